import { sql } from 'drizzle-orm';
import { boolean, date, index, integer, jsonb, numeric, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, tenantId, tenantPolicy, updatedAt } from './columns';
import { clients, sites } from './clients';
import { firms } from './firms';
import { users } from './team';

export const INQUIRY_STAGES = ['new', 'contacted', 'visit_booked', 'samples', 'proposal_sent', 'won', 'lost'] as const;
export const INQUIRY_SOURCES = [
  'web_form',
  'phone',
  'designer_referral',
  'contractor_referral',
  'past_client',
  'showroom',
  'other',
] as const;
export const ACTIVITY_KINDS = ['created', 'note', 'call', 'email', 'stage_change', 'assignment', 'follow_up', 'converted'] as const;

/** A prospect's request for work, followed from first contact until won or lost. */
export const inquiries = pgTable(
  'inquiries',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    contactName: text('contact_name').notNull(),
    email: text('email').notNull().default(''),
    phone: text('phone').notNull().default(''),
    siteAddress: text('site_address').notNull().default(''),
    yearBuilt: integer('year_built'),
    rooms: text('rooms').notNull().default(''),
    finishIdea: text('finish_idea').notNull().default(''),
    timeline: text('timeline').notNull().default(''),
    budgetRange: text('budget_range').notNull().default(''),
    source: text('source', { enum: INQUIRY_SOURCES }).notNull(),
    referrerName: text('referrer_name').notNull().default(''),
    consentToContact: boolean('consent_to_contact').notNull().default(false),
    stage: text('stage', { enum: INQUIRY_STAGES }).notNull().default('new'),
    estimatedValue: numeric('estimated_value', { precision: 14, scale: 2 }),
    assigneeUserId: uuid('assignee_user_id').references(() => users.id),
    nextFollowUp: date('next_follow_up'),
    lostReason: text('lost_reason').notNull().default(''),
    clientId: uuid('client_id').references(() => clients.id),
    siteId: uuid('site_id').references(() => sites.id),
    stageChangedAt: timestamp('stage_changed_at', { withTimezone: true }).notNull().defaultNow(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    // Keyset pagination leads with the firm: (tenant_id, created_at, id).
    index('inquiries_tenant_created_idx').on(t.tenantId, t.createdAt, t.id),
    index('inquiries_tenant_stage_idx').on(t.tenantId, t.stage, t.createdAt, t.id),
    index('inquiries_tenant_follow_up_idx')
      .on(t.tenantId, t.nextFollowUp)
      .where(sql`next_follow_up is not null`),
    tenantPolicy('inquiries'),
  ],
);

/** What happened on an inquiry, who did it and when (notes, calls, e-mails, stage moves). */
export const inquiryActivities = pgTable(
  'inquiry_activities',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    inquiryId: uuid('inquiry_id')
      .notNull()
      .references(() => inquiries.id),
    kind: text('kind', { enum: ACTIVITY_KINDS }).notNull(),
    body: text('body').notNull().default(''),
    data: jsonb('data').notNull().default({}),
    actorUserId: uuid('actor_user_id').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [index('inquiry_activities_inquiry_idx').on(t.tenantId, t.inquiryId, t.createdAt), tenantPolicy('inquiry_activities')],
);

/** The firm's own likelihood of winning at each stage (weighted pipeline). */
export const inquiryStageSettings = pgTable(
  'inquiry_stage_settings',
  {
    tenantId: tenantId().references(() => firms.id),
    stage: text('stage', { enum: INQUIRY_STAGES }).notNull(),
    likelihoodPercent: numeric('likelihood_percent', { precision: 5, scale: 2 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.tenantId, t.stage] }), tenantPolicy('inquiry_stage_settings')],
);

/**
 * Public form stamps already used: a stamp files one inquiry, so a bot cannot fetch one page and
 * replay its stamp. Not firm data (a random nonce and a time), so no RLS; old rows can be pruned.
 */
export const usedFormStamps = pgTable('used_form_stamps', {
  nonce: text('nonce').primaryKey(),
  usedAt: timestamp('used_at', { withTimezone: true }).notNull().defaultNow(),
});
