import { clientFinishSteps, type DescribedLayer } from '@layerbook/domain';
import { clientFinishStepsIn } from './step-words';

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

const cases: [string, DescribedLayer][] = [
  ['one product, one coat', primer],
  ['a mix over part of the surface', glaze],
  ['no product, many coats', { ...primer, products: [], method: 'burnish', coats: 5 }],
  ['three coats in words', { ...primer, coats: 3 }],
  ['no coats', { ...primer, coats: 0 }],
  ['a method with no words of its own', { ...primer, method: 'sponge' }],
  ['full coverage says nothing of it', { ...primer, coverageShare: 1 }],
  ...['brush', 'spray', 'trowel', 'wax', 'sand', 'stencil', 'other'].map((method): [string, DescribedLayer] => [
    method,
    { ...primer, method },
  ]),
];

describe('finish steps in the client’s language (server catalog, samples.steps)', () => {
  it.each(cases)('English says exactly what the domain says: %s', (_name, layer) => {
    expect(clientFinishStepsIn([layer], 'en')).toEqual(clientFinishSteps([layer]));
  });

  // Spanish wording is our own, Latin-American/US site usage (docs/i18n-glossary.md: mano = coat,
  // rodillo, brocha, pistola, llana, veladura); common usage, no source.
  it.each<[string, DescribedLayer, string]>([
    ['one product, one coat', primer, '1. Primer: Acrylic primer, con rodillo, una mano.'],
    [
      'a mix over part of the surface',
      glaze,
      '2. Glaze: una mezcla de Umber tint y Glazing medium, en veladura, dos manos, en cerca del 40 % de la superficie.',
    ],
    ['no product, many coats', { ...primer, products: [], method: 'burnish', coats: 5 }, '1. Primer: bruñido, 5 manos.'],
    ['three coats', { ...primer, method: 'trowel', coats: 3 }, '1. Primer: Acrylic primer, con llana, tres manos.'],
    ['a method with no words of its own', { ...primer, method: 'sponge' }, '1. Primer: Acrylic primer, aplicado, una mano.'],
  ])('Spanish: %s', (_name, layer, expected) => {
    expect(clientFinishStepsIn([layer], 'es')).toEqual([expected]);
  });

  it('keeps what the firm typed as typed and the layers in order', () => {
    const steps = clientFinishStepsIn([{ ...primer, name: 'Fondo de cal' }, glaze], 'es');
    expect(steps[0]).toBe('1. Fondo de cal: Acrylic primer, con rodillo, una mano.');
    expect(steps[1].startsWith('2. Glaze:')).toBe(true);
    expect(clientFinishStepsIn([], 'es')).toEqual([]);
  });
});
