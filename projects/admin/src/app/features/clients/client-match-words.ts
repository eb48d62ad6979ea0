import { CLIENT_MATCH_REASON_LABELS, type ClientMatch } from '@layerbook/contracts/types';

/** "same e-mail, phone and name": why a client may be the same person, in one short phrase. */
export function matchWords(match: Pick<ClientMatch, 'matchedOn'>): string {
  const words = match.matchedOn.map((reason, i) =>
    i === 0 ? CLIENT_MATCH_REASON_LABELS[reason] : CLIENT_MATCH_REASON_LABELS[reason].replace(/^same /, ''),
  );
  if (words.length <= 1) return words[0] ?? '';
  return `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

/** How a candidate is told apart from others of the same name: its e-mail or phone, when it has one. */
export function matchLabel(match: Pick<ClientMatch, 'name' | 'email' | 'phone'>): string {
  const detail = match.email || match.phone;
  return detail ? `${match.name} (${detail})` : match.name;
}
