import { z } from 'zod';
import { isoDate, moneyAmount } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import {
  ESTIMATING_LIMITS as L,
  HOLIDAYS_MAX,
  ISO_WEEKDAYS,
  OVERHEAD_PROFIT_METHODS,
  TAX_MODES,
  type EstimatingSettings,
} from './estimating-types';

export type { EstimatingSettings } from './estimating-types';

const percent = (label: string, range: { min: number; max: number }) =>
  z
    .number({ error: `Enter ${label} as a number.` })
    .min(range.min, { error: `${label[0].toUpperCase()}${label.slice(1)} cannot be negative.` })
    .max(range.max, { error: `Use at most ${range.max} %.` });

const hours = (range: { min: number; max: number }) =>
  z
    .number({ error: 'Enter hours.' })
    .min(range.min, { error: 'Cannot be negative.' })
    .max(range.max, { error: `At most ${range.max} hours.` });

const factor = z
  .number({ error: 'Enter a factor like 1.25.' })
  .min(L.multiplier.min, { error: 'A multiplier is 1 or more (1 = no extra time).' })
  .max(L.multiplier.max, { error: `Use at most ${L.multiplier.max}.` });

const weekday = z
  .number()
  .int()
  .min(ISO_WEEKDAYS[0])
  .max(ISO_WEEKDAYS[ISO_WEEKDAYS.length - 1]);

/**
 * How a firm prices and schedules work. Percentages are whole percents here (20 = 20 %); the
 * estimate engine takes fractions, see toEngineSettings. Money is a decimal string.
 */
export const estimatingSettings = requestSchema<EstimatingSettings>()(
  z
    .strictObject({
      labourRate: moneyAmount,
      materialsMarkupPercent: percent('the materials markup', L.materialsMarkupPercent),
      overheadProfit: z.strictObject({
        method: z.enum(OVERHEAD_PROFIT_METHODS, { error: 'Choose share of the price or markup on cost.' }),
        overheadPercent: percent('overhead', L.overheadPercent),
        profitPercent: percent('profit', L.profitPercent),
      }),
      minimumCharge: moneyAmount.nullable(),
      tax: z.strictObject({
        mode: z.enum(TAX_MODES, { error: 'Choose how sales tax applies.' }),
        ratePercent: percent('the tax rate', L.taxRatePercent),
      }),
      rounding: z.discriminatedUnion('kind', [
        z.strictObject({ kind: z.literal('minorUnit') }),
        z.strictObject({ kind: z.literal('nearest'), increment: moneyAmount }),
      ]),
      calendar: z.strictObject({
        workingWeekdays: z
          .array(weekday, { error: 'Choose the working days.' })
          .min(1, { error: 'Choose at least one working day.' })
          .refine((d) => new Set(d).size === d.length, { error: 'Each day once.' }),
        dayStartHour: z
          .number({ error: 'Enter the hour work starts.' })
          .int()
          .min(L.dayStartHour.min, { error: 'Use 0 to 23.' })
          .max(L.dayStartHour.max, { error: 'Use 0 to 23.' }),
        productiveHoursPerDay: z
          .number({ error: 'Enter hours per day.' })
          .gt(L.productiveHoursPerDay.above, { error: 'More than 0 hours.' })
          .max(L.productiveHoursPerDay.max, { error: `At most ${L.productiveHoursPerDay.max} hours.` }),
        holidays: z
          .array(isoDate)
          .max(HOLIDAYS_MAX, { error: `At most ${HOLIDAYS_MAX} days off.` })
          .refine((d) => new Set(d).size === d.length, { error: 'Each day off once.' }),
        minimumBlockHours: hours(L.minimumBlockHours),
      }),
      crewSize: z
        .number({ error: 'Enter the crew size.' })
        .int({ error: 'Whole people.' })
        .min(L.crewSize.min, { error: 'At least 1 person.' })
        .max(L.crewSize.max, { error: `At most ${L.crewSize.max} people.` }),
      setupHours: hours(L.setupHours),
      cleanupHours: hours(L.cleanupHours),
      multipliers: z.strictObject({ ceiling: factor, height: factor, curvedWall: factor, curvedCeiling: factor, occupied: factor }),
      scaffoldHeight: z
        .number({ error: 'Enter a height.' })
        .gt(L.scaffoldHeight.above, { error: 'More than 0.' })
        .max(L.scaffoldHeight.max),
      workingReach: z.number({ error: 'Enter a reach.' }).min(L.workingReach.min, { error: 'Cannot be negative.' }).max(L.workingReach.max),
      minDeductedOpeningArea: z
        .number({ error: 'Enter an area.' })
        .min(L.minDeductedOpeningArea.min, { error: 'Cannot be negative.' })
        .max(L.minDeductedOpeningArea.max),
    })
    .superRefine((s, ctx) => {
      // Each would make every estimate the firm saves fail, far from here (the engine refuses both).
      if (s.rounding.kind === 'nearest' && Number(s.rounding.increment) <= 0) {
        ctx.addIssue({ code: 'custom', path: ['rounding', 'increment'], message: 'Round to an amount above 0, like 5.00.' });
      }
      if (s.calendar.dayStartHour + s.calendar.productiveHoursPerDay > 24) {
        ctx.addIssue({
          code: 'custom',
          path: ['calendar', 'productiveHoursPerDay'],
          message: 'The working day would run past midnight: start earlier or work fewer hours.',
        });
      }
      if (s.overheadProfit.method === 'margin' && s.overheadProfit.overheadPercent + s.overheadProfit.profitPercent >= 100) {
        ctx.addIssue({
          code: 'custom',
          path: ['overheadProfit', 'profitPercent'],
          message: 'As shares of the price, overhead and profit must add up to less than 100 %.',
        });
      }
    }),
);
