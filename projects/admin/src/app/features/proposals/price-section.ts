import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, inject, input } from '@angular/core';
import type { EstimatingSettings } from '@layerbook/contracts/types';
import { measureText, perAreaGap, roundedNumber, roundsToZero, type EstimateResultJson } from '@layerbook/domain';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { percentText } from './estimate-words';

/** The price build-up, bottom-up, with the owner's per-area check beside it. */
@Component({
  selector: 'lb-price-section',
  imports: [MoneyPipe],
  template: `
    @let p = result().price;
    <h2 id="price-heading">Price</h2>
    <div class="table-wrap" tabindex="0" role="region" aria-labelledby="price-heading">
      <table aria-labelledby="price-heading">
        <tbody>
          <tr>
            <th scope="row">Labour</th>
            <td class="muted">{{ hours(p.labourHours) }} crew-hours × {{ settings().labourRate | money: currency() }}</td>
            <td class="num">{{ p.labour | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">Materials</th>
            <td class="muted">{{ p.materialsCost | money: currency() }} at cost + {{ settings().materialsMarkupPercent }} % markup</td>
            <td class="num">{{ p.materials | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">Equipment and rentals</th>
            <td></td>
            <td class="num">{{ p.equipment | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">Subcontracts</th>
            <td></td>
            <td class="num">{{ p.subcontracts | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">Sundries</th>
            <td></td>
            <td class="num">{{ p.sundries | money: currency() }}</td>
          </tr>
          <tr class="sum">
            <th scope="row">Direct cost</th>
            <td></td>
            <td class="num">{{ p.direct | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">Overhead</th>
            <td class="muted">{{ methodWords() }}</td>
            <td class="num">{{ p.overhead | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">Profit</th>
            <td></td>
            <td class="num">{{ p.profit | money: currency() }}</td>
          </tr>
          @if (!roundsToZero(p.discount)) {
            <tr>
              <th scope="row">Discount</th>
              <td></td>
              <td class="num">− {{ p.discount | money: currency() }}</td>
            </tr>
          }
          <tr>
            <th scope="row">Minimum charge</th>
            <td colspan="2">
              @if (p.isMinimumApplied) {
                Applied: the work came to less than the firm’s minimum of {{ settings().minimumCharge | money: currency() }}.
              } @else if (settings().minimumCharge) {
                Not needed (minimum {{ settings().minimumCharge | money: currency() }}).
              } @else {
                None set.
              }
            </td>
          </tr>
          @if (!roundsToZero(p.roundingAdjustment)) {
            <tr>
              <th scope="row">Rounding</th>
              <td></td>
              <td class="num">{{ p.roundingAdjustment | money: currency() }}</td>
            </tr>
          }
          <tr class="sum">
            <th scope="row">Price</th>
            <td class="muted">before tax</td>
            <td class="num" data-testid="price">{{ p.price | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">Tax</th>
            <td class="muted">{{ taxWords() }}</td>
            <td class="num">{{ p.tax | money: currency() }}</td>
          </tr>
          <tr class="sum">
            <th scope="row">Total</th>
            <td></td>
            <td class="num">{{ p.total | money: currency() }}</td>
          </tr>
        </tbody>
      </table>
    </div>
    <p class="hint">
      Effective markup on cost {{ percent(p.effectiveMarkup) }} · effective margin (share of the price) {{ percent(p.effectiveMargin) }}
    </p>

    <h3 id="per-area-heading">Per-area check</h3>
    @if (result().perAreaCheck; as check) {
      @if (check.lines.length > 0) {
        <div class="table-wrap" tabindex="0" role="region" aria-labelledby="per-area-heading">
          <table aria-labelledby="per-area-heading">
            <thead>
              <tr>
                <th scope="col">Surface</th>
                <th scope="col" class="num">Measured</th>
                <th scope="col" class="num">Rate</th>
                <th scope="col" class="num">Amount</th>
              </tr>
            </thead>
            <tbody>
              @for (line of perAreaLines(); track line.surfaceId) {
                <tr>
                  <th scope="row">{{ line.name }}</th>
                  <td class="num">{{ line.measured }}</td>
                  <td class="num">{{ line.rate | money: currency() }}</td>
                  <td class="num">{{ line.amount | money: currency() }}</td>
                </tr>
              }
              <tr class="sum">
                <th scope="row">By the area</th>
                <td colspan="2"></td>
                <td class="num">{{ check.total | money: currency() }}</td>
              </tr>
              <tr>
                <th scope="row">Bottom-up price</th>
                <td colspan="2"></td>
                <td class="num">{{ p.price | money: currency() }}</td>
              </tr>
              <tr>
                <th scope="row">{{ gap().isAbove ? 'Bottom-up is higher by' : 'Bottom-up is lower by' }}</th>
                <td colspan="2"></td>
                <td class="num">{{ gap().amount | money: currency() }}</td>
              </tr>
            </tbody>
          </table>
        </div>
      } @else {
        <p class="hint">None of the finishes in this option has a rate per {{ unit() }} yet. Add one under Extras.</p>
      }
    } @else {
      <p class="hint">Add a price per {{ unit() }} for a finish under Extras to compare.</p>
    }
  `,
  styleUrl: './result-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PriceSection {
  private readonly locale = inject(LOCALE_ID);

  readonly result = input.required<EstimateResultJson>();
  readonly settings = input.required<EstimatingSettings>();
  readonly currency = input.required<string>();
  readonly lengthUnit = input.required<'ft' | 'm'>();
  readonly rates = input.required<Readonly<Record<string, string>>>();

  protected readonly unit = computed(() => `${this.lengthUnit()}²`);
  protected readonly methodWords = computed(() => {
    const op = this.settings().overheadProfit;
    return op.method === 'margin'
      ? `${op.overheadPercent} % overhead and ${op.profitPercent} % profit as shares of the price`
      : `${op.overheadPercent} % overhead, then ${op.profitPercent} % profit, on cost`;
  });
  protected readonly taxWords = computed(() => {
    const tax = this.settings().tax;
    if (tax.mode === 'none') return 'not added (tax is paid on materials when bought)';
    return tax.mode === 'materials' ? `${tax.ratePercent} % on the materials line` : `${tax.ratePercent} % on the whole job`;
  });
  protected readonly perAreaLines = computed(() => {
    const r = this.result();
    const bySurface = new Map(r.surfaces.map((s) => [s.surfaceId, s]));
    return (r.perAreaCheck?.lines ?? []).map((line) => {
      const s = bySurface.get(line.surfaceId);
      return {
        surfaceId: line.surfaceId,
        name: s?.name ?? '',
        measured: s ? measureText(s.measure, this.lengthUnit()) : '',
        rate: s ? (this.rates()[s.finishSystemId] ?? '') : '',
        amount: line.amount,
      };
    });
  });
  protected readonly gap = computed(() => {
    const r = this.result();
    const gap = perAreaGap(r.price.price, r.perAreaCheck?.total ?? '0');
    return { isAbove: gap.isAbove, amount: gap.amount.toString() };
  });

  /** Crew-hours as a number beside "crew-hours" (they come as a decimal string). */
  protected hours(value: string): string {
    return roundedNumber(Number(value), 2);
  }

  protected percent(ratio: string): string {
    return percentText(ratio, this.locale);
  }

  /** Hides lines that would read "$0.00", such as a rounding of a fraction of a cent. */
  protected roundsToZero(amount: string): boolean {
    return roundsToZero(amount, this.currency());
  }
}
