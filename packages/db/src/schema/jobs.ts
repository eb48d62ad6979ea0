import { sql } from 'drizzle-orm';
import { date, index, integer, jsonb, numeric, pgTable, text, timestamp, unique, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, tenantId, tenantPolicy, updatedAt } from './columns';
import { clients, sites } from './clients';
import { firms } from './firms';
import { inquiries } from './inquiries';
import { estimates, proposalVersions } from './proposals';
import { files } from './files';
import { users } from './team';

/** Accepted work: made when a client accepts a proposal version, with the option they chose. */
export const jobs = pgTable(
  'jobs',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    estimateId: uuid('estimate_id')
      .notNull()
      .references(() => estimates.id),
    proposalVersionId: uuid('proposal_version_id')
      .notNull()
      .references(() => proposalVersions.id),
    clientId: uuid('client_id')
      .notNull()
      .references(() => clients.id),
    siteId: uuid('site_id')
      .notNull()
      .references(() => sites.id),
    inquiryId: uuid('inquiry_id').references(() => inquiries.id),
    title: text('title').notNull(),
    acceptedVariantId: text('accepted_variant_id').notNull(),
    optionLabel: text('option_label').notNull(),
    status: text('status', { enum: ['scheduled', 'in_progress', 'complete', 'cancelled'] })
      .notNull()
      .default('scheduled'),
    currency: text('currency').notNull(),
    /** the contract sum to date: the accepted option's total plus approved change orders (tax included) */
    contractSum: numeric('contract_sum', { precision: 14, scale: 2 }).notNull(),
    /** the accepted option's total, never changed */
    originalContractSum: numeric('original_contract_sum', { precision: 14, scale: 2 }).notNull(),
    /** the tax contained in contract_sum (0 when the firm's tax mode adds none) */
    contractTax: numeric('contract_tax', { precision: 14, scale: 2 }).notNull().default('0'),
    /** schedule: deposit, milestone and final invoices from the payment schedule; progress: schedule-of-values applications with retainage */
    billingMethod: text('billing_method', { enum: ['schedule', 'progress'] })
      .notNull()
      .default('schedule'),
    /** the firm's billing terms copied when billing starts (BillingTerms): later setting changes leave running jobs alone */
    billingTerms: jsonb('billing_terms'),
    billingStartedAt: timestamp('billing_started_at', { withTimezone: true }),
    /** the day of the final walkthrough, once held */
    walkthroughOn: date('walkthrough_on'),
    startDate: date('start_date'),
    finishDate: date('finish_date'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('jobs_proposal_version_key').on(t.tenantId, t.proposalVersionId),
    index('jobs_tenant_created_idx').on(t.tenantId, t.createdAt, t.id),
    // the cash page looks for retainage held on progress-billed jobs only
    index('jobs_progress_idx')
      .on(t.tenantId)
      .where(sql`billing_method = 'progress'`),
    tenantPolicy('jobs'),
  ],
);

/** The job's draft payment schedule (deposit, progress, final), summing exactly to the contract sum. */
export const paymentScheduleLines = pgTable(
  'payment_schedule_lines',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    jobId: uuid('job_id')
      .notNull()
      .references(() => jobs.id),
    position: integer('position').notNull(),
    label: text('label').notNull(),
    role: text('role').notNull(),
    trigger: jsonb('trigger').notNull(),
    percent: numeric('percent', { precision: 7, scale: 4 }),
    amount: numeric('amount', { precision: 14, scale: 2 }).notNull(),
    expectedOn: date('expected_on'),
    /** draft until billing starts; scheduled; ready once its invoice is drafted; invoiced once issued */
    status: text('status', { enum: ['draft', 'scheduled', 'ready', 'invoiced'] })
      .notNull()
      .default('draft'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('payment_schedule_lines_job_idx').on(t.tenantId, t.jobId, t.position), tenantPolicy('payment_schedule_lines')],
);

/**
 * One layer on one surface of the accepted option, in the order the crew applies them: what
 * progress is marked against. Made from the estimate's result when the job is made, and from an
 * engine-priced change order when the client approves it.
 */
