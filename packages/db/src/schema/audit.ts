import { sql } from 'drizzle-orm';
import { index, jsonb, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, tenantId, tenantPolicy } from './columns';
import { firms } from './firms';

/** Who did what, when, to which record. Append-only: the app role has no UPDATE/DELETE on it. */
export const auditLog = pgTable(
  'audit_log',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    actorUserId: uuid('actor_user_id'),
    actorKind: text('actor_kind', { enum: ['staff', 'client', 'system'] }).notNull(),
    action: text('action').notNull(),
    entity: text('entity').notNull(),
    entityId: uuid('entity_id'),
    data: jsonb('data').notNull().default({}),
    createdAt: createdAt(),
  },
  (t) => [
    index('audit_log_tenant_created_idx').on(t.tenantId, t.createdAt, t.id),
    // a record's trail (an invoice page, a job's history) without reading the firm's whole log
    index('audit_log_entity_idx').on(t.tenantId, t.entityId, t.createdAt),
    // the owner's activity filtered by person (who signed in, who changed what), newest first
    index('audit_log_actor_idx').on(t.tenantId, t.actorUserId, t.createdAt, t.id),
    // what the card processor left for a person (payments/attention.ts): Today finds the few without reading the log
    index('audit_log_attention_idx')
      .on(t.tenantId, t.createdAt)
      .where(sql`action in ('invoice.payment_needs_attention', 'invoice.refund_needs_attention')`),
    tenantPolicy('audit_log'),
  ],
);
