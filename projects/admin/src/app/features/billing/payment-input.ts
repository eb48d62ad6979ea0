import { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import { roundToCurrency, roundsToZero } from '@layerbook/contracts/engine';
import { MONEY_AMOUNT_PATTERN, type OfflinePaymentCreate } from '@layerbook/contracts/types';
import { toAmount } from '../../shared/forms/money-input';

/** The ways a payment is recorded by hand (card payments arrive by themselves with the payments issue). */
export const OFFLINE_PAYMENT_METHODS: readonly OfflinePaymentCreate['method'][] = ['transfer', 'cheque', 'cash'];

/**
 * A payment is more than zero and at most the amount due (the API refuses more: an overpayment is
 * not a payment of this invoice). Compared exactly by the domain, never as floats.
 */
export function paymentAmountCheck(amountDue: () => string, currency: () => string): ValidatorFn {
  return (control: AbstractControl<string>): ValidationErrors | null => {
    const amount = toAmount(control.value ?? '');
    if (amount === null || !MONEY_AMOUNT_PATTERN.test(amount)) return null; // required and amountText speak
    if (roundsToZero(amount, currency())) return { zero: true };
    return roundToCurrency(amount, currency()).greaterThan(roundToCurrency(amountDue(), currency())) ? { overDue: amountDue() } : null;
  };
}
