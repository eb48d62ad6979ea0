import type { BillingToday, PaymentMethod } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { SUMMARY_FROM, summaryColumns, type SummaryRow, toSummary } from './invoice-read';
import { openAttentionNotes } from '../payments/attention';
import { receiptNumber } from '../payments/payment-read';
import { moneyOut } from './money';

const LIMIT = 50;

interface ReceivedRow {
  id: string;
  receipt_no: number | null;
  client_id: string;
  client_name: string;
  invoice_id: string;
  number_text: string | null;
  amount: string;
  currency: string;
  method: PaymentMethod;
  received_on: string;
}

/**
 * GET /api/billing/today — drafts to review (queue-drafted first, oldest first), overdue invoices, change orders waiting for
 * the client, payments of the last two days, and what the card processor left for a person to check.
 */
export async function billingToday(tx: TenantTx, now: Date): Promise<BillingToday> {
  const clock = `with clock as materialized (select ($2::timestamptz at time zone f.time_zone)::date as today from firms f where f.id = $1)`;
  const ready = await tx.client.query<SummaryRow>(
    `${clock} select ${summaryColumns('(select today from clock)')} ${SUMMARY_FROM}
      where i.tenant_id = $1 and i.status = 'draft' order by (i.origin = 'queue') desc, i.created_at, i.id limit ${LIMIT}`,
    [tx.tenantId, now],
  );
  const overdue = await tx.client.query<SummaryRow>(
    `${clock} select ${summaryColumns('(select today from clock)')} ${SUMMARY_FROM}
      where i.tenant_id = $1 and i.status in ('issued', 'part_paid') and i.due_on < (select today from clock)
      order by i.due_on, i.created_at limit ${LIMIT}`,
    [tx.tenantId, now],
  );
  const waiting = await tx.client.query<{
    id: string;
    job_id: string;
    job_title: string;
    number: number;
    title: string;
    amount: string;
    currency: string;
    sent_at: Date;
  }>(
    `select co.id, co.job_id, j.title as job_title, co.number, co.title, co.amount::text as amount, j.currency, co.sent_at
       from change_orders co join jobs j on j.tenant_id = co.tenant_id and j.id = co.job_id
      where co.tenant_id = $1 and co.status = 'sent' order by co.sent_at limit ${LIMIT}`,
    [tx.tenantId],
  );
  const received = await tx.client.query<ReceivedRow>(
    `${clock} select p.id, p.receipt_no, p.client_id, c.name as client_name, p.invoice_id, i.number_text, p.amount::text as amount,
            p.currency, p.method, p.received_on::text as received_on
       from payments p join clients c on c.tenant_id = p.tenant_id and c.id = p.client_id
       join invoices i on i.tenant_id = p.tenant_id and i.id = p.invoice_id
      where p.tenant_id = $1 and p.received_on >= (select today from clock) - 1
      order by p.received_on desc, p.created_at desc limit ${LIMIT}`,
    [tx.tenantId, now],
  );
  const needsAttention = await openAttentionNotes(tx);
  return {
    readyToBill: ready.rows.map(toSummary),
    overdue: overdue.rows.map(toSummary),
    changeOrdersWaiting: waiting.rows.map((c) => ({
      id: c.id,
      jobId: c.job_id,
      jobTitle: c.job_title,
      number: c.number,
      title: c.title,
      amount: moneyOut(c.amount, c.currency),
      currency: c.currency,
      sentAt: c.sent_at.toISOString(),
    })),
    paymentsReceived: received.rows.map((p) => ({
      paymentId: p.id,
      receiptNumber: receiptNumber(p.receipt_no),
      clientId: p.client_id,
      clientName: p.client_name,
      invoiceId: p.invoice_id,
      invoiceNumber: p.number_text,
      amount: moneyOut(p.amount, p.currency),
      currency: p.currency,
      method: p.method,
      receivedOn: p.received_on,
    })),
    needsAttention,
  };
}
