import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { toMoney } from '../errors/input-checks';
import { allocateByWeights } from '../money/allocate';
import { minorUnitDigits } from '../money/currency';
import type { MoneyInput } from '../money/money';
import type { PaymentLine } from './payment-schedule';

export interface ChangeOrder {
  id: string;
  number: number;
  description: string;
  /** positive adds, negative deducts */
  amount: MoneyInput;
  status: 'pending' | 'approved' | 'rejected';
}

/** Only approved change orders change the contract sum to date. */
export function contractSumToDate(original: MoneyInput, changeOrders: readonly ChangeOrder[], field = 'changeOrders'): Decimal {
  let sum = toMoney(original, 'originalContractSum', 'original contract sum');
  changeOrders.forEach((co, i) => {
    const amount = toMoney(co.amount, `${field}[${i}].amount`, 'change order amount');
    if (co.status === 'approved') sum = sum.plus(amount);
  });
  return sum;
}

/**
 * Lines a change order leaves as they are: billed ones, and — when the contract grows — the deposit
 * (agreed at signing, and held to a legal cap a larger share would break). A deduction lowers a deposit
 * not yet billed with the rest, so it keeps within a cap that is a share of the smaller contract.
 */
export const staysOnRespread = (l: Pick<PaymentLine, 'isBilled' | 'role'>, growing: boolean): boolean =>
  l.isBilled || (growing && l.role === 'deposit');

/**
 * Re-spreads a schedule to a new contract sum: billed lines (and, when it grows, the deposit) stay as
 * they are, the other unbilled lines absorb the change in proportion to their current amounts (equally if all are
 * zero), and the lines still add up to the contract exactly.
 */
export function respreadSchedule(lines: readonly PaymentLine[], newContractSum: MoneyInput, currency: string): PaymentLine[] {
  const digits = minorUnitDigits(currency, 'currency');
  const target = toMoney(newContractSum, 'contractSum', 'contract sum');
  const growing = target.greaterThan(lines.reduce((a, l) => a.plus(l.amount), new Decimal(0)));
  const billed = lines.filter((l) => staysOnRespread(l, growing)).reduce((a, l) => a.plus(l.amount), new Decimal(0));
  const open = lines.map((l, i) => ({ l, i })).filter(({ l }) => !staysOnRespread(l, growing));
  const openTotal = target.minus(billed);
  if (openTotal.isNegative()) {
    throw new DomainInputError('contractSum', 'The new contract sum is less than what has already been billed and the deposit.');
  }
  if (open.length === 0) {
    if (!openTotal.isZero()) throw new DomainInputError('paymentSchedule', 'Every line is billed; add a line for the change order.');
    return lines.map((l) => ({ ...l }));
  }
  const current = open.map(({ l }) => l.amount);
  const weights = current.every((a) => a.isZero()) ? current.map(() => new Decimal(1)) : current;
  const spread = allocateByWeights(openTotal, weights, digits, 'paymentSchedule');
  const out = lines.map((l) => ({ ...l }));
  open.forEach(({ i }, k) => {
    out[i].amount = spread[k];
  });
  return out;
}
