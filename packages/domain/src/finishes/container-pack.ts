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
/** Cost tolerance when costs are counted in whole minor units, so equal means equal. */
const WHOLE_UNITS = 0.5;
/** Cost tolerance, in dollars, when the prices have too many places to count that way. */
const COST_EPSILON = 1e-9;
/** Two float amounts this close (relatively) hold the same: the tie goes on to the next rule. */
const SAME_AMOUNT = 1e-12;
/** Most branches the search may take before the table over the need takes over (the search is quicker when it is short). */
const QUICK_SEARCH_NODES = 2000;
/** Largest table (amounts × sizes) filled over the need; past it the bounded search runs to the end. */
const GRID_CELLS = 1 << 19;
/** Sizes with more decimal places in mL or g than this share no useful step. */
const GRID_PLACES = 12;

interface Option {
  label: string;
  /** base units (mL or g), as a float */
  size: number;
  /** the size as given, for the exact common step of the table */
  given: Pick<Container, 'size' | 'unit'>;
  /** in whole minor units when the tolerance is WHOLE_UNITS, else the float price */
  price: number;
  exactPrice: Decimal;
}

type Strategy = 'auto' | 'search' | 'table';

/** digits × 10^-places, both safe integers */
interface ShortDecimal {
  digits: number;
  places: number;
}

/**
 * Cheapest set of containers holding at least `need` (base units), not greedy: 1.59 gal at $45/gal
 * and $16/qt is 2 gal ($90), not 1 gal + 3 qt ($93). Ties go to fewer containers, then to the least
 * left over, then to more of the larger sizes (sizes in the order given when equal).
 *
 * A branch-and-bound search runs first, pruning on cost and, among equal costs, on the fewest
 * containers still possible; it settles most packs in a few dozen branches. When it runs long
 * (sizes sharing a unit price, with a remainder that no size fits exactly) and the sizes are whole
 * multiples of a common step (a quart for qt/gal/5 gal, 250 mL for 0.75/1/2.5 L), a table over the
 * need counted in that step finds the pack in (need ÷ step) × sizes steps. Only when there is no
 * such step (a litre beside a gallon) or the table would be too large does the search run to the end.
 */
export function chooseContainers(
  need: number,
  dimension: Dimension,
  containers: readonly Container[],
  field = 'containers',
): ContainerPack {
  return choosePack(need, dimension, containers, field, 'auto');
}

/**
 * One way of searching alone, for specs (not the public API): 'search' runs the bounded search to
 * the end; 'table' fills the table over the need whenever the sizes share a step.
 */
export function chooseContainersBy(
  strategy: Exclude<Strategy, 'auto'>,
  need: number,
  dimension: Dimension,
  containers: readonly Container[],
): ContainerPack {
  return choosePack(need, dimension, containers, 'containers', strategy);
}

function choosePack(
  need: number,
  dimension: Dimension,
  containers: readonly Container[],
  field: string,
  strategy: Strategy,
): ContainerPack {
  requireNonNegative(need, 'need', 'quantity needed');
  requireNonEmpty(containers, field, 'list of containers');
  const parsed = containers.map((c, i) => {
    const at = `${field}[${i}]`;
    requirePositive(c.size, `${at}.size`, 'container size');
    if (dimensionOf(c.unit, `${at}.unit`) !== dimension) {
      throw new DomainInputError(
        `${at}.unit`,
        `The container is sold by ${dimensionOf(c.unit)} but the product is measured by ${dimension}.`,
      );
    }
    const exactPrice = toNonNegativeMoney(c.price, `${at}.price`, 'container price');
    return { label: c.label, size: toBase(c.size, c.unit), given: { size: c.size, unit: c.unit }, exactPrice };
  });
  parsed.sort((a, b) => b.size - a.size);
  const target = need * (1 - RELATIVE_SLACK);
  const { options, tolerance } = costing(parsed, target);

  const quick = strategy === 'auto' ? packBySearch(options, target, tolerance, QUICK_SEARCH_NODES) : null;
  const counts =
    quick ?? (strategy === 'search' ? null : packOnGrid(options, target, tolerance)) ?? packBySearch(options, target, tolerance);
  if (!counts) throw new DomainInputError(field, 'No combination of containers holds the quantity needed.');
  const lines: PackLine[] = [];
  let totalCost = new Decimal(0);
  let containerCount = 0;
  let purchased = 0;
  counts.forEach((n, i) => {
    purchased += n * options[i].size;
    if (n === 0) return;
    const cost = options[i].exactPrice.times(n);
    lines.push({ label: options[i].label, count: n, unitPrice: options[i].exactPrice, cost });
    totalCost = totalCost.plus(cost);
    containerCount += n;
  });
  return { lines, totalCost, containerCount, purchased, leftover: Math.max(0, purchased - need) };
}

