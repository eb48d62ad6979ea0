import { sql } from 'drizzle-orm';
import { bigint, check, date, index, integer, jsonb, numeric, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { invoices } from './billing';
import { clients } from './clients';
import { createdAt, id, tenantId, tenantPolicy, updatedAt } from './columns';
import { firms } from './firms';
import { users } from './team';

const money = (name: string) => numeric(name, { precision: 14, scale: 2 });

export const PAYMENT_METHODS_DB = ['card', 'cheque', 'transfer', 'cash'] as const;

/**
 * Money received against an invoice: offline (cheque, transfer, cash, recorded by the office) or by
 * card through the payment processor's hosted checkout. `amount` is what the client paid;
 * `amount_applied` the part that went on the invoice (at most its amount due) — the rest of an
 * overpayment is a client credit (client_credits), never lost. Each payment has a receipt number
 * from the firm's gapless 'receipt' series, taken in the same transaction that writes the payment.
 * A card payment is unique per checkout session, so fulfilment can run any number of times.
 */
export const payments = pgTable(
  'payments',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    invoiceId: uuid('invoice_id')
      .notNull()
      .references(() => invoices.id),
    clientId: uuid('client_id')
      .notNull()
      .references(() => clients.id),
    method: text('method', { enum: PAYMENT_METHODS_DB }).notNull(),
    amount: money('amount').notNull(),
    amountApplied: money('amount_applied').notNull(),
    amountRefunded: money('amount_refunded').notNull().default('0'),
    currency: text('currency').notNull(),
    receivedOn: date('received_on').notNull(),
    reference: text('reference').notNull().default(''),
    receiptNo: integer('receipt_no'),
    processorSessionId: text('processor_session_id'),
    processorPaymentIntentId: text('processor_payment_intent_id'),
    /** offline payments: the key the office's form made once; a second request with it finds the first */
    clientKey: text('client_key'),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [
    index('payments_invoice_idx').on(t.tenantId, t.invoiceId),
    index('payments_received_idx').on(t.tenantId, t.receivedOn),
    uniqueIndex('payments_processor_session_uq')
      .on(t.processorSessionId)
      .where(sql`processor_session_id is not null`),
    uniqueIndex('payments_client_key_uq')
      .on(t.tenantId, t.clientKey)
      .where(sql`client_key is not null`),
    uniqueIndex('payments_receipt_uq')
      .on(t.tenantId, t.receiptNo)
      .where(sql`receipt_no is not null`),
    check('payments_refund_le_amount', sql`amount_refunded >= 0 and amount_refunded <= amount`),
    check('payments_applied_le_amount', sql`amount_applied >= 0 and amount_applied <= amount`),
    tenantPolicy('payments'),
  ],
);

/**
 * Money given back on a payment: online through the processor (pending until it answers, with an
 * idempotency key = this row's id) or recorded offline. The payment row is locked while a refund
 * is reserved, so concurrent refunds never give back more than was paid (see the check on payments).
 */
export const refunds = pgTable(
  'refunds',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    paymentId: uuid('payment_id')
      .notNull()
      .references(() => payments.id),
    invoiceId: uuid('invoice_id')
      .notNull()
      .references(() => invoices.id),
    clientId: uuid('client_id')
      .notNull()
      .references(() => clients.id),
    /** 'card' = through the processor; the others are recorded offline */
    method: text('method', { enum: PAYMENT_METHODS_DB }).notNull(),
    status: text('status', { enum: ['pending', 'succeeded', 'failed'] }).notNull(),
    amount: money('amount').notNull(),
    currency: text('currency').notNull(),
    refundedOn: date('refunded_on').notNull(),
    reason: text('reason').notNull().default(''),
    reference: text('reference').notNull().default(''),
    processorRefundId: text('processor_refund_id'),
    /** the office form's key, made once: a second request with it finds the first */
    clientKey: text('client_key'),
    failureMessage: text('failure_message'),
    receiptNo: integer('receipt_no'),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('refunds_payment_idx').on(t.tenantId, t.paymentId),
    uniqueIndex('refunds_processor_uq')
      .on(t.processorRefundId)
      .where(sql`processor_refund_id is not null`),
    uniqueIndex('refunds_client_key_uq')
      .on(t.tenantId, t.clientKey)
      .where(sql`client_key is not null`),
    uniqueIndex('refunds_receipt_uq')
      .on(t.tenantId, t.receiptNo)
      .where(sql`receipt_no is not null`),
    check('refunds_amount_positive', sql`amount > 0`),
    tenantPolicy('refunds'),
  ],
);

