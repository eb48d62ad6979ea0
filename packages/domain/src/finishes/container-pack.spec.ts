import fc from 'fast-check';
import { expectInputError } from '../errors/expect-input-error';
import { toBase } from '../units/quantity-unit';
import { chooseContainers } from './container-pack';
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
