import type { BillingToday } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { SUMMARY_FROM, summaryColumns, type SummaryRow, toSummary } from './invoice-read';
import { moneyOut } from './money';

const LIMIT = 50;

/** GET /api/billing/today — drafts to review (queue-drafted first, oldest first), overdue invoices, change orders waiting for the client. */
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
  };
}
