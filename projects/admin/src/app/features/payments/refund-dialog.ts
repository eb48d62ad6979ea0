import { LowerCasePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, effect, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { PAYMENT_LIMITS, type PaymentDetail, type PaymentMethod, type RefundCreate, type RefundView } from '@layerbook/contracts/types';
import { formatMoney } from '@layerbook/domain';
import { newClientKey } from '../../shared/client-key';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { Session } from '../../core/auth/session';
import { DATE_YEAR_WORDS, dateYearInRange, firmToday, fromIsoDate, toIsoDate } from '../../shared/forms/iso-date';
import { AMOUNT_WORDS, amountText, toAmount } from '../../shared/forms/money-input';
import { Submission } from '../../shared/forms/submission';
import { requiredText } from '../../shared/forms/text-validators';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { PAYMENT_METHOD_LABELS } from '../billing/invoice-words';
import { PaymentApi } from './payment-api';
import { paymentParts, refundSplit } from './payment-money';
import { REFUND_CHOICE_WORDS, refundSplitWords } from './payment-words';
import { defaultRefundMethod, isRefusedForGood, refundAmountCheck, refundMethods } from './refund-input';
import { TranslatePipe } from '@ngx-translate/core';
import { provideFieldDefaults } from '../../../../../shared/app/field-defaults';

export interface RefundDialogData {
  readonly payment: PaymentDetail;
  readonly invoiceNumber: string;
  readonly clientName: string;
}

/**
 * Gives money of one payment back: to the card online (card payments), or records a cheque,
 * transfer or cash already given back. Closes with the refund, or nothing; `wasSent` tells the
 * page whether the server was asked (a refusal by the card processor is kept as a failed refund).
 */
@Component({
  selector: 'lb-refund-dialog',
  imports: [
    TranslatePipe,
    CalendarDatePipe,
    FormAlert,
    LowerCasePipe,
    MatButtonModule,
    MatDatepickerModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    MatRadioModule,
    MoneyPipe,
    ReactiveFormsModule,
  ],
  providers: [provideNativeDateAdapter(), provideFieldDefaults()],
  templateUrl: './refund-dialog.html',
  styleUrl: './refund-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RefundDialog {
  protected readonly data = inject<RefundDialogData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<RefundDialog, RefundView>>(MatDialogRef);
  private readonly api = inject(PaymentApi);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly locale = inject(LOCALE_ID);

  protected readonly payment = this.data.payment;
  protected readonly parts = paymentParts(this.payment);
  protected readonly methods = refundMethods(this.payment);
  protected readonly choiceWords = REFUND_CHOICE_WORDS;
  protected readonly methodLabels = PAYMENT_METHOD_LABELS;
  /**
   * A refund by hand is dated between the payment's day and the firm's today — or the payment's day when
   * it was recorded on the firm's tomorrow (the API allows up to that tomorrow, as for the payment).
   */
  protected readonly receivedOn = fromIsoDate(this.payment.receivedOn);
  protected readonly today = latest(firmToday(inject(Session).user()?.timeZone), this.receivedOn);
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  private readonly sent = signal(false);
  /** whether the server was asked at least once (its answer may have changed the payment) */
  readonly wasSent = this.sent.asReadonly();

  protected readonly form = this.fb.group({
    method: this.fb.control<PaymentMethod>(defaultRefundMethod(this.payment), Validators.required),
    amount: [
      this.parts.refundable,
      [
        requiredText,
        amountText,
        refundAmountCheck(
          () => this.parts.refundable,
          () => this.payment.currency,
        ),
      ],
    ],
    refundedOn: this.fb.control<Date | null>(this.today, [Validators.required, dateYearInRange]),
    reference: ['', Validators.maxLength(PAYMENT_LIMITS.referenceMaxLength)],
    reason: ['', [requiredText, Validators.maxLength(PAYMENT_LIMITS.reasonMaxLength)]],
  });

  private readonly method = toSignal(this.form.controls.method.valueChanges, { initialValue: this.form.controls.method.value });
  private readonly amount = toSignal(this.form.controls.amount.valueChanges, { initialValue: this.form.controls.amount.value });
  protected readonly isCard = computed(() => this.method() === 'card');
  /** where the money comes from: the client's credit first, then what was paid on the invoice */
  protected readonly splitWords = computed(() => {
    const split = refundSplit(this.payment, toAmount(this.amount()) ?? '');
    const money = (amount: string): string => formatMoney(amount, this.payment.currency, this.locale);
    return split ? refundSplitWords(split, money, this.data) : null;
  });

  protected readonly words = {
    method: { required: 'Choose how the money goes back.' },
    amount: {
      required: 'Enter the amount to give back.',
      ...AMOUNT_WORDS,
      zero: 'Enter an amount more than zero.',
      overRefundable: `This is more than the ${formatMoney(this.parts.refundable, this.payment.currency, this.locale)} that can still be given back.`,
    },
    refundedOn: {
      required: 'Enter the day the money went back.',
      matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.',
      matDatepickerMin: 'A refund cannot be dated before the payment was received.',
      matDatepickerMax: 'A refund cannot be dated after today.',
      ...DATE_YEAR_WORDS,
    },
    reference: { maxlength: `Use at most ${PAYMENT_LIMITS.referenceMaxLength} characters.` },
    reason: {
      required: 'Say why the money goes back, like “job cancelled” or “paid twice”.',
      maxlength: `Use at most ${PAYMENT_LIMITS.reasonMaxLength} characters.`,
    },
  };

  constructor() {
    // The day and reference are the office's record of money given back by hand; a card refund is dated by the processor.
    effect(() => {
      const byHand = !this.isCard();
      for (const control of [this.form.controls.refundedOn, this.form.controls.reference]) {
        if (byHand) control.enable({ emitEvent: false });
        else control.disable({ emitEvent: false });
      }
    });
  }

  /**
   * Kept while the outcome is unknown, so a refund sent again after a lost answer is recorded once (the
   * API finds the first); a new one after a definite refusal, so the next try is a refund of its own —
   * the API never answers a key with a refund that failed or asked something else.
   */
  private clientKey = newClientKey();

  protected async refund(): Promise<void> {
    const done = await this.submission.send(this.form, () => {
      this.sent.set(true);
      const sending = this.api.refund(this.payment.id, this.toRefund());
      // Beside the submission's own handling, which shows the refusal.
      void sending.catch((error: unknown) => {
        if (isRefusedForGood(toProblem(error))) this.clientKey = newClientKey();
      });
      return sending;
    });
    if (done) this.ref.close(done);
  }

  private toRefund(): RefundCreate {
    const { method, amount, refundedOn, reference, reason } = this.form.getRawValue();
    const base = { method, amount: toAmount(amount) ?? '', reason: reason.trim(), clientKey: this.clientKey };
    if (method === 'card') return base;
    const ref = reference.trim();
    return { ...base, refundedOn: toIsoDate(refundedOn) ?? '', ...(ref ? { reference: ref } : {}) };
  }
}

const latest = (day: Date, other: Date | null): Date => (other && other > day ? other : day);
