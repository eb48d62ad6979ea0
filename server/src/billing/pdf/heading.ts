import type { InvoiceDocument } from '@layerbook/contracts';
import { translator, type Translate } from '../../i18n/catalog';
import { COLOURS, contentWidth, type Doc, MARGIN } from '../../proposals/pdf/page';

const LOGO_FIT: [number, number] = [150, 60];

/** What the top right says: the document's name and its numbers and dates, label by label. */
export interface HeadingFacts {
  readonly title: string;
  readonly facts: ReadonlyArray<readonly [label: string, value: string]>;
}

/**
 * Logo top left, the firm's name, address, phone and tax number under it; the document's name and
 * facts on the right; then who it is for, where the work is and the job.
 */
export function documentHeading(
  doc: Doc,
  d: InvoiceDocument,
  logo: Buffer | null,
  heading: HeadingFacts,
  t: Translate = translator('en'),
): void {
  const width = contentWidth(doc);
  const left = width * 0.58;
  let y = MARGIN;
  if (logo) {
    doc.image(logo, MARGIN, y, { fit: LOGO_FIT });
    y += LOGO_FIT[1] + 8;
  }
  doc.font('heading').fontSize(18).fillColor(COLOURS.umber).text(d.firm.name, MARGIN, y, { width: left });
  const firmLines = [...d.firm.addressLines, d.firm.phone, d.firm.taxId ? t('pdf.taxNumber', { taxId: d.firm.taxId }) : ''].filter(Boolean);
  doc.font('text').fontSize(9.5).fillColor(COLOURS.muted).text(firmLines.join('\n'), { width: left });
  const leftBottom = doc.y;

  const right = MARGIN + left;
  const rightWidth = width - left;
  doc
    .font('strong')
    .fontSize(11)
    .fillColor(COLOURS.verdigris)
    .text(heading.title, right, MARGIN + 4, { width: rightWidth, align: 'right' });
  doc.moveDown(0.2);
  doc.font('text').fontSize(9.5).fillColor(COLOURS.ink);
  for (const [label, value] of heading.facts) doc.text(`${label}: ${value}`, { width: rightWidth, align: 'right' });
  doc.y = Math.max(leftBottom, doc.y) + 16;

  const third = width / 3 - 8;
  const top = doc.y;
  const block = (x: number, title: string, lines: readonly string[]) => {
    doc.font('strong').fontSize(9).fillColor(COLOURS.umber).text(title, x, top, { width: third });
    doc
      .font('text')
      .fontSize(10)
      .fillColor(COLOURS.ink)
      .text(lines.filter(Boolean).join('\n') || ' ', { width: third });
    return doc.y;
  };
  const bottoms = [
    block(MARGIN, t('pdf.billTo'), [d.client.name, d.client.email, ...d.client.addressLines]),
    block(MARGIN + third + 12, t('pdf.workAt'), [d.site.label, ...d.site.addressLines]),
    block(MARGIN + (third + 12) * 2, t('pdf.job'), [d.jobTitle]),
  ];
  doc.x = MARGIN;
  doc.y = Math.max(...bottoms) + 4;
}
