import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { minorUnitDigits } from './currency';

/**
 * Money crosses the package boundary as a decimal string or a Decimal, never a JS number;
 * results come back as Decimal (call `.toFixed(digits)` to serialise).
 */
export type MoneyInput = string | Decimal;

/** Half away from zero, the usual commercial rounding for invoices. */
export function roundToCurrency(amount: Decimal.Value, currency: string): Decimal {
  return new Decimal(amount).toDecimalPlaces(minorUnitDigits(currency), Decimal.ROUND_HALF_UP);
}

/** Integer count of ISO minor units ($10.00 → 1000). Refuses amounts finer than the minor unit. */
export function toMinorUnits(amount: Decimal.Value, currency: string, field = 'amount'): number {
  const digits = minorUnitDigits(currency);
  const scaled = new Decimal(amount).times(new Decimal(10).pow(digits));
  if (!scaled.isInteger()) {
    throw new DomainInputError(field, `${String(amount)} ${currency} has more than ${digits} decimal places.`);
  }
  if (scaled.abs().greaterThan(Number.MAX_SAFE_INTEGER)) {
    throw new DomainInputError(field, 'The amount is too large.');
  }
  return scaled.toNumber();
}

export function fromMinorUnits(minor: number, currency: string, field = 'amount'): Decimal {
  if (!Number.isSafeInteger(minor)) {
    throw new DomainInputError(field, 'Minor units must be a whole number.');
  }
  return new Decimal(minor).div(new Decimal(10).pow(minorUnitDigits(currency)));
}

export function sumMoney(amounts: readonly Decimal[]): Decimal {
  let total = new Decimal(0);
  for (const a of amounts) total = total.plus(a);
  return total;
}

/** True when the amount shows as zero in the currency ("0.00"), e.g. a rounding of a fraction of a cent. */
export function roundsToZero(amount: Decimal.Value, currency: string): boolean {
  return roundToCurrency(amount, currency).isZero();
}

/**
 * A percent as the exact decimal fraction it names: 4.712 → "0.04712". Dividing the number by 100
 * in floating point gives 0.047119999999999995, which taxes 1,562.50 at 73.62 instead of 73.63.
 */
export function percentShare(percent: number): string {
  return new Decimal(percent).div(100).toString();
}
