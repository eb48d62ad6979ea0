import { DatePipe, LowerCasePipe, isPlatformBrowser } from '@angular/common';
import { ChangeDetectionStrategy, Component, LOCALE_ID, PLATFORM_ID, computed, effect, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { roundsToZero } from '@layerbook/contracts/engine';
import type { InvoiceDetail, PaymentDetail, RefundView } from '@layerbook/contracts/types';
import { formatMoney } from '@layerbook/domain';
import { firstValueFrom } from 'rxjs';
import { toProblem } from '../../core/errors/problem';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { PAYMENT_METHOD_LABELS } from '../billing/invoice-words';
import { PaymentApi, paymentReceiptHref, refundReceiptHref } from './payment-api';
import { creditKept, paymentParts } from './payment-money';
import { REFUND_METHOD_WORDS, refundDoneWords, refundStatusLook } from './payment-words';
import { RefundDialog, type RefundDialogData } from './refund-dialog';
import { TranslatePipe } from '@ngx-translate/core';

/** While a refund is on its way back to a card, the invoice is read again this often, this many times (about a minute). */
export const PENDING_CHECK_MS = 5000;
export const PENDING_CHECKS = 12;

/** What a refund did, for the page to say once and show the invoice as it is now. */
export interface RefundOutcome {
  readonly refund: RefundView | null;
  readonly words: string | null;
  /** what went wrong, when the page should say so as a problem */
  readonly problem?: string;
}

/**
 * An invoice's payments as the office sees them: each with its receipt, what went on the invoice and
 * what was kept as credit, its refunds and their receipts, and a Refund… action; then the client's credit.
 */
@Component({
  selector: 'lb-invoice-payments',
  imports: [TranslatePipe, CalendarDatePipe, DatePipe, LowerCasePipe, MatButtonModule, MatIconModule, MoneyPipe, RouterLink],
  templateUrl: './invoice-payments.html',
  styleUrl: './invoice-payments.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvoicePayments {
  private readonly dialog = inject(MatDialog);
  private readonly locale = inject(LOCALE_ID);
  private readonly api = inject(PaymentApi);

  readonly invoice = input.required<InvoiceDetail>();
  /** after a refund was asked for (done, on its way, or refused by the processor): the invoice should be read again */
  readonly refunded = output<RefundOutcome>();
  /** "Check again" while a refund is on its way back to a card (also asked by itself every few seconds for a minute) */
  readonly checkAgain = output();

  protected readonly rows = computed(() => this.invoice().payments.map((payment) => ({ payment, parts: paymentParts(payment) })));
  protected readonly hasPending = computed(() => this.invoice().payments.some((p) => p.refunds.some((r) => r.status === 'pending')));
  protected readonly kept = computed(() => creditKept(this.invoice().clientCredits));

  protected readonly methodLabels = PAYMENT_METHOD_LABELS;
  protected readonly refundMethodWords = REFUND_METHOD_WORDS;
  protected readonly statusLook = refundStatusLook;
  protected readonly receiptHref = paymentReceiptHref;
  protected readonly refundReceiptHref = refundReceiptHref;
  protected readonly isZero = (amount: string, currency: string): boolean => roundsToZero(amount, currency);
  protected readonly isNegative = (amount: string): boolean => amount.trim().startsWith('-');
  protected readonly withoutSign = (amount: string): string => amount.trim().replace(/^-/, '');

  /** the refund being asked about again, if any */
  protected readonly askingAbout = signal<string | null>(null);
  private checksLeft = PENDING_CHECKS;

  constructor() {
    const inBrowser = isPlatformBrowser(inject(PLATFORM_ID));
    // Each answer is a new invoice: while a refund is still pending, ask once more a little later.
    effect((onCleanup) => {
      this.invoice();
      if (!inBrowser || !this.hasPending() || this.checksLeft <= 0) return;
      const timer = setTimeout(() => {
        this.checksLeft -= 1;
        this.checkAgain.emit();
      }, PENDING_CHECK_MS);
      onCleanup(() => clearTimeout(timer));
    });
  }

  protected async openRefund(payment: PaymentDetail): Promise<void> {
    const invoice = this.invoice();
    const ref = this.dialog.open<RefundDialog, RefundDialogData, RefundView>(RefundDialog, {
      data: { payment, invoiceNumber: invoice.number ?? 'the invoice', clientName: invoice.clientName },
      width: '34rem',
      autoFocus: 'first-tabbable',
    });
    const refund = await firstValueFrom(ref.afterClosed());
    if (refund) {
      const money = (amount: string): string => formatMoney(amount, refund.currency, this.locale);
      this.refunded.emit({ refund, words: refundDoneWords(refund, money) });
    } else if (ref.componentInstance?.wasSent()) {
      this.refunded.emit({ refund: null, words: null });
    }
  }

  /** A card refund left pending (the processor did not answer): ask the processor about it again. */
  protected async sendAgain(refund: RefundView): Promise<void> {
    this.askingAbout.set(refund.id);
    try {
      const answer = await this.api.sendAgain(refund.id);
      this.refunded.emit({ refund: answer, words: refundDoneWords(answer, (amount) => formatMoney(amount, answer.currency, this.locale)) });
    } catch (error) {
      const problem = toProblem(error);
      // 409: settled meanwhile (by the processor's own message); the invoice as it is now says how.
      this.refunded.emit(
        problem.status === 409 ? { refund: null, words: null } : { refund: null, words: null, problem: problem.detail ?? problem.title },
      );
    } finally {
      this.askingAbout.set(null);
    }
  }
}
