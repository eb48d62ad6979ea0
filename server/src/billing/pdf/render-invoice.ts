import { INVOICE_KIND_LABELS, INVOICE_STATUS_LABELS } from '@layerbook/contracts';
import PDFDocument from 'pdfkit';
import { registerFonts } from '../../proposals/pdf/fonts';
import { COLOURS, contentWidth, type Doc, footers, MARGIN, paintBackground, paragraph, sectionHeading } from '../../proposals/pdf/page';
import { billingFormats } from './formats';
import { documentHeading } from './heading';
import { linesSection, progressSection, totalsSection } from './invoice-sections';
import type { PrintableInvoice } from './printable';

/** Printed across every page of a draft, so a draft sent on by mistake is never taken for a bill. */
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

function draftMark(doc: Doc): void {
  doc.moveDown(0.3);
  doc
    .font('strong')
    .fontSize(15)
    .fillColor(COLOURS.ochre)
    .text(DRAFT_MARK, MARGIN, doc.y, { width: contentWidth(doc), align: 'center' });
  doc.fillColor(COLOURS.ink);
}

/** The invoice PDF, from the printable invoice alone (and the logo's PNG bytes, when the firm has one). */
export function renderInvoicePdf(inv: PrintableInvoice, logo: Buffer | null): Promise<Buffer> {
  const d = inv.document;
  const f = billingFormats(d.locale, inv.currency);
  const isDraft = inv.status === 'draft';
  const name = isDraft ? 'Draft invoice' : `Invoice ${inv.number ?? ''}`;
  const { doc, done } = startDocument(`${name} — ${d.jobTitle}`, d.firm.name);

  const facts: Array<readonly [string, string]> = [];
  if (inv.number) facts.push(['Number', inv.number]);
  if (inv.issuedOn) facts.push(['Date', f.date(inv.issuedOn)]);
  if (inv.dueOn) facts.push(['Due', f.date(inv.dueOn)]);
  facts.push(['Terms', d.termsText]);
  if (!isDraft) facts.push(['Status', INVOICE_STATUS_LABELS[inv.status]]);
  documentHeading(doc, d, logo, { title: isDraft ? 'DRAFT INVOICE' : 'INVOICE', facts });
  if (isDraft) draftMark(doc);

  const period = inv.periodEnd ? ` for work to ${f.date(inv.periodEnd)}` : '';
  sectionHeading(doc, `${INVOICE_KIND_LABELS[inv.kind]}${period}`);
  if (inv.progress) progressSection(doc, inv.progress, f);
  else linesSection(doc, inv.lines, f);
  totalsSection(doc, inv, f);

  doc.moveDown(0.6);
  if (inv.dueOn && inv.status !== 'void' && inv.status !== 'paid')
    paragraph(doc, `Please pay ${f.money(inv.amountDue)} by ${f.date(inv.dueOn)}.`, 'strong', COLOURS.ink, 10.5);
  if (inv.status === 'void') paragraph(doc, 'This invoice is void: a credit note cancels it in full.', 'strong', COLOURS.ochre, 10.5);
  paragraph(doc, `Deposit rule: ${d.depositCapName}`, 'text', COLOURS.muted, 9);
  if (inv.notes) {
    doc.moveDown(0.4);
    paragraph(doc, inv.notes);
  }
  if (d.footer) {
    doc.moveDown(0.6);
    paragraph(doc, d.footer, 'text', COLOURS.muted, 9);
  }
  footers(doc, `${d.firm.name} · ${isDraft ? DRAFT_MARK : (inv.number ?? '')}`);
  doc.end();
  return done;
}
