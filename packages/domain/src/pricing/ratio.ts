import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { toDecimal } from '../errors/input-checks';

/**
 * A rate or share as a decimal fraction: 0.2 means 20 %. Numbers are accepted here (unlike
 * money) because Decimal reads a JS number through its shortest decimal form, so 0.15 is 0.15.
 */
export type Ratio = string | number | Decimal;

export function toRatio(value: Ratio, field: string, label = 'rate', max = 1): Decimal {
  const r = toDecimal(value, field, label);
  if (r.isNegative()) throw new DomainInputError(field, `The ${label} cannot be negative.`);
  if (r.greaterThan(max))
    throw new DomainInputError(field, `The ${label} cannot be more than ${new Decimal(max).times(100).toString()} %.`);
  return r;
}
