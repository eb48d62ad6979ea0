import type { EstimatingSettings } from './estimating';

/**
 * Starting values until the firm sets its own. All illustrative — common practice, no source;
 * multipliers within DOMAIN.md §2.6's ranges. Each firm must calibrate from its own timesheets.
 */
export function defaultEstimatingSettings(units: 'imperial' | 'metric'): EstimatingSettings {
  const imperial = units === 'imperial';
  return {
    labourRate: '55.00',
    materialsMarkupPercent: 20,
    overheadProfit: { method: 'margin', overheadPercent: 20, profitPercent: 15 },
    minimumCharge: '1500.00',
    tax: { mode: 'none', ratePercent: 0 },
    rounding: { kind: 'minorUnit' },
    calendar: { workingWeekdays: [1, 2, 3, 4, 5], dayStartHour: 8, productiveHoursPerDay: 7, holidays: [], minimumBlockHours: 3 },
    crewSize: 2,
    setupHours: 4,
    cleanupHours: 2,
    multipliers: { ceiling: 1.25, height: 1.2, curvedWall: 1.15, curvedCeiling: 1.5, occupied: 1.1 },
    // 29 CFR 1926.451(g)(1): scaffold fall protection above 10 ft; 12 ft / 3.7 m is where a firm usually brings scaffold in.
    scaffoldHeight: imperial ? 12 : 3.7,
    workingReach: imperial ? 6 : 1.8,
    minDeductedOpeningArea: 0,
  };
}
