import { clientFinishSteps, crewLayerNote, type DescribedLayer } from './finish-steps';

const primer: DescribedLayer = {
  position: 1,
  name: 'Primer',
  method: 'roll',
  coats: 1,
  products: [{ name: 'Acrylic primer' }],
  waitHoursAfter: 4,
};
const glaze: DescribedLayer = {
  position: 2,
  name: 'Glaze',
  method: 'glaze',
  coats: 2,
  products: [
    { name: 'Umber tint', parts: 1 },
    { name: 'Glazing medium', parts: 4 },
  ],
  mixBy: 'volume',
  coverageShare: 0.4,
  dilution: { share: 0.2 },
  waitHoursAfter: 0,
};

// Wording is our own (common practice, no source): what goes on, how, how many coats.
describe('finish steps as the client reads them', () => {
  it.each<[string, DescribedLayer, string]>([
    ['one product, one coat', primer, '1. Primer: Acrylic primer, rolled on, one coat.'],
    [
      'a mix over part of the surface',
      glaze,
      '2. Glaze: a mix of Umber tint and Glazing medium, glazed, two coats, over about 40 % of the surface.',
    ],
    ['no product, many coats', { ...primer, products: [], method: 'burnish', coats: 5 }, '1. Primer: burnished, 5 coats.'],
    ['three coats in words', { ...primer, coats: 3 }, '1. Primer: Acrylic primer, rolled on, three coats.'],
    ['a method we have no words for', { ...primer, method: 'sponge' }, '1. Primer: Acrylic primer, applied, one coat.'],
    ['full coverage says nothing of it', { ...primer, coverageShare: 1 }, '1. Primer: Acrylic primer, rolled on, one coat.'],
  ])('%s', (_name, layer, expected) => {
    expect(clientFinishSteps([layer])).toEqual([expected]);
  });

  it('keeps the layers in the order given, and says nothing for no layers', () => {
    expect(clientFinishSteps([primer, glaze]).map((s) => s.slice(0, 2))).toEqual(['1.', '2.']);
    expect(clientFinishSteps([])).toEqual([]);
  });
});

describe('a layer as the crew read it', () => {
  it.each<[string, DescribedLayer, string]>([
    ['one product, with a wait', primer, 'Acrylic primer; roll, 1 coat; wait 4 h before the next layer'],
    [
      'a mix in parts, partial, thinned',
      glaze,
      'Mix by volume: 1 part Umber tint, 4 parts Glazing medium; glaze, 2 coats; over 40 % of the surface; thinned 20 %',
    ],
    [
      'a mix by weight with a part count left out (one part)',
      {
        ...glaze,
        mixBy: 'weight',
        products: [{ name: 'Lime putty' }, { name: 'Marble dust', parts: 2 }],
        coverageShare: undefined,
        dilution: undefined,
      },
      'Mix by weight: 1 part Lime putty, 2 parts Marble dust; glaze, 2 coats',
    ],
    ['no product', { ...primer, products: [], waitHoursAfter: 0 }, 'roll, 1 coat'],
  ])('%s', (_name, layer, expected) => {
    expect(crewLayerNote(layer)).toBe(expected);
  });
});
