import type { InvoiceStatus, PayOnlineReason } from '@layerbook/contracts';
import { minorUnitDigits, processorMinimumCharge } from '@layerbook/domain';
import Decimal from 'decimal.js';

export interface PayOnlineInvoice {
  readonly status: InvoiceStatus;
  readonly currency: string;
  /** total − paid − credited, major units */
  readonly amountDue: string;
}

export type PayOnline =
  | { readonly canPayOnline: true; readonly payOnlineReason: null }
  /** `payOnlineReason` says why when something stops a card payment the client may wonder about; null when there is nothing to explain */
  | { readonly canPayOnline: false; readonly payOnlineReason: PayOnlineReason | null };

const NO: PayOnline = { canPayOnline: false, payOnlineReason: null };

/**
 * Whether the client may pay this invoice's amount due by card: online payments are on, the
 * invoice is open or part paid with something due, the processor charges cards in its currency,
 * and the amount due is at least the processor's smallest charge there (Stripe Docs "Supported
 * currencies" — minimum charge amounts, via processorMinimumCharge). A refunded invoice is not
 * offered: the firm gave the money back (usually because the work is off), so the portal does not
 * chase it; the office may still record a payment. The reason is a code with its values, which the
 * portal says in the reader's words where the button would be; starting a checkout refuses with it.
 */
export function payOnlineFor(isOnline: boolean, invoice: PayOnlineInvoice): PayOnline {
  if (!isOnline) return NO;
  if (invoice.status === 'refunded') return { canPayOnline: false, payOnlineReason: { code: 'refunded' } };
  if (invoice.status !== 'issued' && invoice.status !== 'part_paid') return NO;
  const due = new Decimal(invoice.amountDue);
  if (due.lessThanOrEqualTo(0)) return NO;
  const { currency } = invoice;
  const minimum = processorMinimumCharge(currency);
  if (!minimum) return { canPayOnline: false, payOnlineReason: { code: 'currencyNotOffered', currency } };
  if (due.lessThan(minimum)) {
    return {
      canPayOnline: false,
      payOnlineReason: { code: 'belowMinimum', currency, minimum: minimum.toFixed(minorUnitDigits(currency)) },
    };
  }
  return { canPayOnline: true, payOnlineReason: null };
}
