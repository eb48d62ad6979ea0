import type { PortalChangeOrder } from '@layerbook/contracts/types';
import { formatMoney } from '@layerbook/domain';

/** Words of the `billing` area by key (without the area), params filled. */
export type BillingSay = (key: string, params?: Readonly<Record<string, unknown>>) => string;

/**
 * What the change does to the contract, in one sentence the client can check: "Your contract sum
 * goes from $10,000.00 to $11,082.50 (up $1,082.50, tax included)." Amounts come as decimal strings
 * and are formatted by the domain's formatMoney, never through a float.
 */
export function contractChangeWords(
  co: Pick<PortalChangeOrder, 'amount' | 'currency' | 'contractSumBefore' | 'contractSumAfter' | 'status'> &
    Partial<Pick<PortalChangeOrder, 'taxNote'>>,
  locale: string,
  say: BillingSay,
): string {
  const money = (amount: string) => formatMoney(amount, co.currency, locale);
  const isDown = co.amount.trim().startsWith('-');
  // A lump sum the firm's tax mode leaves untaxed says so in its own note: no "tax included" here.
  const direction = `${isDown ? 'changeOrder.down' : 'changeOrder.up'}${co.taxNote ? 'Untaxed' : ''}`;
  const by = say(direction, { amount: money(co.amount.trim().replace(/^-/, '')) });
  const sentence =
    co.status === 'approved'
      ? 'changeOrder.sumWent'
      : co.status === 'declined'
        ? 'changeOrder.sumWouldHave'
        : co.status === 'sent' || co.status === 'draft'
          ? 'changeOrder.sumOnceApproved'
          : 'changeOrder.sumGoes';
  return say(sentence, { before: money(co.contractSumBefore), after: money(co.contractSumAfter), by });
}
