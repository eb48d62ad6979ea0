import { z } from 'zod';
import { isoDate, moneyAmount } from '../common/fields';

const percent = (label: string, max = 100) =>
  z.number({ error: `Enter ${label} as a number.` }).min(0, { error: `${label[0]!.toUpperCase()}${label.slice(1)} cannot be negative.` }).max(max, { error: `Use at most ${max} %.` });

const factor = z.number({ error: 'Enter a factor like 1.25.' }).min(1, { error: 'A multiplier is 1 or more (1 = no extra time).' }).max(3, { error: 'Use at most 3.' });

/**
 * How a firm prices and schedules work. Percentages are whole percents here (20 = 20 %); the
 * estimate engine takes fractions, see toEngineSettings. Money is a decimal string.
 */
export const estimatingSettings = z
  .strictObject({
    labourRate: moneyAmount,
    materialsMarkupPercent: percent('the materials markup', 500),
    overheadProfit: z.strictObject({
      method: z.enum(['margin', 'markup'], { error: 'Choose share of the price or markup on cost.' }),
      overheadPercent: percent('overhead'),
      profitPercent: percent('profit'),
    }),
    minimumCharge: moneyAmount.nullable(),
    tax: z.strictObject({
      mode: z.enum(['none', 'materials', 'wholeJob'], { error: 'Choose how sales tax applies.' }),
      ratePercent: percent('the tax rate', 50),
    }),
    rounding: z.discriminatedUnion('kind', [
      z.strictObject({ kind: z.literal('minorUnit') }),
      z.strictObject({ kind: z.literal('nearest'), increment: moneyAmount }),
    ]),
    calendar: z.strictObject({
      workingWeekdays: z
        .array(z.number().int().min(1).max(7), { error: 'Choose the working days.' })
        .min(1, { error: 'Choose at least one working day.' })
        .refine((d) => new Set(d).size === d.length, { error: 'Each day once.' }),
      dayStartHour: z.number({ error: 'Enter the hour work starts.' }).int().min(0, { error: 'Use 0 to 23.' }).max(23, { error: 'Use 0 to 23.' }),
      productiveHoursPerDay: z.number({ error: 'Enter hours per day.' }).gt(0, { error: 'More than 0 hours.' }).max(16, { error: 'At most 16 hours.' }),
      holidays: z.array(isoDate).max(100),
      minimumBlockHours: z.number({ error: 'Enter hours.' }).min(0, { error: 'Cannot be negative.' }).max(16, { error: 'At most 16 hours.' }),
    }),
    crewSize: z.number({ error: 'Enter the crew size.' }).int({ error: 'Whole people.' }).min(1, { error: 'At least 1 person.' }).max(30, { error: 'At most 30 people.' }),
    setupHours: z.number({ error: 'Enter hours.' }).min(0, { error: 'Cannot be negative.' }).max(200),
    cleanupHours: z.number({ error: 'Enter hours.' }).min(0, { error: 'Cannot be negative.' }).max(200),
    multipliers: z.strictObject({ ceiling: factor, height: factor, curvedWall: factor, curvedCeiling: factor, occupied: factor }),
    scaffoldHeight: z.number({ error: 'Enter a height.' }).gt(0, { error: 'More than 0.' }).max(200),
    workingReach: z.number({ error: 'Enter a reach.' }).min(0, { error: 'Cannot be negative.' }).max(20),
    minDeductedOpeningArea: z.number({ error: 'Enter an area.' }).min(0, { error: 'Cannot be negative.' }).max(1000),
  })
  .superRefine((s, ctx) => {
    if (s.overheadProfit.method === 'margin' && s.overheadProfit.overheadPercent + s.overheadProfit.profitPercent >= 100) {
      ctx.addIssue({ code: 'custom', path: ['overheadProfit', 'profitPercent'], message: 'As shares of the price, overhead and profit must add up to less than 100 %.' });
    }
  });
export type EstimatingSettings = z.infer<typeof estimatingSettings>;
