import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, RESPONSE_INIT, computed, effect, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import { INVOICE_KIND_LABELS, type PortalInvoiceDetail } from '@layerbook/contracts/types';
import { problemMessage, toProblem } from '../../core/errors/problem';
import { PayByCard } from '../payments/pay-by-card';
import { CANCELLED_WORDS } from '../payments/payment-words';
import { ReceiptList } from '../payments/receipt-list';
import { formatDay, formatMoney } from '../../shared/format/money';
import { creditNotePdfUrl, invoicePdfUrl, invoiceUrl } from './invoice-api';
import { PROGRESS_COLUMN_WORDS, invoiceStatusWords, isZeroAmount } from './invoice-words';

/** One invoice as the client reads it: the document, its PDF, how to pay it (by card online when open for it), its receipts, and its credit note when void. */
@Component({
  selector: 'lb-invoice-page',
  imports: [MatIconModule, MatProgressBarModule, PayByCard, ReceiptList, RouterLink],
  templateUrl: './invoice-page.html',
  styleUrl: './invoice-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvoicePage {
  private readonly title = inject(Title);
  private readonly response = inject(RESPONSE_INIT, { optional: true });

  /** route parameter */
  readonly id = input.required<string>();
  /** query parameter: `cancelled` when the client came back from the card page without paying */
  readonly payment = input<string>();

  private readonly loaded = httpResource<PortalInvoiceDetail>(() => invoiceUrl(this.id()));

  protected readonly invoice = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));
  protected readonly isLoading = computed(() => !this.loaded.hasValue() && this.loaded.isLoading());
  /** 404 and a malformed id read the same: the link is wrong, or the invoice is not theirs. */
  private readonly isMissing = computed(() => {
    const error = this.loaded.error();
    return error !== undefined && [400, 404].includes(toProblem(error).status);
  });
  protected readonly loadMessage = computed(() => {
    const error = this.loaded.error();
    if (!error) return null;
    return this.isMissing()
      ? 'We could not find this invoice. Open it from your invoices or from the e-mail the firm sent.'
      : problemMessage(error);
  });
  protected readonly statusWords = computed(() => {
    const inv = this.invoice();
    return inv ? invoiceStatusWords(inv) : null;
  });
  protected readonly kindLabels = INVOICE_KIND_LABELS;
  protected readonly progressColumns = PROGRESS_COLUMN_WORDS;
  protected readonly pdfUrl = computed(() => invoicePdfUrl(this.id()));
  protected readonly isZero = isZeroAmount;
  /** back from the card page without paying: said at the top, where the client lands */
  protected readonly wasCancelled = computed(() => this.payment() === 'cancelled');
  protected readonly cancelledWords = CANCELLED_WORDS;

  constructor() {
    effect(() => {
      const inv = this.invoice();
      if (inv) this.title.setTitle(`Invoice ${inv.number} · Layerbook client portal`);
    });
    // Tells crawlers and the host's logs the truth while rendering on the server.
    effect(() => {
      if (this.isMissing() && this.response) this.response.status = 404;
    });
  }

  protected money(amount: string): string {
    const inv = this.invoice();
    return inv ? formatMoney(amount, inv.currency, inv.locale) : '';
  }

  protected day(isoDay: string): string {
    return formatDay(isoDay, this.invoice()?.locale ?? 'en-US');
  }

  protected creditNotePdf(creditNoteId: string): string {
    return creditNotePdfUrl(creditNoteId);
  }
}
