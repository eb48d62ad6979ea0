import type Decimal from 'decimal.js';
import { toMoney } from '../errors/input-checks';
import { sumMoney, type MoneyInput } from '../money/money';

/** One line of a payment schedule as stored: its amount and, when asked as a share, its percentage. */
export interface ScheduledAmount {
  readonly amount: MoneyInput;
  /** the percentage of the contract sum ("30", "33.5"); null for a fixed amount or the rest */
  readonly percent: MoneyInput | null;
}

export interface ScheduleTotals {
  /** the payments added exactly */
  readonly amount: Decimal;
  /** the percentages added exactly; null when a line has none (a fixed amount or the rest) or there are no lines */
  readonly percent: Decimal | null;
  /** the payments add up to the contract sum to the cent: what the client signed is what they are asked for */
  readonly isContractSum: boolean;
}

/**
 * Adds up a payment schedule against its contract sum. A schedule that does not add up to the
 * contract sum asks the client for more or less than they signed for (common practice, no source).
 */
export function scheduleTotals(lines: readonly ScheduledAmount[], contractSum: MoneyInput): ScheduleTotals {
  const amount = sumMoney(lines.map((l, i) => toMoney(l.amount, `paymentSchedule[${i}].amount`)));
  const percents = lines.map((l, i) => (l.percent === null ? null : toMoney(l.percent, `paymentSchedule[${i}].percent`, 'percentage')));
  const percent = percents.length > 0 && percents.every((p) => p !== null) ? sumMoney(percents) : null;
  return { amount, percent, isContractSum: amount.equals(toMoney(contractSum, 'contractSum', 'contract sum')) };
}
