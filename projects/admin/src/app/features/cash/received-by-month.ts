import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { loadMessage } from '../../shared/forms/load-message';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { CashChart } from './cash-chart';
import { barOptions, receivedAmounts, receivedChart } from './cash-charts';
import { Language } from '../../../../../shared/i18n/language';
import type { CashReceived } from '@layerbook/contracts/types';
import { monthLabel } from './cash-words';
import { TranslatePipe } from '@ngx-translate/core';

export const RECEIVED_URL = '/api/cash/received';

/** Cash that came in, month by month for the last twelve months, less the refunds given. */
@Component({
  selector: 'lb-received-by-month',
  imports: [TranslatePipe, CashChart, FormAlert, MatProgressBarModule, MoneyPipe],
  template: `
    <section class="cash-section" aria-labelledby="received-heading">
      <h2 id="received-heading">{{ 'cash.receivedByMonth.cashReceivedByMonth' | translate }}</h2>
      <lb-form-alert [message]="message()" />
      @if (received.isLoading()) {
        <mat-progress-bar mode="indeterminate" [aria-label]="'cash.receivedByMonth.loadingCashReceived' | translate" />
      }
      @if (view(); as r) {
        @if (chart(); as c) {
          <lb-cash-chart [data]="c.data" [options]="c.options" [summary]="'cash.receivedByMonth.barChartOfCash' | translate">
            <table class="figures-table">
              <caption>
                {{
                  'cash.receivedByMonth.receivedInTheLast' | translate
                }}
              </caption>
              <thead>
                <tr>
                  <th scope="col">{{ 'cash.receivedByMonth.month' | translate }}</th>
                  <th scope="col" class="num">{{ 'cash.receivedByMonth.payments' | translate }}</th>
                  <th scope="col" class="num">{{ 'cash.receivedByMonth.refunds' | translate }}</th>
                  <th scope="col" class="num">{{ 'cash.receivedByMonth.received' | translate }}</th>
                </tr>
              </thead>
              <tbody>
                @for (month of r.months; track month.month) {
                  <tr>
                    <th scope="row">{{ monthLabel(month.month) }}</th>
                    <td class="num">
                      {{ month.received | money: r.currency }} <span class="muted">({{ month.paymentCount }})</span>
                    </td>
                    <td class="num">
                      @if (month.refundCount > 0) {
                        −{{ month.refunded | money: r.currency }} <span class="muted">({{ month.refundCount }})</span>
                      } @else {
                        <span class="muted">{{ 'cash.receivedByMonth.none' | translate }}</span>
                      }
                    </td>
                    <td class="num">{{ month.net | money: r.currency }}</td>
                  </tr>
                }
              </tbody>
              <tfoot>
                <tr>
                  <th scope="row">{{ 'cash.receivedByMonth.twelveMonths' | translate }}</th>
                  <td class="num">{{ r.totals.received | money: r.currency }}</td>
                  <td class="num">−{{ r.totals.refunded | money: r.currency }}</td>
                  <td class="num">{{ r.totals.net | money: r.currency }}</td>
                </tr>
              </tfoot>
            </table>
          </lb-cash-chart>
          <p class="note">
            {{ 'cash.receivedByMonth.paymentsAreCountedOn' | translate }}
          </p>
        }
      }
    </section>
  `,
  styleUrl: './cash-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReceivedByMonth {
  /** the reader's locale, as the `money` pipe of the table beside each chart uses it */
  private readonly language = inject(Language);
  protected readonly monthLabel = monthLabel;
  protected readonly received = httpResource<CashReceived>(() => RECEIVED_URL);
  protected readonly view = computed(() => (this.received.hasValue() ? this.received.value() : null));
  protected readonly message = loadMessage(this.received);
  protected readonly chart = computed(() => {
    const view = this.view();
    return view ? { data: receivedChart(view), options: barOptions(view.currency, this.language.locale(), receivedAmounts(view)) } : null;
  });
}
