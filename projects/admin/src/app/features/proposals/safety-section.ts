import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';
import { DomainInputError, unpricedScaffoldWarning, type EstimateResultJson } from '@layerbook/domain';

/** The engine's cautions for this job's facts, each with the rule it points to. */
@Component({
  selector: 'lb-safety-section',
  imports: [TranslatePipe],
  template: `
    <h2 id="safety-heading">{{ 'proposals.safety.heading' | translate }}</h2>
    @if (scaffoldWarning(); as warning) {
      <p class="warning" role="status"><span aria-hidden="true">⚠</span> {{ warning }}</p>
    }
    @for (c of result().cautions; track c.id) {
      <article class="caution" [attr.aria-labelledby]="'caution-' + c.id">
        <h3 [id]="'caution-' + c.id">{{ c.title }}</h3>
        <ul>
          @for (b of c.bullets; track $index) {
            <li>{{ b }}</li>
          }
        </ul>
        <p class="rule">{{ 'proposals.safety.rule' | translate: { rule: c.rule } }}</p>
        @if (c.jurisdiction) {
          <p class="jurisdiction">{{ c.jurisdiction }}</p>
        }
        <p class="hint">{{ c.standing }}</p>
      </article>
    } @empty {
      <p class="hint">{{ 'proposals.safety.none' | translate }}</p>
    }
  `,
  styleUrl: './result-section.scss',
  styles: `
    .caution {
      padding: 0.5rem 0.75rem;
      margin-bottom: 0.75rem;
      border-left: 4px solid var(--lb-ochre);
      background: var(--mat-sys-surface-container-low);
      border-radius: 6px;
    }
    .caution h3 {
      margin-top: 0.25rem;
    }
    .rule {
      margin: 0.25rem 0;
      font-weight: 600;
    }
    .jurisdiction {
      margin: 0.25rem 0;
    }
    .warning {
      padding: 0.5rem 0.75rem;
      border: 1px solid var(--lb-ochre);
      border-radius: 6px;
      font-weight: 600;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SafetySection {
  readonly result = input.required<EstimateResultJson>();
  /** the estimate's equipment lines as typed: a scaffold with none priced gets a warning */
  readonly equipment = input<ReadonlyArray<{ readonly amount: string }>>([]);
  protected readonly scaffoldWarning = computed(() => {
    try {
      return unpricedScaffoldWarning(this.result().cautions, this.equipment());
    } catch (error) {
      // an amount still being typed is marked on its own field
      if (error instanceof DomainInputError) return null;
      throw error;
    }
  });
}
