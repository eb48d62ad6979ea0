import { z } from 'zod';
import { text } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import { JOB_CANCEL_REASON_MAX, type JobStatusChange } from './job';

export const jobStatusChange = requestSchema<JobStatusChange>()(
  z
    .strictObject({
      status: z.enum(['complete', 'in_progress', 'cancelled'], { error: 'Choose finished, reopened or cancelled.' }),
      reason: text(JOB_CANCEL_REASON_MAX, 'The reason').optional(),
    })
    .superRefine((v, ctx) => {
      if (v.status === 'cancelled' && !v.reason) {
        ctx.addIssue({ code: 'custom', path: ['reason'], message: 'Say why the job is cancelled; it stays in its history.' });
      }
    }),
);
