import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { requireNonEmpty, toDecimal } from '../errors/input-checks';

/**
 * Splits `total` into parts proportional to `weights`, each a whole number of minor units
 * (`digits` decimals), summing exactly to `total`: largest-remainder method. Remainder
 * units go to the largest fractional parts; ties go to the earlier part so results are stable.
 */
export function allocateByWeights(total: Decimal.Value, weights: readonly Decimal.Value[], digits: number, field = 'weights'): Decimal[] {
  requireNonEmpty(weights, field, 'list of weights');
  const amount = toDecimal(total, 'total');
  const unit = new Decimal(10).pow(-digits);
  const units = amount.div(unit);
  if (!units.isInteger()) {
    throw new DomainInputError('total', `The total has more than ${digits} decimal places.`);
  }
  const w = weights.map((x, i) => {
    const d = toDecimal(x, `${field}[${i}]`, 'weight');
    if (d.isNegative()) throw new DomainInputError(`${field}[${i}]`, 'A weight cannot be negative.');
    return d;
  });
  const weightSum = w.reduce((a, b) => a.plus(b), new Decimal(0));
  if (weightSum.isZero()) throw new DomainInputError(field, 'The weights cannot all be zero.');

  const sign = units.isNegative() ? -1 : 1;
  const absUnits = units.abs();
  const exact = w.map((x) => absUnits.times(x).div(weightSum));
  const floors = exact.map((x) => x.floor());
  let left = absUnits.minus(floors.reduce((a, b) => a.plus(b), new Decimal(0))).toNumber();
  const order = exact.map((x, i) => ({ i, rem: x.minus(floors[i]) })).sort((a, b) => b.rem.comparedTo(a.rem) || a.i - b.i);
  for (const { i } of order) {
    if (left <= 0) break;
    floors[i] = floors[i].plus(1);
    left -= 1;
  }
  return floors.map((f) => f.times(unit).times(sign));
}

export function splitEvenly(total: Decimal.Value, parts: number, digits: number): Decimal[] {
  if (!Number.isInteger(parts) || parts < 1) {
    throw new DomainInputError('parts', 'The number of parts must be a whole number of at least 1.');
  }
  return allocateByWeights(
    total,
    Array.from({ length: parts }, () => 1),
    digits,
  );
}