export const jobWorkItems = pgTable(
  'job_work_items',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    jobId: uuid('job_id')
      .notNull()
      .references(() => jobs.id),
    position: integer('position').notNull(),
    roomName: text('room_name').notNull(),
    surfaceId: text('surface_id').notNull(),
    surfaceName: text('surface_name').notNull(),
    layerId: text('layer_id').notNull(),
    layerName: text('layer_name').notNull(),
    /** the layer's place in its finish (1 = first on) */
    layerOrder: integer('layer_order').notNull(),
    /**
     * the approved change order that added this work; null for the work sold. A change order may
     * redo a surface already sold with the same finish (another colour): its layers are work of their
     * own. No foreign key, as job_value_lines.change_order_id (billing.ts references jobs).
     */
    changeOrderId: uuid('change_order_id'),
    doneOn: date('done_on'),
    doneBy: uuid('done_by').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [
    // NULLS NOT DISTINCT: the work sold (no change order) stays one item per surface and layer.
    unique('job_work_items_work_key').on(t.tenantId, t.jobId, t.surfaceId, t.layerId, t.changeOrderId).nullsNotDistinct(),
    index('job_work_items_job_idx').on(t.tenantId, t.jobId, t.position),
    tenantPolicy('job_work_items'),
  ],
);

/**
 * The job's schedule of values for progress billing: lines adding up to the contract sum to date;
 * an approved change order adds its own line. `percentComplete`/`storedMaterials` are the latest
 * readings from the work (the next progress invoice bills the difference from the last one).
 */
export const jobValueLines = pgTable(
  'job_value_lines',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    jobId: uuid('job_id')
      .notNull()
      .references(() => jobs.id),
    position: integer('position').notNull(),
    label: text('label').notNull(),
    scheduledValue: numeric('scheduled_value', { precision: 14, scale: 2 }).notNull(),
    changeOrderId: uuid('change_order_id'),
    percentComplete: numeric('percent_complete', { precision: 7, scale: 4 }).notNull().default('0'),
    storedMaterials: numeric('stored_materials', { precision: 14, scale: 2 }).notNull().default('0'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('job_value_lines_job_idx').on(t.tenantId, t.jobId, t.position), tenantPolicy('job_value_lines')],
);

/**
 * The job's history of progress from the work: a layer finished (or reopened) on a surface, a
 * percent complete or stored materials on a value line, the walkthrough held. Append-only.
 * `clientKey` makes a mark sent twice (a phone back online) count once.
 */
export const jobProgress = pgTable(
  'job_progress',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    jobId: uuid('job_id')
      .notNull()
      .references(() => jobs.id),
    kind: text('kind', { enum: ['layerDone', 'layerReopened', 'valuePercent', 'storedMaterials', 'walkthrough'] }).notNull(),
    workItemId: uuid('work_item_id').references(() => jobWorkItems.id),
    valueLineId: uuid('value_line_id').references(() => jobValueLines.id),
    /** percent complete to date, or stored materials amount */
    value: numeric('value', { precision: 14, scale: 4 }),
    happenedOn: date('happened_on').notNull(),
    actorUserId: uuid('actor_user_id').references(() => users.id),
    note: text('note').notNull().default(''),
    clientKey: text('client_key'),
    createdAt: createdAt(),
  },
  (t) => [
    index('job_progress_job_idx').on(t.tenantId, t.jobId, t.createdAt),
    uniqueIndex('job_progress_client_key')
      .on(t.tenantId, t.clientKey)
      .where(sql`client_key is not null`),
    tenantPolicy('job_progress'),
  ],
);

/** A progress photo from the field: the job, optionally the layer on a surface it shows, and a caption. */
export const jobPhotos = pgTable(
  'job_photos',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    jobId: uuid('job_id')
      .notNull()
      .references(() => jobs.id),
    workItemId: uuid('work_item_id').references(() => jobWorkItems.id),
    fileId: uuid('file_id')
      .notNull()
      .references(() => files.id),
    caption: text('caption').notNull().default(''),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [index('job_photos_job_idx').on(t.tenantId, t.jobId, t.createdAt), tenantPolicy('job_photos')],
);
