import { AbstractControl, ValidationErrors } from '@angular/forms';
import { MONEY_AMOUNT_PATTERN } from '@layerbook/contracts/types';

/** "12,500" → "12500", "$50" → "50"; blank → null. The string is sent as typed: money is never a float here. */
export function toAmount(typed: string): string | null {
  const plain = typed
    .trim()
    .replace(/^[$€£¥]/, '')
    .replace(/[,\s]/g, '');
  return plain === '' ? null : plain;
}

/**
 * The API's amount pattern (contracts: moneyAmount), after dropping thousands separators and a leading
 * currency sign; the error says what is wrong: a minus sign, too many digits, or the shape.
 */
export function amountText(control: AbstractControl<string>): ValidationErrors | null {
  const amount = toAmount(control.value ?? '');
  if (amount === null || MONEY_AMOUNT_PATTERN.test(amount)) return null;
  // The specific key first: a form whose words lack it shows its own words for `amount`.
  if (amount.startsWith('-')) return { amountNegative: true, amount: true };
  if (/^\d{13,}(\.\d*)?$/.test(amount)) return { amountTooLarge: true, amount: true };
  return { amount: true };
}

export const AMOUNT_WORDS = {
  amount: 'Enter the amount in figures with at most two decimals, like 12500.00.',
  amountNegative: 'Enter the amount without a minus sign.',
  amountTooLarge: 'That is too large: at most 12 digits before the decimal point.',
} as const;
