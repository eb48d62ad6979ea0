import { expectInputError } from '../errors/expect-input-error';
import { fromBase } from '../units/quantity-unit';
import { DOME_GLAZE } from './fixtures';
import { mixBatch, scaleRecipeToBase } from './mix-batch';

describe('mix cards', () => {
  it('scales a per-base recipe: 1 qt medium + 2 tbsp colorant + 3 fl oz water to 1.5 gal of medium', () => {
    // DOMAIN.md §2.4 [D]; unit relations NIST Handbook 44 App. C
    const { factor, lines } = scaleRecipeToBase(
      {
        base: { name: 'medium', amount: 1, unit: 'quart' },
        additions: [
          { name: 'colorant', amount: 2, unit: 'tbsp' },
          { name: 'water', amount: 3, unit: 'floz' },
        ],
      },
      { amount: 1.5, unit: 'gallon' },
    );
    expect(factor).toBeCloseTo(6, 12);
    const [medium, colorant, water] = lines;
    expect(medium.kitchen?.text).toBe('1½ gal');
    expect(fromBase(colorant.amount, 'tbsp')).toBeCloseTo(12, 12);
    expect(fromBase(colorant.amount, 'floz')).toBeCloseTo(6, 12);
    expect(colorant.kitchen?.text).toBe('¾ cup');
    expect(colorant.amount).toBeCloseTo(177.44, 2);
    expect(fromBase(water.amount, 'floz')).toBeCloseTo(18, 12);
    expect(water.kitchen?.text).toBe('2¼ cups');
  });

  it('splits a batch of diluted glaze: 1 qt of mix, water 10 % of concentrate, 4 : 1', () => {
    // 1 : 4 paint to glazing medium is the usual starting ratio (do-it-yourself-help.com faux glaze recipe)
    const lines = mixBatch(DOME_GLAZE.recipe!, { amount: 1, unit: 'quart' }, DOME_GLAZE.dilution);
    const byName = Object.fromEntries(lines.map((l) => [l.component, l]));
    const concentrateFloz = 32 / 1.1;
    expect(fromBase(byName['medium'].amount, 'floz')).toBeCloseTo((concentrateFloz * 4) / 5, 9);
    expect(fromBase(byName['paint'].amount, 'floz')).toBeCloseTo(concentrateFloz / 5, 9);
    expect(fromBase(byName['water'].amount, 'floz')).toBeCloseTo(32 - concentrateFloz, 9);
    expect(byName['paint'].isBase).toBe(true);
    expect(byName['water'].metric).toBe('86.0 mL');
  });

  it('shows weight recipes in grams only', () => {
    const lines = mixBatch(
      {
        by: 'weight',
        baseProductId: 'lime',
        components: [
          { productId: 'lime', parts: 100 },
          { productId: 'pigment', parts: 3 },
        ],
      },
      { amount: 10.3, unit: 'kg' },
    );
    expect(lines.map((l) => [l.component, l.metric, l.kitchen])).toEqual([
      ['lime', '10.00 kg', null],
      ['pigment', '300.0 g', null],
    ]);
  });

  it.each([
    [() => mixBatch(DOME_GLAZE.recipe!, { amount: 1, unit: 'kg' }), 'batch.unit', /by volume/],
    [() => mixBatch(DOME_GLAZE.recipe!, { amount: 0, unit: 'quart' }), 'batch.amount', /greater than zero/],
    [
      () => mixBatch({ ...DOME_GLAZE.recipe!, components: [{ productId: 'paint', parts: 0 }] }, { amount: 1, unit: 'quart' }),
      'recipe.components[0].parts',
      /greater than zero/,
    ],
    [
      () => scaleRecipeToBase({ base: { name: 'm', amount: 1, unit: 'quart' }, additions: [] }, { amount: 1, unit: 'gallon' }),
      'recipe.additions',
      /empty/,
    ],
  ])('bad input %# names its field', (call, field, message) => {
    expectInputError(call, field, message);
  });
});
