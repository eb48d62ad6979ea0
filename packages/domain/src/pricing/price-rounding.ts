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

/**
 * roundPrice, never below `atLeast` (the firm's minimum charge, DOMAIN.md §2.8: price = max(computed,
 * minimum)): a price the rule would round under it goes up to the next step instead — a 1,225.00
 * minimum to the nearest 100 is 1,300.00, not 1,200.00.
 */
export function roundPriceAtLeast(amount: Decimal, rule: RoundingRule, currency: string, atLeast: Decimal, field = 'rounding'): Decimal {
  const rounded = roundPrice(amount, rule, currency, field);
  if (rounded.greaterThanOrEqualTo(atLeast)) return rounded;
  const step = rule.kind === 'nearest' ? toMoney(rule.increment, `${field}.increment`, 'rounding increment') : null;
  return step ? roundToCurrency(atLeast.div(step).ceil().times(step), currency) : roundToCurrency(atLeast, currency);
}
