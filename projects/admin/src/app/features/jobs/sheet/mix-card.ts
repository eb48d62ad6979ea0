import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { TranslatePipe } from '@ngx-translate/core';
import type { SheetLayer, SheetProduct, UnitSystem } from '@layerbook/contracts/types';
import { Language } from '../../../../../../shared/i18n/language';
import { type BatchUnit, type MixLine, batchUnits, defaultBatch, formatMetric, layerRecipe, scaleMix } from './mix-lines';

let nextCardId = 0;

/**
 * A layer's mix card: the crew types the batch they are making and reads every component and the
 * water scaled to it, in kitchen measures and metric side by side (weight recipes in grams only).
 */
@Component({
  selector: 'lb-mix-card',
  imports: [MatFormFieldModule, MatInputModule, TranslatePipe],
  template: `
    @if (recipe(); as r) {
      <div class="card" role="group" [attr.aria-labelledby]="id + '-h'">
        <h4 [id]="id + '-h'">{{ 'sheet.mix.heading' | translate: { layer: layer().name } }}</h4>
        <div class="batch">
          <mat-form-field subscriptSizing="dynamic">
            <mat-label>{{ 'sheet.mix.batch' | translate }}</mat-label>
            <input
              matInput
              type="number"
              inputmode="decimal"
              min="0"
              step="any"
              [value]="amountText()"
              (input)="amountText.set($any($event.target).value)"
            />
          </mat-form-field>
          <mat-form-field subscriptSizing="dynamic">
            <mat-label>{{ 'sheet.mix.unit' | translate }}</mat-label>
            <select matNativeControl [value]="unit()" (change)="unit.set($any($event.target).value)">
              @for (u of units(); track u) {
                <option [value]="u" [selected]="u === unit()">{{ 'sheet.batchUnit.' + u | translate }}</option>
              }
            </select>
          </mat-form-field>
        </div>
        @if (lines(); as rows) {
          <table>
            <thead>
              <tr>
                <th scope="col">{{ 'sheet.mix.component' | translate }}</th>
                @if (r.by === 'volume') {
                  <th scope="col" class="num">{{ 'sheet.mix.kitchen' | translate }}</th>
                }
                <th scope="col" class="num">{{ 'sheet.mix.metric' | translate }}</th>
              </tr>
            </thead>
            <tbody>
              @for (row of rows; track row.component) {
                <tr>
                  <th scope="row">
                    {{ row.isWater ? ('sheet.mix.water' | translate) : row.name }}
                    @if (row.isBase && rows.length > 1) {
                      <span class="base">{{ 'sheet.mix.base' | translate }}</span>
                    }
                  </th>
                  @if (row.kitchen; as k) {
                    <td class="num">
                      {{ k.isApproximate ? '≈ ' : '' }}{{ k.number }}
                      {{ 'sheet.kitchen.' + k.unit + (k.isPlural ? '.other' : '.one') | translate }}
                    </td>
                  }
                  <td class="num">{{ metric(row) }}</td>
                </tr>
              }
            </tbody>
          </table>
          @if (r.by === 'weight') {
            <p class="note">{{ 'sheet.mix.byWeight' | translate }}</p>
          }
        } @else {
          <p class="error" role="alert">{{ 'sheet.mix.batchError' | translate }}</p>
        }
      </div>
    }
  `,
  styles: `
    .card {
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      padding: 0.75rem;
      background: var(--mat-sys-surface-container-low);
    }
    h4 {
      margin: 0 0 0.5rem;
    }
    .batch {
      display: grid;
      grid-template-columns: minmax(0, 1fr) minmax(0, 1fr);
      gap: 0.5rem;
    }
    table {
      width: 100%;
      border-collapse: collapse;
      margin-top: 0.5rem;
      font-size: 1.05rem;
    }
    th,
    td {
      padding: 0.4rem 0.25rem;
      text-align: left;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
      vertical-align: top;
    }
    thead th {
      font-size: 0.85rem;
      color: var(--mat-sys-on-surface-variant);
    }
    .num {
      text-align: right;
      font-variant-numeric: tabular-nums;
      white-space: nowrap;
    }
    .base {
      display: block;
      font-size: 0.8rem;
      font-weight: normal;
      color: var(--mat-sys-on-surface-variant);
    }
    .note {
      font-size: 0.9rem;
      color: var(--mat-sys-on-surface-variant);
    }
    .error {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MixCard {
  private readonly language = inject(Language);

  readonly layer = input.required<SheetLayer>();
  readonly products = input.required<readonly SheetProduct[]>();
  readonly firmUnits = input.required<UnitSystem>();

  protected readonly id = `lb-mix-${nextCardId++}`;
  protected readonly recipe = computed(() => layerRecipe(this.layer(), this.products()));
  protected readonly units = computed(() => batchUnits(this.recipe()?.by ?? 'volume'));
  private readonly start = computed(() => defaultBatch(this.recipe()?.by ?? 'volume', this.firmUnits()));
  protected readonly amountText = linkedSignal(() => String(this.start().amount));
  protected readonly unit = linkedSignal<BatchUnit>(() => this.start().unit);

  /** the scaled batch, or null while the amount is not a number above zero */
  protected readonly lines = computed<MixLine[] | null>(() => {
    const recipe = this.recipe();
    const amount = Number(this.amountText());
    if (!recipe || this.amountText().trim() === '' || !Number.isFinite(amount) || amount <= 0) return null;
    try {
      return scaleMix(this.layer(), recipe, { amount, unit: this.unit() }, this.products());
    } catch {
      return null;
    }
  });

  protected metric(line: MixLine): string {
    return formatMetric(line.metric, this.language.locale());
  }
}
