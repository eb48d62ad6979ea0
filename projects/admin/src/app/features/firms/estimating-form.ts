import { FormArray, FormControl, FormGroup, Validators } from '@angular/forms';
import type { EstimatingSettings } from '@layerbook/contracts';

const num = (min: number, max: number, required = true) =>
  new FormControl<number | null>(null, [...(required ? [Validators.required] : []), Validators.min(min), Validators.max(max)]);
const money = (required = true) =>
  new FormControl<string>('', { nonNullable: true, validators: [...(required ? [Validators.required] : []), Validators.pattern(/^\d{1,12}(\.\d{1,2})?$/)] });

export const WEEKDAYS = [
  { value: 1, label: 'Mon' },
  { value: 2, label: 'Tue' },
  { value: 3, label: 'Wed' },
  { value: 4, label: 'Thu' },
  { value: 5, label: 'Fri' },
  { value: 6, label: 'Sat' },
  { value: 7, label: 'Sun' },
] as const;

/** The estimating settings as a typed form; nested group names match the API's field paths. */
export function estimatingForm() {
  return new FormGroup({
    labourRate: money(),
    materialsMarkupPercent: num(0, 500),
    overheadProfit: new FormGroup({
      method: new FormControl<'margin' | 'markup'>('margin', { nonNullable: true }),
      overheadPercent: num(0, 100),
      profitPercent: num(0, 100),
    }),
    minimumCharge: money(false),
    tax: new FormGroup({
      mode: new FormControl<'none' | 'materials' | 'wholeJob'>('none', { nonNullable: true }),
      ratePercent: num(0, 50),
    }),
    rounding: new FormGroup({
      kind: new FormControl<'minorUnit' | 'nearest'>('minorUnit', { nonNullable: true }),
      increment: money(false),
    }),
    calendar: new FormGroup({
      workingWeekdays: new FormArray(WEEKDAYS.map(() => new FormControl<boolean>(false, { nonNullable: true }))),
      dayStartHour: num(0, 23),
      productiveHoursPerDay: num(0.5, 16),
      holidays: new FormControl<string>('', { nonNullable: true }),
      minimumBlockHours: num(0, 16),
    }),
    crewSize: num(1, 30),
    setupHours: num(0, 200),
    cleanupHours: num(0, 200),
    multipliers: new FormGroup({
      ceiling: num(1, 3),
      height: num(1, 3),
      curvedWall: num(1, 3),
      curvedCeiling: num(1, 3),
      occupied: num(1, 3),
    }),
    scaffoldHeight: num(0.1, 200),
    workingReach: num(0, 20),
    minDeductedOpeningArea: num(0, 1000),
  });
}

export type EstimatingFormGroup = ReturnType<typeof estimatingForm>;

export function fillForm(form: EstimatingFormGroup, s: EstimatingSettings): void {
  form.reset({
    ...s,
    minimumCharge: s.minimumCharge ?? '',
    rounding: { kind: s.rounding.kind, increment: s.rounding.kind === 'nearest' ? s.rounding.increment : '' },
    calendar: {
      ...s.calendar,
      workingWeekdays: WEEKDAYS.map((d) => s.calendar.workingWeekdays.includes(d.value)),
      holidays: s.calendar.holidays.join('\n'),
    },
  });
}

export function readForm(form: EstimatingFormGroup): EstimatingSettings {
  const v = form.getRawValue();
  const n = (x: number | null) => x ?? 0;
  return {
    labourRate: v.labourRate.trim(),
    materialsMarkupPercent: n(v.materialsMarkupPercent),
    overheadProfit: { method: v.overheadProfit.method, overheadPercent: n(v.overheadProfit.overheadPercent), profitPercent: n(v.overheadProfit.profitPercent) },
    minimumCharge: v.minimumCharge.trim() || null,
    tax: { mode: v.tax.mode, ratePercent: n(v.tax.ratePercent) },
    rounding: v.rounding.kind === 'nearest' ? { kind: 'nearest', increment: v.rounding.increment.trim() } : { kind: 'minorUnit' },
    calendar: {
      workingWeekdays: WEEKDAYS.filter((_, i) => v.calendar.workingWeekdays[i]).map((d) => d.value),
      dayStartHour: n(v.calendar.dayStartHour),
      productiveHoursPerDay: n(v.calendar.productiveHoursPerDay),
      holidays: v.calendar.holidays.split(/[\s,]+/).filter(Boolean),
      minimumBlockHours: n(v.calendar.minimumBlockHours),
    },
    crewSize: n(v.crewSize),
    setupHours: n(v.setupHours),
    cleanupHours: n(v.cleanupHours),
    multipliers: {
      ceiling: n(v.multipliers.ceiling),
      height: n(v.multipliers.height),
      curvedWall: n(v.multipliers.curvedWall),
      curvedCeiling: n(v.multipliers.curvedCeiling),
      occupied: n(v.multipliers.occupied),
    },
    scaffoldHeight: n(v.scaffoldHeight),
    workingReach: n(v.workingReach),
    minDeductedOpeningArea: n(v.minDeductedOpeningArea),
  };
}

/**
 * What the chosen method means for a price, in words (numbers only for display, not money):
 * margin: price = direct ÷ (1 − OH − P); markup: price = direct × (1 + OH) × (1 + P). DOMAIN.md §2.8.
 */
export function methodInWords(method: 'margin' | 'markup', overheadPercent: number, profitPercent: number): string {
  const oh = overheadPercent / 100;
  const p = profitPercent / 100;
  if (method === 'margin') {
    const left = 1 - oh - p;
    if (left <= 0) return 'Overhead and profit must leave part of the price for the work itself.';
    const markup = (1 / left - 1) * 100;
    return `Price = direct cost ÷ (1 − ${overheadPercent} % − ${profitPercent} %): ${markup.toFixed(1)} % on top of cost.`;
  }
  const factor = (1 + oh) * (1 + p);
  const margin = (1 - 1 / factor) * 100;
  return `Price = direct cost × (1 + ${overheadPercent} %) × (1 + ${profitPercent} %): overhead and profit are ${margin.toFixed(1)} % of the price.`;
}
