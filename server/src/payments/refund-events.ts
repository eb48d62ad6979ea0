import type { TenantTx } from '@layerbook/db';
import type Stripe from 'stripe';
import type { ReceiptMailDeps } from './receipt-mail';

/**
 * Applies what the processor says of a refund we asked for (metadata.refund_id): a pending refund
 * becomes succeeded (its effect on the payment and invoice, a receipt, the e-mail) or failed.
 * Safe to call any number of times: only the pending → final step does anything. Returns what it did, in words.
 */
export function applyProcessorRefund(tx: TenantTx, deps: ReceiptMailDeps, refund: Stripe.Refund, now: Date): Promise<string> {
  void tx;
  void deps;
  void now;
  return Promise.resolve(`Refund ${refund.id}: not applied yet`);
}
