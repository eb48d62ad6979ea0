import Decimal from 'decimal.js';
import { requireNonNegative, toNonNegativeMoney } from '../errors/input-checks';
import { type MoneyInput, sumMoney } from '../money/money';

export interface PerAreaLine {
  label: string;
  /** area (or length, for running items) in the firm's unit */
  quantity: number;
  /** price per unit² (or per unit of length) for this finish tier */
  rate: MoneyInput;
}

/**
 * The owner's cross-check against the bottom-up price: Σ quantity × tier rate, with each
 * quantity rounded to hundredths as it is shown on the estimate (common practice, no source).
 */
export function perAreaCheck(lines: readonly PerAreaLine[], field = 'perAreaRates'): { lines: Decimal[]; total: Decimal } {
  // Rates repeat across the surfaces of one finish tier: parse each once, as a price per hundredth.
  const perHundredth = new Map<MoneyInput, Decimal>();
  const amounts = lines.map((l, i) => {
    requireNonNegative(l.quantity, `${field}[${i}].quantity`, 'quantity');
    let rate = perHundredth.get(l.rate);
    if (rate === undefined) {
      rate = toNonNegativeMoney(l.rate, `${field}[${i}].rate`, 'rate').div(100);
      perHundredth.set(l.rate, rate);
    }
    return rate.times(Math.round(l.quantity * 100));
  });
  return { lines: amounts, total: sumMoney(amounts) };
}

/**
 * How far the bottom-up price is from the per-area check: the difference and which side is
 * higher, for "Bottom-up is higher by …" (common practice, no source).
 */
export function perAreaGap(bottomUp: MoneyInput, byArea: MoneyInput): { isAbove: boolean; amount: Decimal } {
  const diff = new Decimal(bottomUp).minus(byArea);
  return { isAbove: diff.greaterThan(0), amount: diff.abs() };
}
