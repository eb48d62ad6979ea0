import type { CheckoutStatus, PaymentMethod, PortalReceipt } from '@layerbook/contracts/types';

/** Back from the card page without paying (`?payment=cancelled`): the client's money did not move. */
export const CANCELLED_WORDS = 'payments.cancelled';

/** The pay button, naming what will be charged: its words key and params. */
export const payButtonLabel = (amountDue: string) => ({ key: 'payments.pay.button', params: { amount: amountDue } }) as const;

/** What the return page says while the processor's word is on its way, and once it has come (never colour alone: an icon and words). */
export interface CheckoutWords {
  /** words keys (payments.checkout.*); the heading may name the receipt number */
  readonly heading: string;
  readonly headingParams?: Readonly<Record<string, string>>;
  readonly text: string;
  readonly textParams?: Readonly<Record<string, string>>;
  readonly icon: string;
  /** still checking by itself */
  readonly isWaiting: boolean;
  readonly tone: 'done' | 'waiting' | 'notice';
}

/**
 * The return page's words for a checkout's state. `gaveUp`: the page stopped checking (about a
 * minute) and the payment is still not recorded; a client must never be led to pay twice. A payment
 * the invoice no longer asked for (voided or settled meanwhile) is kept as the client's credit: never
 * "paid" then, and the part kept is said when only some of it is. `money` formats an amount in a currency.
 */
export function checkoutWords(
  status: Pick<CheckoutStatus, 'state' | 'receiptNumber' | 'credit'>,
  gaveUp: boolean,
  money: (amount: string, currency: string) => string,
): CheckoutWords {
  switch (status.state) {
    case 'paid': {
      const receipt = status.receiptNumber ? { headingParams: { number: status.receiptNumber } } : {};
      const credit = status.credit;
      if (credit?.isWholePayment) {
        return {
          heading: status.receiptNumber ? 'payments.checkout.keptAsCreditReceipt' : 'payments.checkout.keptAsCredit',
          ...receipt,
          text: 'payments.checkout.keptAsCreditText',
          textParams: { amount: money(credit.amount, credit.currency) },
          icon: 'info',
          isWaiting: false,
          tone: 'notice',
        };
      }
      return {
        heading: status.receiptNumber ? 'payments.checkout.paidReceipt' : 'payments.checkout.paid',
        ...receipt,
        ...(credit
          ? { text: 'payments.checkout.paidPartCreditText', textParams: { amount: money(credit.amount, credit.currency) } }
          : { text: 'payments.checkout.paidText' }),
        icon: 'task_alt',
        isWaiting: false,
        tone: 'done',
      };
    }
    case 'expired':
      return {
        heading: 'payments.checkout.expired',
        text: 'payments.checkout.expiredText',
        icon: 'info',
        isWaiting: false,
        tone: 'notice',
      };
    case 'confirming':
      return gaveUp
        ? {
            heading: 'payments.checkout.confirmingLong',
            text: 'payments.checkout.confirmingLongText',
            icon: 'schedule',
            isWaiting: false,
            tone: 'notice',
          }
        : {
            heading: 'payments.checkout.confirming',
            text: 'payments.checkout.confirmingText',
            icon: 'hourglass_top',
            isWaiting: true,
            tone: 'waiting',
          };
    case 'open':
      return gaveUp
        ? {
            heading: 'payments.checkout.notHeard',
            text: 'payments.checkout.notHeardText',
            icon: 'schedule',
            isWaiting: false,
            tone: 'notice',
          }
        : {
            heading: 'payments.checkout.checking',
            text: 'payments.checkout.checkingText',
            icon: 'hourglass_top',
            isWaiting: true,
            tone: 'waiting',
          };
  }
}

const PAID_BY: Readonly<Record<PaymentMethod, string>> = {
  card: 'payments.paidBy.card',
  cheque: 'payments.paidBy.cheque',
  transfer: 'payments.paidBy.transfer',
  cash: 'payments.paidBy.cash',
};
const REFUNDED_BY: Readonly<Record<PaymentMethod, string>> = {
  card: 'payments.refundedBy.card',
  cheque: 'payments.refundedBy.cheque',
  transfer: 'payments.refundedBy.transfer',
  cash: 'payments.refundedBy.cash',
};

/** What a receipt is for, in the client's words (a words key). */
export const receiptWhat = (receipt: Pick<PortalReceipt, 'kind' | 'method'>): string =>
  (receipt.kind === 'refund' ? REFUNDED_BY : PAID_BY)[receipt.method];
