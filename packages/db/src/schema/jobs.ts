import { date, index, integer, jsonb, numeric, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, tenantId, tenantPolicy, updatedAt } from './columns';
import { clients, sites } from './clients';
import { firms } from './firms';
import { inquiries } from './inquiries';
import { estimates, proposalVersions } from './proposals';

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
    /** the accepted option's total; change orders add to it later */
    contractSum: numeric('contract_sum', { precision: 14, scale: 2 }).notNull(),
    startDate: date('start_date'),
    finishDate: date('finish_date'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('jobs_proposal_version_key').on(t.tenantId, t.proposalVersionId),
    index('jobs_tenant_created_idx').on(t.tenantId, t.createdAt, t.id),
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
    status: text('status', { enum: ['draft', 'scheduled', 'invoiced'] })
      .notNull()
      .default('draft'),
    createdAt: createdAt(),
  },
  (t) => [index('payment_schedule_lines_job_idx').on(t.tenantId, t.jobId, t.position), tenantPolicy('payment_schedule_lines')],
);
