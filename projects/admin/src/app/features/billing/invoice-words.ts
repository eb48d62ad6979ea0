import {
  INVOICE_KIND_LABELS,
  INVOICE_LIST_FILTERS,
  INVOICE_STATUS_LABELS,
  type InvoiceKind,
  type InvoiceListFilter,
  type InvoiceStatus,
  type InvoiceDetail,
  type InvoiceSummary,
  type PaymentDetail,
  type PaymentMethod,
  type ProgressTable,
} from '@layerbook/contracts/types';
import { roundsToZero } from '@layerbook/contracts/engine';

export interface StatusLook {
  readonly word: string;
  /** an icon beside the word, so a status never reads by colour alone */
  readonly icon: string;
  readonly isOverdue: boolean;
}

const STATUS_ICONS: Readonly<Record<InvoiceStatus, string>> = {
  draft: 'edit_note',
  issued: 'schedule',
  part_paid: 'hourglass_bottom',
  paid: 'task_alt',
  refunded: 'undo',
  void: 'block',
};

/** An invoice's status in words with its icon; an overdue one says so first ("Overdue — part paid"). */
export function invoiceStatus(invoice: Pick<InvoiceSummary, 'status' | 'isOverdue'>): StatusLook {
  const isOverdue = invoice.isOverdue && (invoice.status === 'issued' || invoice.status === 'part_paid');
  if (isOverdue) {
    return { word: invoice.status === 'part_paid' ? 'Overdue — part paid' : 'Overdue', icon: 'alarm', isOverdue };
  }
  return { word: INVOICE_STATUS_LABELS[invoice.status], icon: STATUS_ICONS[invoice.status], isOverdue };
}

export const kindWord = (kind: InvoiceKind): string => INVOICE_KIND_LABELS[kind];

/** The invoice's number, or "Draft" while it has none (a number is taken only at issue). */
export const invoiceNumber = (invoice: Pick<InvoiceSummary, 'number'>): string => invoice.number ?? 'Draft';

/** The list's filter chips: "To review" leads while drafts wait for someone, otherwise the usual order. */
export function filterOrder(hasDrafts: boolean): readonly InvoiceListFilter[] {
  return hasDrafts ? ['drafts', ...INVOICE_LIST_FILTERS.filter((f) => f !== 'drafts')] : INVOICE_LIST_FILTERS;
}

/** Whether payments may be recorded against the invoice: issued and not settled or voided (a refunded one is owed again). */
export const takesPayments = (status: InvoiceStatus): boolean => status === 'issued' || status === 'part_paid' || status === 'refunded';

/**
 * The server's void rule (`voidInvoice`): any issued invoice — open, paid, part paid or refunded — as
 * long as nothing paid stays on it (payments net of refunds). One issued with nothing due reads paid
 * with nothing paid, and may be voided.
 */
export const canBeVoided = (invoice: Pick<InvoiceDetail, 'status' | 'amountPaid' | 'currency'>): boolean =>
  invoice.status !== 'draft' && invoice.status !== 'void' && roundsToZero(invoice.amountPaid, invoice.currency);

/** Voiding waits for a refund only when money was paid and kept on the invoice. */
export const mustRefundBeforeVoid = (invoice: Pick<InvoiceDetail, 'status' | 'amountPaid' | 'currency'>): boolean =>
  invoice.status !== 'draft' && invoice.status !== 'void' && !roundsToZero(invoice.amountPaid, invoice.currency);

/** "10 % of work, 5 % of stored materials, until 50 % complete" */
export function retainageWords(rates: ProgressTable['retainageRates']): string {
  const words = `${rates.workPercent} % of work, ${rates.storedPercent} % of stored materials`;
  return rates.stopAtPercentComplete === null ? words : `${words}, until ${rates.stopAtPercentComplete} % complete`;
}

export const PAYMENT_METHOD_LABELS: Readonly<Record<PaymentMethod, string>> = {
  card: 'Card',
  cheque: 'Cheque',
  transfer: 'Bank transfer',
  cash: 'Cash',
};

/** What the page says once a payment was recorded: its receipt number, and whether the invoice is now paid. */
export function paymentRecordedWords(
  before: readonly Pick<PaymentDetail, 'id'>[],
  after: Pick<InvoiceDetail, 'status' | 'payments'>,
): string {
  const known = new Set(before.map((p) => p.id));
  const receipt = after.payments.find((p) => !known.has(p.id))?.receiptNumber;
  const recorded = receipt ? `Payment recorded as receipt ${receipt}` : 'Payment recorded';
  return after.status === 'paid' ? `${recorded}: the invoice is paid.` : `${recorded}.`;
}
