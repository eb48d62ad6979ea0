import type { ProposalSnapshot } from '@layerbook/contracts';
import type { Formats } from './format';
import { COLOURS, type Doc, paragraph, row, sectionHeading } from './page';

/** What the client signed, as recorded at acceptance; `signedAt` already in the firm's own zone. */
export interface SignatureRecord {
  readonly signedName: string;
  readonly signedAt: string;
  readonly optionId: string;
  readonly ip: string;
  /** SHA-256 of the snapshot the client read and signed, in hex */
  readonly snapshotHash: string;
}

/** The acceptance record: who typed their name, when, for which option, from where, and the document's fingerprint. */
export function signatureSection(doc: Doc, s: ProposalSnapshot, sig: SignatureRecord, f: Formats): void {
  doc.addPage();
  sectionHeading(doc, 'Signed copy: acceptance record');
  paragraph(doc, `${s.client.name || sig.signedName} accepted this proposal from ${s.firm.name} by typing their name, as recorded below.`);
  doc.moveDown(0.4);
  const option = s.options.find((o) => o.id === sig.optionId);
  const lines: Array<[string, string]> = [
    ['Typed name', sig.signedName],
    ['Signed at', sig.signedAt],
    ['Option chosen', option ? `${option.label}: ${f.money(option.total)}` : sig.optionId],
    ['IP address', sig.ip || 'not recorded'],
  ];
  lines.forEach(([label, value], i) =>
    row(
      doc,
      [
        { text: label, share: 0.3 },
        { text: value, share: 0.7 },
      ],
      { shaded: i % 2 === 0 },
    ),
  );
  doc.moveDown(0.6);
  paragraph(doc, 'Document fingerprint (SHA-256 of the proposal as sent and signed):', 'strong', COLOURS.ink, 9.5);
  paragraph(doc, sig.snapshotHash, 'text', COLOURS.ink, 9);
  doc.moveDown(0.3);
  paragraph(
    doc,
    'The same fingerprint is kept with the firm’s record of the acceptance; any change to the proposal would give a different one.',
    'italic',
    COLOURS.muted,
    9,
  );
}
