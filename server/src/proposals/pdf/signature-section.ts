import type { ProposalSnapshot } from '@layerbook/contracts';
import { acceptedSum, minorUnitDigits } from '@layerbook/domain';
import type { Translate } from '../../i18n/catalog';
import type { Formats } from './format';
import { COLOURS, type Doc, paragraph, row, sectionHeading } from './page';

/** What the client signed, as recorded at acceptance; `signedAt` already in the firm's own zone. */
export interface SignatureRecord {
  readonly signedName: string;
  readonly signedAt: string;
  readonly optionId: string;
  /** the add-ons taken with the option */
  readonly addOnIds: readonly string[];
  readonly ip: string;
  /** SHA-256 of the snapshot the client read and signed, in hex */
  readonly snapshotHash: string;
}

/** The acceptance record: who typed their name, when, for which option and add-ons, from where, and the document's fingerprint. */
export function signatureSection(doc: Doc, s: ProposalSnapshot, sig: SignatureRecord, f: Formats, t: Translate): void {
  doc.addPage();
  sectionHeading(doc, t('pdf.proposal.signedHeading'));
  paragraph(doc, t('pdf.proposal.signedAccepted', { client: s.client.name || sig.signedName, firm: s.firm.name }));
  doc.moveDown(0.4);
  const option = s.options.find((o) => o.id === sig.optionId);
  const addOns = sig.addOnIds.map((id) => s.addOns.find((a) => a.id === id)).filter((a) => a !== undefined);
  const agreed = option && acceptedSum(option, s.addOns, sig.addOnIds, s.currency).total.toFixed(minorUnitDigits(s.currency));
  const lines: Array<[string, string]> = [
    [t('pdf.proposal.typedName'), sig.signedName],
    [t('pdf.proposal.signedAt'), sig.signedAt],
    [t('pdf.proposal.optionChosen'), option ? `${option.label}: ${f.money(option.total)}` : sig.optionId],
    ...addOns.map((a): [string, string] => [t('pdf.proposal.addOnChosen'), `${a.label}: ${f.money(a.total)}`]),
    ...(addOns.length && agreed ? [[t('pdf.proposal.agreedTotal'), f.money(agreed)] as [string, string]] : []),
    [t('pdf.proposal.ip'), sig.ip || t('pdf.proposal.ipNone')],
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
  paragraph(doc, t('pdf.proposal.fingerprint'), 'strong', COLOURS.ink, 9.5);
  paragraph(doc, sig.snapshotHash, 'text', COLOURS.ink, 9);
  doc.moveDown(0.3);
  paragraph(doc, t('pdf.proposal.fingerprintNote'), 'italic', COLOURS.muted, 9);
}
