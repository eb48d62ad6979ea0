import {
  type InvoiceKind,
  type InvoiceStatus,
  type PaymentMethod,
  type PortalInvoiceDetail,
  type PortalInvoiceSummary,
  type PortalStatement,
} from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { jobStatement, type StatementEntry } from '@layerbook/domain';
import type Decimal from 'decimal.js';
import type { ClientPrincipal } from '../http/principal';
import { notFound } from '../http/problem';
import { clientIdOf, firmToday } from '../proposals/client-proposals';
import type { Config } from '../config';
import { payOnlineFor } from '../payments/portal-pay';
import { processorFor } from '../payments/processor';
import { listPortalReceipts } from '../payments/receipts/receipt-read';
import { translator, type Translate } from '../i18n/catalog';
import { clientReader } from '../i18n/reader';
import { moneyOut } from './money';
import { loadPrintableInvoice } from './pdf/printable';

/**
 * What a signed-in client reads of billing: their own invoices once issued (never drafts), each
 * invoice's credit note, and a statement per job. Anything else is "not found", never "forbidden".
 */

interface SummaryRow {
  id: string;
  number_text: string;
  kind: InvoiceKind;
  status: InvoiceStatus;
  is_overdue: boolean;
  job_id: string;
  job_title: string;
  issued_on: string;
  due_on: string;
  currency: string;
  total: string;
  amount_due: string;
  locale: string;
}

const SUMMARY_COLUMNS = `i.id, i.number_text, i.kind, i.status, (i.status in ('issued', 'part_paid') and i.due_on < $3::date) as is_overdue,
  i.job_id, j.title as job_title, i.issued_on::text, i.due_on::text, i.currency, i.total::text,
  (case when i.status = 'void' then 0 else i.total - i.amount_paid - i.amount_credited end)::numeric(14, 2)::text as amount_due,
  i.document->>'locale' as locale`;

const toSummary = (r: SummaryRow): PortalInvoiceSummary => ({
  id: r.id,
  number: r.number_text,
  kind: r.kind,
  status: r.status,
  isOverdue: r.is_overdue,
  jobId: r.job_id,
  jobTitle: r.job_title,
  issuedOn: r.issued_on,
  dueOn: r.due_on,
  currency: r.currency,
  total: moneyOut(r.total, r.currency),
  amountDue: moneyOut(r.amount_due, r.currency),
  locale: r.locale,
});

async function requireClientId(tx: TenantTx, client: ClientPrincipal, what: string): Promise<string> {
  const clientId = await clientIdOf(tx, client);
  if (!clientId) throw notFound(what);
  return clientId;
}

/** The client's issued, part-paid, paid and void invoices, newest first. */
export async function listClientInvoices(tx: TenantTx, client: ClientPrincipal, now: Date): Promise<PortalInvoiceSummary[]> {
  const clientId = await clientIdOf(tx, client);
  if (!clientId) return [];
  const { rows } = await tx.client.query<SummaryRow>(
    `select ${SUMMARY_COLUMNS}
       from invoices i join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id
      where i.tenant_id = $1 and i.client_id = $2 and i.status <> 'draft'
      order by i.issued_on desc, i.number desc`,
    [tx.tenantId, clientId, await firmToday(tx, now)],
  );
  return rows.map(toSummary);
}

/**
 * One invoice of the client's, with whether it can be paid by card now (and why not, when open) and
 * its receipts. `config` says whether online payments are on; without it the invoice offers none.
 */
export async function getClientInvoice(
  tx: TenantTx,
  client: ClientPrincipal,
  id: string,
  now: Date,
  config?: Config,
): Promise<PortalInvoiceDetail> {
  const clientId = await requireClientId(tx, client, 'invoice');
  const { rows } = await tx.client.query<SummaryRow>(
    `select ${SUMMARY_COLUMNS}
       from invoices i join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id
      where i.tenant_id = $1 and i.id = $4 and i.client_id = $2 and i.status <> 'draft'`,
    [tx.tenantId, clientId, await firmToday(tx, now), id],
  );
  if (!rows[0]) throw notFound('invoice');
  const inv = await loadPrintableInvoice(tx, id, { kind: 'client', clientId }, now);
  const note = (
    await tx.client.query<{ id: string; number_text: string; issued_on: string; amount: string }>(
      `select id, number_text, issued_on::text, amount::text from credit_notes where tenant_id = $1 and invoice_id = $2`,
      [tx.tenantId, id],
    )
  ).rows[0];
  const summary = toSummary(rows[0]);
  const online = payOnlineFor(config ? processorFor(config) !== null : false, summary);
  return {
    ...summary,
    lines: inv.lines,
    progress: inv.progress,
    depositCredit: inv.depositCredit,
    taxIncluded: inv.taxIncluded,
    amountPaid: inv.amountPaid,
    amountCredited: inv.amountCredited,
    document: inv.document,
    creditNote: note
      ? { id: note.id, number: note.number_text, issuedOn: note.issued_on, amount: moneyOut(note.amount, inv.currency) }
      : null,
    canPayOnline: online.canPayOnline,
    payOnlineReason: online.payOnlineReason,
    receipts: await listPortalReceipts(tx, id),
  };
}

