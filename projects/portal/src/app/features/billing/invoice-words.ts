import { type InvoiceStatus, type PortalInvoiceSummary, type PortalStatementLine } from '@layerbook/contracts/types';

/** Where an invoice stands for the client, in words and an icon (never colour alone). */
export interface StatusWords {
  /** a words key (billing.status.*) */
  readonly text: string;
  readonly icon: string;
  /** needs the client's attention: open and past its due date */
  readonly isUrgent: boolean;
}

const CLIENT_STATUS: Readonly<Record<Exclude<InvoiceStatus, 'draft'>, StatusWords>> = {
  issued: { text: 'billing.status.issued', icon: 'receipt_long', isUrgent: false },
  part_paid: { text: 'billing.status.partPaid', icon: 'pending', isUrgent: false },
  paid: { text: 'billing.status.paid', icon: 'task_alt', isUrgent: false },
  refunded: { text: 'billing.status.refunded', icon: 'undo', isUrgent: false },
  void: { text: 'billing.status.void', icon: 'block', isUrgent: false },
};

/**
 * The status a client reads: overdue (open or part paid, past its due date in the firm's zone, as
 * the server says) comes before the rest. A client never sees a draft; one would read "To pay".
 */
export function invoiceStatusWords(inv: Pick<PortalInvoiceSummary, 'status' | 'isOverdue'>): StatusWords {
  if (inv.isOverdue && (inv.status === 'issued' || inv.status === 'part_paid')) {
    return {
      text: inv.status === 'part_paid' ? 'billing.status.overduePartPaid' : 'billing.status.overdue',
      icon: 'warning',
      isUrgent: true,
    };
  }
  return CLIENT_STATUS[inv.status === 'draft' ? 'issued' : inv.status];
}

/** What a statement line is, for a screen reader (a payment's own text already says so) and the line's icon. */
export const STATEMENT_KIND_WORDS: Readonly<Record<PortalStatementLine['kind'], { readonly text: string; readonly icon: string }>> = {
  invoice: { text: 'billing.statement.kindInvoice', icon: 'receipt_long' },
  creditNote: { text: 'billing.statement.kindCreditNote', icon: 'block' },
  payment: { text: '', icon: 'payments' },
  refund: { text: '', icon: 'undo' },
};

/** The columns of a progress invoice, in the same words as its PDF (keys of billing.progressColumns). */
export const PROGRESS_COLUMN_WORDS = [
  'billing.progressColumns.scheduledValue',
  'billing.progressColumns.doneBefore',
  'billing.progressColumns.doneThisPeriod',
  'billing.progressColumns.storedOnSite',
  'billing.progressColumns.doneToDate',
  'billing.progressColumns.percent',
  'billing.progressColumns.leftToDo',
  'billing.progressColumns.retainageHeld',
] as const;

/** A decimal string that is zero ("0", "0.00", "-0.00"), read without arithmetic. */
export const isZeroAmount = (amount: string): boolean => /^-?0*(\.0*)?$/.test(amount.trim());
