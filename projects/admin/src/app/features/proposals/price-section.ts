import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, inject, input } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';
import type { EstimatingSettings } from '@layerbook/contracts/types';
import { measureText, perAreaGap, roundedNumber, roundsToZero, type EstimateResultJson } from '@layerbook/domain';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { percentText } from './estimate-words';

/** The price build-up, bottom-up, with the owner's per-area check beside it. */
@Component({
  selector: 'lb-price-section',
  imports: [MoneyPipe, TranslatePipe],
  template: `
    @let p = result().price;
    <h2 id="price-heading">{{ 'proposals.price.heading' | translate }}</h2>
    <div class="table-wrap" tabindex="0" role="region" aria-labelledby="price-heading">
      <table aria-labelledby="price-heading">
        <tbody>
          <tr>
            <th scope="row">{{ 'proposals.price.labour' | translate }}</th>
            <td class="muted">
              {{
                'proposals.price.labourWorking'
                  | translate: { hours: hours(p.labourHours), rate: (settings().labourRate | money: currency()) }
              }}
            </td>
            <td class="num">{{ p.labour | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">{{ 'proposals.price.materials' | translate }}</th>
            <td class="muted">
              {{
                'proposals.price.materialsWorking'
                  | translate: { cost: (p.materialsCost | money: currency()), markup: settings().materialsMarkupPercent }
              }}
            </td>
            <td class="num">{{ p.materials | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">{{ 'proposals.price.equipment' | translate }}</th>
            <td></td>
            <td class="num">{{ p.equipment | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">{{ 'proposals.price.subcontracts' | translate }}</th>
            <td></td>
            <td class="num">{{ p.subcontracts | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">{{ 'proposals.price.sundries' | translate }}</th>
            <td></td>
            <td class="num">{{ p.sundries | money: currency() }}</td>
          </tr>
          <tr class="sum">
            <th scope="row">{{ 'proposals.price.direct' | translate }}</th>
            <td></td>
            <td class="num">{{ p.direct | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">{{ 'proposals.price.overhead' | translate }}</th>
            <td class="muted">{{ methodWords() }}</td>
            <td class="num">{{ p.overhead | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">{{ 'proposals.price.profit' | translate }}</th>
            <td></td>
            <td class="num">{{ p.profit | money: currency() }}</td>
          </tr>
          @if (!roundsToZero(p.discount)) {
            <tr>
              <th scope="row">{{ 'proposals.price.discount' | translate }}</th>
              <td></td>
              <td class="num">− {{ p.discount | money: currency() }}</td>
            </tr>
          }
          <tr>
            <th scope="row">{{ 'proposals.price.minimum' | translate }}</th>
            <td colspan="2">
              @if (p.isMinimumApplied) {
                {{ 'proposals.price.minimumApplied' | translate: { minimum: (settings().minimumCharge | money: currency()) } }}
              } @else if (settings().minimumCharge) {
                {{ 'proposals.price.minimumNotNeeded' | translate: { minimum: (settings().minimumCharge | money: currency()) } }}
              } @else {
                {{ 'proposals.price.minimumNone' | translate }}
              }
            </td>
          </tr>
          @if (!roundsToZero(p.roundingAdjustment)) {
            <tr>
              <th scope="row">{{ 'proposals.price.rounding' | translate }}</th>
              <td></td>
              <td class="num">{{ p.roundingAdjustment | money: currency() }}</td>
            </tr>
          }
          <tr class="sum">
            <th scope="row">{{ 'proposals.price.price' | translate }}</th>
            <td class="muted">{{ 'proposals.price.beforeTax' | translate }}</td>
            <td class="num" data-testid="price">{{ p.price | money: currency() }}</td>
          </tr>
          <tr>
            <th scope="row">{{ 'proposals.price.tax' | translate }}</th>
            <td class="muted">{{ taxWords() }}</td>
            <td class="num">{{ p.tax | money: currency() }}</td>
          </tr>
          <tr class="sum">
            <th scope="row">{{ 'proposals.price.total' | translate }}</th>
            <td></td>
            <td class="num">{{ p.total | money: currency() }}</td>
          </tr>
        </tbody>
      </table>
    </div>
    <p class="hint">
      {{ 'proposals.price.effective' | translate: { markup: percent(p.effectiveMarkup), margin: percent(p.effectiveMargin) } }}
    </p>

    <h3 id="per-area-heading">{{ 'proposals.price.perAreaCheck' | translate }}</h3>
    @if (result().perAreaCheck; as check) {
      @if (check.lines.length > 0) {
        <div class="table-wrap" tabindex="0" role="region" aria-labelledby="per-area-heading">
          <table aria-labelledby="per-area-heading">
            <thead>
              <tr>
                <th scope="col">{{ 'proposals.price.surface' | translate }}</th>
                <th scope="col" class="num">{{ 'proposals.price.measured' | translate }}</th>
                <th scope="col" class="num">{{ 'proposals.price.rate' | translate }}</th>
                <th scope="col" class="num">{{ 'proposals.price.amount' | translate }}</th>
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
                <th scope="row">{{ 'proposals.price.byArea' | translate }}</th>
                <td colspan="2"></td>
                <td class="num">{{ check.total | money: currency() }}</td>
              </tr>
              <tr>
                <th scope="row">{{ 'proposals.price.bottomUp' | translate }}</th>
                <td colspan="2"></td>
                <td class="num">{{ p.price | money: currency() }}</td>
              </tr>
              <tr>
                <th scope="row">{{ (gap().isAbove ? 'proposals.price.higherBy' : 'proposals.price.lowerBy') | translate }}</th>
                <td colspan="2"></td>
                <td class="num">{{ gap().amount | money: currency() }}</td>
              </tr>
            </tbody>
          </table>
        </div>
      } @else {
        <p class="hint">{{ 'proposals.price.noRates' | translate: { unit: unit() } }}</p>
      }
    } @else {
      <p class="hint">{{ 'proposals.price.addRate' | translate: { unit: unit() } }}</p>
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
