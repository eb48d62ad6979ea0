import type { Language, ProposalSnapshot } from '@layerbook/contracts';
import PDFDocument from 'pdfkit';
import { languageOfLocale, localeOf, translator, type Translate } from '../../i18n/catalog';
import { snapshotForReader } from '../snapshot-words';
import { registerFonts } from './fonts';
import { formatsFor } from './format';
import { headingSection } from './heading-section';
import { termsSection, safetySection } from './notes-section';
import { pricesSection, scheduleAndPaymentsSection } from './options-section';
import { footers, MARGIN, paintBackground } from './page';
import { scopeSection } from './scope-section';
import { type SignatureRecord, signatureSection } from './signature-section';

export interface PdfMeta {
  readonly version: number;
  readonly snapshotHash: string;
  /** the acceptance record: given, the PDF is the client's signed copy with it on a last page */
  readonly signature?: SignatureRecord;
  /** the client's language (theirs, else the firm's); left out: the snapshot's own */
  readonly language?: Language;
}

/** `Version N · reference <first 12 of the hash>`: ties the paper to the recorded version. */
export const referenceLine = (meta: PdfMeta, t: Translate = translator('en')) =>
  t('pdf.proposal.reference', { version: meta.version, ref: meta.snapshotHash.slice(0, 12) });

/** The firm's country from the snapshot's locale ("en-US" → "US"). */
const countryOf = (locale: string) => locale.split('-')[1] ?? 'US';

/**
 * The proposal PDF, drawn from the frozen snapshot alone (and, for the signed copy, the acceptance
 * record), in the client's language: our words and the cautions by their keys; numbers, dates and
 * money for the language with the firm's country. What the firm typed stays as typed.
 */
export function renderProposalPdf(stored: ProposalSnapshot, meta: PdfMeta): Promise<Buffer> {
  const language = meta.language ?? languageOfLocale(stored.locale);
  const s = snapshotForReader({ language, locale: localeOf(language, countryOf(stored.locale)) }, stored);
  const t = translator(language);
  const doc = new PDFDocument({
    size: 'LETTER',
    margin: MARGIN,
    bufferPages: true,
    info: {
      Title: t('pdf.proposal.docTitle', { title: s.title, version: meta.version }),
      Author: s.firm.name,
      Subject: t('pdf.proposal.subject', { client: s.client.name }),
    },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  registerFonts(doc);
  paintBackground(doc);
  doc.on('pageAdded', () => paintBackground(doc));

  const f = formatsFor(localeOf(language, countryOf(s.locale)), s.currency);
  const reference = referenceLine(meta, t);
  headingSection(doc, s, f, reference, t);
  scopeSection(doc, s, f, t);
  pricesSection(doc, s, f, t);
  scheduleAndPaymentsSection(doc, s, f, t);
  termsSection(doc, s, t);
  safetySection(doc, s, language, t);
  if (meta.signature) signatureSection(doc, s, meta.signature, f, t);
  footers(doc, `${s.firm.name} · ${reference}`, t);
  doc.end();
  return done;
}
