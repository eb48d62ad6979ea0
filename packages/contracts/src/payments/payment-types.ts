/**
 * Payments, refunds, receipts and online checkout, without zod. Money: decimal strings in
 * `currency` (major units); the processor's integer amounts never leave the server.
 */

export const PAYMENT_METHODS = ['card', 'cheque', 'transfer', 'cash'] as const;
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];
export const PAYMENT_METHOD_LABELS: Readonly<Record<PaymentMethod, string>> = {
  card: 'Card (online)',
  cheque: 'Cheque',
  transfer: 'Bank transfer',
  cash: 'Cash',
};

export const REFUND_STATUSES = ['pending', 'succeeded', 'failed'] as const;
export type RefundStatus = (typeof REFUND_STATUSES)[number];
export const REFUND_STATUS_LABELS: Readonly<Record<RefundStatus, string>> = {
  pending: 'Being sent back',
  succeeded: 'Refunded',
  failed: 'Refund failed',
};

export interface RefundView {
  readonly id: string;
  readonly paymentId: string;
  readonly method: PaymentMethod;
  readonly status: RefundStatus;
  readonly amount: string;
  readonly currency: string;
  readonly refundedOn: string;
  readonly reason: string;
  readonly reference: string;
  /** "RCT-0012"; null until the refund has succeeded */
  readonly receiptNumber: string | null;
  readonly failureMessage: string | null;
}

/**
 * The titles of the 502 answers to a card refund (POST /api/payments/:id/refunds and its send again):
 * the processor refused it (the refund is marked failed; trying again is a new refund, with a new key)
 * or did not answer (the refund is kept as being sent back; sending it again is the same refund).
 */
export const REFUND_PROCESSOR_PROBLEMS = {
  refused: 'The payment processor refused the refund',
  noAnswer: 'The payment processor did not answer',
} as const;

/** One payment as the office sees it on the invoice (and the client in the portal, without `createdBy`). */
export interface PaymentDetail {
  readonly id: string;
  readonly invoiceId: string;
  readonly method: PaymentMethod;
  readonly amount: string;
  /** the part that went on the invoice; amount − applied is a credit on the client's account */
  readonly amountApplied: string;
  readonly amountRefunded: string;
  /** amount − refunded − pending refunds: what a refund may still give back */
  readonly refundable: string;
  readonly currency: string;
  readonly receivedOn: string;
  readonly reference: string;
  /** "RCT-0007"; null only for payments recorded before receipts existed */
  readonly receiptNumber: string | null;
  readonly refunds: readonly RefundView[];
}

/** POST /api/payments/:id/refunds — online (back to the card, only for a card payment) or recorded offline. */
export interface RefundCreate {
  readonly method: PaymentMethod;
  readonly amount: string;
  readonly reason: string;
  /** offline refunds: the day the money went back (defaults to today in the firm's zone) */
  readonly refundedOn?: string;
  /** offline refunds: cheque number, transfer reference */
  readonly reference?: string;
  /** made once per form: the same refund sent again (a retry after a lost answer) is recorded once */
  readonly clientKey?: string;
}

/** A client's money kept beyond an invoice's amount due (an overpayment). */
export interface ClientCreditView {
  readonly id: string;
  readonly paymentId: string;
  readonly amount: string;
  readonly currency: string;
  readonly note: string;
  readonly createdAt: string;
  readonly usedOnInvoiceId: string | null;
}

/** POST /api/portal/invoices/:id/checkout — answer: where to send the browser. */
export interface CheckoutStart {
  readonly url: string;
  readonly checkoutId: string;
}

/**
 * GET /api/portal/invoices/:id/checkout/:checkoutId — what the success page shows while the
 * processor's confirmation is on its way: `confirming` until the payment is recorded.
 */
export interface CheckoutStatus {
  readonly checkoutId: string;
  readonly state: 'open' | 'confirming' | 'paid' | 'expired';
  readonly amount: string;
  readonly currency: string;
  /** the receipt, once the payment is recorded */
  readonly paymentId: string | null;
  readonly receiptNumber: string | null;
  /**
   * once recorded: what of the payment is kept as the client's credit rather than put on the invoice
   * (it was voided or settled another way meanwhile, or paid in another currency); null when none is
   */
  readonly credit: CheckoutCredit | null;
}

export interface CheckoutCredit {
  /** in the payment's currency (major units) */
  readonly amount: string;
  readonly currency: string;
  /** none of the payment went on the invoice */
  readonly isWholePayment: boolean;
}

/** A receipt line in the portal (payments and refunds of one invoice). */
export interface PortalReceipt {
  readonly id: string;
  readonly kind: 'payment' | 'refund';
  readonly number: string;
  readonly on: string;
  readonly method: PaymentMethod;
  readonly amount: string;
  readonly currency: string;
}

export const PAYMENT_LIMITS = { reasonMaxLength: 500, referenceMaxLength: 120, clientKeyMaxLength: 100 } as const;

/**
 * Why the card processor's word left something for a person: a payment taken in another amount or
 * currency than the invoice asked; a refund the processor reported failed after we recorded it given
 * back, or went through after we were told it failed; a refund made at the processor's dashboard we
 * could not record (another currency, more than was left on the payment); a card payment that came in
 * after the invoice stopped asking for it (voided, or settled another way). `other` for older notes.
 */
export const ATTENTION_REASONS = [
  'paidOtherAmount',
  'paidWhenNotAsked',
  'refundFailedAfter',
  'refundWentThroughAfter',
  'refundOtherCurrency',
  'refundMoreThanLeft',
  'other',
] as const;
export type AttentionReason = (typeof ATTENTION_REASONS)[number];

/** One note on Today's money panel until someone marks it dealt with (POST /api/billing/attention/:id/clear). */
export interface AttentionNote {
  /** the audit entry that made the note */
  readonly id: string;
  readonly reason: AttentionReason;
  readonly invoiceId: string;
  readonly invoiceNumber: string | null;
  readonly clientName: string;
  /** what the processor moved, in its own currency (null when it gave no amount we can read) */
  readonly amount: string | null;
  readonly currency: string | null;
  /** what the checkout asked (a payment in another amount or currency only) */
  readonly asked: string | null;
  readonly askedCurrency: string | null;
  readonly notedAt: string;
}
