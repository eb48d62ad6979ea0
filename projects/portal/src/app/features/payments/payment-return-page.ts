import { isPlatformBrowser } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, InjectionToken, PLATFORM_ID, computed, effect, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import type { CheckoutStatus, PortalInvoiceDetail } from '@layerbook/contracts/types';
import { problemMessage, toProblem } from '../../core/errors/problem';
import { invoiceUrl } from '../billing/invoice-api';
import { checkoutStatusUrl, paymentReceiptUrl } from './payment-api';
import { checkoutWords } from './payment-words';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { Language } from '../../../../../shared/i18n/language';
import { formatAmount } from '../../../../../shared/i18n/format';

/** How often the return page asks again, and for how long, before it says it stopped checking. */
export const CHECKOUT_POLL = new InjectionToken<{ readonly everyMs: number; readonly forMs: number }>('CHECKOUT_POLL', {
  providedIn: 'root',
  factory: () => ({ everyMs: 1500, forMs: 60_000 }),
});

/**
 * Where the card page sends the client back after paying: says the payment is being confirmed
 * while the processor's word is on its way, asking again every moment or so, then paid with the
 * receipt. The server treats each ask as a trigger to record a payment the processor already took.
 */
@Component({
  selector: 'lb-payment-return-page',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink, SayPipe, TranslatePipe],
  templateUrl: './payment-return-page.html',
  styleUrl: './payment-return-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PaymentReturnPage {
  private readonly title = inject(Title);
  private readonly translate = inject(TranslateService);
  private readonly language = inject(Language);
  private readonly poll = inject(CHECKOUT_POLL);
  private readonly isBrowser = isPlatformBrowser(inject(PLATFORM_ID));

  /** route parameters: the invoice and the checkout started for it */
  readonly id = input.required<string>();
  readonly checkoutId = input.required<string>();

  private readonly loaded = httpResource<CheckoutStatus>(() => checkoutStatusUrl(this.id(), this.checkoutId()));
  /** read after the checkout's state, so a payment the state's read just recorded is in it */
  private readonly invoiceLoaded = httpResource<PortalInvoiceDetail>(() => (this.loaded.hasValue() ? invoiceUrl(this.id()) : undefined));
  private startedAt = Date.now();
  /** the page stopped asking: about a minute went by without the payment recorded */
  private readonly gaveUp = signal(false);

  protected readonly status = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));
  protected readonly invoice = computed(() => (this.invoiceLoaded.hasValue() ? this.invoiceLoaded.value() : null));
  protected readonly isLoading = computed(() => !this.loaded.hasValue() && this.loaded.isLoading());
  protected readonly loadMessage = computed(() => {
    const error = this.loaded.error();
    if (!error) return null;
    return [400, 404].includes(toProblem(error).status) ? 'payments.return.missing' : problemMessage(error);
  });
  protected readonly words = computed(() => {
    const s = this.status();
    const locale = this.language.locale();
    return s ? checkoutWords(s, this.gaveUp(), (amount, currency) => formatAmount(amount, currency, locale)) : null;
  });
  protected readonly amount = computed(() => {
    const s = this.status();
    return s ? formatAmount(s.amount, s.currency, this.language.locale()) : '';
  });
  protected readonly receiptUrl = computed(() => {
    const id = this.status()?.paymentId;
    return id ? paymentReceiptUrl(id) : null;
  });

  constructor() {
    effect(() => {
      const inv = this.invoice();
      this.language.current();
      this.title.setTitle(
        this.translate.instant(
          inv ? 'layout.titles.paymentFor' : 'layout.titles.payment',
          inv ? { number: inv.number } : undefined,
        ) as string,
      );
    });
    // Asks again while the payment is not recorded (only in the browser: a server render answers at once).
    effect((onCleanup) => {
      const s = this.status();
      if (!this.isBrowser || !s || this.loaded.isLoading() || this.gaveUp()) return;
      if (s.state !== 'open' && s.state !== 'confirming') return;
      if (Date.now() - this.startedAt >= this.poll.forMs) {
        this.gaveUp.set(true);
        return;
      }
      const timer = setTimeout(() => this.loaded.reload(), this.poll.everyMs);
      onCleanup(() => clearTimeout(timer));
    });
    // Paid while the page was open: the invoice is read again for its new amount due.
    let lastState: CheckoutStatus['state'] | null = null;
    effect(() => {
      const state = this.status()?.state ?? null;
      if (state === 'paid' && lastState !== null && lastState !== 'paid') this.invoiceLoaded.reload();
      lastState = state;
    });
  }

  protected money(amount: string, inv: PortalInvoiceDetail): string {
    return formatAmount(amount, inv.currency, this.language.locale());
  }

  /** After the page stopped asking: one more ask, and it keeps asking for another while. */
  protected checkAgain(): void {
    this.startedAt = Date.now();
    this.gaveUp.set(false);
    this.loaded.reload();
  }
}
