import type { CashReceivableInvoice, CashReceivables } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import Decimal from 'decimal.js';
import { moneyOut } from '../billing/money';
import { ageReceivables, agingByClient, type ReceivableInput } from './domain';
import { firmClock } from './firm-clock';
import { bucketsOut } from './money';
import { RECEIVABLES_AS_OF, RECEIVABLES_NOW, type ReceivableRow } from './receivables-sql';

/**
 * GET /api/cash/receivables: open invoices aged by days past due as of a date (default today in
 * the firm's zone), retainage apart, per client and per invoice — aged by packages/domain.
 */
export async function cashReceivables(tx: TenantTx, now: Date, asOfAsked: string | undefined): Promise<CashReceivables> {
  const clock = await firmClock(tx, now);
  const asOf = asOfAsked ?? clock.today;
  const { rows } = await tx.client.query<ReceivableRow>(asOf >= clock.today ? RECEIVABLES_NOW : RECEIVABLES_AS_OF, [tx.tenantId, asOf]);
  // The amount owed is the due part; retainage is carried beside it so the domain keeps it apart.
  const inputs: ReceivableInput[] = rows.map((r) => {
    if (r.retainage === '0' || r.retainage === '0.00')
      return { id: r.id, dueDate: r.due_on, amount: r.owed.startsWith('-') ? '0' : r.owed };
    const owed = Decimal.max(new Decimal(r.owed), 0);
    return { id: r.id, dueDate: r.due_on, amount: owed.plus(r.retainage), retainageHeld: r.retainage };
  });
  const report = ageReceivables(inputs, asOf);
  const byId = new Map(rows.map((r) => [r.id, r]));
  const names = new Map(rows.map((r) => [r.client_id, r.client_name]));
  const money = (d: Decimal) => moneyOut(d, clock.currency);
  const invoices: CashReceivableInvoice[] = report.invoices.map((a) => {
    const r = byId.get(a.id) as ReceivableRow;
    return {
      invoiceId: a.id,
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
  const clients = agingByClient(report.invoices, (id) => (byId.get(id) as ReceivableRow).client_id).map((c) => ({
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
    clients,
    invoices,
  };
}
