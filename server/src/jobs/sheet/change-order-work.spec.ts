import type { EstimateResultJson } from '@layerbook/domain';
import { type ChangeOrderCrewPart, withChangeWork } from './change-order-work';
import type { StoredCaution } from './sheet-cautions';

type Surface = EstimateResultJson['surfaces'][number];

const surface = (measure: Partial<Surface['measure']>): Surface => ({
  roomId: 'r-1',
  surfaceId: 's-9',
  name: 'Vault',
  finishSystemId: 'f-2',
  measure: {
    measure: 'area',
    quantity: 10,
    gross: 12,
    deductions: 2,
    formula: '',
    isCeiling: true,
    isCurved: true,
    topHeight: 3,
    ...measure,
  },
  layers: [],
});

const caution = (id: string, bullets: string[]): StoredCaution => ({ id, title: id, bullets, rule: '' });

const part = (over: Partial<ChangeOrderCrewPart>): ChangeOrderCrewPart => ({
  lengthUnit: 'ft',
  surfaces: [surface({})],
  cautions: [],
  finishSystems: [{ id: 'f-2', name: 'Glaze', layers: [] }],
  products: [{ id: 'p-2', name: 'Glaze', unit: 'L', hazards: {} }],
  ...over,
});

const sold = {
  library: {
    finishSystems: [{ id: 'f-1', name: 'Lime', layers: [] }],
    products: [{ id: 'p-1', name: 'Lime', unit: 'kg' as const, hazards: {} }],
  },
  cautions: [caution('lime-alkali', ['Wear eye protection.'])],
};

describe('withChangeWork', () => {
  it('adds each approved change order’s surfaces, finish and products; one priced before crew parts adds none', () => {
    const merged = withChangeWork(
      sold,
      [
        { number: 1, crew: null },
        { number: 2, crew: part({}) },
      ],
      'ft',
    );
    expect(merged.added.map((a) => [a.changeOrder, a.surface.name, a.surface.measure.quantity])).toEqual([[2, 'Vault', 10]]);
    expect(merged.library.finishSystems.map((f) => f.id)).toEqual(['f-1', 'f-2']);
    expect(merged.library.products.map((p) => p.id)).toEqual(['p-1', 'p-2']);
  });

  it('gives the sizes in the sheet’s unit', () => {
    const merged = withChangeWork(sold, [{ number: 3, crew: part({ lengthUnit: 'm' }) }], 'ft');
    const m = merged.added[0].surface.measure;
    // 1 ft = 0.3048 m exactly (NIST SP 811 App. B.8): 10 m² = 10 ÷ 0.3048² ft², 3 m = 3 ÷ 0.3048 ft
    expect(m.quantity).toBeCloseTo(10 / 0.3048 ** 2, 6);
    expect(m.gross).toBeCloseTo(12 / 0.3048 ** 2, 6);
    expect(m.topHeight).toBeCloseTo(3 / 0.3048, 6);
  });

  it('a caution the sold work raised gains the change order’s other lines; a new kind is added', () => {
    const merged = withChangeWork(
      sold,
      [
        {
          number: 4,
          crew: part({
            cautions: [
              caution('lime-alkali', ['Wear eye protection.', 'Keep water for rinsing.']),
              caution('scaffold-fall-protection', ['Guardrails.']),
            ],
          }),
        },
      ],
      'ft',
    );
    expect(merged.cautions.map((c) => [c.id, c.bullets])).toEqual([
      ['lime-alkali', ['Wear eye protection.', 'Keep water for rinsing.']],
      ['scaffold-fall-protection', ['Guardrails.']],
    ]);
  });
});
