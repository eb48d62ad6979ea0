import { PRODUCTS } from '../finishes/fixtures';
import { computeEstimate } from './compute-estimate';
import type { EstimateInput } from './estimate-input';
import { ASK_FOR_YEAR } from './lead-status';

/** One primed wall, 12 ft long and 10 ft high; rates are illustrative (common practice, no source). */
function wall(yearBuilt: number | undefined, disturbedPaintedArea: number | undefined): EstimateInput {
  return {
    startDate: '2026-12-07',
    property: { ...(yearBuilt !== undefined ? { yearBuilt } : {}), isOccupied: false },
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
      setupHours: 1,
      cleanupHours: 1,
      multipliers: { ceiling: 1.5, curvedWall: 1.15, curvedCeiling: 1.25, height: 1.2, occupied: 1.1 },
      scaffoldHeight: 14,
      workingReach: 12,
    },
    products: PRODUCTS,
    finishSystems: [
      {
        id: 'primed',
        name: 'Primed',
        layers: [
          {
            id: 'primer',
            name: 'Primer',
            method: 'roll',
            productId: 'primer',
            coverage: { kind: 'spreadRate', surfacePerUnit: 350, unit: 'gallon', lengthUnit: 'ft' },
            coats: 1,
            waste: 0.1,
            productionRate: { surfacePerHour: 250, lengthUnit: 'ft' },
            waitHoursAfter: 0,
          },
        ],
      },
    ],
    rooms: [
      {
        id: 'hall',
        name: 'Hall',
        surfaces: [
          {
            id: 'w',
            name: 'Wall',
            finishSystemId: 'primed',
            shape: { kind: 'walls', perimeter: 12, height: 10, openings: [] },
            ...(disturbedPaintedArea !== undefined ? { disturbedPaintedArea } : {}),
          },
        ],
      },
    ],
  };
}

const leadBullets = (input: EstimateInput) => computeEstimate(input).cautions.find((c) => c.id === 'lead-safe-work')?.bullets ?? null;

describe('computeEstimate: lead-safe work when the year built is not known (40 CFR 745)', () => {
  it.each([
    // 40 CFR 745.83: more than 6 ft² disturbed in a room is past the minor-repair limit
    ['known, before 1978', 1950, 40, 'target-housing', true, false],
    ['known, 1978 or later', 1990, 40, 'built-1978-or-later', false, false],
    // common practice, no source: an unknown year with paint disturbed is treated as before 1978 and asks for the year
    ['unknown, paint disturbed', undefined, 40, 'assumed-target-housing', true, true],
    ['unknown, under the minor-repair limit', undefined, 4, 'assumed-target-housing', false, false],
    ['unknown, nothing disturbed', undefined, undefined, 'year-unknown', false, false],
  ] as const)('%s: %s', (_, year, disturbed, status, hasCaution, asksForYear) => {
    const input = wall(year, disturbed);
    expect(computeEstimate(input).lead).toBe(status);
    const bullets = leadBullets(input);
    expect(bullets !== null).toBe(hasCaution);
    expect(bullets?.[0] === ASK_FOR_YEAR).toBe(asksForYear);
  });
});