/**
 * A hosted checkout opened for an invoice: what was asked (amount, currency) so the processor's
 * answer can be checked against it, and whether it is still open. `amount` is in major units.
 */
export const checkoutSessions = pgTable(
  'checkout_sessions',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    invoiceId: uuid('invoice_id')
      .notNull()
      .references(() => invoices.id),
    clientId: uuid('client_id')
      .notNull()
      .references(() => clients.id),
    processorSessionId: text('processor_session_id').notNull(),
    amount: money('amount').notNull(),
    currency: text('currency').notNull(),
    status: text('status', { enum: ['open', 'complete', 'expired'] })
      .notNull()
      .default('open'),
    url: text('url').notNull(),
    createdAt: createdAt(),
    completedAt: timestamp('completed_at', { withTimezone: true }),
  },
  (t) => [
    uniqueIndex('checkout_sessions_processor_uq').on(t.processorSessionId),
    index('checkout_sessions_invoice_idx').on(t.tenantId, t.invoiceId),
    // The reconciliation's sweep reads only the open ones (payments/checkout-expiry.ts).
    index('checkout_sessions_open_idx')
      .on(t.tenantId, t.createdAt)
      .where(sql`status = 'open'`),
    tenantPolicy('checkout_sessions'),
  ],
);

/**
 * Events from the processor, stored by the webhook (after its signature check) or by the
 * reconciliation job, under the firm named in the object's metadata. A queue job applies each;
 * `applied_at` is set in the same transaction as the event's effect, so an event delivered five
 * times is applied once.
 */
export const processorEvents = pgTable(
  'processor_events',
  {
    id: text('id').primaryKey(),
    tenantId: tenantId().references(() => firms.id),
    type: text('type').notNull(),
    /** the processor's `created` (unix seconds) */
    processorCreated: bigint('processor_created', { mode: 'number' }).notNull(),
    payload: jsonb('payload').notNull(),
    receivedVia: text('received_via', { enum: ['webhook', 'reconcile'] }).notNull(),
    receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
    appliedAt: timestamp('applied_at', { withTimezone: true }),
    /** what applying it did, in words ("Payment RCT-0004 recorded", "Ignored: not ours") */
    outcome: text('outcome'),
  },
  (t) => [
    index('processor_events_unapplied_idx')
      .on(t.tenantId, t.receivedAt)
      .where(sql`applied_at is null`),
    tenantPolicy('processor_events'),
  ],
);

/**
 * The reconciliation job's place in the processor's event list (one row per processor account;
 * no firm data, so no tenant). Only the job role reads and writes it.
 */
export const processorSync = pgTable('processor_sync', {
  account: text('account').primaryKey(),
  lastEventId: text('last_event_id'),
  lastEventCreated: bigint('last_event_created', { mode: 'number' }),
  updatedAt: updatedAt(),
});

/**
 * What a client paid beyond an invoice's amount due: kept as a credit on the client's account,
 * never lost. The office sees it on the invoice and the client; using it on a later invoice is a
 * recorded allocation (used_on_invoice_id).
 */
export const clientCredits = pgTable(
  'client_credits',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    clientId: uuid('client_id')
      .notNull()
      .references(() => clients.id),
    paymentId: uuid('payment_id')
      .notNull()
      .references(() => payments.id),
    amount: money('amount').notNull(),
    currency: text('currency').notNull(),
    note: text('note').notNull().default(''),
    usedOnInvoiceId: uuid('used_on_invoice_id').references(() => invoices.id),
    meta: jsonb('meta'),
    createdAt: createdAt(),
  },
  (t) => [index('client_credits_client_idx').on(t.tenantId, t.clientId), tenantPolicy('client_credits')],
);
