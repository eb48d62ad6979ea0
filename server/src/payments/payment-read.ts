import {
  RECEIPT_PREFIX,
  type ClientCreditView,
  type PaymentDetail,
  type PaymentMethod,
  type RefundStatus,
  type RefundView,
} from '@layerbook/contracts';
import type { SqlQuery } from '@layerbook/db';
import { documentNumber } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { moneyOut } from '../billing/money';

/** A number of the firm's receipt series (payments and refunds share it; RECEIPT_PREFIX). */
export const receiptNumber = (n: number | null): string | null => (n === null ? null : documentNumber(RECEIPT_PREFIX, n));

interface PaymentRow {
  id: string;
  invoice_id: string;
  method: PaymentMethod;
  amount: string;
  amount_applied: string;
  amount_refunded: string;
  pending_refunds: string;
  /** this payment's credit already used on another invoice: no longer the client's to take back */
  credit_used: string;
  currency: string;
  received_on: string;
  reference: string;
  receipt_no: number | null;
}

interface RefundRow {
  id: string;
  payment_id: string;
  method: PaymentMethod;
  status: RefundStatus;
  amount: string;
  currency: string;
  refunded_on: string;
  reason: string;
  reference: string;
  receipt_no: number | null;
  failure_message: string | null;
}

type Rows = Record<string, unknown>[];

/**
 * The reads behind an invoice's payments (payments, then refunds) and its client credits, to run
 * with the invoice's other reads in one round trip (readAllInOneTrip); invoicePayments and
 * invoiceCredits make the views from their rows.
 */
export const invoicePaymentReads = (tenantId: string, invoiceId: string): SqlQuery[] => [
  {
    name: 'invoice_payments',
    text: `select p.id, p.invoice_id, p.method, p.amount::text as amount, p.amount_applied::text as amount_applied,
            p.amount_refunded::text as amount_refunded, p.currency, p.received_on::text as received_on, p.reference, p.receipt_no,
            coalesce((select sum(r.amount) from refunds r where r.tenant_id = p.tenant_id and r.payment_id = p.id and r.status = 'pending'), 0)::text
              as pending_refunds,
            coalesce((select sum(c.amount) from client_credits c where c.tenant_id = p.tenant_id and c.payment_id = p.id
                        and c.used_on_invoice_id is not null), 0)::text as credit_used
       from payments p where p.tenant_id = $1 and p.invoice_id = $2 order by p.received_on, p.created_at`,
    values: [tenantId, invoiceId],
  },
  {
    name: 'invoice_refunds',
    text: `select id, payment_id, method, status, amount::text as amount, currency, refunded_on::text as refunded_on, reason, reference,
            receipt_no, failure_message
       from refunds where tenant_id = $1 and invoice_id = $2 order by created_at`,
    values: [tenantId, invoiceId],
  },
];

/** An invoice's payments, oldest first, each with its refunds and what may still be refunded. */
export function invoicePayments(paymentRows: Rows, refundRows: Rows): PaymentDetail[] {
  const refunds = refundRows as unknown as RefundRow[];
  return (paymentRows as unknown as PaymentRow[]).map((p) => ({
    id: p.id,
    invoiceId: p.invoice_id,
    method: p.method,
    amount: moneyOut(p.amount, p.currency),
    amountApplied: moneyOut(p.amount_applied, p.currency),
    amountRefunded: moneyOut(p.amount_refunded, p.currency),
    refundable: moneyOut(
      Decimal.max(0, new Decimal(p.amount).minus(p.amount_refunded).minus(p.pending_refunds).minus(p.credit_used)).toString(),
      p.currency,
    ),
    currency: p.currency,
    receivedOn: p.received_on,
    reference: p.reference,
    receiptNumber: receiptNumber(p.receipt_no),
    refunds: refunds.filter((r) => r.payment_id === p.id).map(toRefundView),
  }));
}

export const toRefundView = (r: RefundRow): RefundView => ({
  id: r.id,
  paymentId: r.payment_id,
  method: r.method,
  status: r.status,
  amount: moneyOut(r.amount, r.currency),
  currency: r.currency,
  refundedOn: r.refunded_on,
  reason: r.reason,
  reference: r.reference,
  receiptNumber: receiptNumber(r.receipt_no),
  failureMessage: r.failure_message,
});

export const invoiceCreditsRead = (tenantId: string, invoiceId: string): SqlQuery => ({
  name: 'invoice_client_credits',
  text: `select c.id, c.payment_id, c.amount::text as amount, c.currency, c.note, c.created_at, c.used_on_invoice_id
       from client_credits c join payments p on p.tenant_id = c.tenant_id and p.id = c.payment_id
      where c.tenant_id = $1 and p.invoice_id = $2 order by c.created_at`,
  values: [tenantId, invoiceId],
});

interface CreditRow {
  id: string;
  payment_id: string;
  amount: string;
  currency: string;
  note: string;
  created_at: Date;
  used_on_invoice_id: string | null;
}

/** Overpayments made on this invoice, kept as the client's credit (from invoiceCreditsRead's rows). */
export function invoiceCredits(rows: Rows): ClientCreditView[] {
  return (rows as unknown as CreditRow[]).map((c) => ({
    id: c.id,
    paymentId: c.payment_id,
    amount: moneyOut(c.amount, c.currency),
    currency: c.currency,
    note: c.note,
    createdAt: c.created_at.toISOString(),
    usedOnInvoiceId: c.used_on_invoice_id,
  }));
}
