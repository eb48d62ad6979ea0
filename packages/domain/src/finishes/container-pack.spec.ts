import Decimal from 'decimal.js';
import fc from 'fast-check';
import { expectInputError } from '../errors/expect-input-error';
import { type QuantityUnit, toBase } from '../units/quantity-unit';
import { chooseContainers, chooseContainersBy } from './container-pack';
import type { Container } from './finish-system';
import { PRODUCTS } from './fixtures';

const primer = PRODUCTS[0].containers;
const lime = PRODUCTS[1].containers;
const summary = (p: ReturnType<typeof chooseContainers>): string =>
  `${p.lines.map((l) => `${l.count}×${l.label}`).join(' + ')} = ${p.totalCost.toFixed(2)}`;

describe('container packs at lowest cost (DOMAIN.md §2.5 [D]; bounded search, common practice)', () => {
  it('primer 1.5855 gal: 2 gal at $90 beats 1 gal + 3 qt at $93', () => {
    expect(summary(chooseContainers(toBase(1.5855, 'gallon'), 'volume', primer))).toBe('2×1 gal = 90.00');
  });

  it('plaster 41.244 kg: 2 × 20 kg + 1 × 5 kg at $218 beats 3 × 20 kg at $285', () => {
    expect(summary(chooseContainers(toBase(41.244, 'kg'), 'mass', lime))).toBe('2×20 kg pail + 1×5 kg pail = 218.00');
  });

  it('an exact fit is not rounded up by float error', () => {
    expect(summary(chooseContainers(toBase(2, 'gallon'), 'volume', primer))).toBe('2×1 gal = 90.00');
    expect(summary(chooseContainers(toBase(0.5, 'gallon'), 'volume', primer))).toBe('2×1 qt = 32.00');
  });

  it('ties go to fewer containers, then to less left over', () => {
    const sameRate: Container[] = [
      { label: 'qt', size: 1, unit: 'quart', price: '10.00' },
      { label: 'gal', size: 1, unit: 'gallon', price: '40.00' },
    ];
    expect(summary(chooseContainers(toBase(1, 'gallon'), 'volume', sameRate))).toBe('1×gal = 40.00');
    const samePrice: Container[] = [
      { label: '2 L', size: 2, unit: 'L', price: '10.00' },
      { label: '1.5 L', size: 1.5, unit: 'L', price: '10.00' },
    ];
    const pack = chooseContainers(1200, 'volume', samePrice);
    expect(summary(pack)).toBe('1×1.5 L = 10.00');
    expect(pack.leftover).toBeCloseTo(300, 9);
  });

  it('nothing needed, nothing bought', () => {
    expect(chooseContainers(0, 'volume', primer).containerCount).toBe(0);
  });

  it('holds the need and never costs more than any single-size pack (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 60, noNaN: true }), (gallons) => {
        const need = toBase(gallons, 'gallon');
        const pack = chooseContainers(need, 'volume', primer);
        expect(pack.purchased).toBeGreaterThanOrEqual(need * (1 - 1e-9));
        const allGallons = Math.ceil(gallons - 1e-9) * 45;
        const allQuarts = Math.ceil(gallons * 4 - 1e-9) * 16;
        expect(pack.totalCost.toNumber()).toBeLessThanOrEqual(Math.min(allGallons, allQuarts));
      }),
    );
  });

  it.each([
    [() => chooseContainers(1, 'volume', []), 'containers', /empty/],
    [() => chooseContainers(1, 'volume', [{ label: 'x', size: 0, unit: 'L', price: '1.00' }]), 'containers[0].size', /greater than zero/],
    [() => chooseContainers(1, 'volume', [{ label: 'x', size: 1, unit: 'kg', price: '1.00' }]), 'containers[0].unit', /sold by mass/],
    [() => chooseContainers(1, 'volume', [{ label: 'x', size: 1, unit: 'L', price: '-1.00' }]), 'containers[0].price', /negative/],
    [() => chooseContainers(-1, 'volume', primer), 'need', /negative/],
  ])('bad input %# names its field', (call, field, message) => {
    expectInputError(call, field, message);
  });
});

/** mL or g per unit, exact: 1 gal = 231 in³ = 3785.411784 mL, 1 qt = ¼ gal (NIST Handbook 44 App. C, DOMAIN.md R2). */
const BASE_PER: Partial<Record<QuantityUnit, string>> = { L: '1000', quart: '946.352946', gallon: '3785.411784', kg: '1000' };

