import { expectInputError } from '../errors/expect-input-error';
import { DOME_GLAZE, PRODUCTS } from '../finishes/fixtures';
import type { FinishLayer } from '../finishes/finish-system';
import { fromBase } from '../units/quantity-unit';
import { computeEstimate } from './compute-estimate';
import type { EstimateInput } from './estimate-input';

/**
 * The round dining room of DOMAIN.md §2.2–2.8 [D] end to end. Rates are illustrative
 * (common practice, no source); formulas as named in the geometry, labour and pricing specs.
 */
const spread = (surfacePerUnit: number, unit: 'gallon' | 'L', lengthUnit: 'ft' | 'm') =>
  ({ kind: 'spreadRate', surfacePerUnit, unit, lengthUnit }) as const;
const kgPerM2 = (unitPerSurface: number) => ({ kind: 'consumption', unitPerSurface, unit: 'kg', lengthUnit: 'm' }) as const;
const rate = (surfacePerHour: number) => ({ surfacePerHour, lengthUnit: 'ft' }) as const;
const layer = (l: Omit<FinishLayer, 'coats' | 'waste'> & Partial<FinishLayer>): FinishLayer => ({ coats: 1, waste: 0.1, ...l });

const DINING_ROOM: EstimateInput = {
  startDate: '2025-06-05',
  property: { yearBuilt: 1950, isOccupied: false },
  settings: {
    currency: 'USD',
    lengthUnit: 'ft',
    minDeductedOpeningArea: 0,
    labourRate: '45.00',
    materialsMarkup: 0,
    overheadProfit: { method: 'margin', overhead: 0.2, profit: 0.15 },
    tax: { mode: 'none', rate: 0 },
    rounding: { kind: 'minorUnit' },
    calendar: { workingWeekdays: [1, 2, 3, 4, 5], dayStartHour: 8, productiveHoursPerDay: 7, minimumBlockHours: 3 },
    crewSize: 2,
    setupHours: 4,
    cleanupHours: 2,
    multipliers: { ceiling: 1.5, curvedWall: 1.15, curvedCeiling: 1.25, height: 1.2, occupied: 1.1 },
    scaffoldHeight: 14,
    workingReach: 6,
  },
  products: PRODUCTS,
  finishSystems: [
    {
      id: 'venetian',
      name: 'Lime Venetian, waxed',
      layers: [
        layer({
          id: 'primer',
          name: 'Primer',
          method: 'roll',
          productId: 'primer',
          coverage: spread(350, 'gallon', 'ft'),
          productionRate: rate(250),
          waitHoursAfter: 4,
        }),
        layer({
          id: 'coat1',
          name: 'Plaster coat 1',
          method: 'trowel',
          productId: 'lime',
          coverage: kgPerM2(0.5),
          productionRate: rate(60),
          waitHoursAfter: 16,
        }),
        layer({
          id: 'coat2',
          name: 'Plaster coat 2 and burnish',
          method: 'burnish',
          productId: 'lime',
          coverage: kgPerM2(0.3),
          productionRate: rate(40),
          waitHoursAfter: 24,
        }),
        layer({
          id: 'wax',
          name: 'Wax and buff',
          method: 'wax',
          productId: 'wax',
          coverage: spread(50, 'L', 'm'),
          productionRate: rate(80),
          waitHoursAfter: 0,
        }),
      ],
    },
    {
      id: 'glazedDome',
      name: 'Base and antiquing glaze',
      layers: [
        layer({
          id: 'domeBase',
          name: 'Dome base coat',
          method: 'roll',
          productId: 'primer',
          coverage: spread(350, 'gallon', 'ft'),
          productionRate: rate(200),
          waitHoursAfter: 4,
        }),
        DOME_GLAZE,
      ],
    },
  ],
  rooms: [
    {
      id: 'dining',
      name: 'Dining room',
      surfaces: [
        {
          id: 'walls',
          name: 'Walls',
          finishSystemId: 'venetian',
          shape: {
            kind: 'roundWalls',
            radius: 9,
            height: 10,
            openings: [
              { width: 3, height: 7 },
              { width: 4, height: 5, count: 2 },
            ],
          },
        },
        { id: 'dome', name: 'Dome', finishSystemId: 'glazedDome', shape: { kind: 'sphericalCap', baseRadius: 9, rise: 3, elevation: 10 } },
      ],
    },
  ],
  perAreaRates: { venetian: '6.00', glazedDome: '3.00' },
  options: [{ id: 'crown', label: 'Glazed crown, 56.55 LF', labourHours: 6, materialsCost: '40.00' }],
};

/** A deep copy to break; the job is plain JSON data. */
const copyJob = (): EstimateInput => JSON.parse(JSON.stringify(DINING_ROOM)) as EstimateInput;

