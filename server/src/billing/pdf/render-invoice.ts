import PDFDocument from 'pdfkit';
import { registerFonts } from '../../proposals/pdf/fonts';
import { COLOURS, contentWidth, type Doc, footers, MARGIN, paintBackground, paragraph, sectionHeading } from '../../proposals/pdf/page';
import { printingFor } from './formats';
import { documentHeading } from './heading';
import { linesSection, progressSection, totalsSection } from './invoice-sections';
import type { PrintableInvoice } from './printable';

/** Printed across every page of a draft, so a draft sent on by mistake is never taken for a bill (pdf.invoice.draftMark in English). */
export const DRAFT_MARK = 'DRAFT — not an invoice';

/** A PDF document set up like the proposal's: our fonts, the ivory page, buffered pages for the footers. */
export function startDocument(title: string, author: string): { doc: Doc; done: Promise<Buffer> } {
  const doc = new PDFDocument({ size: 'LETTER', margin: MARGIN, bufferPages: true, info: { Title: title, Author: author } });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  registerFonts(doc);
  paintBackground(doc);
  doc.on('pageAdded', () => paintBackground(doc));
  return { doc, done };
}

function draftMark(doc: Doc, mark: string): void {
  doc.moveDown(0.3);
  doc
    .font('strong')
    .fontSize(15)
    .fillColor(COLOURS.ochre)
    .text(mark, MARGIN, doc.y, { width: contentWidth(doc), align: 'center' });
  doc.fillColor(COLOURS.ink);
}

/** The invoice PDF, from the printable invoice alone (and the logo's PNG bytes, when the firm has one), in the client's language. */
export function renderInvoicePdf(inv: PrintableInvoice, logo: Buffer | null): Promise<Buffer> {
  const d = inv.document;
  const { t, f } = printingFor(inv, inv.currency);
  const isDraft = inv.status === 'draft';
  const mark = t('pdf.invoice.draftMark');
  const name = isDraft ? t('pdf.invoice.draftName') : t('pdf.invoice.name', { number: inv.number ?? '' });
  const { doc, done } = startDocument(`${name} — ${d.jobTitle}`, d.firm.name);

  const facts: Array<readonly [string, string]> = [];
  if (inv.number) facts.push([t('pdf.number'), inv.number]);
  if (inv.issuedOn) facts.push([t('pdf.date'), f.date(inv.issuedOn)]);
  if (inv.dueOn) facts.push([t('pdf.invoice.due'), f.date(inv.dueOn)]);
  facts.push([t('pdf.invoice.terms'), d.termsText]);
  if (!isDraft) facts.push([t('pdf.invoice.status'), t(`pdf.invoice.statuses.${inv.isOverdue ? 'overdue' : inv.status}`)]);
  documentHeading(doc, d, logo, { title: isDraft ? t('pdf.invoice.draftTitle') : t('pdf.invoice.title'), facts }, t);
  if (isDraft) draftMark(doc, mark);

  const kind = t(`pdf.invoice.kinds.${inv.kind}`);
  sectionHeading(doc, inv.periodEnd ? t('pdf.invoice.kindForWorkTo', { kind, date: f.date(inv.periodEnd) }) : kind);
  if (inv.progress) progressSection(doc, inv.progress, f, t);
  else linesSection(doc, inv.lines, f, t);
  totalsSection(doc, inv, f, t);

  doc.moveDown(0.6);
  if (inv.dueOn && inv.status !== 'void' && inv.status !== 'paid') {
    const pay = inv.isOverdue ? 'pdf.invoice.pleasePayOverdue' : 'pdf.invoice.pleasePay';
    paragraph(doc, t(pay, { amount: f.money(inv.amountDue), date: f.date(inv.dueOn) }), 'strong', COLOURS.ink, 10.5);
  }
  if (inv.status === 'void') paragraph(doc, t('pdf.invoice.void'), 'strong', COLOURS.ochre, 10.5);
  // The jurisdiction's cap on deposits, named where it applies: on the deposit itself.
  if (inv.kind === 'deposit') paragraph(doc, t('pdf.depositRule', { rule: d.depositCapName }), 'text', COLOURS.muted, 9);
  if (inv.notes) {
    doc.moveDown(0.4);
    paragraph(doc, inv.notes);
  }
  if (d.footer) {
    doc.moveDown(0.6);
    paragraph(doc, d.footer, 'text', COLOURS.muted, 9);
  }
  footers(doc, `${d.firm.name} · ${isDraft ? mark : (inv.number ?? '')}`, t);
  doc.end();
  return done;
}
