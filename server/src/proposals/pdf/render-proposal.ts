import type { ProposalSnapshot } from '@layerbook/contracts';
import PDFDocument from 'pdfkit';
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
}

/** `Version N · reference <first 12 of the hash>`: ties the paper to the recorded version. */
export const referenceLine = (meta: PdfMeta) => `Version ${meta.version} · reference ${meta.snapshotHash.slice(0, 12)}`;

/** The proposal PDF, drawn from the frozen snapshot alone (and, for the signed copy, the acceptance record). */
export function renderProposalPdf(s: ProposalSnapshot, meta: PdfMeta): Promise<Buffer> {
  const doc = new PDFDocument({
    size: 'LETTER',
    margin: MARGIN,
    bufferPages: true,
    info: { Title: `${s.title} — proposal, version ${meta.version}`, Author: s.firm.name, Subject: `Proposal for ${s.client.name}` },
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

  const f = formatsFor(s.locale, s.currency);
  const reference = referenceLine(meta);
  headingSection(doc, s, f, reference);
  scopeSection(doc, s, f);
  pricesSection(doc, s, f);
  scheduleAndPaymentsSection(doc, s, f);
  termsSection(doc, s);
  safetySection(doc, s);
  if (meta.signature) signatureSection(doc, s, meta.signature, f);
  footers(doc, `${s.firm.name} · ${reference}`);
  doc.end();
  return done;
}
