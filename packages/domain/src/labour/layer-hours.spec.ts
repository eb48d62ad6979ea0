import { expectInputError } from '../errors/expect-input-error';
import type { FinishLayer } from '../finishes/finish-system';
import { DOME_GLAZE, PRIMER } from '../finishes/fixtures';
import { crewTime, layerHours } from './layer-hours';

// DOMAIN.md §2.6 [D] (illustrative rates; multipliers common practice, no source)
const WALLS = { quantity: 2 * Math.PI * 9 * 10 - 61, measure: 'area', unit: 'ft' } as const;
const DOME = { quantity: 90 * Math.PI, measure: 'area', unit: 'ft' } as const;
const wallConditions = { isCeiling: false, isCurved: true, topHeight: 10, isOccupied: false, scaffoldHeight: 12 };
const domeConditions = { isCeiling: true, isCurved: true, topHeight: null, isOccupied: false, scaffoldHeight: 12 };
const firm = { ceiling: 1.5, curvedWall: 1.15, curvedCeiling: 1.25, height: 1.2, occupied: 1.1 };
const layer = (id: string, rate: number): FinishLayer => ({ ...PRIMER, id, productionRate: { surfacePerHour: rate, lengthUnit: 'ft' } });

describe('labour hours per layer', () => {
  it('round-room walls at roll 250, trowel 60, burnish 40, wax 80 with curved ×1.15: 33.75 h', () => {
    const hours = [layer('roll', 250), layer('trowel', 60), layer('burnish', 40), layer('wax', 80)].map(
      (l) => layerHours(WALLS, l, wallConditions, firm).hours,
    );
    expect(hours.map((h) => h.toFixed(2))).toEqual(['2.32', '9.67', '14.50', '7.25']);
    expect(hours.reduce((a, b) => a + b, 0)).toBeCloseTo(33.75, 2);
  });

  it('dome: ceiling 1.5 × curved 1.25 = 1.875; base 2.65 h + glaze 1.59 h = 4.24 h', () => {
    const base = layerHours(DOME, layer('base', 200), domeConditions, firm);
    const glaze = layerHours(DOME, DOME_GLAZE, domeConditions, firm);
    expect(base.chain).toEqual([
      { name: 'ceiling', factor: 1.5 },
      { name: 'curvedCeiling', factor: 1.25 },
    ]);
    expect(base.hours).toBeCloseTo(2.65, 2);
    expect(glaze.baseHours).toBeCloseTo(84.82 / 100, 4);
    expect(glaze.hours).toBeCloseTo(1.59, 2);
    expect(base.hours + glaze.hours).toBeCloseTo(4.24, 2);
  });

  it('applies height and occupied once each; a layer override wins over the firm default', () => {
    const high = { ...wallConditions, topHeight: 14, isOccupied: true, isCurved: false };
    const h = layerHours({ quantity: 100, measure: 'area', unit: 'ft' }, { ...layer('x', 100), multipliers: { height: 1.3 } }, high, firm);
    expect(h.chain).toEqual([
      { name: 'height', factor: 1.3 },
      { name: 'occupied', factor: 1.1 },
    ]);
    expect(h.hours).toBeCloseTo(1.43, 12);
  });

  it('layers total 37.99 h; with 4 h setup and 2 h clean-up, 43.99 crew-hours', () => {
    const total = 33.7457 + 4.2411;
    const t = crewTime(total, 4, 2, 2, 7);
    expect(t.totalCrewHours.toFixed(2)).toBe('43.99');
    expect(t.crewDays).toBeCloseTo(43.9868 / 14, 3);
  });

  it.each([
    [() => layerHours(WALLS, layer('x', 0), wallConditions, firm), 'layer.productionRate.surfacePerHour', /greater than zero/],
    [
      () => layerHours(WALLS, { ...layer('x', 10), multipliers: { curvedWall: -1 } }, wallConditions, firm),
      'layer.multipliers.curvedWall',
      /greater than zero/,
    ],
    [() => crewTime(10, 1, 1, 0, 7), 'settings.crewSize', /at least 1/],
    [() => crewTime(10, -1, 1, 2, 7), 'settings.setupHours', /negative/],
  ])('bad input %# names its field', (call, field, message) => {
    expectInputError(call, field, message);
  });
});
