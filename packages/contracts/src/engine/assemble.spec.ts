import { computeEstimate } from '@layerbook/domain';
import type { SurfaceShape } from '@layerbook/domain';
import { defaultEstimatingSettings } from '../firms/estimating-defaults';
import type { EstimateInputs } from '../proposals/estimate-types';
import { assembleEstimateInput } from './assemble';
import type { EstimateContext } from './context';

/**
 * A stair hall with 17 ft walls and a flat ceiling measured without its elevation; only the
 * ceiling is finished. Default settings: height allowance above 12 ft, 6 ft working reach.
 */
function stairHall(ceiling: SurfaceShape, wallHeight: number | null = 17): EstimateContext {
  const surfaces = [
    ...(wallHeight === null
      ? []
      : [
          {
            id: 'walls',
            name: 'Walls',
            shape: { kind: 'walls', perimeter: 44, height: wallHeight } as SurfaceShape,
            disturbedPaintedArea: null,
          },
        ]),
    { id: 'ceiling', name: 'Ceiling', shape: ceiling, disturbedPaintedArea: null },
  ];
  return {
    settings: defaultEstimatingSettings('imperial'),
    lengthUnit: 'ft',
    currency: 'USD',
    yearBuilt: 1990,
    rooms: [{ id: 'hall', name: 'Stair hall', isExterior: false, surfaces }],
    products: [{ id: 'glaze', name: 'Glaze', unit: 'quart', containers: [{ label: '1 qt', size: 1, unit: 'quart', price: '22.00' }] }],
    finishSystems: [
      {
        id: 'glazed',
        name: 'Glazed ceiling',
        layers: [
          {
            id: 'glaze',
            name: 'Glaze',
            method: 'glaze',
            productId: 'glaze',
            coats: 1,
            waste: 0.1,
            waitHoursAfter: 0,
            coverage: { kind: 'spreadRate', surfacePerUnit: 100, unit: 'quart', lengthUnit: 'ft' },
            productionRate: { surfacePerHour: 40, lengthUnit: 'ft' },
          },
        ],
      },
    ],
  };
}

const ceilingOnly: EstimateInputs = {
  title: 'Stair hall ceiling',
  startDate: '2026-12-07',
  isOccupied: false,
  variants: [{ id: 'A', label: 'Ceiling only', surfaces: [{ surfaceId: 'ceiling', finishSystemId: 'glazed' }] }],
  addOns: [],
  equipment: [],
  subcontracts: [],
  sundries: [],
  discount: null,
  perAreaRates: {},
};

const flat: SurfaceShape = { kind: 'ceilingRect', length: 10, width: 12 };

describe('assembleEstimateInput: a ceiling without its elevation', () => {
  it('starts at the room wall height, so the height allowance and fall-protection cautions apply', () => {
    const input = assembleEstimateInput(stairHall(flat), ceilingOnly, 'A');
    expect(input.rooms[0].surfaces.map((s) => s.id)).toEqual(['ceiling']);
    expect(input.rooms[0].surfaces[0].shape).toEqual({ ...flat, elevation: 17 });
    const e = computeEstimate(input);
    // top of work 17 ft > the 12 ft scaffold height setting (common practice, no source)
    expect(e.surfaces[0].layers[0].labour.chain.map((m) => m.name)).toEqual(['ceiling', 'height']);
    // working level 17 − 6 ft reach = 11 ft: above 10 ft (29 CFR 1926.451(g)(1)) and 6 ft or more (29 CFR 1926.501(b)(1))
    expect(e.cautions.map((c) => c.id)).toEqual(expect.arrayContaining(['scaffold-fall-protection', 'edge-fall-protection']));
  });

  it.each<[string, SurfaceShape, number | null, string[]]>([
    ['an elevation typed in wins', { ...flat, elevation: 8 }, 17, ['ceiling']],
    ['a low room needs no allowance', flat, 8, ['ceiling']],
    ['a room with no walls measured stays unknown', flat, null, ['ceiling']],
  ])('%s', (_case, ceiling, wallHeight, chain) => {
    const e = computeEstimate(assembleEstimateInput(stairHall(ceiling, wallHeight), ceilingOnly, 'A'));
    expect(e.surfaces[0].layers[0].labour.chain.map((m) => m.name)).toEqual(chain);
    expect(e.cautions.map((c) => c.id)).not.toContain('scaffold-fall-protection');
  });
});
