import { z } from 'zod';
import { isoDate, pageQuery, uuid } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import { AUDIT_ACTION_MAX_LENGTH, AUDIT_KINDS, type AuditListRequest } from './audit-types';

const ACTION_NAME = /^[a-z][a-zA-Z_]*(\.[a-zA-Z_]+)+$/;

/** GET /api/audit: each filter optional; `from`/`to` are days in the firm's time zone, both included. */
export const auditListQuery = requestSchema<AuditListRequest>()(
  z
    .strictObject({
      person: uuid('person').optional(),
      kind: z.enum(AUDIT_KINDS, { error: `A kind is one of ${AUDIT_KINDS.join(', ')}.` }).optional(),
      action: z
        .string({ error: 'Name one action, like invoice.issued.' })
        .max(AUDIT_ACTION_MAX_LENGTH, { error: `Use at most ${AUDIT_ACTION_MAX_LENGTH} characters.` })
        .regex(ACTION_NAME, { error: 'Name one action, like invoice.issued.' })
        .optional(),
      record: uuid('record id').optional(),
      from: isoDate.optional(),
      to: isoDate.optional(),
      ...pageQuery,
    })
    .refine((q) => !q.from || !q.to || q.from <= q.to, { error: 'The last day is before the first.', path: ['to'] }),
);
export type AuditListQuery = z.infer<typeof auditListQuery>;

/** GET /api/firm/export takes no query. */
export const firmExportQuery = z.strictObject({});
