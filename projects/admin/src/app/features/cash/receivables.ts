import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { map } from 'rxjs';
import { loadMessage } from '../../shared/forms/load-message';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { CashChart } from './cash-chart';
import { agingAmounts, agingChart, barOptions } from './cash-charts';
import { Language } from '../../../../../shared/i18n/language';
import {
  CASH_AGING_BUCKETS,
  CASH_AGING_BUCKET_LABELS,
  type CashAgingBucket,
  type CashReceivableInvoices,
  type CashReceivables,
} from '@layerbook/contracts/types';
import { lateWords } from './cash-words';
import { drillFromParams, drillHeading, drillToParams, drillUrl, type ReceivableDrill } from './receivable-drill';
import { TranslatePipe } from '@ngx-translate/core';

export const RECEIVABLES_URL = '/api/cash/receivables';
/** How many clients the server lists unless all are asked for (server/src/cash/receivables.ts). */
export const CLIENTS_LISTED = 25;

/** Money owed to the firm by age as of a chosen day, per client, with the invoices behind each figure on request. */
@Component({
  selector: 'lb-receivables',
  imports: [
    TranslatePipe,
    CalendarDatePipe,
    CashChart,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MoneyPipe,
    RouterLink,
  ],
  templateUrl: './receivables.html',
  styleUrl: './cash-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Receivables {
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);
  /** the reader's locale, as the `money` pipe of the table beside each chart uses it */
  private readonly language = inject(Language);

  protected readonly buckets = CASH_AGING_BUCKETS;
  protected readonly bucketLabels = CASH_AGING_BUCKET_LABELS;
  protected readonly lateWords = lateWords;

  /** The address bar holds the day and the drill-down, so a drilled view can be bookmarked or shared. */
  protected readonly drill = toSignal(this.route.queryParams.pipe(map(drillFromParams)), {
    initialValue: drillFromParams(this.route.snapshot.queryParams),
  });
  /** Apart from the drill-down, so opening a list never asks for the figures again. */
  private readonly asOf = computed(() => this.drill().asOf);
  protected readonly clientsListed = CLIENTS_LISTED;
  /** Every client who owes, or (the default) the 25 who owe most. */
  protected readonly allClients = signal(false);
  protected readonly receivables = httpResource<CashReceivables>(() => {
    const asOf = this.asOf();
    const params = { ...(asOf ? { asOf } : {}), ...(this.allClients() ? { clients: 'all' } : {}) };
    return { url: RECEIVABLES_URL, ...(Object.keys(params).length ? { params } : {}) };
  });
  protected readonly view = computed(() => (this.receivables.hasValue() ? this.receivables.value() : null));
  protected readonly message = loadMessage(this.receivables);
  protected readonly chart = computed(() => {
    const view = this.view();
    return view ? { data: agingChart(view), options: barOptions(view.currency, this.language.locale(), agingAmounts(view)) } : null;
  });
  protected readonly isDrilled = computed(() => this.drill().age !== null || this.drill().clientId !== null);
  /** The invoices behind a figure, asked for when the owner opens one (an age, a client, both). */
  protected readonly drilled = httpResource<CashReceivableInvoices>(() => (this.isDrilled() ? drillUrl(this.drill()) : undefined));
  protected readonly drillMessage = loadMessage(this.drilled);
  protected readonly invoices = computed(() => (this.isDrilled() && this.drilled.hasValue() ? this.drilled.value().invoices : []));
  protected readonly heading = computed(() => {
    const view = this.view();
    return view ? drillHeading(view, this.drill(), this.invoices()[0]?.clientName) : '';
  });

  /** The same figures, invoice by invoice, as a spreadsheet file for the accountant. */
  protected csvHref(asOf: string): string {
    return `/api/cash/exports/receivables.csv?asOf=${encodeURIComponent(asOf)}`;
  }

  protected chooseDay(value: string): void {
    this.go({ ...this.drill(), asOf: /^\d{4}-\d{2}-\d{2}$/.test(value) ? value : null });
  }

  protected showAge(age: CashAgingBucket): void {
    this.go({ ...this.drill(), age, clientId: null });
  }

  /** A bar clicked on the chart: the same list as the age's button in the table. */
  protected showAgeAt(index: number): void {
    const age = CASH_AGING_BUCKETS[index];
    if (age) this.showAge(age);
  }

  protected showClient(clientId: string): void {
    this.go({ ...this.drill(), age: null, clientId });
  }

  protected showAllClients(all: boolean): void {
    this.allClients.set(all);
  }

  protected closeDrill(): void {
    this.go({ ...this.drill(), age: null, clientId: null });
  }

  private go(drill: ReceivableDrill): void {
    void this.router.navigate([], {
      relativeTo: this.route,
      queryParams: drillToParams(drill),
      queryParamsHandling: 'merge',
      replaceUrl: true,
    });
  }
}
