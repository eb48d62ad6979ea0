import { toDecimal } from '../errors/input-checks';
import type { MoneyInput } from '../money/money';

/**
 * The builder's warning when the work level needs a scaffold (29 CFR 1926.451(g)(1): more than
 * 10 ft, which raises the 'scaffold-fall-protection' caution) and no equipment line carries an
 * amount above zero: the scaffold rental and its erection are then missing from the price.
 * Null when there is nothing to warn about.
 */
export function unpricedScaffoldWarning(
  cautions: ReadonlyArray<{ readonly id: string }>,
  equipment: ReadonlyArray<{ readonly amount: MoneyInput }> | undefined,
): string | null {
  if (!cautions.some((c) => c.id === 'scaffold-fall-protection')) return null;
  const isPriced = (equipment ?? []).some((line, i) => toDecimal(line.amount, `equipment[${i}].amount`).greaterThan(0));
  return isPriced ? null : 'The work needs a scaffold, but no equipment is priced: add the scaffold rental and the time to put it up.';
}
