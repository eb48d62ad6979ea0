import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { toMoney } from '../errors/input-checks';
import { type MoneyInput, roundToCurrency } from '../money/money';

/** Applied once, to the final price: to the currency's minor unit, or to the nearest 5, 10, 1 … */
export type RoundingRule = { kind: 'minorUnit' } | { kind: 'nearest'; increment: MoneyInput };

export function roundPrice(amount: Decimal, rule: RoundingRule, currency: string, field = 'rounding'): Decimal {
  if (rule.kind === 'minorUnit') return roundToCurrency(amount, currency);
  if (rule.kind === 'nearest') {
    const step = toMoney(rule.increment, `${field}.increment`, 'rounding increment');
    if (step.lessThanOrEqualTo(0)) throw new DomainInputError(`${field}.increment`, 'The rounding increment must be greater than zero.');
    return roundToCurrency(amount.div(step).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).times(step), currency);
  }
  const unknown: { kind?: unknown } = rule;
  throw new DomainInputError(`${field}.kind`, `"${String(unknown.kind)}" is not a rounding rule.`);
}
