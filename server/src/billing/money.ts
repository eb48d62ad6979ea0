import { minorUnitDigits } from '@layerbook/domain';
import Decimal from 'decimal.js';

const TWO_DECIMALS = /\.\d\d$/;

/**
 * A money column (numeric(14,2) read as `::text`) at the currency's minor units: "1250.00" for
 * dollars, "1250" for yen. Two-decimal currencies pass through untouched (no parsing per row).
 */
export function moneyOut(value: string | Decimal, currency: string): string {
  const digits = minorUnitDigits(currency);
  if (typeof value === 'string') return digits === 2 && TWO_DECIMALS.test(value) ? value : new Decimal(value).toFixed(digits);
  return value.toFixed(digits);
}

/** What a money column (numeric(14, 2)) holds: less than a trillion either way. */
export const MONEY_COLUMN_LIMIT = new Decimal('1e12');

/** Decimals a money column keeps (numeric(14,2)): a third decimal of KWD or BHD would be rounded away on save. */
export const STORED_DECIMALS = 2;

/**
 * Whether an amount typed for this currency has no more decimals than its minor units allow ("10.50"
 * is not yen) and than a money column keeps (two: "10.005" KWD is refused, never silently rounded).
 */
export function fitsCurrency(amount: string, currency: string): boolean {
  const decimals = amount.split('.')[1]?.replace(/0+$/, '').length ?? 0;
  return decimals <= Math.min(minorUnitDigits(currency), STORED_DECIMALS);
}

/** What fitsCurrency refuses, in words: "Use whole amounts in JPY." / "Use at most 2 decimals in USD." */
export function decimalsMessage(currency: string): string {
  const digits = Math.min(minorUnitDigits(currency), STORED_DECIMALS);
  return digits === 0 ? `Use whole amounts in ${currency}.` : `Use at most ${digits} decimals in ${currency}.`;
}