describe('computeEstimate: the round dining room', () => {
  const e = computeEstimate(DINING_ROOM);

  it('measures the surfaces', () => {
    expect(e.surfaces.map((s) => Number(s.measure.quantity.toFixed(2)))).toEqual([504.49, 282.74]);
    expect(e.totals.area).toBeCloseTo(787.23, 2);
  });

  it('totals each product across the job before choosing containers', () => {
    const byId = Object.fromEntries(e.products.map((p) => [p.productId, p]));
    expect(byId['lime'].needInUnit).toBeCloseTo(41.244, 3);
    expect(byId['lime'].pack.totalCost.toFixed(2)).toBe('218.00');
    // walls 1.5855 gal + dome 282.74 / 350 × 1.1 = 0.8886 gal = 2.4742 gal → 2 gal + 2 qt ($122) beats 3 gal ($135)
    expect(byId['primer'].needInUnit).toBeCloseTo(2.4742, 4);
    expect(byId['primer'].pack.lines.map((l) => `${l.count}×${l.label}`)).toEqual(['2×1 gal', '2×1 qt']);
    expect(fromBase(byId['medium'].need, 'floz')).toBeCloseTo(22.702, 3);
    expect(e.totals.materialsCost.toFixed(2)).toBe('440.00');
  });

  it('shows labour with its multiplier chain: 43.99 crew-hours', () => {
    const dome = e.surfaces[1].layers[0].labour;
    expect(dome.chain.map((m) => `${m.name}×${m.factor}`)).toEqual(['ceiling×1.5', 'curvedCeiling×1.25']);
    expect(e.labour.layerHours).toBeCloseTo(37.99, 2);
    expect(e.labour.totalCrewHours.toFixed(2)).toBe('43.99');
  });

  it('schedules the job over five working days', () => {
    expect(e.schedule.days.map((d) => d.date)).toEqual(['2025-06-05', '2025-06-06', '2025-06-09', '2025-06-10', '2025-06-11']);
    expect(e.schedule.milestones.at(-1)).toEqual(expect.objectContaining({ id: 'job', date: '2025-06-11' }));
  });

  it('prices by margin and shows the per-area check beside it', () => {
    // (43.99 × 45 + 440) / (1 − 0.20 − 0.15)
    expect(e.price.direct.toFixed(2)).toBe('2419.55');
    expect(e.price.price.toFixed(2)).toBe('3722.38');
    expect(e.perAreaCheck?.total.toFixed(2)).toBe('3875.16');
    // option: (6 × 45 + 40) / 0.65
    expect(e.options[0].price.price.toFixed(2)).toBe('476.92');
  });

  it('raises the cautions the facts call for', () => {
    // dome top 13 ft − 6 ft reach = 7 ft standing level (29 CFR 1926.501(b)(1)); lime (ICSC 0408)
    expect(e.cautions.map((c) => c.id)).toEqual(['edge-fall-protection', 'lime-alkali']);
  });

  it("passes the firm's country to the cautions: outside the US they point to national or provincial rules", () => {
    const abroad = computeEstimate({ ...copyJob(), firmCountry: 'CA' });
    expect(abroad.cautions.map((c) => c.jurisdiction)).toEqual([
      'A US federal rule. Outside the US, check your national or provincial rules.',
      'Guidance, not a regulation. Outside the US, check your national or provincial rules.',
    ]);
    expect(e.cautions[0]?.jurisdiction).toBe('A US federal rule.');
  });

  it('refuses a job measuring more than one estimate takes, before choosing containers or planning days', () => {
    // a wall typed three zeros too long: 2π × 9 ft × 10,000 ft ≈ 565,487 ft² of walls, past the 500,000 ft² limit
    const huge = copyJob();
    huge.rooms[0].surfaces[0].shape = { kind: 'roundWalls', radius: 9, height: 10_000, openings: [] };
    expectInputError(() => computeEstimate(huge), 'rooms', /more than the 500,000 ft² one estimate takes/);
  });

  it('names the field of a bad input deep in the job', () => {
    const bad = copyJob();
    bad.rooms[0].surfaces[1].shape = { kind: 'sphericalCap', baseRadius: 9, rise: 12 };
    expectInputError(() => computeEstimate(bad), 'rooms[0].surfaces[1].shape.rise', /more than the base radius/);
    const noSystem = { ...DINING_ROOM, finishSystems: [{ id: 'venetian', name: 'x', layers: [] }] };
    expectInputError(() => computeEstimate(noSystem), 'finishSystems[0].layers', /empty/);
    const unknown = copyJob();
    unknown.rooms[0].surfaces[0].finishSystemId = 'nope';
    expectInputError(() => computeEstimate(unknown), 'rooms[0].surfaces[0].finishSystemId');
    expectInputError(() => computeEstimate({ ...DINING_ROOM, rooms: [] }), 'rooms', /empty/);
  });
});
