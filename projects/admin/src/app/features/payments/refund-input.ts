import { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import { roundToCurrency, roundsToZero } from '@layerbook/contracts/engine';
import {
  MONEY_AMOUNT_PATTERN,
  REFUND_PROCESSOR_PROBLEMS,
  type PaymentDetail,
  type PaymentMethod,
  type Problem,
} from '@layerbook/contracts/types';
import { toAmount } from '../../shared/forms/money-input';

const OFFLINE_REFUNDS: readonly PaymentMethod[] = ['transfer', 'cheque', 'cash'];

/**
 * How a payment's money may go back: a card payment back to the card online (the first choice) or
 * by hand; a cheque, transfer or cash payment only by hand (the API refuses a card refund of it).
 */
export const refundMethods = (payment: Pick<PaymentDetail, 'method'>): readonly PaymentMethod[] =>
  payment.method === 'card' ? ['card', ...OFFLINE_REFUNDS] : OFFLINE_REFUNDS;

/** The choice the dialog starts on: the way the client paid. */
export const defaultRefundMethod = (payment: Pick<PaymentDetail, 'method'>): PaymentMethod => payment.method;

/**
 * A refund is more than zero and at most what the payment may still give back (the API refuses
 * more, and never refunds more than was paid). Compared exactly, never as floats.
 */
export function refundAmountCheck(refundable: () => string, currency: () => string): ValidatorFn {
  return (control: AbstractControl<string>): ValidationErrors | null => {
    const amount = toAmount(control.value ?? '');
    if (amount === null || !MONEY_AMOUNT_PATTERN.test(amount)) return null; // required and amountText speak
    if (roundsToZero(amount, currency())) return { zero: true };
    return roundToCurrency(amount, currency()).greaterThan(roundToCurrency(refundable(), currency()))
      ? { overRefundable: refundable() }
      : null;
  };
}

/**
 * Whether the API's answer to a refund settles that nothing was refunded, so trying again is a new
 * refund and needs a new key: a 4xx (the request was refused as it stood) or the processor's refusal
 * (the refund is marked failed). When the outcome is unknown — the processor did not answer, a server
 * error, no connection — the same key goes again, and the API answers the refund already made.
 */
export const isRefusedForGood = (problem: Pick<Problem, 'status' | 'title'>): boolean =>
  (problem.status >= 400 && problem.status < 500) || (problem.status === 502 && problem.title === REFUND_PROCESSOR_PROBLEMS.refused);
