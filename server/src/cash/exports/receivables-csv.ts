import { CASH_AGING_BUCKET_LABELS, type CashReceivableInvoices } from '@layerbook/contracts';
import { stringify } from 'csv-stringify/sync';
import { neutralise } from './neutralise';

const HEADER = ['Invoice number', 'Client', 'Job', 'Due on', 'Days past due', 'Age', 'Currency', 'Amount due', 'Retainage held'];

/**
 * The receivables page as a file: the same aging (packages/domain, through the cash API's own
 * service), one row per open invoice, so every bucket and the retainage add up to what the page
 * shows for that day. Days past due is negative before the due date: ours, a plain number.
 * It is as long as the page's full drill-down (the open invoices), so it is written in one piece.
 */
export function receivablesCsv(view: CashReceivableInvoices): string {
  const rows = view.invoices.map((i) => [
    neutralise(i.number),
    neutralise(i.clientName),
    neutralise(i.jobTitle),
    i.dueOn,
    String(i.daysPastDue),
    CASH_AGING_BUCKET_LABELS[i.bucket],
    view.currency,
    i.amountDue,
    i.retainage,
  ]);
  // BOM and CRLF as the other exports (see csv-stream.ts)
  return `\uFEFF${stringify([HEADER, ...rows], { record_delimiter: 'windows' })}`;
}
