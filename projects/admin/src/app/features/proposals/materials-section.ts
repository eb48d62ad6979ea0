import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';
import { QUANTITY_UNIT_SYMBOLS, type EngineRoom } from '@layerbook/contracts/types';
import { formatKitchenVolume, formatMetricMass, fromBase, roundedNumber, type EstimateResultJson } from '@layerbook/domain';
import { MoneyPipe } from '../../shared/ui/money-pipe';

/** What to buy (whole-job totals rounded up to the containers sold) and what to mix per layer. */
@Component({
  selector: 'lb-materials-section',
  imports: [MoneyPipe, TranslatePipe],
  template: `
    <h2 id="materials-heading">{{ 'proposals.materials.heading' | translate }}</h2>
    <div class="table-wrap" tabindex="0" role="region" aria-labelledby="materials-heading">
      <table aria-labelledby="materials-heading">
        <thead>
          <tr>
            <th scope="col">{{ 'proposals.materials.product' | translate }}</th>
            <th scope="col" class="num">{{ 'proposals.materials.need' | translate }}</th>
            <th scope="col">{{ 'proposals.materials.buy' | translate }}</th>
            <th scope="col" class="num">{{ 'proposals.materials.cost' | translate }}</th>
            <th scope="col" class="num">{{ 'proposals.materials.leftOver' | translate }}</th>
          </tr>
        </thead>
        <tbody>
          @for (p of products(); track p.productId) {
            <tr>
              <th scope="row">{{ p.name }}</th>
              <td class="num">{{ p.need }}</td>
              <td>
                <ul class="plain">
                  @for (line of p.lines; track line.label) {
                    <li>
                      {{
                        'proposals.materials.buyLine'
                          | translate: { count: line.count, label: line.label, price: (line.unitPrice | money: currency()) }
                      }}
                    </li>
                  }
                </ul>
              </td>
              <td class="num">{{ p.cost | money: currency() }}</td>
              <td class="num">{{ p.leftover }}</td>
            </tr>
          }
          <tr class="sum">
            <th scope="row">{{ 'proposals.materials.atCost' | translate }}</th>
            <td colspan="2"></td>
            <td class="num">{{ result().totals.materialsCost | money: currency() }}</td>
            <td></td>
          </tr>
        </tbody>
      </table>
    </div>
    <p class="hint">{{ 'proposals.materials.hint' | translate }}</p>

    <h3 id="mix-heading">{{ 'proposals.materials.mixHeading' | translate }}</h3>
    <div class="table-wrap" tabindex="0" role="region" aria-labelledby="mix-heading">
      <table aria-labelledby="mix-heading">
        <thead>
          <tr>
            <th scope="col">{{ 'proposals.materials.surfaceAndLayer' | translate }}</th>
            <th scope="col">{{ 'proposals.materials.mixed' | translate }}</th>
            <th scope="col">{{ 'proposals.materials.water' | translate }}</th>
          </tr>
        </thead>
        <tbody>
          @for (m of mixes(); track m.key) {
            <tr>
              <th scope="row">{{ m.label }}</th>
              <td>{{ m.mix }}</td>
              <td>{{ m.water }}</td>
            </tr>
          }
        </tbody>
      </table>
    </div>
  `,
  styleUrl: './result-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MaterialsSection {
  readonly result = input.required<EstimateResultJson>();
  readonly currency = input.required<string>();
  readonly rooms = input.required<readonly EngineRoom[]>();

  protected readonly products = computed(() =>
    this.result().products.map((p) => ({
      productId: p.productId,
      name: p.name,
      need: `${roundedNumber(p.needInUnit, 2)} ${QUANTITY_UNIT_SYMBOLS[p.unit]}`,
      lines: p.pack.lines,
      cost: p.pack.totalCost,
      leftover: `${roundedNumber(fromBase(p.pack.leftover, p.unit), 2)} ${QUANTITY_UNIT_SYMBOLS[p.unit]}`,
    })),
  );

  protected readonly mixes = computed(() => {
    const roomNames = new Map(this.rooms().map((r) => [r.id, r.name]));
    return this.result().surfaces.flatMap((s) =>
      s.layers.map((l) => ({
        key: `${s.surfaceId}:${l.layerId}`,
        label: `${roomNames.get(s.roomId) ?? ''} – ${s.name}: ${l.name}`,
        mix: amountText(l.quantity.mix, l.quantity.dimension),
        water: l.quantity.water > 0 ? amountText(l.quantity.water, l.quantity.dimension) : '—',
      })),
    );
  });
}

/** Volumes in kitchen measures with metric alongside; weights in metric (a scale, not spoons). */
function amountText(base: number, dimension: 'volume' | 'mass'): string {
  if (dimension === 'mass') return formatMetricMass(base);
  const k = formatKitchenVolume(base);
  return `${k.text} (${k.metric})`;
}
