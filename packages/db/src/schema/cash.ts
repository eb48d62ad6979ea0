import { date, integer, numeric, pgTable, primaryKey, text, uuid } from 'drizzle-orm/pg-core';
import { tenantId, tenantPolicy } from './columns';
import { firms } from './firms';

const money = (name: string) => numeric(name, { precision: 14, scale: 2 });

/*
 * Figures the Cash page reads, kept by PostgreSQL itself: triggers on invoices, payments, refunds and
 * change orders (the cash_figures_rls migration) add each row's part and take away its old part
 * in the same transaction as the write, so a figure is never behind the rows it sums. Firm data under
 * forced row-level security like every tenant table; the web and job roles write them only through
 * those triggers.
 */

/**
 * What is still owed on open invoices (issued, part paid, refunded; total − paid − credited > 0),
 * summed per client and due date. A row goes when its last invoice is paid, credited or voided.
 */
export const cashOpenBalances = pgTable(
  'cash_open_balances',
  {
    tenantId: tenantId().references(() => firms.id),
    clientId: uuid('client_id').notNull(),
    dueOn: date('due_on').notNull(),
    owed: money('owed').notNull(),
    invoiceCount: integer('invoice_count').notNull(),
  },
  (t) => [primaryKey({ columns: [t.tenantId, t.clientId, t.dueOn] }), tenantPolicy('cash_open_balances')],
);

/**
 * The same open balances rolled up per due date (the firm's aging and the forecast read these, a row
 * per day rather than per client and day) and per client (the clients owing most). Kept by the same
 * trigger function as cash_open_balances, in the same statement.
 */
export const cashOpenDueDays = pgTable(
  'cash_open_due_days',
  {
    tenantId: tenantId().references(() => firms.id),
    dueOn: date('due_on').notNull(),
    owed: money('owed').notNull(),
    invoiceCount: integer('invoice_count').notNull(),
  },
  (t) => [primaryKey({ columns: [t.tenantId, t.dueOn] }), tenantPolicy('cash_open_due_days')],
);

export const cashOpenClients = pgTable(
  'cash_open_clients',
  {
    tenantId: tenantId().references(() => firms.id),
    clientId: uuid('client_id').notNull(),
    owed: money('owed').notNull(),
    invoiceCount: integer('invoice_count').notNull(),
  },
  (t) => [primaryKey({ columns: [t.tenantId, t.clientId] }), tenantPolicy('cash_open_clients')],
);

/** Payments received (by received date) and refunds that went through (by refund date), per firm-local day. */
export const cashReceivedDays = pgTable(
  'cash_received_days',
  {
    tenantId: tenantId().references(() => firms.id),
    kind: text('kind', { enum: ['payment', 'refund'] }).notNull(),
    day: date('day').notNull(),
    amount: money('amount').notNull(),
    count: integer('count').notNull(),
  },
  (t) => [primaryKey({ columns: [t.tenantId, t.kind, t.day] }), tenantPolicy('cash_received_days')],
);

/**
 * Each job's money so far: Σ total, credited and paid of its invoices past draft (void ones too, as
 * their credit note balances them) and Σ approved change orders.
 */
export const cashJobTotals = pgTable(
  'cash_job_totals',
  {
    tenantId: tenantId().references(() => firms.id),
    jobId: uuid('job_id').notNull(),
    issued: money('issued').notNull().default('0'),
    credited: money('credited').notNull().default('0'),
    paid: money('paid').notNull().default('0'),
    changeOrders: money('change_orders').notNull().default('0'),
  },
  (t) => [primaryKey({ columns: [t.tenantId, t.jobId] }), tenantPolicy('cash_job_totals')],
);
