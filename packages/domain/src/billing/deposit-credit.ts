import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { minorUnitDigits } from '../money/currency';
import type { MoneyInput } from '../money/money';
import { toCurrencyAmount } from './currency-amount';

/**
 * How an advance deposit comes off later invoices: `prorata` — the deposit's share of the work billed
 * to date (deposit × earned to date ÷ contract sum), less what earlier invoices credited; `next` — as
 * much as possible on the next invoices until it is used up. Either way the invoice that bills the
 * contract sum in full, or the final one, takes whatever is left.
 */
export type DepositCreditRule = 'prorata' | 'next';

export interface DepositCreditInput {
  rule: DepositCreditRule;
  /** the deposit received as an advance */
  deposit: MoneyInput;
  /** deposit already credited on earlier invoices */
  creditedBefore: MoneyInput;
  /** what earlier invoices billed for work (before their deposit credits) */
  earnedBefore: MoneyInput;
  /** what this invoice bills for work (before the deposit credit); a negative correction earns nothing */
  earnedThisInvoice: MoneyInput;
  contractSum: MoneyInput;
  isFinal: boolean;
  currency: string;
}

/**
 * The deposit credit on this invoice: never more than the deposit not yet credited, never more than
 * the invoice earns (an invoice is never pushed below zero by its deposit), never negative
 * (common practice, no source; DOMAIN.md §2.11 "a deposit is applied as a credit on a later invoice").
 */
export function depositCredit(input: DepositCreditInput): Decimal {
  const digits = minorUnitDigits(input.currency, 'currency');
  const deposit = toCurrencyAmount(input.deposit, digits, 'deposit', 'deposit');
  const creditedBefore = toCurrencyAmount(input.creditedBefore, digits, 'creditedBefore', 'deposit already credited');
  const earned = Decimal.max(toCurrencyAmount(input.earnedThisInvoice, digits, 'earnedThisInvoice', 'amount earned', true), 0);
  const earnedBefore = Decimal.max(toCurrencyAmount(input.earnedBefore, digits, 'earnedBefore', 'amount earned before', true), 0);
  const contractSum = toCurrencyAmount(input.contractSum, digits, 'contractSum', 'contract sum');
  if (creditedBefore.greaterThan(deposit)) {
    throw new DomainInputError('creditedBefore', 'More has been credited than the deposit.');
  }
  const remaining = deposit.minus(creditedBefore);
  const earnedToDate = earnedBefore.plus(earned);
  let wanted: Decimal;
  if (input.isFinal || input.rule === 'next') {
    wanted = remaining;
  } else if (input.rule === 'prorata') {
    if (contractSum.isZero()) {
      throw new DomainInputError('contractSum', 'A deposit credited pro rata needs a contract sum greater than zero.');
    }
    // On totals to date, so rounding never piles up and a contract sum changed by a change order is
    // followed; the invoice that bills the contract sum in full takes the rest.
    wanted = earnedToDate.greaterThanOrEqualTo(contractSum)
      ? remaining
      : deposit.times(earnedToDate).div(contractSum).toDecimalPlaces(digits, Decimal.ROUND_HALF_UP).minus(creditedBefore);
  } else {
    throw new DomainInputError('rule', 'A deposit is credited pro rata or on the next invoices.');
  }
  return Decimal.max(Decimal.min(wanted, remaining, earned), 0);
}
