import { sql } from 'drizzle-orm';
import { date, index, integer, jsonb, numeric, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, tenantId, tenantPolicy, updatedAt } from './columns';
import { clients } from './clients';
import { firms } from './firms';
import { jobs, paymentScheduleLines } from './jobs';
import { users } from './team';

const money = (name: string) => numeric(name, { precision: 14, scale: 2 });

/**
 * How the firm bills: deposit limit (with the rule's name), payment terms, retainage, how a deposit
 * is credited on progress invoices, reminder cadence, number prefixes. `settings` holds
 * @layerbook/contracts' BillingSettings; a firm without a row uses the defaults.
 */
export const firmBillingSettings = pgTable(
  'firm_billing_settings',
  {
    tenantId: uuid('tenant_id')
      .primaryKey()
      .references(() => firms.id),
    settings: jsonb('settings').notNull(),
    updatedAt: updatedAt(),
  },
  () => [tenantPolicy('firm_billing_settings')],
);

/**
 * Gapless per-firm numbers: `update … set next_no = next_no + 1 returning` inside the issuing
 * transaction (a sequence would leave gaps on rollback). Series: invoice, credit_note, receipt.
 */
export const documentCounters = pgTable(
  'document_counters',
  {
    tenantId: tenantId().references(() => firms.id),
    series: text('series', { enum: ['invoice', 'credit_note', 'receipt'] }).notNull(),
    nextNo: integer('next_no').notNull().default(1),
  },
  (t) => [primaryKey({ columns: [t.tenantId, t.series] }), tenantPolicy('document_counters')],
);

/** A change to the contract, numbered per job; only an approved one moves the contract sum. */
export const changeOrders = pgTable(
  'change_orders',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    jobId: uuid('job_id')
      .notNull()
      .references(() => jobs.id),
    number: integer('number').notNull(),
    title: text('title').notNull(),
    description: text('description').notNull().default(''),
    pricing: text('pricing', { enum: ['lumpSum', 'engine'] }).notNull(),
    /** before tax; negative deducts */
    price: money('price').notNull(),
    tax: money('tax').notNull().default('0'),
    /** price + tax: what the contract sum moves by when approved */
    amount: money('amount').notNull(),
    /** for engine pricing: the surfaces, the finish and the engine's figures, as the client read them */
    detail: jsonb('detail').notNull().default({}),
    status: text('status', { enum: ['draft', 'sent', 'approved', 'declined'] })
      .notNull()
      .default('draft'),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    decidedAt: timestamp('decided_at', { withTimezone: true }),
    signedName: text('signed_name'),
    clientComment: text('client_comment').notNull().default(''),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('change_orders_job_number_key').on(t.tenantId, t.jobId, t.number),
    index('change_orders_status_idx').on(t.tenantId, t.status),
    tenantPolicy('change_orders'),
  ],
);

export const INVOICE_KINDS_DB = ['deposit', 'milestone', 'progress', 'retainage', 'final'] as const;
export const INVOICE_STATUSES_DB = ['draft', 'issued', 'part_paid', 'paid', 'refunded', 'void'] as const;

/**
 * An invoice. A draft has no number and may change; issuing takes the next number from the firm's
 * counter in the same transaction and freezes `document`; after that only its payment state moves,
 * and voiding makes a credit note. Money columns are in `currency`.
 */
