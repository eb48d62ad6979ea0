import { expectInputError } from '../errors/expect-input-error';
import { convertQuantity, fromBase } from '../units/quantity-unit';
import { DOME_GLAZE, LIME_TWO_COATS, PRIMER, productMap } from './fixtures';
import { layerQuantity } from './layer-quantity';

// DOMAIN.md §2.2 [D]: net walls 2π·9·10 − 61; dome 90π (Weisstein, MathWorld "Zone")
const WALLS = { quantity: 2 * Math.PI * 9 * 10 - 61, measure: 'area', unit: 'ft' } as const;
const DOME = { quantity: 90 * Math.PI, measure: 'area', unit: 'ft' } as const;

describe('layer quantities (DOMAIN.md §2.3 [D]; qty = area × share × coats / coverage × (1 + waste), common practice)', () => {
  it('primer on the walls: 1.5855 gal = 6.342 qt', () => {
    const q = layerQuantity(WALLS, PRIMER, productMap());
    expect(fromBase(q.products[0].amount, 'gallon')).toBeCloseTo(1.5855, 4);
    expect(fromBase(q.products[0].amount, 'quart')).toBeCloseTo(6.342, 3);
  });

  it('lime plaster, per-coat consumption in kg/m² on an area in ft²: 25.778 + 15.467 = 41.244 kg', () => {
    // ft² → m² by NIST SP 811 App. B.8
    const q = layerQuantity(WALLS, LIME_TWO_COATS, productMap());
    expect(q.dimension).toBe('mass');
    expect(q.coatAmounts.map((g) => fromBase(g, 'kg'))).toEqual([expect.closeTo(25.778, 3), expect.closeTo(15.467, 3)]);
    expect(fromBase(q.products[0].amount, 'kg')).toBeCloseTo(41.244, 3);
  });

  it('dome glaze at 30 % coverage, diluted 10 % of concentrate, 4 : 1 medium to paint', () => {
    const q = layerQuantity(DOME, DOME_GLAZE, productMap());
    expect(q.effectiveSurface).toBeCloseTo(84.82, 2);
    expect(fromBase(q.mix, 'gallon')).toBeCloseTo(0.24387, 5);
    expect(fromBase(q.mix, 'floz')).toBeCloseTo(31.215, 3);
    expect(fromBase(q.concentrate, 'floz')).toBeCloseTo(28.377, 3);
    expect(fromBase(q.water, 'floz')).toBeCloseTo(2.838, 3);
    const [medium, paint] = q.products;
    expect(fromBase(medium.amount, 'floz')).toBeCloseTo(22.702, 3);
    expect(fromBase(paint.amount, 'floz')).toBeCloseTo(5.675, 3);
    expect(fromBase(paint.amount, 'tbsp')).toBeCloseTo(11.35, 2);
    expect(fromBase(paint.amount, 'mL')).toBeCloseTo(167.8, 1);
  });

  it('the two dilution conventions differ by about 1 % at 10 %', () => {
    const ofMix = layerQuantity(DOME, { ...DOME_GLAZE, dilution: { share: 0.1, convention: 'ofMix' } }, productMap());
    const ofConc = layerQuantity(DOME, DOME_GLAZE, productMap());
    expect(ofMix.concentrate / ofMix.mix).toBeCloseTo(0.9, 12);
    expect(ofConc.concentrate / ofConc.mix).toBeCloseTo(1 / 1.1, 12);
  });

  it.each([
    // water as a share of the concentrate: 1:1 wash = 100 %, 2:1 = 200 % (common practice, no source)
    [1, 1 / 2],
    [2, 1 / 3],
    [10, 1 / 11],
  ])('a %d:1 wash is accepted; concentrate is %d of the mix', (share, concentrate) => {
    const q = layerQuantity(DOME, { ...DOME_GLAZE, dilution: { share, convention: 'ofConcentrate' } }, productMap());
    expect(q.concentrate / q.mix).toBeCloseTo(concentrate, 12);
  });

  it('waste of exactly 100 % doubles the amount (the limit itself is accepted)', () => {
    const none = layerQuantity(WALLS, { ...PRIMER, waste: 0 }, productMap());
    const full = layerQuantity(WALLS, { ...PRIMER, waste: 1 }, productMap());
    expect(full.mix / none.mix).toBeCloseTo(2, 12);
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY, '12' as unknown as number])('a surface quantity of %p is refused', (quantity) => {
    expectInputError(() => layerQuantity({ ...WALLS, quantity }, PRIMER, productMap()), 'surface.quantity', /finite/);
  });

  it('wet film check: 1 gal over 400 ft² is 4.0 mils (1604 rule, paintcenter.org Ask the Expert Dec 2007)', () => {
    // 1 US gal over 1 ft² = 231 in³ / 144 in² = 1.604 in = 1604 mils (NIST Handbook 44 App. C)
    const milsPerGallonPerFt2 = (convertQuantity(1, 'gallon', 'in3') / 144) * 1000;
    expect(milsPerGallonPerFt2).toBeCloseTo(1604.17, 2);
    expect(milsPerGallonPerFt2 / 400).toBeCloseTo(4.0, 1);
  });

  it.each([
    [{ ...PRIMER, coverage: { ...PRIMER.coverage, surfacePerUnit: 0 } }, 'layer.coverage.surfacePerUnit', /greater than zero/],
    [{ ...DOME_GLAZE, dilution: { share: 1, convention: 'ofMix' as const } }, 'layer.dilution.share', /final mix must be under 100 %/],
    [{ ...DOME_GLAZE, dilution: { share: 10.5, convention: 'ofConcentrate' as const } }, 'layer.dilution.share', /at most 1000 %/],
    [{ ...PRIMER, waste: 1.01 }, 'layer.waste', /above 100 %/],
    [{ ...PRIMER, waste: Number.NaN }, 'layer.waste', /finite/],
    [{ ...DOME_GLAZE, dilution: { share: -0.1, convention: 'ofMix' as const } }, 'layer.dilution.share', /negative/],
    [{ ...PRIMER, coats: 0 }, 'layer.coats', /at least 1/],
    [{ ...PRIMER, coverageShare: 1.3 }, 'layer.coverageShare', /between 0 and 1/],
    [{ ...PRIMER, waste: -0.1 }, 'layer.waste', /negative/],
    [{ ...LIME_TWO_COATS, coats: 3 }, 'layer.coatCoverages', /one coverage per coat/],
    [{ ...PRIMER, productId: 'nope' }, 'layer.productId', /No product/],
    [{ ...PRIMER, productId: undefined }, 'layer.productId', /product or a recipe/],
    [{ ...PRIMER, productId: 'lime' }, 'layer.productId', /density/],
    [{ ...DOME_GLAZE, recipe: { ...DOME_GLAZE.recipe!, components: [] } }, 'layer.recipe.components', /cannot be empty/],
    [{ ...DOME_GLAZE, recipe: { ...DOME_GLAZE.recipe!, baseProductId: 'wax' } }, 'layer.recipe.baseProductId', /base/],
    [{ ...DOME_GLAZE, recipe: { ...DOME_GLAZE.recipe!, by: 'weight' as const } }, 'layer.recipe.by', /by weight/],
  ])('bad layer %# names its field', (layer, field, message) => {
    expectInputError(() => layerQuantity(WALLS, layer, productMap()), field, message);
  });
});
