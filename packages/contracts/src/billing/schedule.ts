import { z } from 'zod';
import { isoDate, moneyAmount, requiredText, uuid } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import {
  BILLING_METHODS,
  BILLING_SCHEDULE_LIMITS,
  type BillingScheduleUpdate,
  type BillingTrigger,
  type ValueLinesUpdate,
} from './job-billing-types';

/** Longest label of a schedule line or a schedule-of-values line; most lines either takes. */
export const BILLING_LINE_LABEL_MAX = BILLING_SCHEDULE_LIMITS.labelMaxLength;
export const BILLING_LINES_MAX = BILLING_SCHEDULE_LIMITS.linesMax;

const billingTrigger: z.ZodType<BillingTrigger> = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('acceptance') }),
    z.strictObject({ kind: z.literal('date'), date: isoDate }),
    z.strictObject({ kind: z.literal('layerComplete'), layerId: requiredText(100, 'Choose the layer.') }),
    z.strictObject({ kind: z.literal('walkthrough') }),
  ],
  { error: 'Choose when the line is due: on acceptance, a date, a layer done, or the walkthrough.' },
);

/** PUT /api/jobs/:id/billing/schedule: the whole schedule; lines without `id` are new. */
export const billingScheduleUpdate = requestSchema<BillingScheduleUpdate>()(
  z.strictObject({
    method: z.enum(BILLING_METHODS, { error: 'Choose how this job is billed.' }),
    lines: z
      .array(
        z.strictObject({
          id: uuid('line id').optional(),
          label: requiredText(BILLING_LINE_LABEL_MAX, 'Name the payment.'),
          role: z.enum(['deposit', 'milestone', 'final'], { error: 'A line is a deposit, a stage payment or the final payment.' }),
          trigger: billingTrigger,
          amount: moneyAmount,
        }),
        { error: 'Send the lines as a list.' },
      )
      .max(BILLING_LINES_MAX, { error: `At most ${BILLING_LINES_MAX} lines.` })
      .readonly(),
  }),
);

/** PUT /api/jobs/:id/billing/value-lines: the whole schedule of values. */
export const valueLinesUpdate = requestSchema<ValueLinesUpdate>()(
  z.strictObject({
    lines: z
      .array(
        z.strictObject({
          id: uuid('line id').optional(),
          label: requiredText(BILLING_LINE_LABEL_MAX, 'Name the line.'),
          scheduledValue: moneyAmount,
        }),
        { error: 'Send the lines as a list.' },
      )
      .min(1, { error: 'The schedule of values needs at least one line.' })
      .max(BILLING_LINES_MAX, { error: `At most ${BILLING_LINES_MAX} lines.` })
      .readonly(),
  }),
);
