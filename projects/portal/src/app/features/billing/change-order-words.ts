import type { PortalChangeOrder } from '@layerbook/contracts/types';
import { formatMoney } from '../../shared/format/money';

/**
 * What the change does to the contract, in one sentence the client can check: "Your contract sum
 * goes from $10,000.00 to $11,082.50 (up $1,082.50, tax included)." Amounts come as decimal strings
 * and are formatted by the domain's formatMoney, never through a float.
 */
export function contractChangeWords(
  co: Pick<PortalChangeOrder, 'amount' | 'currency' | 'contractSumBefore' | 'contractSumAfter' | 'status'>,
  locale: string,
): string {
  const money = (amount: string) => formatMoney(amount, co.currency, locale);
  const isDown = co.amount.trim().startsWith('-');
  const by = `${isDown ? 'down' : 'up'} ${money(co.amount.trim().replace(/^-/, ''))}, tax included`;
  const verb = co.status === 'approved' ? 'went' : co.status === 'declined' ? 'would have gone' : 'goes';
  const when = co.status === 'sent' || co.status === 'draft' ? ' once you approve' : '';
  return `Your contract sum ${verb} from ${money(co.contractSumBefore)} to ${money(co.contractSumAfter)}${when} (${by}).`;
}
