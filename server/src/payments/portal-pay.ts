import type { InvoiceStatus } from '@layerbook/contracts';
import { minorUnitDigits, processorMinimumCharge } from '@layerbook/domain';
import Decimal from 'decimal.js';

export interface PayOnlineInvoice {
  readonly status: InvoiceStatus;
  readonly currency: string;
  /** total − paid − credited, major units */
  readonly amountDue: string;
}

export type PayOnline =
  | { readonly canPayOnline: true; readonly payOnlineNote: null }
  /** `note` says why when the invoice is open and something stops a card payment; null when there is nothing to explain */
  | { readonly canPayOnline: false; readonly payOnlineNote: string | null };

const NO: PayOnline = { canPayOnline: false, payOnlineNote: null };

/**
 * Why a refunded invoice is not offered for card payment: the firm gave the money back (usually
 * because the work is off), so the portal does not chase it; the office may still record a payment.
 */
export const REFUNDED_NOTE = 'The firm gave back what was paid on this invoice, so it is not paid by card here. Please ask the firm.';

/**
 * Whether the client may pay this invoice's amount due by card: online payments are on, the
 * invoice is open or part paid with something due (not refunded: see REFUNDED_NOTE), the processor charges cards in its currency,
 * and the amount due is at least the processor's smallest charge there (Stripe Docs "Supported
 * currencies" — minimum charge amounts, via processorMinimumCharge). The portal shows the note
 * where the button would be; starting a checkout refuses with the same words.
 */
export function payOnlineFor(isOnline: boolean, invoice: PayOnlineInvoice): PayOnline {
  if (!isOnline) return NO;
  if (invoice.status === 'refunded') return { canPayOnline: false, payOnlineNote: REFUNDED_NOTE };
  if (invoice.status !== 'issued' && invoice.status !== 'part_paid') return NO;
  const due = new Decimal(invoice.amountDue);
  if (due.lessThanOrEqualTo(0)) return NO;
  const minimum = processorMinimumCharge(invoice.currency);
  if (!minimum)
    return { canPayOnline: false, payOnlineNote: `Card payment is not offered in ${invoice.currency}; please pay another way.` };
  if (due.lessThan(minimum)) {
    const shown = minimum.toFixed(minorUnitDigits(invoice.currency));
    return {
      canPayOnline: false,
      payOnlineNote: `Below the smallest card payment, ${shown} ${invoice.currency}; please pay another way.`,
    };
  }
  return { canPayOnline: true, payOnlineNote: null };
}