interface EntryRow {
  kind: 'invoice' | 'creditNote' | 'payment' | 'refund';
  on: string;
  /** the document's number, or the payment's reference */
  text: string;
  /** a credit note's invoice number */
  of_number: string | null;
  invoice_kind: InvoiceKind | null;
  method: PaymentMethod | null;
  amount: string;
}

/**
 * One job of this client: its invoices (issued, never drafts), credit notes, payments and the
 * refunds that went through (a negative credit: the balance owed goes back up), with the running balance.
 * A payment counts with the part that went on its invoice (money beyond it, or in another currency, is
 * the client's credit, not this job's), a refund with the part that came off the invoice.
 */
export async function getClientStatement(tx: TenantTx, client: ClientPrincipal, jobId: string): Promise<PortalStatement> {
  const clientId = await requireClientId(tx, client, 'job');
  const job = (
    await tx.client.query<{ id: string; title: string; currency: string; contract_sum: string; locale: string }>(
      `select j.id, j.title, j.currency, j.contract_sum::text, f.language || '-' || f.country as locale
         from jobs j join firms f on f.id = j.tenant_id where j.tenant_id = $1 and j.id = $2 and j.client_id = $3`,
      [tx.tenantId, jobId, clientId],
    )
  ).rows[0];
  if (!job) throw notFound('job');
  const { rows } = await tx.client.query<EntryRow>(
    `select 'invoice' as kind, i.issued_on::text as on, i.number_text as text, i.kind as invoice_kind, i.total::text as amount, null as method,
            i.number as seq, null as of_number
       from invoices i where i.tenant_id = $1 and i.job_id = $2 and i.status <> 'draft'
     union all
     select 'creditNote', n.issued_on::text, n.number_text, null, n.amount::text, null, n.number, i.number_text
       from credit_notes n join invoices i on i.tenant_id = n.tenant_id and i.id = n.invoice_id
      where n.tenant_id = $1 and i.job_id = $2
     union all
     select 'payment', p.received_on::text, p.reference, null, p.amount_applied::text, p.method, null, null
       from payments p join invoices i on i.tenant_id = p.tenant_id and i.id = p.invoice_id
      where p.tenant_id = $1 and i.job_id = $2 and p.amount_applied > 0
     union all
     select 'refund', r.refunded_on::text, r.reference, null, (r.amount + coalesce(c.amount, 0))::text, r.method, null, null
       from refunds r join invoices i on i.tenant_id = r.tenant_id and i.id = r.invoice_id
       left join lateral (select sum(c.amount) as amount from client_credits c
                           where c.tenant_id = r.tenant_id and c.payment_id = r.payment_id and c.meta->>'refundId' = r.id::text) c on true
      where r.tenant_id = $1 and i.job_id = $2 and r.status = 'succeeded' and r.amount + coalesce(c.amount, 0) > 0
     order by 2, 7 nulls last`,
    [tx.tenantId, jobId],
  );
  const t = translator((await clientReader(tx, clientId)).language);
  const entries: StatementEntry[] = rows.map((r) => ({ kind: r.kind, on: r.on, ref: entryText(r, t), amount: r.amount }));
  const s = jobStatement({ contractSum: job.contract_sum, currency: job.currency, entries });
  const money = (d: Decimal) => moneyOut(d, job.currency);
  return {
    jobId: job.id,
    jobTitle: job.title,
    currency: job.currency,
    locale: job.locale,
    contractSum: moneyOut(job.contract_sum, job.currency),
    lines: s.lines.map((l) => ({
      on: l.on,
      kind: l.kind,
      text: l.ref,
      charge: money(l.charge),
      credit: money(l.credit),
      balance: money(l.balance),
    })),
    invoiced: money(s.invoiced),
    credited: money(s.credited),
    paid: money(s.paid),
    balanceDue: money(s.balanceDue),
    unbilled: money(s.unbilled),
  };
}

/** "INV-0007 Deposit", "CN-0002 for INV-0007", "Payment by cheque 1042", "Refund to card": in the client's language. */
function entryText(r: EntryRow, t: Translate): string {
  const w = (key: string, params?: Record<string, string>) => t(`invoiceWords.statement.${key}`, params);
  if (r.kind === 'payment' || r.kind === 'refund') {
    const words = w(`${r.kind}.${r.method ?? 'other'}`);
    return r.text ? w('withReference', { words, reference: r.text }) : words;
  }
  if (r.kind === 'invoice' && r.invoice_kind) return w('invoice', { number: r.text, kind: t(`pdf.invoice.kinds.${r.invoice_kind}`) });
  if (r.kind === 'creditNote' && r.of_number) return w('creditNote', { creditNote: r.text, number: r.of_number });
  return r.text;
}
