import type { Language, ProposalSnapshot } from '@layerbook/contracts';
import type { Translate } from '../../i18n/catalog';
import { cautionIn, leadNoticeIn } from '../../i18n/cautions';
import { bullets, COLOURS, paragraph, sectionHeading, subHeading, type Doc } from './page';

/** Exclusions, terms and notes: only the parts the firm wrote (their words as written; our headings translated). */
export function termsSection(doc: Doc, s: ProposalSnapshot, t: Translate): void {
  if (s.exclusions.length) {
    sectionHeading(doc, t('pdf.proposal.notIncludedHeading'));
    bullets(doc, s.exclusions);
  }
  if (s.terms.text || s.notes) {
    sectionHeading(doc, t('pdf.proposal.termsAndNotes'));
    if (s.terms.text) paragraph(doc, s.terms.text);
    if (s.notes) {
      doc.moveDown(0.4);
      paragraph(doc, s.notes);
    }
  }
}

/**
 * The cautions the job's facts triggered, each with its rule, and the standing line always — in the
 * client's language by their keys; every line is kept (one the engine did not write stays in English).
 */
export function safetySection(doc: Doc, s: ProposalSnapshot, language: Language, t: Translate): void {
  if (s.leadNotice) {
    const lead = leadNoticeIn(language, s.leadNotice);
    sectionHeading(doc, lead.title);
    bullets(doc, lead.bullets, 9.5);
    paragraph(doc, t('pdf.proposal.rule', { rule: lead.rule }), 'italic', COLOURS.muted, 9);
    if (lead.jurisdiction) paragraph(doc, lead.jurisdiction, 'italic', COLOURS.muted, 9);
  }
  sectionHeading(doc, t('pdf.proposal.safetyNotes'));
  if (!s.safety.cautions.length) paragraph(doc, t('pdf.proposal.noHazard'), 'text', COLOURS.muted);
  for (const stored of s.safety.cautions) {
    const c = cautionIn(language, stored);
    subHeading(doc, c.title);
    bullets(doc, c.bullets, 9.5);
    paragraph(doc, t('pdf.proposal.rule', { rule: c.rule }), 'italic', COLOURS.muted, 9);
    // Snapshots made before cautions said whose rule it is have no such line.
    if (c.jurisdiction) paragraph(doc, c.jurisdiction, 'italic', COLOURS.muted, 9);
  }
  doc.moveDown(0.5);
  paragraph(
    doc,
    cautionIn(language, { title: '', bullets: [], rule: '', standing: s.safety.standing }).standing,
    'strong',
    COLOURS.ochre,
    9.5,
  );
}
