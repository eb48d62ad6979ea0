import type { PortalReceipt } from '../payments/payment-types';
import type { ChangeOrderView } from './change-order-types';
import type { InvoiceDocument, InvoiceKind, InvoiceLine, InvoiceStatus, ProgressTable } from './invoice-types';

/**
 * What a client reads of billing in the portal: only their own issued invoices (never drafts),
 * credit notes, a statement per job, and change orders sent to them. Money: decimal strings.
 */

export interface PortalInvoiceSummary {
  readonly id: string;
  readonly number: string;
  readonly kind: InvoiceKind;
  readonly status: InvoiceStatus;
  readonly isOverdue: boolean;
  readonly jobId: string;
  readonly jobTitle: string;
  readonly issuedOn: string;
  readonly dueOn: string;
  readonly currency: string;
  readonly total: string;
  readonly amountDue: string;
  /** the firm's locale the invoice prints in ("en-US"): the portal formats money and dates with it */
  readonly locale: string;
}

/**
 * Why an invoice is not offered for card payment, as a code with its values (never words: the
 * portal says it in the reader's language). Money: a decimal string in major units.
 */
export type PayOnlineReason =
  /** the firm gave back what was paid, so the portal does not chase it; the client asks the firm */
  | { readonly code: 'refunded' }
  /** the card processor publishes no card charge in this currency */
  | { readonly code: 'currencyNotOffered'; readonly currency: string }
  /** the amount due is below the processor's smallest card charge in the currency ("0.50" USD) */
  | { readonly code: 'belowMinimum'; readonly currency: string; readonly minimum: string };

export interface PortalInvoiceDetail extends PortalInvoiceSummary {
  readonly lines: readonly InvoiceLine[];
  readonly progress: ProgressTable | null;
  readonly depositCredit: string;
  readonly taxIncluded: string;
  readonly amountPaid: string;
  readonly amountCredited: string;
  readonly document: InvoiceDocument;
  readonly creditNote: { readonly id: string; readonly number: string; readonly issuedOn: string; readonly amount: string } | null;
  /** open or part paid, online payments configured, and the amount due at least the processor's minimum */
  readonly canPayOnline: boolean;
  /** why there is no pay button when online payments are on and the invoice is open or refunded; null otherwise */
  readonly payOnlineReason: PayOnlineReason | null;
  /** receipts for its payments and refunds, newest last */
  readonly receipts: readonly PortalReceipt[];
}

export interface PortalStatementLine {
  readonly on: string;
  readonly kind: 'invoice' | 'creditNote' | 'payment' | 'refund';
  /** "INV-0007 Deposit", "CN-0002", "Payment by cheque 1042" */
  readonly text: string;
  readonly charge: string;
  readonly credit: string;
  readonly balance: string;
}

/** GET /api/portal/jobs/:id/statement */
export interface PortalStatement {
  readonly jobId: string;
  readonly jobTitle: string;
  readonly currency: string;
  /** the firm's locale ("en-US") */
  readonly locale: string;
  readonly contractSum: string;
  readonly lines: readonly PortalStatementLine[];
  readonly invoiced: string;
  readonly credited: string;
  readonly paid: string;
  readonly balanceDue: string;
  readonly unbilled: string;
}

/** GET /api/portal/change-orders/:id (and the answer to the client's decision) */
export interface PortalChangeOrder extends ChangeOrderView {
  /** the firm's IANA time zone: when it was answered is shown as the firm's day and time, as on the proposal */
  readonly timeZone: string;
}
