import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';
import type { SheetFinish, SheetLayer, SheetProduct, UnitSystem } from '@layerbook/contracts/types';
import { Language } from '../../../../../../shared/i18n/language';
import { MixCard } from './mix-card';
import { formatNumber } from './sheet-format';
import { numberFormat } from '../../../../../../shared/i18n/format/intl-cache';

/** Each finish's layers in the order they go on: product, method, coats, coverage, share, wait, and a mix card. */
@Component({
  selector: 'lb-sheet-finishes',
  imports: [MixCard, TranslatePipe],
  template: `
    @for (finish of finishes(); track finish.id) {
      <section class="finish" [attr.aria-labelledby]="'finish-' + finish.id">
        <h3 [id]="'finish-' + finish.id">{{ finish.name }}</h3>
        <ol class="layers">
          @for (layer of finish.layers; track layer.id; let i = $index) {
            <li>
              <p class="name">
                <span class="step">{{ i + 1 }}</span><strong>{{ layer.name }}</strong>
              </p>
              <dl>
                <div>
                  <dt>{{ 'sheet.finishes.product' | translate }}</dt>
                  <dd>{{ productNames(layer) }}</dd>
                </div>
                <div>
                  <dt>{{ 'sheet.finishes.method' | translate }}</dt>
                  <dd>{{ 'sheet.method.' + layer.method | translate }}</dd>
                </div>
                <div>
                  <dt>{{ 'sheet.finishes.coats' | translate }}</dt>
                  <dd>{{ layer.coats }}</dd>
                </div>
                <div>
                  <dt>{{ 'sheet.finishes.coverage' | translate }}</dt>
                  <dd>
                    @if (layer.coverage.kind === 'spreadRate') {
                      {{
                        'sheet.finishes.spreadRate'
                          | translate
                            : {
                                value: number(layer.coverage.surfacePerUnit),
                                length: layer.coverage.lengthUnit,
                                unit: ('sheet.qty.' + layer.coverage.unit | translate),
                              }
                      }}
                    } @else {
                      {{
                        'sheet.finishes.consumption'
                          | translate
                            : {
                                value: number(layer.coverage.unitPerSurface, 2),
                                length: layer.coverage.lengthUnit,
                                unit: ('sheet.qty.' + layer.coverage.unit | translate),
                              }
                      }}
                    }
                  </dd>
                </div>
                <div>
                  <dt>{{ 'sheet.finishes.share' | translate }}</dt>
                  <dd>{{ percent(layer.coverageShare) }}</dd>
                </div>
                @if (layer.dilution; as d) {
                  <div>
                    <dt>{{ 'sheet.finishes.dilution' | translate }}</dt>
                    <dd>{{ 'sheet.finishes.' + d.convention | translate: { percent: percent(d.share) } }}</dd>
                  </div>
                }
                <div>
                  <dt>{{ 'sheet.finishes.waitAfter' | translate }}</dt>
                  <dd>
                    @if (layer.waitHoursAfter > 0) {
                      {{ 'sheet.finishes.hours' | translate: { hours: number(layer.waitHoursAfter) } }}
                    } @else {
                      {{ 'sheet.finishes.noWait' | translate }}
                    }
                  </dd>
                </div>
              </dl>
              <lb-mix-card [layer]="layer" [products]="products()" [firmUnits]="firmUnits()" />
            </li>
          }
        </ol>
      </section>
    } @empty {
      <p class="muted">{{ 'sheet.finishes.none' | translate }}</p>
    }
  `,
  styles: `
    h3 {
      margin: 1rem 0 0.5rem;
    }
    .layers {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 1rem;
    }
    .name {
      display: flex;
      align-items: center;
      gap: 0.5rem;
      margin: 0 0 0.25rem;
    }
    .step {
      display: inline-grid;
      place-items: center;
      width: 1.6rem;
      height: 1.6rem;
      border-radius: 50%;
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
      font-size: 0.85rem;
      flex: none;
    }
    dl {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(min(100%, 10rem), 1fr));
      gap: 0.25rem 1rem;
      margin: 0 0 0.5rem;
    }
    dt {
      font-size: 0.8rem;
      color: var(--mat-sys-on-surface-variant);
    }
    dd {
      margin: 0;
    }
    .muted {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SheetFinishes {
  private readonly language = inject(Language);

  readonly finishes = input.required<readonly SheetFinish[]>();
  readonly products = input.required<readonly SheetProduct[]>();
  readonly firmUnits = input.required<UnitSystem>();

  protected productNames(layer: SheetLayer): string {
    const ids = layer.recipe ? layer.recipe.components.map((c) => c.productId) : layer.productId ? [layer.productId] : [];
    return ids.map((id) => this.products().find((p) => p.id === id)?.name ?? id).join(' + ');
  }

  protected number(value: number, digits = 1): string {
    return formatNumber(value, this.language.locale(), digits);
  }

  protected percent(share: number): string {
    return numberFormat(this.language.locale(), { style: 'percent', maximumFractionDigits: 1 }).format(share);
  }
}
