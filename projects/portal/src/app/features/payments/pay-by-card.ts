import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { PortalInvoiceDetail } from '@layerbook/contracts/types';
import { problemMessage, toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { FormAlert } from '../../shared/ui/form-alert';
import { LEAVE_FOR, PaymentApi } from './payment-api';
import { payButtonLabel } from './payment-words';
import { TranslatePipe } from '@ngx-translate/core';
import { Language } from '../../../../../shared/i18n/language';
import { formatAmount, LbMoneyPipe } from '../../../../../shared/i18n/format';

/**
 * How to pay an open invoice: by card on the processor's payment page (the server opens a checkout,
 * the browser goes there and comes back to the return page), or, when paying online is not open for
 * it, the firm's own way with the reason why (the server's reason code, said in the reader's words).
 */
@Component({
  selector: 'lb-pay-by-card',
  imports: [FormAlert, LbMoneyPipe, MatButtonModule, MatIconModule, TranslatePipe],
  template: `
    @let inv = current();
    <section class="pay" aria-labelledby="pay-heading">
      @if (inv.canPayOnline) {
        <h2 id="pay-heading">{{ 'payments.pay.online' | translate }}</h2>
        <p>{{ 'payments.pay.onlineText' | translate }}</p>
        <lb-form-alert [message]="message()" />
        <button mat-flat-button type="button" [disabled]="!isHydrated() || isBusy()" (click)="pay()">
          <mat-icon aria-hidden="true">credit_card</mat-icon>
          {{ label().key | translate: label().params }}
        </button>
        @if (isBusy()) {
          <p class="small" role="status">{{ 'payments.pay.opening' | translate }}</p>
        }
      } @else if (inv.status === 'paid' || inv.status === 'void') {
        <h2 id="pay-heading">{{ 'payments.pay.how' | translate }}</h2>
        <lb-form-alert [message]="message()" />
        <p>{{ (inv.status === 'paid' ? 'payments.pay.nowPaid' : 'payments.pay.nowVoid') | translate: { number: inv.number } }}</p>
      } @else {
        <h2 id="pay-heading">{{ 'payments.pay.how' | translate }}</h2>
        <lb-form-alert [message]="message()" />
        @if (inv.payOnlineReason; as reason) {
          <p class="note">
            <mat-icon aria-hidden="true">info</mat-icon>
            <span>
              {{ 'payments.pay.notAvailable' | translate }}
              @switch (reason.code) {
                @case ('belowMinimum') {
                  {{ 'payments.pay.why.belowMinimum' | translate: { minimum: reason.minimum | lbMoney: reason.currency } }}
                }
                @case ('currencyNotOffered') {
                  {{ 'payments.pay.why.currencyNotOffered' | translate: { currency: reason.currency } }}
                }
                @case ('refunded') {
                  {{ 'payments.pay.why.refunded' | translate }}
                }
              }
            </span>
          </p>
        }
        <p>{{ 'payments.pay.otherWay' | translate: { firm: inv.document.firm.name, number: inv.number } }}</p>
      }
    </section>
  `,
  styles: `
    .pay {
      padding: 1rem 1.25rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-low);
    }
    h2 {
      font-family: var(--lb-serif);
      font-size: 1.15rem;
      margin: 0 0 0.5rem;
    }
    p {
      margin: 0 0 0.75rem;
    }
    .note {
      display: flex;
      gap: 0.5rem;
      align-items: flex-start;
    }
    .note mat-icon {
      flex: none;
    }
    .small {
      margin: 0.5rem 0 0;
      font-size: 0.9rem;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PayByCard {
  private readonly api = inject(PaymentApi);
  private readonly leaveFor = inject(LEAVE_FOR);
  private readonly language = inject(Language);

  readonly invoice = input.required<PortalInvoiceDetail>();
  /** The invoice as read again after a refusal, for the page around to show what stands now too. */
  readonly invoiceChanged = output<PortalInvoiceDetail>();

  /** The page's invoice, or the one read again here after the server refused a card payment (it changed meanwhile). */
  protected readonly current = linkedSignal(() => this.invoice());
  protected readonly label = computed(() => {
    const inv = this.current();
    return payButtonLabel(formatAmount(inv.amountDue, inv.currency, this.language.locale()));
  });
  protected readonly isBusy = signal(false);
  protected readonly message = signal<string | null>(null);
  protected readonly isHydrated = hydratedSignal();

  /**
   * Opens a checkout for the amount due and sends the browser to the processor's page; stays busy while
   * it leaves. A 409 means the invoice changed since the page read it (paid another way, voided, less
   * due): the server's reason stays shown, and the invoice is read again so the amount and the button
   * are what stands now.
   */
  protected async pay(): Promise<void> {
    this.message.set(null);
    this.isBusy.set(true);
    try {
      const start = await this.api.startCheckout(this.current().id);
      this.leaveFor(start.url);
    } catch (error) {
      this.message.set(problemMessage(error));
      if (toProblem(error).status === 409) await this.readAgain();
      this.isBusy.set(false);
    }
  }

  private async readAgain(): Promise<void> {
    try {
      const fresh = await this.api.invoice(this.current().id);
      this.current.set(fresh);
      this.invoiceChanged.emit(fresh);
    } catch {
      // Not read: the page's copy stays, and the server's reason above still says why it was refused.
    }
  }
}
