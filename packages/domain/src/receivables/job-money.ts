import Decimal from 'decimal.js';
import { requireInteger, toMoney, toNonNegativeMoney } from '../errors/input-checks';
import type { MoneyInput } from '../money/money';

/** Win rate = accepted ÷ decided (accepted + declined) proposals, as a percent with one decimal; null when none decided. */
export function winRate(accepted: number, declined: number): { accepted: number; decided: number; percent: Decimal | null } {
  requireInteger(accepted, 'accepted', 0, 'count');
  requireInteger(declined, 'declined', 0, 'count');
  const decided = accepted + declined;
  return { accepted, decided, percent: decided === 0 ? null : new Decimal(accepted).times(100).dividedBy(decided).toDecimalPlaces(1) };
}

/**
 * Average job size = Σ contracted ÷ number of jobs, to the cent; null with no jobs (common practice,
 * no source). Takes the sum and the count (the database sums a firm's jobs exactly in numeric).
 */
export function averageJobSize(contractedSum: MoneyInput, jobCount: number): Decimal | null {
  requireInteger(jobCount, 'jobCount', 0, 'count');
  if (jobCount === 0) return null;
  return toNonNegativeMoney(contractedSum, 'contractedSum').dividedBy(jobCount).toDecimalPlaces(2);
}

/** The estimate's costs of the option sold: what the firm pays before overhead and profit. */
export interface EstimatedCosts {
  labour: MoneyInput;
  /** materials at cost (before markup) */
  materialsCost: MoneyInput;
  equipment: MoneyInput;
  subcontracts: MoneyInput;
  sundries: MoneyInput;
}

export interface Margin {
  cost: Decimal;
  /** price − cost */
  margin: Decimal;
  /** margin ÷ price × 100, one decimal; null when the price is 0 */
  percent: Decimal | null;
}

/**
 * Gross margin = price − cost, and as a share of price (margin, not markup: accounting glossaries,
 * common practice). `price` excludes tax. Costs are the estimate's cost lines.
 */
export function grossMargin(price: MoneyInput, costs: EstimatedCosts): Margin {
  const p = toMoney(price, 'price', 'price');
  const cost = (['labour', 'materialsCost', 'equipment', 'subcontracts', 'sundries'] as const).reduce<Decimal>(
    (a, k) => a.plus(toNonNegativeMoney(costs[k], `costs.${k}`)),
    new Decimal(0),
  );
  const margin = p.minus(cost);
  return { cost, margin, percent: p.isZero() ? null : margin.times(100).dividedBy(p).toDecimalPlaces(1) };
}

/**
 * Money of one job: contracted = original contract sum + approved change orders; invoiced = issued
 * invoices less credit notes; paid = payments applied less refunds (common practice, no source).
 */
export function jobMoney(input: {
  originalContractSum: MoneyInput;
  approvedChangeOrders: MoneyInput;
  issued: MoneyInput;
  credited: MoneyInput;
  paymentsApplied: MoneyInput;
  refunded: MoneyInput;
}): { contracted: Decimal; changeOrders: Decimal; invoiced: Decimal; paid: Decimal } {
  const changeOrders = toMoney(input.approvedChangeOrders, 'approvedChangeOrders');
  return {
    contracted: toNonNegativeMoney(input.originalContractSum, 'originalContractSum').plus(changeOrders),
    changeOrders,
    invoiced: toNonNegativeMoney(input.issued, 'issued').minus(toNonNegativeMoney(input.credited, 'credited')),
    paid: toNonNegativeMoney(input.paymentsApplied, 'paymentsApplied').minus(toNonNegativeMoney(input.refunded, 'refunded')),
  };
}
