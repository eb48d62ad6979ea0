import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { toMoney, toNonNegativeMoney } from '../errors/input-checks';
import { minorUnitDigits } from '../money/currency';
import type { MoneyInput } from '../money/money';
import { type Ratio, toRatio } from '../pricing/ratio';

/**
 * Deposit limits are jurisdiction data, not code. California home improvement contracts
 * (Bus. & Prof. Code §7159): { kind: 'lesserOf', amount: '1000', share: 0.1 }.
 */
export type DepositCapRule =
  | { kind: 'none' }
  | { kind: 'amount'; amount: MoneyInput }
  | { kind: 'share'; share: Ratio }
  | { kind: 'lesserOf'; amount: MoneyInput; share: Ratio };

/** A share cap in money, rounded down: a deposit of the rounded-up cent would be over the share the law allows. */
const shareOf = (contract: Decimal, share: Decimal, currency: string): Decimal =>
  contract.times(share).toDecimalPlaces(minorUnitDigits(currency, 'currency'), Decimal.ROUND_DOWN);

export function depositCap(rule: DepositCapRule, contractSum: MoneyInput, currency: string, field = 'depositCap'): Decimal | null {
  const contract = toNonNegativeMoney(contractSum, 'contractSum', 'contract sum');
  switch (rule.kind) {
    case 'none':
      return null;
    case 'amount':
      return toNonNegativeMoney(rule.amount, `${field}.amount`);
    case 'share':
      return shareOf(contract, toRatio(rule.share, `${field}.share`, 'share'), currency);
    case 'lesserOf':
      return Decimal.min(
        toNonNegativeMoney(rule.amount, `${field}.amount`),
        shareOf(contract, toRatio(rule.share, `${field}.share`, 'share'), currency),
      );
    default:
      throw new DomainInputError(`${field}.kind`, 'Unknown deposit rule.');
  }
}

export interface DepositCheck {
  cap: Decimal | null;
  deposit: Decimal;
  isWithinCap: boolean;
  /** how much the deposit is over the cap (0 when within) */
  excess: Decimal;
}

export function checkDeposit(deposit: MoneyInput, rule: DepositCapRule, contractSum: MoneyInput, currency: string): DepositCheck {
  const d = toMoney(deposit, 'deposit', 'deposit');
  const cap = depositCap(rule, contractSum, currency);
  const excess = cap === null || d.lessThanOrEqualTo(cap) ? new Decimal(0) : d.minus(cap);
  return { cap, deposit: d, isWithinCap: excess.isZero(), excess };
}
