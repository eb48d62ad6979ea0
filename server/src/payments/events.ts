import { isUuid, withTenant, type TenantTx } from '@layerbook/db';
import type { Pool } from 'pg';
import type Stripe from 'stripe';
import type { JobQueue } from '../queue/job-queue';
import { type PaymentsApplyJob, QUEUES } from '../queue/queues';

/**
 * Processor events as we keep them: each filed under the firm named in its object's metadata
 * (`tenant_id`, set on every Checkout Session and refund we create), stored once by its id, and
 * applied by the payments-apply job queued in the same transaction.
 */

/** The firm an event belongs to, from `data.object.metadata.tenant_id`; null when it names none (not ours). */
export function eventTenant(event: Pick<Stripe.Event, 'data'>): string | null {
  const object = event.data.object as { metadata?: Record<string, string> | null };
  const tenantId = object.metadata?.['tenant_id'];
  return typeof tenantId === 'string' && isUuid(tenantId) ? tenantId : null;
}

/** Queues the application of a stored event, in the caller's transaction. */
export async function enqueueApply(tx: TenantTx, queue: JobQueue, eventId: string): Promise<void> {
  const data: PaymentsApplyJob = { tenantId: tx.tenantId, eventId };
  await queue.send(QUEUES.paymentsApply, data, tx);
}

export type StoreResult = 'stored' | 'duplicate' | 'unknownFirm';

/**
 * Stores the event under its firm and queues its application, in one transaction: either both
 * happen or neither. An event already stored (a second delivery, or the reconciliation found it
 * first) changes nothing. A firm id that names no firm is answered 'unknownFirm' (nothing stored).
 */
export async function storeEvent(
  pool: Pool,
  queue: JobQueue,
  tenantId: string,
  event: Stripe.Event,
  via: 'webhook' | 'reconcile',
): Promise<StoreResult> {
  try {
    return await withTenant(pool, tenantId, async (tx) => {
      const { rowCount } = await tx.client.query(
        `insert into processor_events (id, tenant_id, type, processor_created, payload, received_via)
         values ($1, $2, $3, $4, $5, $6) on conflict (id) do nothing`,
        [event.id, tx.tenantId, event.type, event.created, JSON.stringify(event), via],
      );
      if (!rowCount) return 'duplicate';
      await enqueueApply(tx, queue, event.id);
      return 'stored';
    });
  } catch (error) {
    // processor_events.tenant_id references firms: a metadata firm id that is not one of ours.
    if ((error as { code?: string }).code === '23503') return 'unknownFirm';
    throw error;
  }
}
