import Decimal from 'decimal.js';
import type { IsoDate } from '../calendar/local-date';
import { DomainInputError } from '../errors/domain-input-error';
import { requireNonEmpty, toMoney, toNonNegativeMoney } from '../errors/input-checks';
import { allocateByWeights } from '../money/allocate';
import { minorUnitDigits } from '../money/currency';
import type { MoneyInput } from '../money/money';
import { type Ratio, toRatio } from '../pricing/ratio';

export type PaymentBasis = { kind: 'share'; share: Ratio } | { kind: 'amount'; amount: MoneyInput } | { kind: 'remainder' };

export type PaymentTrigger =
  { kind: 'acceptance' } | { kind: 'date'; date: IsoDate } | { kind: 'layerComplete'; layerId: string } | { kind: 'walkthrough' };

const ROLE_WORDS: Record<PaymentLineInput['role'], string> = { deposit: 'Deposit', milestone: 'Progress payment', final: 'Final payment' };

/**
 * A payment line's name, said from what makes it due, so the schedule, the terms and the job all
 * read the same event: "Progress payment when Base coat is finished on every surface", never
 * "Primer complete" beside terms that speak of other coats. `layerName` names a layerComplete trigger.
 */
export function paymentLabel(role: PaymentLineInput['role'], trigger: PaymentTrigger, layerName?: string): string {
  switch (trigger.kind) {
    case 'acceptance':
      return `${ROLE_WORDS[role]} on acceptance`;
    case 'date':
      return `${ROLE_WORDS[role]} due ${trigger.date}`;
    case 'layerComplete':
      return `${ROLE_WORDS[role]} when ${layerName?.trim() || 'the chosen layer'} is finished on every surface`;
    case 'walkthrough':
      return `${ROLE_WORDS[role]} on completion, after the walkthrough`;
  }
}

export interface PaymentLineInput {
  id: string;
  label: string;
  role: 'deposit' | 'milestone' | 'final';
  basis: PaymentBasis;
  trigger: PaymentTrigger;
}

export interface PaymentLine {
  id: string;
  label: string;
  role: 'deposit' | 'milestone' | 'final';
  trigger: PaymentTrigger;
  amount: Decimal;
  /** billed lines never change when a change order re-spreads the schedule */
  isBilled: boolean;
}

/**
 * Turns deposit / milestone / final lines (by share, amount or "the rest") into amounts that
 * add up to the contract sum exactly; share lines are split by largest remainder so no cent
 * is lost or invented.
 */
export function buildPaymentSchedule(
  contractSum: MoneyInput,
  lines: readonly PaymentLineInput[],
  currency: string,
  field = 'paymentSchedule',
): PaymentLine[] {
  const digits = minorUnitDigits(currency, 'currency');
  const contract = toMoney(contractSum, 'contractSum', 'contract sum');
  if (contract.lessThanOrEqualTo(0)) throw new DomainInputError('contractSum', 'The contract sum must be greater than zero.');
  if (contract.decimalPlaces() > digits)
    throw new DomainInputError('contractSum', `The contract sum has more than ${digits} decimal places.`);
  requireNonEmpty(lines, field, 'payment schedule');

  const amounts: Array<Decimal | null> = lines.map(() => null);
  let fixed = new Decimal(0);
  const shareIdx: number[] = [];
  const shares: Decimal[] = [];
  let remainderIdx = -1;
  lines.forEach((l, i) => {
    const at = `${field}[${i}].basis`;
    if (l.basis.kind === 'amount') {
      const a = toNonNegativeMoney(l.basis.amount, `${at}.amount`);
      if (a.decimalPlaces() > digits) throw new DomainInputError(`${at}.amount`, `The amount has more than ${digits} decimal places.`);
      amounts[i] = a;
      fixed = fixed.plus(a);
    } else if (l.basis.kind === 'share') {
      shareIdx.push(i);
      shares.push(toRatio(l.basis.share, `${at}.share`, 'share'));
    } else if (l.basis.kind === 'remainder') {
      if (remainderIdx >= 0) throw new DomainInputError(at, 'Only one line can take the rest of the contract.');
      remainderIdx = i;
    } else {
      throw new DomainInputError(`${at}.kind`, 'A payment is a share, an amount or the remainder.');
    }
  });
  const shareSum = shares.reduce((a, b) => a.plus(b), new Decimal(0));
  let shareTotal: Decimal;
  if (remainderIdx < 0) {
    shareTotal = contract.minus(fixed);
    if (shareIdx.length === 0 && !shareTotal.isZero()) {
      throw new DomainInputError(
        field,
        `The payments add up to ${fixed.toFixed(digits)}, not the contract sum ${contract.toFixed(digits)}.`,
      );
    }
    if (shareIdx.length > 0 && !contract.times(shareSum).equals(shareTotal)) {
      throw new DomainInputError(
        field,
        `The percentages add up to ${shareSum.times(100).toString()} % of the contract; with the fixed amounts they must make exactly 100 %.`,
      );
    }
  } else {
    shareTotal = contract.times(shareSum).toDecimalPlaces(digits, Decimal.ROUND_HALF_UP);
  }
  if (shareTotal.isNegative()) throw new DomainInputError(field, 'The fixed amounts add up to more than the contract sum.');
  if (shareIdx.length > 0) {
    const weights = shareSum.isZero() ? shares.map(() => new Decimal(1)) : shares;
    allocateByWeights(shareTotal, weights, digits).forEach((a, k) => {
      amounts[shareIdx[k]] = a;
    });
  }
  if (remainderIdx >= 0) {
    const rest = contract.minus(fixed).minus(shareTotal);
    if (rest.isNegative()) throw new DomainInputError(field, 'The payments add up to more than the contract sum.');
    amounts[remainderIdx] = rest;
  }
  return lines.map((l, i) => ({
    id: l.id,
    label: l.label,
    role: l.role,
    trigger: l.trigger,
    amount: amounts[i] as Decimal,
    isBilled: false,
  }));
}
