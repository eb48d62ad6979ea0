import { date, index, integer, jsonb, numeric, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, tenantId, tenantPolicy, updatedAt } from './columns';
import { clients, sites } from './clients';
import { firms } from './firms';
import { inquiries } from './inquiries';
import { users } from './team';

/**
 * An estimate for the work at one site: the choices the office makes (`inputs`: which finish
 * system goes on which surface, in one or more variants, plus extras) and the numbers the server
 * computed from them with @layerbook/domain (`result`, per variant). The stored numbers are the server's.
 */
export const estimates = pgTable(
  'estimates',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    siteId: uuid('site_id')
      .notNull()
      .references(() => sites.id),
    clientId: uuid('client_id')
      .notNull()
      .references(() => clients.id),
    inquiryId: uuid('inquiry_id').references(() => inquiries.id),
    title: text('title').notNull(),
    status: text('status', { enum: ['draft', 'proposed', 'accepted', 'declined'] })
      .notNull()
      .default('draft'),
    startDate: date('start_date').notNull(),
    inputs: jsonb('inputs').notNull(),
    result: jsonb('result'),
    /** the first variant's quoted price, for lists and the pipeline */
    price: numeric('price', { precision: 14, scale: 2 }),
    computedAt: timestamp('computed_at', { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('estimates_tenant_created_idx').on(t.tenantId, t.createdAt, t.id),
    index('estimates_site_idx').on(t.tenantId, t.siteId),
    tenantPolicy('estimates'),
  ],
);

export const PROPOSAL_STATUSES = ['draft', 'sent', 'accepted', 'declined', 'changes_requested', 'superseded'] as const;

/**
 * A version of the proposal made from an estimate. Once sent it is frozen: `snapshot` is what the
 * client reads and signs (scope, options with prices, schedule, payment terms, safety notes) and
 * `snapshotHash` its SHA-256, recorded again at acceptance. A change is a new version.
 */
export const proposalVersions = pgTable(
  'proposal_versions',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    estimateId: uuid('estimate_id')
      .notNull()
      .references(() => estimates.id),
    version: integer('version').notNull(),
    status: text('status', { enum: PROPOSAL_STATUSES }).notNull().default('draft'),
    snapshot: jsonb('snapshot').notNull(),
    snapshotHash: text('snapshot_hash').notNull(),
    /**
     * The estimate's engine result the snapshot was made from (every option's quantities, layers,
     * schedule, cautions, price): the accepted job's work, sheet and money come from the version the
     * client signed, not from the estimate as the office may have saved it since.
     */
    result: jsonb('result'),
    /**
     * The finish systems (layers, coats, recipes, waits) and products (name, unit, hazards; no price)
     * the options use, as they were when the version was made: the crew's sheet reads the job's from
     * here, so a library edit for future work does not reach a job already sold.
     */
    library: jsonb('library'),
    expiresOn: date('expires_on').notNull(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    decidedAt: timestamp('decided_at', { withTimezone: true }),
    acceptedVariantId: text('accepted_variant_id'),
    /** the add-ons the client took with the option, by their ids in the snapshot */
    acceptedAddOnIds: text('accepted_add_on_ids').array().notNull().default([]),
    signedName: text('signed_name'),
    signedIp: text('signed_ip'),
    signedUserAgent: text('signed_user_agent'),
    clientComment: text('client_comment').notNull().default(''),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('proposal_versions_estimate_version_key').on(t.tenantId, t.estimateId, t.version),
    index('proposal_versions_tenant_created_idx').on(t.tenantId, t.createdAt, t.id),
    tenantPolicy('proposal_versions'),
  ],
);
