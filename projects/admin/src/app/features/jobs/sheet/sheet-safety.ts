import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { SheetCaution, SheetProduct } from '@layerbook/contracts/types';
import { Language } from '../../../../../../shared/i18n/language';
import { type CautionText, cautionView, hazardFlags } from './caution-lines';
import { formatNumber } from './sheet-format';
import { TranslateOrPipe } from './translate-or-pipe';

/**
 * The cautions the engine raised for this job, each with its rule, whose rule it is and the standing
 * line (in the reader's language by key, else the English as sent), then each product's hazard flags.
 */
@Component({
  selector: 'lb-sheet-safety',
  imports: [MatIconModule, TranslateOrPipe, TranslatePipe],
  template: `
    @for (c of cautions(); track c.id) {
      <article class="caution" [attr.aria-labelledby]="'caution-' + c.id">
        <h3 [id]="'caution-' + c.id">
          <mat-icon aria-hidden="true">warning</mat-icon>{{ c.title.key | translateOr: c.title.params : c.title.english }}
        </h3>
        <ul>
          @for (b of c.bullets; track $index) {
            <li>{{ b.key | translateOr: b.params : b.english }}</li>
          }
        </ul>
        <p class="rule">
          <strong>{{ 'sheet.safety.rule' | translate }}</strong> {{ c.rule.key | translateOr: c.rule.params : c.rule.english }}
        </p>
        <p class="jurisdiction">
          @for (j of c.jurisdiction; track $index) {
            {{ j.key | translateOr: j.params : j.english }}
          }
        </p>
        <p class="standing">{{ c.standing.key | translateOr: c.standing.params : c.standing.english }}</p>
      </article>
    } @empty {
      <p class="muted">{{ 'sheet.safety.none' | translate }}</p>
    }

    @if (flagged().length > 0) {
      <h3>{{ 'sheet.safety.hazards' | translate }}</h3>
      <ul class="hazards">
        @for (p of flagged(); track p.product.id) {
          <li>
            <strong>{{ p.product.name }}</strong>
            <span class="flags">
              @for (f of p.flags; track f.kind) {
                <span class="flag" [class.danger]="f.kind === 'flammable'">
                  @switch (f.kind) {
                    @case ('flammable') {
                      <mat-icon aria-hidden="true">local_fire_department</mat-icon>
                    }
                    @case ('dryingOil') {
                      <mat-icon aria-hidden="true">local_fire_department</mat-icon>
                    }
                    @default {
                      <mat-icon aria-hidden="true">report</mat-icon>
                    }
                  }
                  @if (f.kind === 'flammable' || f.kind === 'flashPoint') {
                    {{ 'sheet.safety.' + f.kind | translate: { c: number(f.flashPointC), f: number(f.flashPointF) } }}
                  } @else {
                    {{ 'sheet.safety.' + f.kind | translate }}
                  }
                </span>
              }
            </span>
          </li>
        }
      </ul>
    }
  `,
  styles: `
    .caution {
      border: 1px solid var(--mat-sys-outline-variant);
      border-left: 4px solid var(--mat-sys-error);
      border-radius: 8px;
      padding: 0.5rem 0.75rem;
      margin-bottom: 0.75rem;
      background: var(--mat-sys-surface-container-lowest);
    }
    h3 {
      display: flex;
      align-items: center;
      gap: 0.4rem;
      margin: 0.5rem 0;
    }
    h3 mat-icon {
      color: var(--mat-sys-error);
      flex: none;
    }
    ul {
      margin: 0.25rem 0;
      padding-left: 1.25rem;
    }
    li {
      margin: 0.25rem 0;
    }
    p {
      margin: 0.35rem 0;
    }
    .rule,
    .jurisdiction,
    .standing {
      font-size: 0.9rem;
      color: var(--mat-sys-on-surface-variant);
    }
    .hazards {
      list-style: none;
      padding: 0;
    }
    .hazards li {
      display: grid;
      gap: 0.25rem;
      padding: 0.4rem 0;
      border-top: 1px solid var(--mat-sys-outline-variant);
    }
    .flags {
      display: flex;
      flex-wrap: wrap;
      gap: 0.35rem;
    }
    .flag {
      display: inline-flex;
      align-items: center;
      gap: 0.25rem;
      padding: 0.15rem 0.6rem;
      border-radius: 999px;
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
      font-size: 0.9rem;
    }
    .flag.danger {
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    .flag mat-icon {
      width: 18px;
      height: 18px;
      font-size: 18px;
    }
    .muted {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SheetSafety {
  private readonly language = inject(Language);
  private readonly translate = inject(TranslateService);

  readonly sheetCautions = input.required<readonly SheetCaution[]>();
  readonly products = input.required<readonly SheetProduct[]>();

  protected readonly cautions = computed(() => {
    this.language.current(); // list items are joined in the reader's language: again when it changes
    return this.sheetCautions().map((caution) => {
      const view = cautionView(caution);
      return { ...view, bullets: view.bullets.map((b) => this.withItems(b)) };
    });
  });
  protected readonly flagged = computed(() =>
    this.products()
      .map((product) => ({ product, flags: hazardFlags(product) }))
      .filter((p) => p.flags.length > 0),
  );

  /** A line listing items (flammable products) gets its list param in the reader's words; any item without words: the English line. */
  private withItems(text: CautionText): CautionText {
    if (!text.items || !text.key) return text;
    const said = text.items.map((item) => this.translate.instant(item.key, item.params) as unknown);
    if (said.some((s, i) => typeof s !== 'string' || s === text.items![i].key)) return { ...text, key: null };
    return { ...text, params: { ...text.params, products: said.join(', ') } };
  }

  protected number(value: number): string {
    return formatNumber(value, this.language.locale());
  }
}
