import { COLOURS, footers, paragraph, row, sectionHeading } from '../../proposals/pdf/page';
import { printingFor } from './formats';
import { documentHeading } from './heading';
import { summaryRows } from './invoice-sections';
import type { PrintableCreditNote } from './printable';
import { startDocument } from './render-invoice';

/** The credit note PDF, in the client's language: its number, the invoice it cancels, why, and the amount credited. */
export function renderCreditNotePdf(note: PrintableCreditNote, logo: Buffer | null): Promise<Buffer> {
  const d = note.document;
  const { t, f } = printingFor(note, note.currency);
  const { doc, done } = startDocument(`${t('pdf.creditNote.name', { number: note.number })} — ${d.jobTitle}`, d.firm.name);
  documentHeading(
    doc,
    d,
    logo,
    {
      title: t('pdf.creditNote.title'),
      facts: [
        [t('pdf.number'), note.number],
        [t('pdf.date'), f.date(note.issuedOn)],
        [t('pdf.forInvoice'), note.invoice.number],
      ],
    },
    t,
  );

  sectionHeading(doc, t('pdf.creditNote.credit'));
  const cancels = { invoice: note.invoice.number, kind: t(`pdf.invoice.kinds.${note.invoice.kind}`) };
  row(doc, [
    {
      text: note.invoice.issuedOn
        ? t('pdf.creditNote.cancelsOf', { ...cancels, date: f.date(note.invoice.issuedOn) })
        : t('pdf.creditNote.cancels', cancels),
      share: 0.7,
    },
    { text: f.minus(note.amount), share: 0.3, align: 'right' },
  ]);
  summaryRows(doc, [[t('pdf.creditNote.amountCredited'), f.money(note.amount)]], true);
  doc.moveDown(0.6);
  paragraph(doc, t('pdf.reason', { reason: note.reason }));
  doc.moveDown(0.4);
  paragraph(doc, t('pdf.creditNote.oweNothing', { invoice: note.invoice.number }), 'text', COLOURS.muted, 9.5);
  if (d.footer) {
    doc.moveDown(0.6);
    paragraph(doc, d.footer, 'text', COLOURS.muted, 9);
  }
  footers(doc, `${d.firm.name} · ${note.number}`, t);
  doc.end();
  return done;
}
