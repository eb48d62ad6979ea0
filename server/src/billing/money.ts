import { minorUnitDigits } from '@layerbook/domain';
import Decimal from 'decimal.js';

const TWO_DECIMALS = /\.\d\d$/;

/**
 * A money column (numeric(14,2) read as `::text`) at the currency's minor units: "1250.00" for
 * dollars, "1250" for yen. Two-decimal currencies pass through untouched (no parsing per row).
 */
export function moneyOut(value: string | Decimal, currency: string): string {
  const digits = minorUnitDigits(currency);
  if (typeof value === 'string' && digits === 2 && TWO_DECIMALS.test(value)) return value;
  return new Decimal(value).toFixed(digits);
}

/** Whether an amount typed for this currency has no more decimals than its minor units allow ("10.50" is not yen). */
export function fitsCurrency(amount: string, currency: string): boolean {
  const decimals = amount.split('.')[1]?.replace(/0+$/, '').length ?? 0;
  return decimals <= minorUnitDigits(currency);
}
