import type { ProposalSnapshot } from '@layerbook/contracts';
import type { Translate } from '../../i18n/catalog';
import type { Formats } from './format';
import { COLOURS, contentWidth, type Doc, MARGIN } from './page';

/** Firm on the left, the document's dates on the right, then who it is for and where. */
export function headingSection(doc: Doc, s: ProposalSnapshot, f: Formats, reference: string, t: Translate): void {
  const width = contentWidth(doc);
  const top = MARGIN;
  doc
    .font('heading')
    .fontSize(20)
    .fillColor(COLOURS.umber)
    .text(s.firm.name, MARGIN, top, { width: width * 0.6 });
  doc
    .font('text')
    .fontSize(9.5)
    .fillColor(COLOURS.muted)
    .text([...s.firm.addressLines, s.firm.phone].filter(Boolean).join('\n'), { width: width * 0.6 });
  const leftBottom = doc.y;

  const right = MARGIN + width * 0.6;
  doc
    .font('strong')
    .fontSize(10)
    .fillColor(COLOURS.verdigris)
    .text(t('pdf.proposal.title'), right, top + 4, { width: width * 0.4, align: 'right', characterSpacing: 1.5 });
  doc
    .font('text')
    .fontSize(9.5)
    .fillColor(COLOURS.ink)
    .text(t('pdf.proposal.date', { date: f.date(s.issuedOn) }), right, doc.y + 2, { width: width * 0.4, align: 'right' })
    .text(t('pdf.proposal.validUntil', { date: f.date(s.expiresOn) }), { width: width * 0.4, align: 'right' })
    .fillColor(COLOURS.muted)
    .text(reference, { width: width * 0.4, align: 'right' });
  doc.y = Math.max(leftBottom, doc.y) + 18;

  doc.font('heading').fontSize(17).fillColor(COLOURS.ink).text(s.title, MARGIN, doc.y, { width });
  doc.moveDown(0.5);

  const half = width / 2 - 8;
  const y = doc.y;
  doc
    .font('strong')
    .fontSize(9)
    .fillColor(COLOURS.umber)
    .text(t('pdf.proposal.preparedFor'), MARGIN, y, { width: half, characterSpacing: 1 });
  doc
    .font('text')
    .fontSize(10)
    .fillColor(COLOURS.ink)
    .text([s.client.name, s.client.email, s.client.phone].filter(Boolean).join('\n'), { width: half });
  const clientBottom = doc.y;
  doc
    .font('strong')
    .fontSize(9)
    .fillColor(COLOURS.umber)
    .text(t('pdf.proposal.workAt'), MARGIN + half + 16, y, { width: half, characterSpacing: 1 });
  const siteLines = [
    s.site.label,
    ...s.site.addressLines,
    s.site.yearBuilt ? t('pdf.proposal.built', { year: s.site.yearBuilt }) : '',
  ].filter(Boolean);
  doc.font('text').fontSize(10).fillColor(COLOURS.ink).text(siteLines.join('\n'), { width: half });
  doc.x = MARGIN;
  doc.y = Math.max(clientBottom, doc.y) + 6;
}
