import { ChangeDetectionStrategy, Component, LOCALE_ID, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { INVOICE_LIMITS, type InvoiceDetail, type OfflinePaymentCreate } from '@layerbook/contracts/types';
import { formatMoney } from '@layerbook/domain';
import { newClientKey } from '../../shared/client-key';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Session } from '../../core/auth/session';
import { DATE_YEAR_WORDS, dateYearInRange, firmToday, toIsoDate } from '../../shared/forms/iso-date';
import { AMOUNT_WORDS, amountText, toAmount } from '../../shared/forms/money-input';
import { Submission } from '../../shared/forms/submission';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { InvoiceApi } from './invoice-api';
import { PAYMENT_METHOD_LABELS } from './invoice-words';
import { OFFLINE_PAYMENT_METHODS, paymentAmountCheck } from './payment-input';
import { TranslatePipe } from '@ngx-translate/core';

/** Records a cheque, transfer or cash received against an issued invoice. */
@Component({
  selector: 'lb-payment-form',
  imports: [
    TranslatePipe,
    FormAlert,
    MatButtonModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    MoneyPipe,
    ReactiveFormsModule,
  ],
  providers: [provideNativeDateAdapter()],
  template: `
    <form [formGroup]="form" (ngSubmit)="recordPayment()" novalidate aria-labelledby="payment-form-heading">
      <fieldset class="lb-gate" [disabled]="!isHydrated()">
        <h3 id="payment-form-heading">{{ 'billing.paymentForm.recordAPayment' | translate }}</h3>
        <lb-form-alert [message]="submission.message()" />
        <div class="fields">
          <mat-form-field>
            <mat-label>{{ 'billing.paymentForm.paidBy' | translate }}</mat-label>
            <mat-select formControlName="method">
              @for (method of methods; track method) {
                <mat-option [value]="method">{{ methodLabels[method] }}</mat-option>
              }
            </mat-select>
            <mat-error>{{ errorText(form.controls.method, {}) }}</mat-error>
          </mat-form-field>
          <mat-form-field>
            <mat-label>{{ 'billing.paymentForm.amount' | translate }}</mat-label>
            <input matInput formControlName="amount" inputmode="decimal" autocomplete="off" required />
            <span matTextSuffix>&nbsp;{{ invoice().currency }}</span>
            <mat-hint>{{
              'billing.paymentForm.atMostTheAmount' | translate: { amountDue: (invoice().amountDue | money: invoice().currency) }
            }}</mat-hint>
            <mat-error>{{ errorText(form.controls.amount, amountWords()) }}</mat-error>
          </mat-form-field>
          <mat-form-field>
            <mat-label>{{ 'billing.paymentForm.receivedOn' | translate }}</mat-label>
            <input matInput [matDatepicker]="picker" [max]="today" formControlName="receivedOn" autocomplete="off" required />
            <mat-datepicker-toggle matIconSuffix [for]="picker" />
            <mat-datepicker #picker />
            <mat-error>{{ errorText(form.controls.receivedOn, words.receivedOn) }}</mat-error>
          </mat-form-field>
          <mat-form-field>
            <mat-label>{{ 'billing.paymentForm.reference' | translate }}</mat-label>
            <input matInput formControlName="reference" autocomplete="off" />
            <mat-hint>{{ 'billing.paymentForm.chequeNumberOrTransfer' | translate }}</mat-hint>
            <mat-error>{{ errorText(form.controls.reference, words.reference) }}</mat-error>
          </mat-form-field>
        </div>
        <div class="lb-form-actions">
          <button mat-flat-button type="submit" [disabled]="submission.isBusy()">
            {{ 'billing.paymentForm.recordThePayment' | translate }}
          </button>
          <button mat-button type="button" (click)="cancelled.emit()">{{ 'billing.paymentForm.cancel' | translate }}</button>
        </div>
      </fieldset>
    </form>
  `,
  styles: `
    h3 {
      margin: 0 0 0.75rem;
      font-size: 1.1rem;
    }
    .fields {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(13rem, 1fr));
      gap: 1rem;
      align-items: start;
      margin-bottom: 0.75rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PaymentForm {
  private readonly api = inject(InvoiceApi);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly locale = inject(LOCALE_ID);

  readonly invoice = input.required<InvoiceDetail>();
  readonly saved = output<InvoiceDetail>();
  readonly cancelled = output();

  protected readonly methods = OFFLINE_PAYMENT_METHODS;
  protected readonly methodLabels = PAYMENT_METHOD_LABELS;
  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  /** made once per form: a payment sent again after a lost answer is recorded once (the API finds the first) */
  private readonly clientKey = newClientKey();
  /** money is recorded once received: the firm's today at the latest (the API allows its tomorrow too) */
  protected readonly today = firmToday(inject(Session).user()?.timeZone);
  protected readonly words = {
    receivedOn: {
      required: 'Enter the day it was received.',
      matDatepickerMax: 'A payment cannot be received after today.',
      matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.',
      ...DATE_YEAR_WORDS,
    },
    reference: { maxlength: `Use at most ${INVOICE_LIMITS.referenceMaxLength} characters.` },
  };

  protected readonly form = this.fb.group({
    method: this.fb.control<OfflinePaymentCreate['method']>('transfer', Validators.required),
    amount: [
      '',
      [
        requiredText,
        amountText,
        paymentAmountCheck(
          () => this.invoice().amountDue,
          () => this.invoice().currency,
        ),
      ],
    ],
    receivedOn: this.fb.control<Date | null>(this.today, [Validators.required, dateYearInRange]),
    reference: ['', Validators.maxLength(INVOICE_LIMITS.referenceMaxLength)],
  });

  protected amountWords(): Record<string, string> {
    const { amountDue, currency } = this.invoice();
    return {
      required: 'Enter the amount received.',
      ...AMOUNT_WORDS,
      zero: 'Enter an amount more than zero.',
      overDue: `This is more than the ${formatMoney(amountDue, currency, this.locale)} due; record at most the amount due.`,
    };
  }

  protected async recordPayment(): Promise<void> {
    const saved = await this.submission.send(this.form, () => this.api.recordPayment(this.invoice().id, this.toPayment()));
    if (saved) this.saved.emit(saved);
  }

  private toPayment(): OfflinePaymentCreate {
    const { method, amount, receivedOn, reference } = this.form.getRawValue();
    return {
      method,
      amount: toAmount(amount) ?? '',
      receivedOn: toIsoDate(receivedOn) ?? '',
      reference: reference.trim(),
      clientKey: this.clientKey,
    };
  }
}
