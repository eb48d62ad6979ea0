import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { minorUnitDigits } from '../money/currency';
import type { MoneyInput } from '../money/money';
import { toCurrencyAmount } from './currency-amount';

export interface IncludedTaxInput {
  /** this invoice's amount, tax included; negative for a credit */
  amount: MoneyInput;
  /** the contract sum the client signed, tax included (price + tax) */
  contractSum: MoneyInput;
  /** the tax inside the contract sum */
  contractTax: MoneyInput;
  /** what earlier invoices billed, tax included, net of credits */
  billedBefore: MoneyInput;
  /** the tax those earlier invoices carried */
  taxBilledBefore: MoneyInput;
  currency: string;
}

/**
 * The tax contained in an invoice amount when the contract sum already includes tax: the tax share
 * of everything billed so far, rounded half up to the currency's minor unit, less the tax earlier
 * invoices carried. The
 * invoice that brings the billed total to the contract sum exactly takes the rest of the tax, so
 * the invoices' tax adds up to the contract's tax to the cent however the rounding fell
 * (common practice, no source).
 */
export function includedTax(input: IncludedTaxInput): Decimal {
  const digits = minorUnitDigits(input.currency, 'currency');
  const amount = toCurrencyAmount(input.amount, digits, 'amount', 'amount', true);
  const contractSum = toCurrencyAmount(input.contractSum, digits, 'contractSum', 'contract sum');
  const contractTax = toCurrencyAmount(input.contractTax, digits, 'contractTax', 'tax');
  const billedBefore = toCurrencyAmount(input.billedBefore, digits, 'billedBefore', 'amount billed before', true);
  const taxBilledBefore = toCurrencyAmount(input.taxBilledBefore, digits, 'taxBilledBefore', 'tax billed before', true);
  if (contractTax.greaterThan(contractSum)) {
    throw new DomainInputError('contractTax', 'The tax cannot be more than the contract sum that includes it.');
  }
  if (contractSum.isZero()) return new Decimal(0);
  // Rounded on the running total, not per invoice: each invoice's tax is at most its amount, and
  // the invoice that reaches the contract sum lands on the contract's tax exactly.
  const billedAfter = billedBefore.plus(amount);
  if (billedAfter.equals(contractSum)) return contractTax.minus(taxBilledBefore);
  return billedAfter.times(contractTax).div(contractSum).toDecimalPlaces(digits, Decimal.ROUND_HALF_UP).minus(taxBilledBefore);
}