interface Choice {
  counts: Map<string, number>;
  cost: Decimal;
  containers: number;
  purchased: Decimal;
}

/**
 * Every count of every size up to what the need alone would take, in exact decimals: the lowest
 * cost, then fewest containers, then least bought, then more of the larger sizes (sizes listed
 * largest first, equal sizes in the order given) — the tie rules of DOMAIN.md §2.5; the last one
 * is common practice, no source.
 */
function bruteForce(need: number, containers: readonly Container[]): Choice {
  const sized = containers
    .map((c) => ({ c, exact: new Decimal(c.size).times(BASE_PER[c.unit] as string), float: toBase(c.size, c.unit) }))
    .sort((a, b) => b.float - a.float);
  const target = new Decimal(need).times(new Decimal(1).minus('1e-9'));
  const counts = new Array<number>(sized.length).fill(0);
  let best: Choice | null = null;
  const visit = (i: number): void => {
    if (i === sized.length) {
      const purchased = sized.reduce((sum, s, j) => sum.plus(s.exact.times(counts[j])), new Decimal(0));
      if (purchased.lt(target)) return;
      const cost = sized.reduce((sum, s, j) => sum.plus(new Decimal(s.c.price as string).times(counts[j])), new Decimal(0));
      const containers = counts.reduce((sum, n) => sum + n, 0);
      const isBetter =
        !best ||
        cost.lt(best.cost) ||
        (cost.eq(best.cost) && (containers < best.containers || (containers === best.containers && purchased.lt(best.purchased))));
      if (isBetter) {
        best = { counts: new Map(sized.map((s, j) => [s.c.label, counts[j]])), cost, containers, purchased };
      }
      return;
    }
    // more of this size first, so on a full tie the first pack found keeps the larger sizes
    for (let n = target.div(sized[i].exact).ceil().toNumber(); n >= 0; n--) {
      counts[i] = n;
      visit(i + 1);
    }
  };
  visit(0);
  return best as unknown as Choice;
}

const US_SIZES: [number, QuantityUnit][] = [
  [1, 'quart'],
  [2, 'quart'],
  [3, 'quart'],
  [0.5, 'gallon'],
  [1, 'gallon'],
  [2, 'gallon'],
  [5, 'gallon'],
];
const METRIC_SIZES: [number, QuantityUnit][] = [0.5, 0.75, 1, 1.5, 2.5, 4, 5, 10].map((l) => [l, 'L']);
const MASS_SIZES: [number, QuantityUnit][] = [1, 2.5, 5, 10, 20, 25].map((kg) => [kg, 'kg']);
/** quarts per US size, litres per metric size, kg per bag: what an equal unit price is counted in */
const measureOf = (size: number, unit: QuantityUnit): number => (unit === 'gallon' ? size * 4 : size);
const PRICES = ['0.00', '5.00', '9.99', '10.00', '12.50', '16.00', '20.00', '45.00'];

const dimensionOf = (containers: readonly Container[]): 'volume' | 'mass' => (containers[0].unit === 'kg' ? 'mass' : 'volume');

/** Random size sets (equal unit prices, one price for all, or assorted) and small needs, some exact fits. */
const packCase = fc
  .record({
    family: fc.constantFrom(US_SIZES, METRIC_SIZES, MASS_SIZES, [...US_SIZES, ...METRIC_SIZES]),
    pricing: fc.constantFrom('unit rate', 'one price', 'assorted'),
    rate: fc.integer({ min: 1, max: 40 }),
    sizeCount: fc.integer({ min: 1, max: 4 }),
    seed: fc.array(fc.nat(), { minLength: 8, maxLength: 8 }),
  })
  .chain(({ family, pricing, rate, sizeCount, seed }) => {
    const picks = seed.slice(0, sizeCount).map((n) => family[n % family.length]);
    const containers: Container[] = picks.map(([size, unit], i) => ({
      label: `${i}: ${size} ${unit}`,
      size,
      unit,
      price:
        pricing === 'unit rate'
          ? new Decimal(measureOf(size, unit)).times(rate).toFixed(2)
          : pricing === 'one price'
            ? `${rate}.00`
            : PRICES[seed[i + 4] % PRICES.length],
    }));
    const sizes = containers.map((c) => toBase(c.size, c.unit));
    const largest = Math.max(...sizes);
    const exactFit = fc
      .array(fc.integer({ min: 0, max: 3 }), { minLength: sizes.length, maxLength: sizes.length })
      .map((ns) => ns.reduce((sum, n, i) => sum + n * sizes[i], 0));
    const need = fc.oneof(fc.double({ min: 0, max: 3 * largest, noNaN: true }), exactFit);
    return need.map((n) => ({ containers, need: n }));
  })
  // keep the brute force small: every count of every size up to the need
  .filter(({ containers, need }) => containers.reduce((cells, c) => cells * (Math.ceil(need / toBase(c.size, c.unit)) + 1), 1) <= 20_000);

