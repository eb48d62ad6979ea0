import type { ProposalTerms } from '@layerbook/contracts/types';

/**
 * The payment terms in one sentence, with only the payments there are: "A deposit of 30 % on
 * acceptance, a progress payment of 40 % when …, and the rest on completion, as in …". The progress
 * payment is said from its trigger, as each option's payment schedule names it.
 */
export function paymentTermsSentence(terms: Pick<ProposalTerms, 'depositPercent' | 'progressPercent'>): string {
  const parts: string[] = [];
  if (terms.depositPercent > 0) parts.push(`a deposit of ${terms.depositPercent} % on acceptance`);
  if (terms.progressPercent > 0)
    parts.push(
      `a progress payment of ${terms.progressPercent} % when the layer named in the payment schedule is finished on every surface`,
    );
  parts.push(parts.length ? 'the rest on completion' : 'payment in full on completion');
  const list = parts.length < 3 ? parts.join(' and ') : `${parts.slice(0, -1).join(', ')}, and ${parts[parts.length - 1]}`;
  return `${list.charAt(0).toUpperCase()}${list.slice(1)}, as in the payment schedule of each option.`;
}
