import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, RESPONSE_INIT, computed, effect, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import type { PortalInvoiceDetail } from '@layerbook/contracts/types';
import { problemMessage, toProblem } from '../../core/errors/problem';
import { PayByCard } from '../payments/pay-by-card';
import { CANCELLED_WORDS } from '../payments/payment-words';
import { ReceiptList } from '../payments/receipt-list';
import { creditNotePdfUrl, invoicePdfUrl, invoiceUrl } from './invoice-api';
import { PROGRESS_COLUMN_WORDS, invoiceStatusWords, isZeroAmount } from './invoice-words';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { Language } from '../../../../../shared/i18n/language';
import { LbNumberPipe, formatAmount, formatCalendarDay } from '../../../../../shared/i18n/format';

/** One invoice as the client reads it: the document, its PDF, how to pay it (by card online when open for it), its receipts, and its credit note when void. */
@Component({
  selector: 'lb-invoice-page',
  imports: [LbNumberPipe, MatIconModule, MatProgressBarModule, PayByCard, ReceiptList, RouterLink, SayPipe, TranslatePipe],
  templateUrl: './invoice-page.html',
  styleUrl: './invoice-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvoicePage {
  private readonly title = inject(Title);
  private readonly response = inject(RESPONSE_INIT, { optional: true });
  private readonly translate = inject(TranslateService);
  private readonly language = inject(Language);

  /** route parameter */
  readonly id = input.required<string>();
  /** query parameter: `cancelled` when the client came back from the card page without paying */
  readonly payment = input<string>();

  /** The server writes the invoice's own words (line labels, terms, deposit rule) in the client's language: read again when it changes. */
  private readonly loaded = httpResource<PortalInvoiceDetail>(() => {
    this.language.current();
    return invoiceUrl(this.id());
  });

  protected readonly invoice = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));

  /** The invoice as it stands now, read again by the pay button after a refusal (paid or voided meanwhile). */
  protected showFresh(fresh: PortalInvoiceDetail): void {
    this.loaded.set(fresh);
  }
  protected readonly isLoading = computed(() => !this.loaded.hasValue() && this.loaded.isLoading());
  /** 404 and a malformed id read the same: the link is wrong, or the invoice is not theirs. */
  private readonly isMissing = computed(() => {
    const error = this.loaded.error();
    return error !== undefined && [400, 404].includes(toProblem(error).status);
  });
  protected readonly loadMessage = computed(() => {
    const error = this.loaded.error();
    if (!error) return null;
    return this.isMissing() ? 'billing.invoice.missing' : problemMessage(error);
  });
  protected readonly statusWords = computed(() => {
    const inv = this.invoice();
    return inv ? invoiceStatusWords(inv) : null;
  });
  /** "Deposit from Kiln Lane Plaster for Hall limewash", in the reader's language. */
  protected readonly meta = computed(() => {
    this.language.current();
    const inv = this.invoice();
    if (!inv) return '';
    const kind = String(this.translate.instant(`billing.kind.${inv.kind}`));
    return String(this.translate.instant('billing.invoice.meta', { kind, firm: inv.document.firm.name, job: inv.jobTitle }));
  });
  protected readonly progressColumns = PROGRESS_COLUMN_WORDS;
  protected readonly pdfUrl = computed(() => invoicePdfUrl(this.id()));
  protected readonly isZero = isZeroAmount;
  /** back from the card page without paying: said at the top, where the client lands */
  protected readonly wasCancelled = computed(() => this.payment() === 'cancelled');
  protected readonly cancelledWords = CANCELLED_WORDS;

  constructor() {
    effect(() => {
      const inv = this.invoice();
      this.language.current();
      if (inv) this.title.setTitle(this.translate.instant('layout.titles.invoiceNumber', { number: inv.number }) as string);
    });
    // Tells crawlers and the host's logs the truth while rendering on the server.
    effect(() => {
      if (this.isMissing() && this.response) this.response.status = 404;
    });
  }

  protected money(amount: string): string {
    const inv = this.invoice();
    return inv ? formatAmount(amount, inv.currency, this.language.locale()) : '';
  }

  protected day(isoDay: string): string {
    return formatCalendarDay(isoDay, this.language.locale(), 'long');
  }

  protected creditNotePdf(creditNoteId: string): string {
    return creditNotePdfUrl(creditNoteId);
  }
}
