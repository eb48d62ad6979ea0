import type { TenantTx } from '@layerbook/db';
import type { JobQueue } from '../../queue/job-queue';
import { type BillingEvaluateJob, QUEUES } from '../../queue/queues';

/**
 * Asks the queue to check a job's billing triggers, in the caller's transaction: the check runs
 * only if the write that may have met a trigger (a progress mark, billing start, an approved change
 * order) commits. The check itself is idempotent, so an extra one costs nothing. `progressMarked`:
 * a percent complete or stored materials was marked (a progress-billed job's application is drafted).
 * `refreshDraft`: another invoice of the job was issued or voided, or its contract sum or value lines changed (its
 * open application is refigured, its period kept).
 */
export async function enqueueBillingCheck(
  tx: TenantTx,
  queue: JobQueue,
  jobId: string,
  opts: { progressMarked?: boolean; refreshDraft?: boolean } = {},
): Promise<void> {
  const data: BillingEvaluateJob = {
    tenantId: tx.tenantId,
    jobId,
    ...(opts.progressMarked ? { progressMarked: true } : {}),
    ...(opts.refreshDraft ? { refreshDraft: true } : {}),
  };
  await queue.send(QUEUES.billingEvaluate, data, tx);
}
