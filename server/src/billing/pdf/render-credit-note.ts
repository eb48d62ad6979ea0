import { INVOICE_KIND_LABELS } from '@layerbook/contracts';
import { COLOURS, footers, paragraph, row, sectionHeading } from '../../proposals/pdf/page';
import { billingFormats } from './formats';
import { documentHeading } from './heading';
import { summaryRows } from './invoice-sections';
import type { PrintableCreditNote } from './printable';
import { startDocument } from './render-invoice';

/** The credit note PDF: its number, the invoice it cancels, why, and the amount credited. */
export function renderCreditNotePdf(note: PrintableCreditNote, logo: Buffer | null): Promise<Buffer> {
  const d = note.document;
  const f = billingFormats(d.locale, note.currency);
  const { doc, done } = startDocument(`Credit note ${note.number} — ${d.jobTitle}`, d.firm.name);
  documentHeading(doc, d, logo, {
    title: 'CREDIT NOTE',
    facts: [
      ['Number', note.number],
      ['Date', f.date(note.issuedOn)],
      ['For invoice', note.invoice.number],
    ],
  });

  sectionHeading(doc, 'Credit');
  const issued = note.invoice.issuedOn ? ` of ${f.date(note.invoice.issuedOn)}` : '';
  row(doc, [
    { text: `Cancels invoice ${note.invoice.number} (${INVOICE_KIND_LABELS[note.invoice.kind]})${issued} in full`, share: 0.7 },
    { text: f.minus(note.amount), share: 0.3, align: 'right' },
  ]);
  summaryRows(doc, [['Amount credited', f.money(note.amount)]], true);
  doc.moveDown(0.6);
  paragraph(doc, `Reason: ${note.reason}`);
  doc.moveDown(0.4);
  paragraph(doc, `You owe nothing on invoice ${note.invoice.number}.`, 'text', COLOURS.muted, 9.5);
  if (d.footer) {
    doc.moveDown(0.6);
    paragraph(doc, d.footer, 'text', COLOURS.muted, 9);
  }
  footers(doc, `${d.firm.name} · ${note.number}`);
  doc.end();
  return done;
}