export const invoices = pgTable(
  'invoices',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    jobId: uuid('job_id')
      .notNull()
      .references(() => jobs.id),
    clientId: uuid('client_id')
      .notNull()
      .references(() => clients.id),
    kind: text('kind', { enum: INVOICE_KINDS_DB }).notNull(),
    status: text('status', { enum: INVOICE_STATUSES_DB }).notNull().default('draft'),
    number: integer('number'),
    numberText: text('number_text'),
    /** the billing-schedule line this invoice bills (deposit, milestone, final) */
    scheduleLineId: uuid('schedule_line_id').references(() => paymentScheduleLines.id),
    /** progress invoices: the last day of the period billed */
    periodEnd: date('period_end'),
    issuedOn: date('issued_on'),
    dueOn: date('due_on'),
    currency: text('currency').notNull(),
    /** what the invoice bills before the deposit credit (progress: earned this period less retainage) */
    subtotal: money('subtotal').notNull(),
    depositCredit: money('deposit_credit').notNull().default('0'),
    /** progress invoices: retainage held to date, for the reader */
    retainageHeld: money('retainage_held').notNull().default('0'),
    /** the tax contained in `total` (the contract sum already includes tax) */
    taxIncluded: money('tax_included').notNull().default('0'),
    /** subtotal − deposit credit: what the client owes on this invoice */
    total: money('total').notNull(),
    amountPaid: money('amount_paid').notNull().default('0'),
    amountCredited: money('amount_credited').notNull().default('0'),
    /** InvoiceLine[] */
    lines: jsonb('lines').notNull().default([]),
    /** progress invoices: the schedule-of-values table (ProgressTable) */
    progress: jsonb('progress'),
    /** frozen at issue: firm, client, site, terms, deposit rule (InvoiceDocument) */
    document: jsonb('document'),
    notes: text('notes').notNull().default(''),
    origin: text('origin', { enum: ['office', 'queue'] }).notNull(),
    /** what drafted it (the trigger that was met), for the reader */
    trigger: jsonb('trigger'),
    createdBy: uuid('created_by').references(() => users.id),
    issuedBy: uuid('issued_by').references(() => users.id),
    issuedAt: timestamp('issued_at', { withTimezone: true }),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    voidedAt: timestamp('voided_at', { withTimezone: true }),
    voidedBy: uuid('voided_by').references(() => users.id),
    voidReason: text('void_reason'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('invoices_number_key').on(t.tenantId, t.number),
    // one live invoice per schedule line: a trigger met twice (two workers, a retry) drafts once
    uniqueIndex('invoices_schedule_line_key')
      .on(t.tenantId, t.scheduleLineId)
      .where(sql`status <> 'void' and schedule_line_id is not null`),
    index('invoices_tenant_created_idx').on(t.tenantId, t.createdAt, t.id),
    index('invoices_job_idx').on(t.tenantId, t.jobId),
    index('invoices_client_idx').on(t.tenantId, t.clientId),
    index('invoices_open_due_idx').on(t.tenantId, t.status, t.dueOn),
    // the list's open and overdue filters, newest first, without stepping over paid and void ones
    index('invoices_open_created_idx')
      .on(t.tenantId, t.createdAt, t.id)
      .where(sql`status in ('issued', 'part_paid')`),
    tenantPolicy('invoices'),
  ],
);

/** What voiding an issued invoice makes: its own number from the credit-note series. */
export const creditNotes = pgTable(
  'credit_notes',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    invoiceId: uuid('invoice_id')
      .notNull()
      .references(() => invoices.id),
    number: integer('number').notNull(),
    numberText: text('number_text').notNull(),
    issuedOn: date('issued_on').notNull(),
    currency: text('currency').notNull(),
    amount: money('amount').notNull(),
    reason: text('reason').notNull(),
    document: jsonb('document').notNull(),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('credit_notes_number_key').on(t.tenantId, t.number),
    uniqueIndex('credit_notes_invoice_key').on(t.tenantId, t.invoiceId),
    tenantPolicy('credit_notes'),
  ],
);

/** Each reminder step sent for an invoice, once: the unique key is what stops a second send. */
export const invoiceReminders = pgTable(
  'invoice_reminders',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    invoiceId: uuid('invoice_id')
      .notNull()
      .references(() => invoices.id),
    /** `before:3`, `due`, `after:7` … (offset from the due date) */
    step: text('step').notNull(),
    sentOn: date('sent_on').notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('invoice_reminders_step_key').on(t.tenantId, t.invoiceId, t.step), tenantPolicy('invoice_reminders')],
);