/**
 * Prices in whole minor units (cents, or finer when a price has more places) so equal costs are
 * equal exactly; a float price with a small tolerance only when those integers could overflow.
 */
function costing(parsed: Omit<Option, 'price'>[], target: number): { options: Option[]; tolerance: number } {
  const scale = 10 ** Math.max(...parsed.map((o) => o.exactPrice.decimalPlaces()));
  // Rounding recovers the whole number exactly while it stays well under 2^52.
  const scaled = parsed.map((o) => Math.round(o.exactPrice.toNumber() * scale));
  const mostContainers = Math.ceil(target / Math.min(...parsed.map((o) => o.size))) + 1;
  const isSafe = Math.max(...scaled) * mostContainers * parsed.length < 2 ** 50;
  return {
    options: parsed.map((o, i) => ({
      label: o.label,
      size: o.size,
      given: o.given,
      price: isSafe ? scaled[i] : o.exactPrice.toNumber(),
      exactPrice: o.exactPrice,
    })),
    tolerance: isSafe ? WHOLE_UNITS : COST_EPSILON,
  };
}

/** The sizes as whole numbers of their largest common step (in mL or g), or null when that step is too fine. */
function commonStep(options: readonly Option[]): { units: number[]; step: number } | null {
  // The unit factors are short decimals, so the float factor prints back as the exact one.
  const scaled = onePlaces(options.map((o) => product(shortDecimal(String(o.given.size)), shortDecimal(String(toBase(1, o.given.unit))))));
  if (!scaled || scaled.places > GRID_PLACES) return null;
  const step = scaled.whole.reduce(greatestCommonDivisor);
  return { units: scaled.whole.map((w) => w / step), step: step / 10 ** scaled.places };
}

/** A plain decimal numeral ("946.352946") as digits and places; null for an exponent form or past 2^53. */
function shortDecimal(text: string): ShortDecimal | null {
  const match = /^(\d+)(?:\.(\d+))?$/.exec(text);
  if (!match) return null;
  const fraction = match[2] ?? '';
  const digits = Number(match[1] + fraction);
  return Number.isSafeInteger(digits) ? { digits, places: fraction.length } : null;
}

function product(a: ShortDecimal | null, b: ShortDecimal | null): ShortDecimal | null {
  if (!a || !b) return null;
  const digits = a.digits * b.digits;
  return Number.isSafeInteger(digits) ? { digits, places: a.places + b.places } : null;
}

/** The decimals as whole numbers over one power of ten, or null when one is missing or too large. */
function onePlaces(values: readonly (ShortDecimal | null)[]): { whole: number[]; places: number } | null {
  if (values.some((v) => v === null)) return null;
  const places = Math.max(...values.map((v) => (v as ShortDecimal).places));
  const whole = values.map((v) => (v as ShortDecimal).digits * 10 ** (places - (v as ShortDecimal).places));
  return whole.every((w) => Number.isSafeInteger(w)) ? { whole, places } : null;
}

function greatestCommonDivisor(a: number, b: number): number {
  return b === 0 ? a : greatestCommonDivisor(b, a % b);
}

/**
 * Table over the need counted in the common step: the best pack holding at least a steps, for every
 * a up to the need. Sizes are added one at a time from the smallest, so a pack that uses size i is
 * size i plus the best pack (of sizes i and smaller) for what is left; on a full tie the pack with
 * more of the larger size wins, as the ordering of the sizes says. Costs are whole minor units and
 * the tie rules after cost fold into one number, containers × span + steps held. Null when the
 * table would be too large or the prices are not counted in whole units.
 */
