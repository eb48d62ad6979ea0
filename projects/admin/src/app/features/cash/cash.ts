import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { BarController, BarElement, CategoryScale, Legend, LinearScale, Tooltip } from 'chart.js';
import { provideCharts } from 'ng2-charts';
import { Session } from '../../core/auth/session';
import { CashExports } from './cash-exports';
import { CashForecast } from './cash-forecast';
import { JobMoney } from './job-money';
import { ReceivedByMonth } from './received-by-month';
import { Receivables } from './receivables';
import { TranslatePipe } from '@ngx-translate/core';

/**
 * The owner's cash: who owes what and how late, what came in each month, what is expected in the
 * coming weeks, how jobs pay, and the files for the accountant. The office sees the same page
 * without margins (the API leaves them out). Only the bar chart's parts of chart.js are registered,
 * here in the lazily loaded page, so the first load of the app never carries the chart library.
 */
@Component({
  selector: 'lb-cash',
  imports: [TranslatePipe, CashExports, CashForecast, JobMoney, ReceivedByMonth, Receivables],
  providers: [provideCharts({ registerables: [BarController, BarElement, CategoryScale, LinearScale, Legend, Tooltip] })],
  template: `
    <section class="lb-page wide-page">
      <h1>{{ 'cash.cash.cash' | translate }}</h1>
      <p class="lb-lead">
        {{ 'cash.cash.whoOwesYouAnd' | translate }}
        @if (isOwner) {
          {{ 'cash.cash.whatEachJobBrought' | translate }}
        }
      </p>
      <lb-receivables />
      <lb-received-by-month />
      <lb-cash-forecast />
      <lb-job-money />
      <lb-cash-exports />
    </section>
  `,
  styles: `
    .wide-page {
      max-width: 84rem;
    }
    h1 {
      margin: 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Cash {
  protected readonly isOwner = inject(Session).isOwner();
}
