import type { ProposalSnapshot } from '@layerbook/contracts';
import type { Formats } from './format';
import { row, sectionHeading, subHeading, type Doc } from './page';

/** Room by room: each surface, its measured size and the finish every option puts on it. */
export function scopeSection(doc: Doc, s: ProposalSnapshot, f: Formats): void {
  sectionHeading(doc, 'Scope of work');
  const labels = new Map(s.options.map((o) => [o.id, o.label]));
  const single = s.options.length === 1;
  for (const room of s.scope) {
    subHeading(doc, room.name);
    row(
      doc,
      [
        { text: 'Surface', share: 0.34, font: 'strong' },
        { text: 'Measured', share: 0.18, align: 'right', font: 'strong' },
        { text: single ? 'Finish' : 'Finish by option', share: 0.48, font: 'strong' },
      ],
      { shaded: true, size: 9.5 },
    );
    for (const surface of room.surfaces) {
      const finishes = surface.finishes
        .map((x) => (single ? (x.finish ?? '—') : `${labels.get(x.optionId) ?? x.optionId}: ${x.finish ?? 'not included'}`))
        .join('\n');
      row(doc, [
        { text: surface.name, share: 0.34 },
        { text: f.quantity(surface.quantity, surface.unit), share: 0.18, align: 'right' },
        { text: finishes, share: 0.48 },
      ]);
    }
  }
}
