import type { AttentionReason } from '@layerbook/contracts/types';
import { daysBetween } from '@layerbook/contracts/engine';

/** Words to translate: a key and its params. */
export interface Words {
  readonly key: string;
  readonly params?: Readonly<Record<string, unknown>>;
}

/**
 * How late an invoice is, as words, counted in calendar days from its due date to the firm's
 * today ("1 day overdue", "12 days overdue"); null when either day is missing or not past due.
 */
export function overdueWords(dueOn: string | null, today: string | null): Words | null {
  if (!dueOn || !today) return null;
  const days = daysBetween(dueOn, today);
  if (days <= 0) return null;
  return days === 1 ? { key: 'today.money.dayOverdue' } : { key: 'today.money.daysOverdue', params: { count: days } };
}

/** A payment's day said against the firm's today: "today", "yesterday", or null for any other day (then shown as a date). */
export function receivedWords(receivedOn: string, today: string | null): 'today' | 'yesterday' | null {
  const days = today ? daysBetween(receivedOn, today) : null;
  if (days === 0) return 'today';
  if (days === 1) return 'yesterday';
  return null;
}

/** What each kind of note to check says (its amounts as params: `amount`, and `asked` for a payment). */
export const ATTENTION_WORDS: Readonly<Record<AttentionReason, string>> = {
  paidOtherAmount: 'today.money.attentionPaidOtherAmount',
  paidWhenNotAsked: 'today.money.attentionPaidWhenNotAsked',
  refundFailedAfter: 'today.money.attentionRefundFailedAfter',
  refundWentThroughAfter: 'today.money.attentionRefundWentThroughAfter',
  refundOtherCurrency: 'today.money.attentionRefundOtherCurrency',
  refundMoreThanLeft: 'today.money.attentionRefundMoreThanLeft',
  other: 'today.money.attentionOther',
};
