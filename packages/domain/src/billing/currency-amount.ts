import type Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { toMoney } from '../errors/input-checks';
import type { MoneyInput } from '../money/money';

/**
 * A billed amount as the invoice will print it: a decimal string or Decimal with no more decimals
 * than the currency's minor unit (an invoice for 10.005 USD cannot be paid to the cent).
 * `isNegativeAllowed` is for credits; otherwise a negative amount names its field.
 */
export function toCurrencyAmount(value: MoneyInput, digits: number, field: string, label = 'amount', isNegativeAllowed = false): Decimal {
  const amount = toMoney(value, field, label);
  if (!isNegativeAllowed && amount.isNegative()) throw new DomainInputError(field, `The ${label} cannot be negative.`);
  if (amount.decimalPlaces() > digits) throw new DomainInputError(field, `The ${label} has more than ${digits} decimal places.`);
  return amount;
}
