import type { ProposalTerms } from '@layerbook/contracts/types';
import { listFormat } from '../../../../../shared/i18n/format/intl-cache';

/** Words of the `proposals` area by key (without the area). */
export type TermsSay = (key: string, params?: Readonly<Record<string, unknown>>) => string;

/**
 * The payment terms in one sentence, with only the payments there are: "A deposit of 30 % on
 * acceptance, a progress payment of 40 % when …, and the rest on completion, as in …". The progress
 * payment is said from its trigger, as each option's payment schedule names it. The list is joined
 * the reader's way (Intl.ListFormat: "a, b, and c" in en-US, "a, b y c" in Spanish).
 */
export function paymentTermsSentence(
  terms: Pick<ProposalTerms, 'depositPercent' | 'progressPercent'>,
  say: TermsSay,
  locale: string,
): string {
  const parts: string[] = [];
  if (terms.depositPercent > 0) parts.push(say('terms.deposit', { percent: terms.depositPercent }));
  if (terms.progressPercent > 0) parts.push(say('terms.progress', { percent: terms.progressPercent }));
  parts.push(say(parts.length ? 'terms.rest' : 'terms.inFull'));
  const list = listFormat(locale, { style: 'long', type: 'conjunction' }).format(parts);
  return say('terms.sentence', { list: `${list.charAt(0).toLocaleUpperCase(locale)}${list.slice(1)}` });
}
