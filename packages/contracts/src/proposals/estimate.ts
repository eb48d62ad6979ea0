import { z } from 'zod';
import { isoDate, moneyAmount, requiredText, uuid } from '../common/fields';

const shortId = z.string({ error: 'Missing id.' }).regex(/^[A-Za-z0-9_-]{1,40}$/, { error: 'Use letters, digits, - or _.' });
const costLine = z.strictObject({ label: requiredText(120, 'Name this cost.'), amount: moneyAmount });

/**
 * What the office chooses for an estimate. A variant assigns a finish system to each surface it
 * prices ("Option A: polished lime plaster", "Option B: limewash"); add-ons are alternates priced
 * from their own labour and materials. Amounts are decimal strings; percentages whole numbers.
 */
export const estimateInputs = z
  .strictObject({
    title: requiredText(160, 'Give the estimate a title.'),
    startDate: isoDate,
    isOccupied: z.boolean({ error: 'Say whether the home is lived in during the work.' }),
    variants: z
      .array(
        z.strictObject({
          id: shortId,
          label: requiredText(80, 'Name this option.'),
          surfaces: z
            .array(z.strictObject({ surfaceId: uuid('surface'), finishSystemId: uuid('finish system') }))
            .min(1, { error: 'Choose a finish for at least one surface.' }),
        }),
      )
      .min(1, { error: 'An estimate needs at least one option.' })
      .max(4, { error: 'At most four options.' }),
    addOns: z
      .array(
        z.strictObject({
          id: shortId,
          label: requiredText(120, 'Name this add-on.'),
          labourHours: z.number({ error: 'Enter hours.' }).min(0, { error: 'Cannot be negative.' }).max(10_000),
          materialsCost: moneyAmount,
        }),
      )
      .max(20),
    equipment: z.array(costLine).max(20),
    subcontracts: z.array(costLine).max(20),
    sundries: z.array(costLine).max(20),
    discount: z
      .discriminatedUnion('kind', [
        z.strictObject({ kind: z.literal('percent'), percent: z.number().gt(0, { error: 'More than 0 %.' }).max(100, { error: 'At most 100 %.' }) }),
        z.strictObject({ kind: z.literal('amount'), amount: moneyAmount }),
      ])
      .nullable(),
    /** price per unit² by finish system id, for the per-area comparison */
    perAreaRates: z.record(z.uuid(), moneyAmount),
  })
  .superRefine((v, ctx) => {
    const ids = new Set<string>();
    v.variants.forEach((variant, i) => {
      if (ids.has(variant.id)) ctx.addIssue({ code: 'custom', path: ['variants', i, 'id'], message: 'Each option needs its own id.' });
      ids.add(variant.id);
      const seen = new Set<string>();
      variant.surfaces.forEach((s, j) => {
        if (seen.has(s.surfaceId)) ctx.addIssue({ code: 'custom', path: ['variants', i, 'surfaces', j, 'surfaceId'], message: 'This surface already has a finish in this option.' });
        seen.add(s.surfaceId);
      });
    });
  });
export type EstimateInputs = z.infer<typeof estimateInputs>;

export const estimateCreate = z.strictObject({
  siteId: uuid('site'),
  inquiryId: uuid('inquiry').nullable().default(null),
  title: requiredText(160, 'Give the estimate a title.'),
  startDate: isoDate,
});
export type EstimateCreate = z.infer<typeof estimateCreate>;
