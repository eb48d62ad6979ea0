import { describe, expect, it } from 'vitest';
import { estimatingForm, fillForm, methodInWords, readForm } from './estimating-form';
import type { EstimatingSettings } from '@layerbook/contracts/types';

/** Settings to fill the form with in specs (the contract's starting values for an imperial firm). */
const defaultSettings: EstimatingSettings = {
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
  scaffoldHeight: 12,
  workingReach: 6,
  minDeductedOpeningArea: 0,
};

describe('methodInWords', () => {
  it.each([
    ['margin', 20, 15, 'Price = direct cost ÷ (1 − 20 % − 15 %): 53.8 % on top of cost.'],
    ['markup', 20, 15, 'Price = direct cost × (1 + 20 %) × (1 + 15 %): overhead and profit are 27.5 % of the price.'],
    ['margin', 60, 40, 'Overhead and profit must leave part of the price for the work itself.'],
    ['markup', 250, 300, 'Price = direct cost × (1 + 250 %) × (1 + 300 %): overhead and profit are 92.9 % of the price.'],
    ['markup', -5, 10, ''],
  ] as const)('says what %s with %s % overhead and %s % profit means', (method, overhead, profit, words) => {
    expect(methodInWords(method, overhead, profit)).toBe(words);
  });
});

describe('fillForm and readForm', () => {
  it('give back the settings they were given', () => {
    const form = estimatingForm();
    fillForm(form, defaultSettings);
    expect(readForm(form)).toEqual(defaultSettings);
    expect(form.valid).toBe(true);
  });

  it('read rounding to the nearest amount, days off and a missing minimum charge', () => {
    const form = estimatingForm();
    fillForm(form, { ...defaultSettings, minimumCharge: null, rounding: { kind: 'nearest', increment: '5.00' } });
    form.controls.calendar.controls.holidays.setValue(['2026-12-25', '2026-12-26', '2027-01-01']);
    const read = readForm(form);
    expect(read.minimumCharge).toBeNull();
    expect(read.rounding).toEqual({ kind: 'nearest', increment: '5.00' });
    expect(read.calendar.holidays).toEqual(['2026-12-25', '2026-12-26', '2027-01-01']);
  });

  it.each([
    ['no productive hours', 'productiveHoursPerDay', 0],
    ['a multiplier under 1', 'ceiling', 0.9],
    ['too big a crew', 'crewSize', 31],
  ] as const)('refuses %s, as the API would', (_case, field, value) => {
    const form = estimatingForm();
    fillForm(form, defaultSettings);
    const control =
      field === 'productiveHoursPerDay'
        ? form.controls.calendar.controls.productiveHoursPerDay
        : field === 'ceiling'
          ? form.controls.multipliers.controls.ceiling
          : form.controls.crewSize;
    control.setValue(value);
    expect(control.valid).toBe(false);
  });
});
