import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe } from '@ngx-translate/core';

/** Stands in for an area that is not built yet, saying plainly what it will hold. */
@Component({
  selector: 'lb-coming-soon',
  imports: [TranslatePipe, MatIconModule],
  template: `
    <section class="lb-page">
      <h1>{{ heading() | translate }}</h1>
      <p class="lb-lead">{{ summary() | translate }}</p>
      <p class="later">
        <mat-icon aria-hidden="true">construction</mat-icon>
        <span>{{ 'ui.comingSoon.beingBuilt' | translate }}</span>
      </p>
    </section>
  `,
  styles: `
    .later {
      display: inline-flex;
      align-items: center;
      gap: 0.5rem;
      padding: 0.5rem 0.75rem;
      border-radius: 8px;
      background: var(--mat-sys-surface-container);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ComingSoon {
  readonly heading = input.required<string>();
  readonly summary = input.required<string>();
}
