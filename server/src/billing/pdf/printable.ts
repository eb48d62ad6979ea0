import type { BillingTerms, InvoiceDocument, InvoiceKind, InvoiceLine, InvoiceStatus, Language, ProgressTable } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import Decimal from 'decimal.js';
import { localDate } from '../../firms/local-date';
import { notFound } from '../../http/problem';
import { invoiceDocument } from '../document';
import { moneyOut } from '../money';
import { localeOf } from '../../i18n/catalog';
import { documentForReader, linesForReader, progressForReader, progressWithWords, type WordsReader } from '../invoice-words';
import { loadBillingSettings } from '../settings';

/** Everything an invoice PDF prints, read in one firm transaction; money at the currency's minor units. */
export interface PrintableInvoice {
  readonly id: string;
  readonly jobId: string;
  /** "INV-0007"; null for a draft */
  readonly number: string | null;
  readonly kind: InvoiceKind;
  readonly status: InvoiceStatus;
  readonly issuedOn: string | null;
  readonly dueOn: string | null;
  readonly periodEnd: string | null;
  readonly currency: string;
  readonly subtotal: string;
  readonly depositCredit: string;
  readonly retainageHeld: string;
  readonly taxIncluded: string;
  readonly total: string;
  readonly amountPaid: string;
  readonly amountCredited: string;
  /** total − paid − credited; 0 for a void invoice */
  readonly amountDue: string;
  /** past its due date with money still due, on the firm's day the PDF is drawn (as the lists say "overdue") */
  readonly isOverdue: boolean;
  readonly lines: readonly InvoiceLine[];
  readonly progress: ProgressTable | null;
  /** frozen at issue; for a draft, what it would print today */
  readonly document: InvoiceDocument;
  readonly notes: string;
  /** the logo's object in the store (null: none, or replaced since the invoice was issued) */
  readonly logoKey: string | null;
  /** the client's language (theirs, else the firm's): the PDF is printed in it, for the office too */
  readonly language: Language;
  /** the firm's country, for number and date conventions with the language */
  readonly country: string;
}

/** A credit note with the invoice it cancels. */
export interface PrintableCreditNote {
  readonly id: string;
  readonly number: string;
  readonly issuedOn: string;
  readonly currency: string;
  readonly amount: string;
  readonly reason: string;
  readonly invoice: { readonly id: string; readonly number: string; readonly issuedOn: string | null; readonly kind: InvoiceKind };
  readonly document: InvoiceDocument;
  readonly logoKey: string | null;
  readonly language: Language;
  readonly country: string;
}

/** Who may read: the office sees every invoice of the firm (drafts included); a client only their own issued ones. */
export type Reader = { readonly kind: 'office' } | { readonly kind: 'client'; readonly clientId: string };

interface InvoiceRow {
  id: string;
  job_id: string;
  number_text: string | null;
  kind: InvoiceKind;
  status: InvoiceStatus;
  issued_on: string | null;
  due_on: string | null;
  period_end: string | null;
  currency: string;
  subtotal: string;
  deposit_credit: string;
  retainage_held: string;
  tax_included: string;
  total: string;
  amount_paid: string;
  amount_credited: string;
  amount_due: string;
  lines: InvoiceLine[];
  progress: ProgressTable | null;
  document: InvoiceDocument | null;
  notes: string;
  billing_terms: BillingTerms | null;
  language: Language;
  country: string;
  time_zone: string;
}

/** The invoice's client reads the PDF: their language, else the firm's, with the firm's country (joins on `i`). */
const READER_SQL = `coalesce(rc.language, rf.language) as language, rf.country, rf.time_zone`;
const READER_JOINS = `join firms rf on rf.id = i.tenant_id left join clients rc on rc.tenant_id = i.tenant_id and rc.id = i.client_id`;

/** The reader's filter as SQL after `where i.tenant_id = $1 and i.id = $2`, with its parameters from $3. */
function readerFilter(reader: Reader): { sql: string; params: unknown[] } {
  return reader.kind === 'office'
    ? { sql: '', params: [] }
    : { sql: `and i.client_id = $3 and i.status <> 'draft'`, params: [reader.clientId] };
}

/** The terms a draft would print: the job's copy once billing started, the firm's current ones before. */
async function draftDocument(tx: TenantTx, jobId: string, jobTerms: BillingTerms | null): Promise<InvoiceDocument> {
  const { settings } = await loadBillingSettings(tx);
  const terms: BillingTerms = jobTerms ?? {
    depositCapName: settings.depositCapName,
    depositCap: null,
    terms: settings.terms,
    retainage: settings.retainage,
    depositCredit: settings.depositCredit,
  };
  return invoiceDocument(tx, jobId, terms, settings);
}

