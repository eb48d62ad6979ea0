import { z } from 'zod';
import { isoDate, moneyAmount, pageQuery, requiredText, text, uuid } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import {
  ESTIMATE_INPUT_LIMITS as L,
  ESTIMATE_SHORT_ID_PATTERN,
  type EstimateCreate,
  type EstimateInputs,
  type EstimateSave,
} from './estimate-types';

const shortId = z.string({ error: 'Missing id.' }).regex(ESTIMATE_SHORT_ID_PATTERN, { error: 'Use letters, digits, - or _.' });
const costLine = z.strictObject({ label: requiredText(L.costLabelMax, 'Name this cost.'), amount: moneyAmount });
const costLines = z.array(costLine).max(L.costLinesMax);

/** What the office chooses for an estimate (see EstimateInputs). */
const inputsShape = {
  title: requiredText(L.titleMax, 'Give the estimate a title.'),
  startDate: isoDate,
  isOccupied: z.boolean({ error: 'Say whether the home is lived in during the work.' }),
  variants: z
    .array(
      z.strictObject({
        id: shortId,
        label: requiredText(L.optionLabelMax, 'Name this option.'),
        surfaces: z
          .array(z.strictObject({ surfaceId: uuid('surface'), finishSystemId: uuid('finish system') }))
          .min(1, { error: 'Choose a finish for at least one surface.' }),
      }),
    )
    .min(1, { error: 'An estimate needs at least one option.' })
    .max(L.optionsMax, { error: 'At most four options.' }),
  addOns: z
    .array(
      z.strictObject({
        id: shortId,
        label: requiredText(L.addOnLabelMax, 'Name this add-on.'),
        labourHours: z.number({ error: 'Enter hours.' }).min(0, { error: 'Cannot be negative.' }).max(L.addOnHoursMax),
        materialsCost: moneyAmount,
      }),
    )
    .max(L.addOnsMax),
  equipment: costLines,
  subcontracts: costLines,
  sundries: costLines,
  discount: z
    .discriminatedUnion('kind', [
      z.strictObject({
        kind: z.literal('percent'),
        percent: z.number().gt(0, { error: 'More than 0 %.' }).max(L.discountPercentMax, { error: 'At most 100 %.' }),
      }),
      z.strictObject({ kind: z.literal('amount'), amount: moneyAmount }),
    ])
    .nullable(),
  /** price per unit² by finish system id, for the per-area comparison */
  perAreaRates: z.record(z.uuid(), moneyAmount),
  internalNotes: text(L.notesMax, 'Internal notes').optional(),
  clientNotes: text(L.notesMax, 'Notes for the client').optional(),
};

/** Ids must be unique among options and among add-ons; a surface takes one finish per option. */
function checkInputIds(v: EstimateInputs, ctx: z.RefinementCtx): void {
  const ids = new Set<string>();
  v.variants.forEach((variant, i) => {
    if (ids.has(variant.id)) ctx.addIssue({ code: 'custom', path: ['variants', i, 'id'], message: 'Each option needs its own id.' });
    ids.add(variant.id);
    const seen = new Set<string>();
    variant.surfaces.forEach((s, j) => {
      if (seen.has(s.surfaceId))
        ctx.addIssue({
          code: 'custom',
          path: ['variants', i, 'surfaces', j, 'surfaceId'],
          message: 'This surface already has a finish in this option.',
        });
      seen.add(s.surfaceId);
    });
  });
  const addOnIds = new Set<string>();
  v.addOns.forEach((a, i) => {
    if (addOnIds.has(a.id)) ctx.addIssue({ code: 'custom', path: ['addOns', i, 'id'], message: 'Each add-on needs its own id.' });
    addOnIds.add(a.id);
  });
}

export const estimateInputs = requestSchema<EstimateInputs>()(z.strictObject(inputsShape).superRefine(checkInputIds));

/** PUT /api/estimates/:id/inputs: the inputs and the last save the office started from (see EstimateSave). */
export const estimateSave = requestSchema<EstimateSave>()(
  z
    .strictObject({
      ...inputsShape,
      computedAt: z.iso.datetime({ error: 'Send the time of the save you started from.' }).nullable().optional(),
    })
    .superRefine(checkInputIds),
);

export const estimateCreate = requestSchema<EstimateCreate>()(
  z.strictObject({
    siteId: uuid('site'),
    inquiryId: uuid('inquiry').nullable().default(null),
    title: requiredText(L.titleMax, 'Give the estimate a title.'),
    startDate: isoDate,
  }),
);

/** GET /api/estimates: newest first, keyset pages; optionally one site's estimates. */
export const estimateListQuery = z.strictObject({ siteId: uuid('site').optional(), ...pageQuery });
