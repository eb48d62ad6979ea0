import type { InvoiceKind, InvoiceStatus } from '@layerbook/contracts';
import { moneyOut } from '../../billing/money';
import type { ExportSpec } from './export-spec';
import { neutralise } from './neutralise';

interface InvoiceRow {
  number_text: string | null;
  issued_on: string;
  due_on: string | null;
  status: InvoiceStatus;
  kind: InvoiceKind;
  client_name: string;
  job_title: string;
  currency: string;
  subtotal: string;
  deposit_credit: string;
  tax_included: string;
  total: string;
  amount_paid: string;
  amount_credited: string;
  retainage_held: string;
  amount_due: string;
}

/**
 * Invoices issued in the range (drafts have no issue date, so none), void ones included with
 * their status. Amount due is the invoice list's (total − paid − credited; nothing on a void one).
 * Retainage is a progress application's held to date, as the application states it (each one
 * restates the job's whole retainage, so the column is not summed down a job's invoices).
 */
export const invoicesExport: ExportSpec<InvoiceRow> = {
  header: [
    'Invoice number',
    'Issued on',
    'Due on',
    'Status',
    'Kind',
    'Client',
    'Job',
    'Currency',
    'Subtotal',
    'Deposit credit',
    'Tax included',
    'Total',
    'Paid',
    'Credited',
    'Retainage held to date',
    'Amount due',
  ],
  sql: `select i.number_text, i.issued_on::text as issued_on, i.due_on::text as due_on, i.status, i.kind, c.name as client_name,
      j.title as job_title, i.currency, i.subtotal::text as subtotal, i.deposit_credit::text as deposit_credit,
      i.tax_included::text as tax_included, i.total::text as total, i.amount_paid::text as amount_paid,
      i.amount_credited::text as amount_credited, i.retainage_held::text as retainage_held,
      (case when i.status = 'void' then 0 else i.total - i.amount_paid - i.amount_credited end)::text as amount_due
    from invoices i
    join clients c on c.tenant_id = i.tenant_id and c.id = i.client_id
    join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id
    where i.tenant_id = $1 and i.issued_on between $2::date and $3::date
    order by i.issued_on, i.number, i.id`,
  toCells: (r) => [
    neutralise(r.number_text ?? ''),
    r.issued_on,
    r.due_on ?? '',
    r.status,
    r.kind,
    neutralise(r.client_name),
    neutralise(r.job_title),
    r.currency,
    moneyOut(r.subtotal, r.currency),
    moneyOut(r.deposit_credit, r.currency),
    moneyOut(r.tax_included, r.currency),
    moneyOut(r.total, r.currency),
    moneyOut(r.amount_paid, r.currency),
    moneyOut(r.amount_credited, r.currency),
    moneyOut(r.retainage_held, r.currency),
    moneyOut(r.amount_due, r.currency),
  ],
};

interface CreditNoteRow {
  number_text: string;
  issued_on: string;
  invoice_number: string | null;
  client_name: string;
  reason: string;
  currency: string;
  amount: string;
}

/** Credit notes issued in the range (each voids one invoice, named beside it). */
export const creditNotesExport: ExportSpec<CreditNoteRow> = {
  header: ['Credit note number', 'Issued on', 'Invoice number', 'Client', 'Reason', 'Currency', 'Amount'],
  sql: `select cn.number_text, cn.issued_on::text as issued_on, i.number_text as invoice_number, c.name as client_name, cn.reason,
      cn.currency, cn.amount::text as amount
    from credit_notes cn
    join invoices i on i.tenant_id = cn.tenant_id and i.id = cn.invoice_id
    join clients c on c.tenant_id = i.tenant_id and c.id = i.client_id
    where cn.tenant_id = $1 and cn.issued_on between $2::date and $3::date
    order by cn.issued_on, cn.number, cn.id`,
  toCells: (r) => [
    neutralise(r.number_text),
    r.issued_on,
    neutralise(r.invoice_number ?? ''),
    neutralise(r.client_name),
    neutralise(r.reason),
    r.currency,
    moneyOut(r.amount, r.currency),
  ],
};
