import { sql } from 'drizzle-orm';
import { integer, pgPolicy, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, currentTenant, id, jobsRole } from './columns';

/**
 * Outbox of e-mails. A row is written in the same transaction as the change that causes it, and
 * a queue job sends it; `purposeKey` is unique so a retried write or job never sends twice.
 * The web role may only INSERT here (grants), because bodies carry one-time links; the jobs role
 * sends for every firm. Mail about a person rather than a firm (password resets) is filed under
 * the firm they joined first.
 */
export const mailOutbox = pgTable(
  'mail_outbox',
  {
    id: id(),
    tenantId: uuid('tenant_id').notNull(),
    purposeKey: text('purpose_key').notNull(),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    html: text('html').notNull(),
    text: text('text').notNull(),
    /** Display name of the sender (the firm, for mail to its clients); null sends as Layerbook. */
    fromName: text('from_name'),
    /** Where replies go (the firm, for mail to its clients); null sets no Reply-To. */
    replyTo: text('reply_to'),
    status: text('status', { enum: ['pending', 'sent', 'failed'] })
      .notNull()
      .default('pending'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('mail_outbox_purpose_key').on(t.purposeKey),
    pgPolicy('mail_outbox_tenant_isolation', {
      as: 'permissive',
      for: 'all',
      to: 'public',
      using: sql`tenant_id = ${currentTenant}`,
      withCheck: sql`tenant_id = ${currentTenant}`,
    }),
    pgPolicy('mail_outbox_sender', { as: 'permissive', for: 'all', to: jobsRole, using: sql`true`, withCheck: sql`true` }),
  ],
);
