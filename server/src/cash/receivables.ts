import type { CashAgingBucket, CashReceivableInvoice, CashReceivableInvoices, CashReceivables } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import Decimal from 'decimal.js';
import { moneyOut } from '../billing/money';
import { AGING_BUCKETS, ageReceivables, agingByClient, bucketDueDates, type ReceivableInput } from './domain';
import { firmClock, type FirmClock } from './firm-clock';
import { bucketsOut } from './money';
import { receivableInvoices, receivablesByClientAge, type ReceivableRow, type ReceivableSumRow } from './receivables-sql';

/** The aging date asked for (default today in the firm's zone), and whether it is in the past. */
function agingDay(clock: FirmClock, asOfAsked: string | undefined): { asOf: string; past: boolean } {
  const asOf = asOfAsked ?? clock.today;
  return { asOf, past: asOf < clock.today };
}

/** The amount owed is the due part; retainage is carried beside it so the domain keeps it apart. */
function receivableInput(id: string, row: { due_on: string; owed: string; retainage: string }, invoiceCount = 1): ReceivableInput {
  if (row.retainage === '0' || row.retainage === '0.00') return { id, dueDate: row.due_on, amount: row.owed, invoiceCount };
  return { id, dueDate: row.due_on, amount: new Decimal(row.owed).plus(row.retainage), retainageHeld: row.retainage, invoiceCount };
}

/**
 * GET /api/cash/receivables: what is owed by age as of a date, retainage apart, in total and per
 * client — aged by packages/domain. PostgreSQL sums the open invoices per client and age first (an
 * age's due dates come from the domain), so the answer stays small however many invoices are open;
 * the invoices themselves come with the drill-down.
 */
export async function cashReceivables(tx: TenantTx, now: Date, asOfAsked: string | undefined): Promise<CashReceivables> {
  const clock = await firmClock(tx, now);
  const { asOf, past } = agingDay(clock, asOfAsked);
  const firstDueDates = AGING_BUCKETS.slice(0, 4).map((bucket) => bucketDueDates(bucket, asOf).from);
  const { rows } = await tx.client.query<ReceivableSumRow>(receivablesByClientAge(past), [tx.tenantId, asOf, ...firstDueDates]);
  const report = ageReceivables(
    rows.map((r, i) => receivableInput(String(i), r, r.invoice_count)),
    asOf,
  );
  const names = new Map(rows.map((r) => [r.client_id, r.client_name]));
  const money = (d: Decimal) => moneyOut(d, clock.currency);
  const clients = agingByClient(report.invoices, (i) => rows[Number(i)].client_id).map((c) => ({
    clientId: c.clientId,
    clientName: names.get(c.clientId) ?? '',
    buckets: bucketsOut(c.buckets, clock.currency),
    total: money(c.total),
    retainage: money(c.retainage),
    invoiceCount: c.invoiceCount,
  }));
  return {
    asOf,
    currency: clock.currency,
    buckets: bucketsOut(report.buckets, clock.currency),
    total: money(report.total),
    retainage: money(report.retainage),
    invoiceCount: clients.reduce((n, c) => n + c.invoiceCount, 0),
    clients,
  };
}

/**
 * GET /api/cash/receivables/invoices: the open invoices behind a figure — one age (its due dates
 * from the domain), one client, both or neither — each aged by packages/domain, most overdue first.
 * The receivables CSV is this list with nothing chosen.
 */
export async function cashReceivableInvoices(
  tx: TenantTx,
  now: Date,
  drill: { asOf?: string; age?: CashAgingBucket; client?: string },
): Promise<CashReceivableInvoices> {
  const clock = await firmClock(tx, now);
  const { asOf, past } = agingDay(clock, drill.asOf);
  const due = drill.age ? bucketDueDates(drill.age, asOf) : { from: null, to: null };
  const { rows } = await tx.client.query<ReceivableRow>(receivableInvoices(past), [
    tx.tenantId,
    asOf,
    drill.client ?? null,
    due.from,
    due.to,
  ]);
  const report = ageReceivables(
    rows.map((r) => receivableInput(r.id, r)),
    asOf,
  );
  const money = (d: Decimal) => moneyOut(d, clock.currency);
  const invoices: CashReceivableInvoice[] = report.invoices.map((a, i) => {
    const r = rows[i];
    return {
      invoiceId: r.id,
      number: r.number_text,
      clientId: r.client_id,
      clientName: r.client_name,
      jobId: r.job_id,
      jobTitle: r.job_title,
      dueOn: r.due_on,
      daysPastDue: a.daysPastDue,
      bucket: a.bucket,
      amountDue: money(a.open),
      retainage: money(a.retainage),
    };
  });
  invoices.sort((a, b) => b.daysPastDue - a.daysPastDue || (a.number < b.number ? -1 : 1));
  return { asOf, currency: clock.currency, age: drill.age ?? null, clientId: drill.client ?? null, invoices };
}
