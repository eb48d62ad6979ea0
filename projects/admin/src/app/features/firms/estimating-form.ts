import { FormArray, FormControl, FormGroup, Validators } from '@angular/forms';
import {
  ESTIMATING_LIMITS as L,
  ISO_WEEKDAYS,
  MONEY_AMOUNT_PATTERN,
  type EstimatingSettings,
  type NumberRange,
  type OverheadProfitMethod,
  type RoundingKind,
  type TaxMode,
} from '@layerbook/contracts/types';
import { overheadProfitEquivalents } from '@layerbook/domain';
import { inRange } from '../../shared/forms/number-range';

const num = (range: NumberRange) => new FormControl<number | null>(null, [Validators.required, ...inRange(range)]);
const money = (required = true) =>
  new FormControl<string>('', {
    nonNullable: true,
    validators: [...(required ? [Validators.required] : []), Validators.pattern(MONEY_AMOUNT_PATTERN)],
  });

/** The estimating settings as a typed form; nested group names match the API's field paths. */
export function estimatingForm() {
  return new FormGroup({
    labourRate: money(),
    materialsMarkupPercent: num(L.materialsMarkupPercent),
    overheadProfit: new FormGroup({
      method: new FormControl<OverheadProfitMethod>('margin', { nonNullable: true }),
      overheadPercent: num(L.overheadPercent),
      profitPercent: num(L.profitPercent),
    }),
    minimumCharge: money(false),
    tax: new FormGroup({
      mode: new FormControl<TaxMode>('none', { nonNullable: true }),
      ratePercent: num(L.taxRatePercent),
    }),
    rounding: new FormGroup({
      kind: new FormControl<RoundingKind>('minorUnit', { nonNullable: true }),
      increment: money(false),
    }),
    calendar: new FormGroup({
      workingWeekdays: new FormArray(ISO_WEEKDAYS.map(() => new FormControl<boolean>(false, { nonNullable: true }))),
      dayStartHour: num(L.dayStartHour),
      productiveHoursPerDay: num(L.productiveHoursPerDay),
      /** days off, YYYY-MM-DD in date order; the settings page adds and removes them one at a time */
      holidays: new FormControl<string[]>([], { nonNullable: true }),
      minimumBlockHours: num(L.minimumBlockHours),
    }),
    crewSize: num(L.crewSize),
    setupHours: num(L.setupHours),
    cleanupHours: num(L.cleanupHours),
    multipliers: new FormGroup({
      ceiling: num(L.multiplier),
      height: num(L.multiplier),
      curvedWall: num(L.multiplier),
      curvedCeiling: num(L.multiplier),
      occupied: num(L.multiplier),
    }),
    scaffoldHeight: num(L.scaffoldHeight),
    workingReach: num(L.workingReach),
    minDeductedOpeningArea: num(L.minDeductedOpeningArea),
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
      workingWeekdays: ISO_WEEKDAYS.map((day) => s.calendar.workingWeekdays.includes(day)),
      holidays: [...s.calendar.holidays].sort(),
    },
  });
}

export function readForm(form: EstimatingFormGroup): EstimatingSettings {
  const v = form.getRawValue();
  const n = (x: number | null) => x ?? 0;
  return {
    labourRate: v.labourRate.trim(),
    materialsMarkupPercent: n(v.materialsMarkupPercent),
    overheadProfit: {
      method: v.overheadProfit.method,
      overheadPercent: n(v.overheadProfit.overheadPercent),
      profitPercent: n(v.overheadProfit.profitPercent),
    },
    minimumCharge: v.minimumCharge.trim() || null,
    tax: { mode: v.tax.mode, ratePercent: n(v.tax.ratePercent) },
    rounding: v.rounding.kind === 'nearest' ? { kind: 'nearest', increment: v.rounding.increment.trim() } : { kind: 'minorUnit' },
    calendar: {
      workingWeekdays: ISO_WEEKDAYS.filter((_, i) => v.calendar.workingWeekdays[i]),
      dayStartHour: n(v.calendar.dayStartHour),
      productiveHoursPerDay: n(v.calendar.productiveHoursPerDay),
      holidays: [...v.calendar.holidays],
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
 * What the chosen method means for a price, in words: margin shows the markup on cost it comes
 * to, markup the share of the price (packages/domain computes both).
 */
export function methodInWords(method: OverheadProfitMethod, overheadPercent: number, profitPercent: number): string {
  const overhead = overheadPercent / 100;
  const profit = profitPercent / 100;
  if (method === 'margin' && overhead + profit >= 1) {
    return 'Overhead and profit must leave part of the price for the work itself.';
  }
  let equivalents: ReturnType<typeof overheadProfitEquivalents>;
  try {
    equivalents = overheadProfitEquivalents({ method, overhead, profit });
  } catch {
    // A number out of range while typing: its field says so; there is nothing to explain yet.
    return '';
  }
  const { markupOnCost, shareOfPrice } = equivalents;
  if (method === 'margin') {
    return `Price = direct cost ÷ (1 − ${overheadPercent} % − ${profitPercent} %): ${markupOnCost.times(100).toFixed(1)} % on top of cost.`;
  }
  return `Price = direct cost × (1 + ${overheadPercent} %) × (1 + ${profitPercent} %): overhead and profit are ${shareOfPrice.times(100).toFixed(1)} % of the price.`;
}
