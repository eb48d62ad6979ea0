import Decimal from 'decimal.js';
import { isNonNegativeNumber, requireNonNegative, toNonNegativeMoney } from '../errors/input-checks';
import { type MoneyInput, sumMoney } from '../money/money';

export interface PerAreaLine {
  label: string;
  /** area (or length, for running items) in the firm's unit */
  quantity: number;
  /** price per unit² (or per unit of length) for this finish tier */
  rate: MoneyInput;
}

/** One finish tier's rate, the amounts its surfaces came to, and their hundredths added up. */
interface Tier {
  perHundredth: Decimal;
  byHundredths: Map<number, Decimal>;
  hundredths: number;
}

/**
 * The owner's cross-check against the bottom-up price: Σ quantity × tier rate, with each
 * quantity rounded to hundredths as it is shown on the estimate (common practice, no source).
 */
export function perAreaCheck(lines: readonly PerAreaLine[], field = 'perAreaRates'): { lines: Decimal[]; total: Decimal } {
  // Rates repeat across the surfaces of one finish tier: parse each once, as a price per
  // hundredth; surfaces of the same size share one amount (a Decimal never changes).
  const tiers = new Map<MoneyInput, Tier>();
  const amounts = new Array<Decimal>(lines.length);
  for (let i = 0; i < lines.length; i++) {
    const l = lines[i];
    // The field path is only built for a bad value: this runs for every surface.
    if (!isNonNegativeNumber(l.quantity)) requireNonNegative(l.quantity, `${field}[${i}].quantity`, 'quantity');
    let tier = tiers.get(l.rate);
    if (tier === undefined) {
      tier = { perHundredth: toNonNegativeMoney(l.rate, `${field}[${i}].rate`, 'rate').div(100), byHundredths: new Map(), hundredths: 0 };
      tiers.set(l.rate, tier);
    }
    const h = Math.round(l.quantity * 100);
    let amount = tier.byHundredths.get(h);
    if (amount === undefined) {
      amount = tier.perHundredth.times(h);
      tier.byHundredths.set(h, amount);
    }
    tier.hundredths += h;
    amounts[i] = amount;
  }
  return { lines: amounts, total: tierTotal(tiers) ?? sumMoney(amounts) };
}

/**
 * Σ rate × (Σ hundredths) per tier: the same total as adding every line, whenever no amount on
 * the way needs more significant digits than Decimal keeps. Every line and partial sum is at most
 * the total and has no more decimals than the finest rate, so that holds when the total's whole
 * digits plus those decimals fit; otherwise null, and the lines are added one by one.
 */
function tierTotal(tiers: ReadonlyMap<MoneyInput, Tier>): Decimal | null {
  let total = new Decimal(0);
  let decimals = 0;
  for (const tier of tiers.values()) {
    if (!Number.isSafeInteger(tier.hundredths)) return null;
    decimals = Math.max(decimals, tier.perHundredth.decimalPlaces());
    total = total.plus(tier.perHundredth.times(tier.hundredths));
  }
  const wholeDigits = Math.max(1, total.e + 1);
  return wholeDigits + decimals <= Decimal.precision ? total : null;
}

/**
 * How far the bottom-up price is from the per-area check: the difference and which side is
 * higher, for "Bottom-up is higher by …" (common practice, no source).
 */
export function perAreaGap(bottomUp: MoneyInput, byArea: MoneyInput): { isAbove: boolean; amount: Decimal } {
  const diff = new Decimal(bottomUp).minus(byArea);
  return { isAbove: diff.greaterThan(0), amount: diff.abs() };
}
