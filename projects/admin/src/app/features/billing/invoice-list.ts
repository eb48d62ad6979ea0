import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatChipListboxChange, MatChipsModule } from '@angular/material/chips';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import {
  INVOICE_LIST_FILTERS,
  INVOICE_LIST_FILTER_LABELS,
  SEARCH_MAX_LENGTH,
  type InvoiceListFilter,
  type InvoiceSummary,
  type KeysetPage,
} from '@layerbook/contracts/types';
import { debounceTime, distinctUntilChanged, map, tap } from 'rxjs';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { keysetList } from '../../shared/forms/keyset-list';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { INVOICES_URL } from './invoice-api';
import {
  NO_INVOICE_FILTERS,
  invoiceFiltersFromParams,
  invoiceFiltersToParams,
  invoiceListParams,
  sameInvoiceFilters,
  type InvoiceFilters,
} from './invoice-filters';
import { filterOrder, invoiceNumber, invoiceStatus, kindWord } from './invoice-words';
import { TranslatePipe } from '@ngx-translate/core';

const SEARCH_PAUSE_MS = 300;

/** Invoices: every invoice of the firm, newest first, filtered by state and searched by number or client. */
@Component({
  selector: 'lb-invoice-list',
  imports: [
    TranslatePipe,
    CalendarDatePipe,
    FormAlert,
    MatButtonModule,
    MatChipsModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MoneyPipe,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './invoice-list.html',
  styleUrl: './invoice-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvoiceList {
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);

  protected readonly filterLabels = INVOICE_LIST_FILTER_LABELS;
  protected readonly searchMaxLength = SEARCH_MAX_LENGTH;
  protected readonly isHydrated = hydratedSignal();
  protected readonly invoiceStatus = invoiceStatus;
  protected readonly invoiceNumber = invoiceNumber;
  protected readonly kindWord = kindWord;

  protected readonly search = new FormControl('', { nonNullable: true });

  /** The address bar is the one source of truth: the chips and the search write to it, the list follows it. */
  protected readonly filters = toSignal(
    this.route.queryParams.pipe(
      map(invoiceFiltersFromParams),
      distinctUntilChanged(sameInvoiceFilters),
      tap(({ q }) => {
        if (this.search.value.trim() !== q.trim()) this.search.setValue(q, { emitEvent: false });
      }),
    ),
    { initialValue: NO_INVOICE_FILTERS },
  );
  protected readonly list = keysetList<InvoiceSummary>(INVOICES_URL, () => invoiceListParams(this.filters()));

  /** One draft is enough to know "To review" should lead the chips. */
  private readonly drafts = httpResource<KeysetPage<InvoiceSummary>>(() => ({ url: INVOICES_URL, params: { filter: 'drafts', limit: 1 } }));
  private readonly hasDrafts = computed(() => this.drafts.hasValue() && this.drafts.value().items.length > 0);
  protected readonly chips = computed<readonly InvoiceListFilter[]>(() =>
    this.drafts.hasValue() ? filterOrder(this.hasDrafts()) : INVOICE_LIST_FILTERS,
  );
  protected readonly isFiltered = computed(() => {
    const { filter, q } = this.filters();
    return filter !== 'all' || q.trim() !== '';
  });

  constructor() {
    this.search.valueChanges
      .pipe(debounceTime(SEARCH_PAUSE_MS), distinctUntilChanged(), takeUntilDestroyed(inject(DestroyRef)))
      .subscribe((q) => this.applyFilters({ ...this.filters(), q }));
  }

  protected chooseFilter(change: MatChipListboxChange): void {
    // Choosing the chip already chosen clears it: that is "All".
    const filter = INVOICE_LIST_FILTERS.find((choice) => choice === change.value) ?? 'all';
    this.applyFilters({ ...this.filters(), filter });
  }

  protected clearFilters(): void {
    this.search.setValue('', { emitEvent: false });
    this.applyFilters(NO_INVOICE_FILTERS);
  }

  private applyFilters(filters: InvoiceFilters): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: invoiceFiltersToParams(filters), replaceUrl: true });
  }
}
