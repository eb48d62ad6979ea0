import { REFUND_STATUS_LABELS, type PaymentMethod, type RefundStatus, type RefundView } from '@layerbook/contracts/types';

/** A refund's state in words with an icon beside it, so it never reads by colour alone. */
export interface RefundStatusLook {
  readonly word: string;
  readonly icon: string;
}

const REFUND_STATUS_ICONS: Readonly<Record<RefundStatus, string>> = {
  pending: 'hourglass_top',
  succeeded: 'check_circle',
  failed: 'error',
};

export const refundStatusLook = (status: RefundStatus): RefundStatusLook => ({
  word: REFUND_STATUS_LABELS[status],
  icon: REFUND_STATUS_ICONS[status],
});

/** How the money went back: "Back to the card", "By cheque"… */
export const REFUND_METHOD_WORDS: Readonly<Record<PaymentMethod, string>> = {
  card: 'Back to the card',
  cheque: 'By cheque',
  transfer: 'By bank transfer',
  cash: 'In cash',
};

/** The choices in the refund dialog, as the office would say them. */
export const REFUND_CHOICE_WORDS: Readonly<Record<PaymentMethod, string>> = {
  card: 'Back to the card, online',
  cheque: 'Cheque (already written)',
  transfer: 'Bank transfer (already sent)',
  cash: 'Cash (already handed back)',
};

/**
 * Where a refund's money comes from, in a sentence: the client's credit first, then what was paid on
 * the invoice (which then has that much due again).
 */
export function refundSplitWords(
  split: { readonly fromCredit: string; readonly fromInvoice: string },
  money: (amount: string) => string,
  about: { readonly invoiceNumber: string; readonly clientName: string },
): string {
  const fromCredit = /[1-9]/.test(split.fromCredit);
  const fromInvoice = /[1-9]/.test(split.fromInvoice);
  const credit = `the credit kept for ${about.clientName}`;
  const invoice = `what was paid on ${about.invoiceNumber}, which then has ${money(split.fromInvoice)} more due`;
  if (fromCredit && fromInvoice)
    return `${money(split.fromCredit)} comes out of ${credit}, and ${money(split.fromInvoice)} off ${invoice}.`;
  if (fromCredit) return `It all comes out of ${credit}; ${about.invoiceNumber} stays as it is.`;
  return fromInvoice ? `It comes off ${invoice}.` : '';
}

/** What the page says once a refund was asked for. */
export function refundDoneWords(refund: RefundView, money: (amount: string) => string): string {
  const amount = money(refund.amount);
  if (refund.status === 'failed')
    return `The refund of ${amount} did not go through${refund.failureMessage ? `: ${refund.failureMessage}` : '.'}`;
  if (refund.status === 'pending') {
    return `${amount} is on its way back to the card. It shows as refunded here once the card processor confirms it.`;
  }
  const receipt = refund.receiptNumber ? ` Refund receipt ${refund.receiptNumber}.` : '';
  return refund.method === 'card' ? `${amount} refunded to the card.${receipt}` : `Refund of ${amount} recorded.${receipt}`;
}