describe('container packs against brute force (property; tie rules of DOMAIN.md §2.5, larger sizes last: common practice, no source)', () => {
  it.each([
    ['chooseContainers', (need: number, containers: Container[]) => chooseContainers(need, dimensionOf(containers), containers)],
    [
      'the bounded search alone',
      (need: number, containers: Container[]) => chooseContainersBy('search', need, dimensionOf(containers), containers),
    ],
    [
      'the table over the need',
      (need: number, containers: Container[]) => chooseContainersBy('table', need, dimensionOf(containers), containers),
    ],
  ])('%s: the lowest cost, and the same pack as brute force under the tie rules', (_, choose) => {
    fc.assert(
      fc.property(packCase, ({ containers, need }) => {
        const pack = choose(need, containers);
        const expected = bruteForce(need, containers);
        expect(pack.totalCost.toFixed(2)).toBe(expected.cost.toFixed(2));
        expect(pack.containerCount).toBe(expected.containers);
        const chosen = new Map(containers.map((c) => [c.label, pack.lines.find((l) => l.label === c.label)?.count ?? 0]));
        expect(chosen).toEqual(expected.counts);
        expect(pack.purchased).toBeCloseTo(expected.purchased.toNumber(), 6);
      }),
      { numRuns: 250 },
    );
  });
});

describe('equal unit prices do not blow up the search (issue: 400 gal over 5 sizes took 20–24 s; common practice, no source)', () => {
  const atOneRate: Container[] = [
    { label: '1 qt', size: 1, unit: 'quart', price: '10.00' },
    { label: '2 qt', size: 2, unit: 'quart', price: '20.00' },
    { label: '1 gal', size: 1, unit: 'gallon', price: '40.00' },
    { label: '2 gal', size: 2, unit: 'gallon', price: '80.00' },
    { label: '5 gal', size: 5, unit: 'gallon', price: '200.00' },
  ];
  const atOnePrice = atOneRate.map((c) => ({ ...c, price: '50.00' }));
  // Arithmetic: 400 gal = 80 × 5 gal. At $40/gal 401.3 gal leaves 1.3 gal, cheapest as 1 gal + 2 qt ($60, 2 containers)
  // over 2 gal ($80); at $50 each the 1.3 gal is one more container either way, and 2 gal leaves less than 5 gal.
  it.each([
    ['$40/gal', 400, '80×5 gal = 16000.00', atOneRate],
    ['$40/gal', 401.3, '80×5 gal + 1×1 gal + 1×2 qt = 16060.00', atOneRate],
    ['$40/gal', 0.2, '1×1 qt = 10.00', atOneRate],
    ['$50 each', 400, '80×5 gal = 4000.00', atOnePrice],
    ['$50 each', 401.3, '80×5 gal + 1×2 gal = 4050.00', atOnePrice],
  ] as const)('5 sizes at %s, %s gal → %s', (_, gallons, expected, containers) => {
    const started = Date.now();
    expect(summary(chooseContainers(toBase(gallons, 'gallon'), 'volume', containers))).toBe(expected);
    // a guard against the blow-up (the old search took 20–24 s here), not a benchmark: ops/bench/domain measures it
    expect(Date.now() - started).toBeLessThan(1000);
  });

  it.each([
    ['$40/gal', '80×5 gal = 16000.00', atOneRate],
    ['$50 each', '80×5 gal = 4000.00', atOnePrice],
  ] as const)('the bounded search alone cuts the ties when the sizes fill 400 gal exactly: %s → %s', (_, expected, containers) => {
    const started = Date.now();
    expect(summary(chooseContainersBy('search', toBase(400, 'gallon'), 'volume', containers))).toBe(expected);
    expect(Date.now() - started).toBeLessThan(1000);
  });
});
