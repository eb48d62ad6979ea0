import { AbstractControl, ValidationErrors } from '@angular/forms';
import { MONEY_AMOUNT_PATTERN } from '@layerbook/contracts/types';

/** "12,500" → "12500"; blank → null. The string is sent as typed: money is never a float here. */
export function toAmount(typed: string): string | null {
  const plain = typed.trim().replace(/[,\s]/g, '');
  return plain === '' ? null : plain;
}

/** The API's amount pattern (contracts: moneyAmount), after dropping thousands separators. */
export function amountText(control: AbstractControl<string>): ValidationErrors | null {
  const amount = toAmount(control.value ?? '');
  return amount === null || MONEY_AMOUNT_PATTERN.test(amount) ? null : { amount: true };
}

export const AMOUNT_WORDS = {
  amount: 'Enter an amount of zero or more with at most two decimals, like 12500.00.',
} as const;
