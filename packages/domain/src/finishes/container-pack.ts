import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { requireNonEmpty, requireNonNegative, requirePositive, toNonNegativeMoney } from '../errors/input-checks';
import { type Dimension, dimensionOf, toBase } from '../units/quantity-unit';
import type { Container } from './finish-system';

export interface PackLine {
  label: string;
  count: number;
  unitPrice: Decimal;
  cost: Decimal;
}

export interface ContainerPack {
  lines: PackLine[];
  totalCost: Decimal;
  containerCount: number;
  /** what the pack holds and what is left over, in base units (mL or g) */
  purchased: number;
  leftover: number;
}

/** Guards against a float sum landing a hair under the need (2 × 1 gal vs 2 gal). */
const RELATIVE_SLACK = 1e-9;
const COST_EPSILON = 1e-9;

interface Option {
  label: string;
  size: number;
  price: number;
  exactPrice: Decimal;
}

/**
 * Cheapest set of containers holding at least `need` (base units). A small branch-and-bound
 * search, not greedy: 1.59 gal at $45/gal and $16/qt is 2 gal ($90), not 1 gal + 3 qt ($93).
 * Ties go to fewer containers, then to the least left over.
 */
export function chooseContainers(
  need: number,
  dimension: Dimension,
  containers: readonly Container[],
  field = 'containers',
): ContainerPack {
  requireNonNegative(need, 'need', 'quantity needed');
  requireNonEmpty(containers, field, 'list of containers');
  const options: Option[] = containers.map((c, i) => {
    const at = `${field}[${i}]`;
    requirePositive(c.size, `${at}.size`, 'container size');
    if (dimensionOf(c.unit, `${at}.unit`) !== dimension) {
      throw new DomainInputError(
        `${at}.unit`,
        `The container is sold by ${dimensionOf(c.unit)} but the product is measured by ${dimension}.`,
      );
    }
    const exactPrice = toNonNegativeMoney(c.price, `${at}.price`, 'container price');
    return { label: c.label, size: toBase(c.size, c.unit), price: exactPrice.toNumber(), exactPrice };
  });
  options.sort((a, b) => b.size - a.size);
  // Cheapest rate among the options from index i on: a lower bound on any way to fill the rest.
  const cheapestRateFrom = options.map((_, i) => Math.min(...options.slice(i).map((o) => o.price / o.size)));

  const target = need * (1 - RELATIVE_SLACK);
  const counts = new Array<number>(options.length).fill(0);
  let best: { counts: number[]; cost: number; containers: number; purchased: number } | null = null;

  const consider = (cost: number, containersUsed: number, purchased: number): void => {
    const better =
      !best ||
      cost < best.cost - COST_EPSILON ||
      (Math.abs(cost - best.cost) <= COST_EPSILON &&
        (containersUsed < best.containers || (containersUsed === best.containers && purchased < best.purchased)));
    if (better) best = { counts: [...counts], cost, containers: containersUsed, purchased };
  };

  const search = (i: number, purchased: number, cost: number, used: number): void => {
    const remaining = target - purchased;
    if (remaining <= 0) {
      consider(cost, used, purchased);
      return;
    }
    if (i === options.length) return;
    if (best && cost + remaining * cheapestRateFrom[i] > best.cost + COST_EPSILON) return;
    const o = options[i];
    const most = Math.ceil(remaining / o.size);
    const least = i === options.length - 1 ? most : 0;
    for (let n = most; n >= least; n--) {
      counts[i] = n;
      search(i + 1, purchased + n * o.size, cost + n * o.price, used + n);
    }
    counts[i] = 0;
  };
  search(0, 0, 0, 0);

  const chosen = best as { counts: number[]; purchased: number } | null;
  if (!chosen) throw new DomainInputError(field, 'No combination of containers holds the quantity needed.');
  const lines: PackLine[] = [];
  let totalCost = new Decimal(0);
  let containerCount = 0;
  chosen.counts.forEach((n, i) => {
    if (n === 0) return;
    const cost = options[i].exactPrice.times(n);
    lines.push({ label: options[i].label, count: n, unitPrice: options[i].exactPrice, cost });
    totalCost = totalCost.plus(cost);
    containerCount += n;
  });
  return { lines, totalCost, containerCount, purchased: chosen.purchased, leftover: Math.max(0, chosen.purchased - need) };
}
