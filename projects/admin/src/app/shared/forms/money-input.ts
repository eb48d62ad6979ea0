import { AbstractControl, ValidationErrors } from '@angular/forms';

/** The API's amount pattern (contracts: moneyAmount), after dropping thousands separators. */
const AMOUNT = /^\d{1,12}(\.\d{1,2})?$/;

/** "12,500" → "12500"; blank → null. The string is sent as typed: money is never a float here. */
export function toAmount(typed: string): string | null {
  const plain = typed.trim().replace(/[,\s]/g, '');
  return plain === '' ? null : plain;
}

export function amountText(control: AbstractControl<string>): ValidationErrors | null {
  const amount = toAmount(control.value ?? '');
  return amount === null || AMOUNT.test(amount) ? null : { amount: true };
}

export const AMOUNT_WORDS = {
  amount: 'Enter an amount with at most two decimals, like 12500.00.',
} as const;