function packOnGrid(options: readonly Option[], target: number, tolerance: number): number[] | null {
  const grid = commonStep(options);
  if (!grid || tolerance !== WHOLE_UNITS) return null;
  // a need too small to count in the step (a denormal) still takes one container
  const steps = target > 0 ? Math.max(1, Math.ceil(target / grid.step)) : 0;
  const width = steps + 1;
  if (width * options.length > GRID_CELLS) return null;
  if (width * Math.max(...options.map((o) => o.price)) >= Number.MAX_SAFE_INTEGER) return null;
  // A best pack never holds a container it could drop, so its count and its steps both stay under span.
  const span = steps + Math.max(...grid.units) + 2;
  if (span * span >= Number.MAX_SAFE_INTEGER) return null;
  const cost = new Float64Array(width).fill(Infinity);
  const tie = new Float64Array(width);
  cost[0] = 0;
  const takes = new Uint8Array(width * options.length);
  for (let i = options.length - 1; i >= 0; i--) {
    const unit = grid.units[i];
    const price = options[i].price;
    const oneMore = span + unit;
    const row = i * width;
    for (let a = 1; a <= steps; a++) {
      const rest = a > unit ? a - unit : 0;
      const c = cost[rest] + price;
      const t = tie[rest] + oneMore;
      if (c < cost[a] || (c === cost[a] && t <= tie[a])) {
        cost[a] = c;
        tie[a] = t;
        takes[row + a] = 1;
      }
    }
  }
  const counts = new Array<number>(options.length).fill(0);
  for (let a = steps, i = 0; a > 0;) {
    if (takes[i * width + a]) {
      counts[i]++;
      a = Math.max(0, a - grid.units[i]);
    } else {
      i++;
    }
  }
  return counts;
}

interface Best {
  counts: number[];
  cost: number;
  containers: number;
  purchased: number;
}

/**
 * Branch and bound over the count of each size, largest first and more before fewer, so among
 * full ties the first pack found is the one the table picks too. A branch is cut when even
 * the cheapest rate left cannot reach the best cost, or cannot beat it and would need more
 * containers than the best pack (the cut that keeps equal unit prices from being enumerated).
 * Null when it takes more than `nodeLimit` branches.
 */
function packBySearch(options: readonly Option[], target: number, tolerance: number, nodeLimit = Infinity): number[] | null {
  // Cheapest rate among the options from index i on: a lower bound on any way to fill the rest.
  const cheapestRateFrom = options.map((_, i) => Math.min(...options.slice(i).map((o) => o.price / o.size)));
  const counts = new Array<number>(options.length).fill(0);
  let best: Best | null = null;

  const isBetter = (cost: number, containers: number, purchased: number, than: Best): boolean =>
    cost < than.cost - tolerance ||
    (cost <= than.cost + tolerance &&
      (containers < than.containers || (containers === than.containers && purchased < than.purchased * (1 - SAME_AMOUNT))));

  let nodes = 0;
  const search = (i: number, purchased: number, cost: number, used: number): void => {
    if (++nodes > nodeLimit) return;
    const remaining = target - purchased;
    if (remaining <= 0) {
      if (!best || isBetter(cost, used, purchased, best)) best = { counts: [...counts], cost, containers: used, purchased };
      return;
    }
    if (i === options.length) return;
    if (best) {
      const leastCost = cost + remaining * cheapestRateFrom[i];
      if (leastCost > best.cost + tolerance) return;
      // options[i] is the largest size left, so no way to fill the rest uses fewer containers.
      const fewest = used + Math.ceil((remaining / options[i].size) * (1 - SAME_AMOUNT));
      if (leastCost >= best.cost - tolerance && fewest > best.containers) return;
    }
    const o = options[i];
    const most = Math.max(1, Math.ceil(remaining / o.size));
    const least = i === options.length - 1 ? most : 0;
    for (let n = most; n >= least; n--) {
      counts[i] = n;
      search(i + 1, purchased + n * o.size, cost + n * o.price, used + n);
    }
    counts[i] = 0;
  };
  search(0, 0, 0, 0);
  return best && nodes <= nodeLimit ? (best as Best).counts : null;
}
