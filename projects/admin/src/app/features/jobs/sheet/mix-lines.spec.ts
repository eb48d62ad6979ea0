import { describe, expect, it } from 'vitest';
import { batchUnits, defaultBatch, formatMetric, layerRecipe, scaleMix } from './mix-lines';
import { glazeLayer, limeLayer, products } from './sheet-fixtures';

// NIST Handbook 44 App. C: 1 US quart = 946.352946 mL exactly (¼ of 231 in³ at 2.54 cm/in).
const QUART_ML = 946.352946;

describe('scaleMix (a layer recipe scaled to the crew batch)', () => {
  it('splits a quart of glaze: water 10 % of the concentrate, then paint : medium = 1 : 4', () => {
    const lines = scaleMix(glazeLayer, glazeLayer.recipe!, { amount: 1, unit: 'quart' }, products);
    const by = Object.fromEntries(lines.map((l) => [l.component, l]));
    // DOMAIN.md dilution convention "of concentrate": concentrate = mix / (1 + share)
    const concentrate = QUART_ML / 1.1;
    expect(by['p-paint'].amount).toBeCloseTo(concentrate / 5, 9);
    expect(by['p-medium'].amount).toBeCloseTo((concentrate * 4) / 5, 9);
    expect(by['water'].amount).toBeCloseTo(QUART_ML - concentrate, 9);
    expect(by['p-paint']).toMatchObject({ name: 'Umber base paint', isBase: true, isWater: false });
    expect(by['water']).toMatchObject({ name: null, isWater: true });
    // 86.03 mL = 5.82 tbsp: the nearest common fraction, 5¾, is within 2 % (kitchen-display.ts; common practice, no source)
    expect(by['water'].kitchen).toEqual({ isApproximate: true, number: '5¾', unit: 'tbsp', isPlural: true });
    expect(by['water'].metric).toEqual({ value: by['water'].amount, digits: 1, unit: 'mL' });
  });

  it('shows both a kitchen measure and metric for every volume line', () => {
    const lines = scaleMix(glazeLayer, glazeLayer.recipe!, { amount: 2, unit: 'gallon' }, products);
    for (const line of lines) {
      expect(line.kitchen).not.toBeNull();
      expect(line.metric.unit === 'mL' || line.metric.unit === 'L').toBe(true);
    }
  });

  it('keeps weight recipes in grams and kilograms with no kitchen measure', () => {
    const lines = scaleMix(limeLayer, limeLayer.recipe!, { amount: 10.3, unit: 'kg' }, products);
    // 100 : 3 by weight of 10.3 kg → 10 kg lime, 0.3 kg pigment (parts × batch / Σ parts)
    expect(lines.map((l) => [l.name, l.kitchen, l.metric])).toEqual([
      ['Slaked lime putty', null, { value: 10, digits: 2, unit: 'kg' }],
      ['Earth pigment', null, { value: expect.closeTo(300, 9) as number, digits: 1, unit: 'g' }],
    ]);
  });

  it('refuses a batch measured by weight for a volume recipe (no density to cross with)', () => {
    expect(() => scaleMix(glazeLayer, glazeLayer.recipe!, { amount: 1, unit: 'kg' }, products)).toThrow();
  });
});

describe('layerRecipe', () => {
  it('takes the layer recipe when it has one', () => {
    expect(layerRecipe(glazeLayer, products)).toBe(glazeLayer.recipe);
  });

  it('makes a recipe of one part from a product applied as is, by its unit', () => {
    const asIs = { ...glazeLayer, recipe: null, dilution: null, productId: 'p-lime' };
    expect(layerRecipe(asIs, products)).toEqual({ by: 'weight', baseProductId: 'p-lime', components: [{ productId: 'p-lime', parts: 1 }] });
    expect(layerRecipe({ ...asIs, productId: 'missing' }, products)).toBeNull();
  });
});

describe('batch units and the first batch', () => {
  it('offers cans and cups or metric for volume, grams for weight', () => {
    expect(batchUnits('volume')).toEqual(['cup', 'quart', 'gallon', 'mL', 'L']);
    expect(batchUnits('weight')).toEqual(['g', 'kg']);
  });

  it('starts from a quart or a litre by the firm units, a kilogram by weight', () => {
    expect(defaultBatch('volume', 'imperial')).toEqual({ amount: 1, unit: 'quart' });
    expect(defaultBatch('volume', 'metric')).toEqual({ amount: 1, unit: 'L' });
    expect(defaultBatch('weight', 'imperial')).toEqual({ amount: 1, unit: 'kg' });
  });
});

describe('formatMetric', () => {
  it.each([
    // separators per CLDR (Intl)
    [{ value: 1.4196, digits: 2, unit: 'L' as const }, 'en-US', '1.42 L'],
    [{ value: 1.4196, digits: 2, unit: 'L' as const }, 'es-ES', '1,42 L'],
    [{ value: 177.44, digits: 1, unit: 'mL' as const }, 'es-US', '177.4 mL'],
  ])('writes %j in %s as %s', (metric, locale, shown) => {
    expect(formatMetric(metric, locale)).toBe(shown);
  });
});
