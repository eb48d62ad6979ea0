/**
 * How a firm prices and schedules work, without zod: the choices with their words, each number's
 * allowed range, and what GET/PUT /api/firm/estimating answer. The zod schema (estimating.ts) and
 * the admin form are both built from these limits.
 */

/** margin: overhead and profit are shares of the price; markup: compounded on cost. */
export const OVERHEAD_PROFIT_METHODS = ['margin', 'markup'] as const;
export type OverheadProfitMethod = (typeof OVERHEAD_PROFIT_METHODS)[number];
export const OVERHEAD_PROFIT_METHOD_LABELS: Readonly<Record<OverheadProfitMethod, string>> = {
  margin: 'As shares of the price (margin)',
  markup: 'As markups on cost',
};

export const TAX_MODES = ['none', 'materials', 'wholeJob'] as const;
export type TaxMode = (typeof TAX_MODES)[number];
export const TAX_MODE_LABELS: Readonly<Record<TaxMode, string>> = {
  none: 'None (we pay tax when buying materials)',
  materials: 'On the materials line only',
  wholeJob: 'On the whole job',
};

export const ROUNDING_KINDS = ['minorUnit', 'nearest'] as const;
export type RoundingKind = (typeof ROUNDING_KINDS)[number];
export const ROUNDING_KIND_LABELS: Readonly<Record<RoundingKind, string>> = {
  minorUnit: 'To the cent',
  nearest: 'To the nearest…',
};

/** ISO weekday numbers (1 = Monday … 7 = Sunday) with their short names. */
export const ISO_WEEKDAYS = [1, 2, 3, 4, 5, 6, 7] as const;
export type IsoWeekdayNumber = (typeof ISO_WEEKDAYS)[number];
export const WEEKDAY_LABELS: Readonly<Record<IsoWeekdayNumber, string>> = {
  1: 'Mon',
  2: 'Tue',
  3: 'Wed',
  4: 'Thu',
  5: 'Fri',
  6: 'Sat',
  7: 'Sun',
};

/** An inclusive range, or one that must stay above `above` (more than 0 hours, say). */
export type NumberRange = { readonly min: number; readonly max: number } | { readonly above: number; readonly max: number };

/** The allowed range of each number in the settings (percents are whole percents: 20 = 20 %). */
export const ESTIMATING_LIMITS = {
  materialsMarkupPercent: { min: 0, max: 500 },
  overheadPercent: { min: 0, max: 100 },
  profitPercent: { min: 0, max: 100 },
  taxRatePercent: { min: 0, max: 50 },
  dayStartHour: { min: 0, max: 23 },
  productiveHoursPerDay: { above: 0, max: 16 },
  minimumBlockHours: { min: 0, max: 16 },
  crewSize: { min: 1, max: 30 },
  setupHours: { min: 0, max: 200 },
  cleanupHours: { min: 0, max: 200 },
  /** 1 = no extra time. */
  multiplier: { min: 1, max: 3 },
  scaffoldHeight: { above: 0, max: 200 },
  workingReach: { min: 0, max: 20 },
  minDeductedOpeningArea: { min: 0, max: 1000 },
} as const satisfies Record<string, NumberRange>;

/** At most this many holidays in the firm's calendar. */
export const HOLIDAYS_MAX = 100;

export type Rounding = { readonly kind: 'minorUnit' } | { readonly kind: 'nearest'; readonly increment: string };

/** The settings as the owner sends them (PUT /api/firm/estimating). Money is a decimal string. */
export interface EstimatingSettings {
  readonly labourRate: string;
  readonly materialsMarkupPercent: number;
  readonly overheadProfit: {
    readonly method: OverheadProfitMethod;
    readonly overheadPercent: number;
    readonly profitPercent: number;
  };
  readonly minimumCharge: string | null;
  readonly tax: { readonly mode: TaxMode; readonly ratePercent: number };
  readonly rounding: Rounding;
  readonly calendar: {
    readonly workingWeekdays: number[];
    readonly dayStartHour: number;
    readonly productiveHoursPerDay: number;
    readonly holidays: string[];
    readonly minimumBlockHours: number;
  };
  readonly crewSize: number;
  readonly setupHours: number;
  readonly cleanupHours: number;
  readonly multipliers: {
    readonly ceiling: number;
    readonly height: number;
    readonly curvedWall: number;
    readonly curvedCeiling: number;
    readonly occupied: number;
  };
  readonly scaffoldHeight: number;
  readonly workingReach: number;
  readonly minDeductedOpeningArea: number;
}

/** GET and PUT /api/firm/estimating. */
export interface EstimatingSettingsView {
  readonly settings: EstimatingSettings;
  /** true until the owner saves the firm's own values */
  readonly isDefault: boolean;
  readonly lengthUnit: 'ft' | 'm';
  readonly currency: string;
}
