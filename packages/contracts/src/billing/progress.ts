import { z } from 'zod';
import { isoDate, moneyAmount, text, uuid } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import { PROGRESS_LIMITS, type ProgressMark } from './job-billing-types';

const clientKey = z
  .string({ error: 'The mark key must be text.' })
  .min(1, { error: 'The mark key cannot be empty.' })
  .max(PROGRESS_LIMITS.clientKeyMaxLength, { error: `Use at most ${PROGRESS_LIMITS.clientKeyMaxLength} characters.` })
  .optional();
const note = text(PROGRESS_LIMITS.noteMaxLength, 'The note').optional();

const percentComplete = z
  .number({ error: 'Enter the percent complete as a number from 0 to 100.' })
  .min(0, { error: 'The percent complete cannot be negative.' })
  .max(100, { error: 'The percent complete is at most 100.' })
  .refine((n) => Math.round(n * 100) / 100 === n, { error: 'Use at most two decimals.' });

/** POST /api/jobs/:id/progress — one mark from the work; the day it happened on site is `on`. */
export const progressMark = requestSchema<ProgressMark>()(
  z.discriminatedUnion(
    'kind',
    [
      z.strictObject({ kind: z.literal('layerDone'), workItemId: uuid('work item id'), on: isoDate, clientKey, note }),
      z.strictObject({ kind: z.literal('layerReopened'), workItemId: uuid('work item id'), on: isoDate, clientKey, note }),
      z.strictObject({
        kind: z.literal('valuePercent'),
        valueLineId: uuid('value line id'),
        percentComplete,
        on: isoDate,
        clientKey,
        note,
      }),
      z.strictObject({
        kind: z.literal('storedMaterials'),
        valueLineId: uuid('value line id'),
        amount: moneyAmount,
        on: isoDate,
        clientKey,
        note,
      }),
      z.strictObject({ kind: z.literal('walkthrough'), on: isoDate, clientKey, note }),
    ],
    { error: 'Choose what to mark: layerDone, layerReopened, valuePercent, storedMaterials or walkthrough.' },
  ),
);
