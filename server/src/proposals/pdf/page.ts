import { translator, type Translate } from '../../i18n/catalog';
import type PDFDocument from 'pdfkit';
import type { FontName } from './fonts';

export type Doc = typeof PDFDocument;

/** Our own palette: lime-plaster ivory page, umber headings, verdigris accents, ochre for attention. */
export const COLOURS = {
  page: '#F7F2E8',
  ink: '#2F2419',
  muted: '#5D5246',
  umber: '#6B4A2F',
  verdigris: '#3E7C6F',
  ochre: '#A8741A',
  rule: '#D8C9AE',
  band: '#EFE6D4',
} as const;

export const MARGIN = 54;
const FOOTER_SPACE = 28;

export const contentWidth = (doc: Doc) => doc.page.width - MARGIN * 2;
const bottom = (doc: Doc) => doc.page.height - MARGIN - FOOTER_SPACE;

/** Starts a new page when `height` more points would not fit above the footer. */
export function ensureSpace(doc: Doc, height: number): void {
  if (doc.y + height > bottom(doc)) doc.addPage();
}

export function paintBackground(doc: Doc): void {
  doc.save().rect(0, 0, doc.page.width, doc.page.height).fill(COLOURS.page).restore();
  doc.fillColor(COLOURS.ink);
}

export function sectionHeading(doc: Doc, title: string): void {
  ensureSpace(doc, 60);
  doc.moveDown(0.8);
  doc
    .font('heading')
    .fontSize(15)
    .fillColor(COLOURS.umber)
    .text(title, MARGIN, doc.y, { width: contentWidth(doc) });
  const y = doc.y + 3;
  doc
    .save()
    .moveTo(MARGIN, y)
    .lineTo(MARGIN + contentWidth(doc), y)
    .lineWidth(0.75)
    .strokeColor(COLOURS.rule)
    .stroke()
    .restore();
  doc.y = y + 8;
  doc.fillColor(COLOURS.ink);
}

export function subHeading(doc: Doc, title: string): void {
  ensureSpace(doc, 40);
  doc.moveDown(0.4);
  doc
    .font('strong')
    .fontSize(11.5)
    .fillColor(COLOURS.verdigris)
    .text(title, MARGIN, doc.y, { width: contentWidth(doc) });
  doc.moveDown(0.2);
  doc.fillColor(COLOURS.ink);
}

export function paragraph(doc: Doc, text: string, font: FontName = 'text', colour: string = COLOURS.ink, size = 10): void {
  doc.font(font).fontSize(size).fillColor(colour);
  ensureSpace(doc, doc.heightOfString(text, { width: contentWidth(doc) }));
  doc.text(text, MARGIN, doc.y, { width: contentWidth(doc) });
  doc.fillColor(COLOURS.ink);
}

export function bullets(doc: Doc, items: readonly string[], size = 10): void {
  const indent = 12;
  for (const item of items) {
    doc.font('text').fontSize(size);
    const width = contentWidth(doc) - indent;
    ensureSpace(doc, doc.heightOfString(item, { width }) + 2);
    const y = doc.y;
    doc.fillColor(COLOURS.umber).text('•', MARGIN, y, { width: indent, lineBreak: false });
    doc.fillColor(COLOURS.ink).text(item, MARGIN + indent, y, { width });
    doc.y += 2;
  }
}

export interface Cell {
  readonly text: string;
  /** share of the content width */
  readonly share: number;
  readonly align?: 'left' | 'right';
  readonly font?: FontName;
}

/** One table row: cells side by side, the row as tall as its tallest cell, never split across pages. */
export function row(doc: Doc, cells: readonly Cell[], opts: { shaded?: boolean; size?: number } = {}): void {
  const size = opts.size ?? 10;
  const pad = 4;
  const total = contentWidth(doc);
  const widths = cells.map((c) => c.share * total);
  const heights = cells.map((c, i) =>
    doc
      .font(c.font ?? 'text')
      .fontSize(size)
      .heightOfString(c.text || ' ', { width: widths[i] - pad * 2 }),
  );
  const height = Math.max(...heights) + pad * 2;
  ensureSpace(doc, height);
  const top = doc.y;
  if (opts.shaded) doc.save().rect(MARGIN, top, total, height).fill(COLOURS.band).restore();
  let x = MARGIN;
  cells.forEach((c, i) => {
    doc
      .font(c.font ?? 'text')
      .fontSize(size)
      .fillColor(COLOURS.ink)
      .text(c.text, x + pad, top + pad, { width: widths[i] - pad * 2, align: c.align ?? 'left' });
    x += widths[i];
  });
  doc
    .save()
    .moveTo(MARGIN, top + height)
    .lineTo(MARGIN + total, top + height)
    .lineWidth(0.5)
    .strokeColor(COLOURS.rule)
    .stroke()
    .restore();
  doc.x = MARGIN;
  doc.y = top + height;
}

/** Writes the reference line at the foot of every page once the content is laid out ("page 2 of 3" in the reader's words). */
export function footers(doc: Doc, line: string, t: Translate = translator('en')): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const keep = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    doc
      .font('text')
      .fontSize(8.5)
      .fillColor(COLOURS.muted)
      .text(`${line} · ${t('pdf.page', { n: i - range.start + 1, total: range.count })}`, MARGIN, doc.page.height - MARGIN - 10, {
        width: contentWidth(doc),
        align: 'center',
        lineBreak: false,
      });
    doc.page.margins.bottom = keep;
  }
}
