import type { CheckoutStatus, PaymentMethod, PortalReceipt } from '@layerbook/contracts/types';

/** Back from the card page without paying (`?payment=cancelled`): the client's money did not move. */
export const CANCELLED_WORDS =
  'The payment was not completed and nothing was charged. You can try again. If your card was declined, try another card or ask your bank.';

/** The pay button, naming what will be charged. */
export const payButtonLabel = (amountDue: string): string => `Pay ${amountDue} by card`;

/** What the return page says while the processor's word is on its way, and once it has come (never colour alone: an icon and words). */
export interface CheckoutWords {
  readonly heading: string;
  readonly text: string;
  readonly icon: string;
  /** still checking by itself */
  readonly isWaiting: boolean;
  readonly tone: 'done' | 'waiting' | 'notice';
}

/**
 * The return page's words for a checkout's state. `gaveUp`: the page stopped checking (about a
 * minute) and the payment is still not recorded; a client must never be led to pay twice.
 */
export function checkoutWords(status: Pick<CheckoutStatus, 'state' | 'receiptNumber'>, gaveUp: boolean): CheckoutWords {
  switch (status.state) {
    case 'paid':
      return {
        heading: status.receiptNumber ? `Paid — receipt ${status.receiptNumber}` : 'Paid',
        text: 'Thank you. Your payment is recorded on the invoice, and the receipt is on its way to you by e-mail.',
        icon: 'task_alt',
        isWaiting: false,
        tone: 'done',
      };
    case 'expired':
      return {
        heading: 'This payment was not completed',
        text: 'The card payment page closed before a payment was made, and nothing was charged. You can start again from the invoice.',
        icon: 'info',
        isWaiting: false,
        tone: 'notice',
      };
    case 'confirming':
      return gaveUp
        ? {
            heading: 'Payment received — still being confirmed',
            text: 'Your card payment went through, but recording it is taking longer than usual. Please do not pay again: it will show on the invoice and you will get a receipt by e-mail.',
            icon: 'schedule',
            isWaiting: false,
            tone: 'notice',
          }
        : {
            heading: 'Payment received — being confirmed',
            text: 'Your card payment went through. We are recording it on the invoice; this usually takes a few seconds and this page updates by itself.',
            icon: 'hourglass_top',
            isWaiting: true,
            tone: 'waiting',
          };
    case 'open':
      return gaveUp
        ? {
            heading: 'We have not heard about this payment yet',
            text: 'If you completed the payment, it will show on the invoice shortly and you will get a receipt by e-mail; please do not pay again. If you left the payment page without paying, nothing was charged.',
            icon: 'schedule',
            isWaiting: false,
            tone: 'notice',
          }
        : {
            heading: 'Checking your payment',
            text: 'We are waiting for the card processor to tell us that your payment went through. This page updates by itself.',
            icon: 'hourglass_top',
            isWaiting: true,
            tone: 'waiting',
          };
  }
}

const PAID_BY: Readonly<Record<PaymentMethod, string>> = {
  card: 'Paid by card online',
  cheque: 'Paid by cheque',
  transfer: 'Paid by bank transfer',
  cash: 'Paid in cash',
};
const REFUNDED_BY: Readonly<Record<PaymentMethod, string>> = {
  card: 'Refunded to your card',
  cheque: 'Refunded by cheque',
  transfer: 'Refunded by bank transfer',
  cash: 'Refunded in cash',
};

/** What a receipt is for, in the client's words. */
export const receiptWhat = (receipt: Pick<PortalReceipt, 'kind' | 'method'>): string =>
  (receipt.kind === 'refund' ? REFUNDED_BY : PAID_BY)[receipt.method];
