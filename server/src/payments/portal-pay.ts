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
 * Whether the client may pay this invoice's amount due by card: online payments are on, the
 * invoice is open, part paid or refunded (owed again) with something due, the processor charges cards in its currency,
 * and the amount due is at least the processor's smallest charge there (Stripe Docs "Supported
 * currencies" — minimum charge amounts, via processorMinimumCharge). The portal shows the note
 * where the button would be; starting a checkout refuses with the same words.
 */
export function payOnlineFor(isOnline: boolean, invoice: PayOnlineInvoice): PayOnline {
  if (!isOnline) return NO;
  // A refunded invoice is owed again (as recordPayment and the office's payments take it).
  if (invoice.status !== 'issued' && invoice.status !== 'part_paid' && invoice.status !== 'refunded') return NO;
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
