import type {
  CashAgingBucket,
  CashReceivableInvoice,
  CashReceivableInvoices,
  CashReceivables,
  CashReceivablesQuery,
} from '@layerbook/contracts';
import Decimal from 'decimal.js';
import { moneyOut } from '../billing/money';
import { AGING_BUCKETS, ageReceivables, agingByClient, bucketDueDates, type ReceivableInput } from './domain';
import type { StaffPrincipal } from '../http/principal';
import { staffClock, type FirmClock } from './firm-clock';
import { bucketsOut } from './money';
import type { ReportPlan } from './read-only';
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

/** How many clients the receivables answer lists unless all are asked for: those owing most. */
export const CLIENTS_LISTED = 25;

/**
 * GET /api/cash/receivables: what is owed by age as of a date, retainage apart, in total and for the
 * clients owing most (all of them on request) — aged by packages/domain. PostgreSQL sums the open
 * invoices per client and age first (an age's due dates come from the domain), so the answer stays
 * small however many invoices are open; the invoices themselves come with the drill-down.
 */
export function cashReceivables(staff: StaffPrincipal, now: Date, query: CashReceivablesQuery): ReportPlan<CashReceivables> {
  const clock = staffClock(staff, now);
  const { asOf, past } = agingDay(clock, query.asOf);
  const firstDueDates = AGING_BUCKETS.slice(0, 4).map((bucket) => bucketDueDates(bucket, asOf).from);
  const listed = query.clients === 'all' ? null : CLIENTS_LISTED;
  return {
    queries: [
      {
        name: past ? 'cash_receivables_past' : 'cash_receivables_kept',
        text: receivablesByClientAge(past),
        values: [staff.tenantId, asOf, ...firstDueDates, listed],
      },
    ],
    answer: ([sums]) => receivablesOf(sums as unknown as ReceivableSumRow[], asOf, clock.currency),
  };
}

function receivablesOf(rows: readonly ReceivableSumRow[], asOf: string, currency: string): CashReceivables {
  const firm = rows.filter((r) => r.part === 'f');
  const chosen = rows.filter((r) => r.part === 'c');
  const report = ageReceivables(
    firm.map((r, i) => receivableInput(String(i), r, r.invoice_count)),
    asOf,
  );
  const perClient = ageReceivables(
    chosen.map((r, i) => receivableInput(String(i), r, r.invoice_count)),
    asOf,
  );
  const names = new Map(chosen.map((r) => [r.client_id, r.client_name]));
  const money = (d: Decimal) => moneyOut(d, currency);
  const clients = agingByClient(perClient.invoices, (i) => chosen[Number(i)].client_id as string).map((c) => ({
    clientId: c.clientId,
    clientName: names.get(c.clientId) ?? '',
    buckets: bucketsOut(c.buckets, currency),
    total: money(c.total),
    retainage: money(c.retainage),
    invoiceCount: c.invoiceCount,
  }));
  return {
    asOf,
    currency,
    buckets: bucketsOut(report.buckets, currency),
    total: money(report.total),
    retainage: money(report.retainage),
    invoiceCount: report.invoices.reduce((n, a) => n + a.invoiceCount, 0),
    clientCount: firm[0]?.client_count ?? 0,
    clients,
  };
}

/**
 * GET /api/cash/receivables/invoices: the open invoices behind a figure — one age (its due dates
 * from the domain), one client, both or neither — each aged by packages/domain, most overdue first.
 * The receivables CSV is this list with nothing chosen.
 */
export function cashReceivableInvoices(
  staff: StaffPrincipal,
  now: Date,
  drill: { asOf?: string; age?: CashAgingBucket; client?: string },
): ReportPlan<CashReceivableInvoices> {
  const clock = staffClock(staff, now);
  const { asOf, past } = agingDay(clock, drill.asOf);
  const due = drill.age ? bucketDueDates(drill.age, asOf) : { from: null, to: null };
  return {
    queries: [
      {
        name: past ? 'cash_receivable_invoices_past' : 'cash_receivable_invoices_now',
        text: receivableInvoices(past),
        values: [staff.tenantId, asOf, drill.client ?? null, due.from, due.to],
      },
    ],
    answer: ([found]) => {
      const rows = found as unknown as ReceivableRow[];
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
    },
  };
}