/** The logo file's object key, if the file is still there. */
async function logoKey(tx: TenantTx, fileId: string | null): Promise<string | null> {
  if (!fileId) return null;
  const { rows } = await tx.client.query<{ storage_key: string }>(`select storage_key from files where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    fileId,
  ]);
  return rows[0]?.storage_key ?? null;
}

export async function loadPrintableInvoice(tx: TenantTx, id: string, reader: Reader, now: Date): Promise<PrintableInvoice> {
  const filter = readerFilter(reader);
  const { rows } = await tx.client.query<InvoiceRow>(
    `select i.id, i.job_id, i.number_text, i.kind, i.status, i.issued_on::text, i.due_on::text, i.period_end::text, i.currency,
            i.subtotal::text, i.deposit_credit::text, i.retainage_held::text, i.tax_included::text, i.total::text,
            i.amount_paid::text, i.amount_credited::text,
            (case when i.status = 'void' then 0 else i.total - i.amount_paid - i.amount_credited end)::numeric(14, 2)::text as amount_due,
            i.lines, i.progress, i.document, i.notes, j.billing_terms, ${READER_SQL}
       from invoices i join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id ${READER_JOINS}
      where i.tenant_id = $1 and i.id = $2 ${filter.sql}`,
    [tx.tenantId, id, ...filter.params],
  );
  const r = rows[0];
  if (!r) throw notFound('invoice');
  // The words the system wrote (line labels, terms, the deposit rule) in the client's language, as the rest of the PDF.
  const words: WordsReader = { language: r.language, locale: localeOf(r.language, r.country) };
  const document = documentForReader(words, r.document ?? (await draftDocument(tx, r.job_id, r.billing_terms)));
  const money = (v: string) => moneyOut(v, r.currency);
  return {
    id: r.id,
    jobId: r.job_id,
    number: r.number_text,
    kind: r.kind,
    status: r.status,
    issuedOn: r.issued_on,
    dueOn: r.due_on,
    periodEnd: r.period_end,
    currency: r.currency,
    subtotal: money(r.subtotal),
    depositCredit: money(r.deposit_credit),
    retainageHeld: money(r.retainage_held),
    taxIncluded: money(r.tax_included),
    total: money(r.total),
    amountPaid: money(r.amount_paid),
    amountCredited: money(r.amount_credited),
    amountDue: money(r.amount_due),
    isOverdue:
      (r.status === 'issued' || r.status === 'part_paid') &&
      r.due_on !== null &&
      r.due_on < localDate(r.time_zone, now) &&
      new Decimal(r.amount_due).gt(0),
    lines: linesForReader(words, r.lines),
    // A draft is a preview: its default value line reads in the client's words before issue keeps the key.
    progress: progressForReader(words, r.status === 'draft' ? progressWithWords(r.progress) : r.progress),
    document,
    notes: r.notes,
    logoKey: await logoKey(tx, document.firm.logoFileId),
    language: r.language,
    country: r.country,
  };
}

interface CreditNoteRow {
  id: string;
  number_text: string;
  issued_on: string;
  currency: string;
  amount: string;
  reason: string;
  invoice_id: string;
  invoice_number: string | null;
  invoice_issued_on: string | null;
  invoice_kind: InvoiceKind;
  job_id: string;
  invoice_document: InvoiceDocument | null;
  billing_terms: BillingTerms | null;
  language: Language;
  country: string;
}

export async function loadPrintableCreditNote(tx: TenantTx, id: string, reader: Reader): Promise<PrintableCreditNote> {
  const filter = readerFilter(reader);
  const { rows } = await tx.client.query<CreditNoteRow>(
    `select n.id, n.number_text, n.issued_on::text, n.currency, n.amount::text, n.reason, i.id as invoice_id,
            i.number_text as invoice_number, i.issued_on::text as invoice_issued_on, i.kind as invoice_kind, i.job_id,
            i.document as invoice_document, j.billing_terms, ${READER_SQL}
       from credit_notes n
       join invoices i on i.tenant_id = n.tenant_id and i.id = n.invoice_id
       join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id ${READER_JOINS}
      where n.tenant_id = $1 and n.id = $2 ${filter.sql}`,
    [tx.tenantId, id, ...filter.params],
  );
  const r = rows[0];
  if (!r) throw notFound('credit note');
  // The invoice's own document, frozen when it was issued: the credit note speaks to the same client.
  const words: WordsReader = { language: r.language, locale: localeOf(r.language, r.country) };
  const document = documentForReader(words, r.invoice_document ?? (await draftDocument(tx, r.job_id, r.billing_terms)));
  return {
    id: r.id,
    number: r.number_text,
    issuedOn: r.issued_on,
    currency: r.currency,
    amount: moneyOut(r.amount, r.currency),
    reason: r.reason,
    invoice: { id: r.invoice_id, number: r.invoice_number ?? '', issuedOn: r.invoice_issued_on, kind: r.invoice_kind },
    document,
    logoKey: await logoKey(tx, document.firm.logoFileId),
    language: r.language,
    country: r.country,
  };
}
