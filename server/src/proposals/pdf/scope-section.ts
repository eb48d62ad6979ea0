import type { ProposalSnapshot } from '@layerbook/contracts';
import type { Translate } from '../../i18n/catalog';
import type { Formats } from './format';
import { row, sectionHeading, subHeading, type Doc } from './page';

/** Room by room: each surface, its measured size and the finish every option puts on it. */
export function scopeSection(doc: Doc, s: ProposalSnapshot, f: Formats, t: Translate): void {
  sectionHeading(doc, t('pdf.proposal.scope'));
  const labels = new Map(s.options.map((o) => [o.id, o.label]));
  const single = s.options.length === 1;
  for (const room of s.scope) {
    subHeading(doc, room.name);
    row(
      doc,
      [
        { text: t('pdf.proposal.surface'), share: 0.34, font: 'strong' },
        { text: t('pdf.proposal.measured'), share: 0.18, align: 'right', font: 'strong' },
        { text: single ? t('pdf.proposal.finish') : t('pdf.proposal.finishByOption'), share: 0.48, font: 'strong' },
      ],
      { shaded: true, size: 9.5 },
    );
    for (const surface of room.surfaces) {
      const finishes = surface.finishes
        .map((x) => (single ? (x.finish ?? '—') : `${labels.get(x.optionId) ?? x.optionId}: ${x.finish ?? t('pdf.proposal.notIncluded')}`))
        .join('\n');
      row(doc, [
        { text: surface.name, share: 0.34 },
        { text: f.quantity(surface.quantity, surface.unit), share: 0.18, align: 'right' },
        { text: finishes, share: 0.48 },
      ]);
    }
  }
}
