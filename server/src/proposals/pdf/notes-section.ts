import type { ProposalSnapshot } from '@layerbook/contracts';
import { bullets, COLOURS, paragraph, sectionHeading, subHeading, type Doc } from './page';

/** Exclusions, terms and notes: only the parts the firm wrote. */
export function termsSection(doc: Doc, s: ProposalSnapshot): void {
  if (s.exclusions.length) {
    sectionHeading(doc, 'Not included');
    bullets(doc, s.exclusions);
  }
  if (s.terms.text || s.notes) {
    sectionHeading(doc, 'Terms and notes');
    if (s.terms.text) paragraph(doc, s.terms.text);
    if (s.notes) {
      doc.moveDown(0.4);
      paragraph(doc, s.notes);
    }
  }
}

/** The cautions the job's facts triggered, each with its rule, and the standing line always. */
export function safetySection(doc: Doc, s: ProposalSnapshot): void {
  if (s.leadNotice) {
    sectionHeading(doc, s.leadNotice.title);
    bullets(doc, s.leadNotice.bullets, 9.5);
    paragraph(doc, `Rule: ${s.leadNotice.rule}`, 'italic', COLOURS.muted, 9);
    if (s.leadNotice.jurisdiction) paragraph(doc, s.leadNotice.jurisdiction, 'italic', COLOURS.muted, 9);
  }
  sectionHeading(doc, 'Safety and compliance notes');
  if (!s.safety.cautions.length) paragraph(doc, 'No particular hazard was flagged for this work.', 'text', COLOURS.muted);
  for (const c of s.safety.cautions) {
    subHeading(doc, c.title);
    bullets(doc, c.bullets, 9.5);
    paragraph(doc, `Rule: ${c.rule}`, 'italic', COLOURS.muted, 9);
    // Snapshots made before cautions said whose rule it is have no such line.
    if (c.jurisdiction) paragraph(doc, c.jurisdiction, 'italic', COLOURS.muted, 9);
  }
  doc.moveDown(0.5);
  paragraph(doc, s.safety.standing, 'strong', COLOURS.ochre, 9.5);
}
