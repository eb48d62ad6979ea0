import { withTenant, type TenantTx } from '@layerbook/db';
import type { Pool } from 'pg';
import type Stripe from 'stripe';
import type { PaymentsApplyJob } from '../queue/queues';
import { type CheckoutExpiryJob, expireStaleCheckouts, isCheckoutExpiryJob } from './checkout-expiry';
import { expireCheckoutSession, fulfilCheckoutSession } from './fulfil';
import type { ReceiptMailDeps } from './receipt-mail';
import { processorFor } from './processor';
import { applyProcessorRefund } from './refund-events';

export interface ApplyDeps extends ReceiptMailDeps {
  /**
   * Called after the event's effect is written and before it is marked applied, still inside the
   * transaction. Only the worker-kill test sets it (to stall there); nothing else should.
   */
  readonly afterEffect?: (eventId: string) => Promise<void>;
}

/**
 * A charge's refunds, each applied as its own refund event would be. The charge names its firm (it
 * carries the PaymentIntent's metadata), while a refund made at the processor's dashboard does not,
 * so its own events are not stored: this is how such a refund is recorded. Since Stripe's API
 * 2022-11-15 a charge no longer embeds its refunds, so they are listed from the processor.
 */
async function applyChargeRefunds(tx: TenantTx, deps: ReceiptMailDeps, charge: Stripe.Charge, now: Date): Promise<string> {
  const stripe = processorFor(deps.config);
  if (!stripe) return 'Ignored: online payments are off, so the charge’s refunds cannot be read';
  const done: string[] = [];
  for await (const refund of stripe.refunds.list({ charge: charge.id, limit: 100 })) {
    done.push(await applyProcessorRefund(tx, deps, refund, now));
  }
  return done.length ? done.join('; ') : `Ignored: no refunds listed for ${charge.id}`;
}

/** What one event does, in words; throwing rolls the whole application back and the queue retries it. */
async function dispatch(tx: TenantTx, deps: ReceiptMailDeps, event: Stripe.Event, now: Date): Promise<string> {
  switch (event.type) {
    case 'checkout.session.completed':
    case 'checkout.session.async_payment_succeeded':
      return (await fulfilCheckoutSession(tx, deps, event.data.object, new Date(event.created * 1000), now)).outcome;
    case 'checkout.session.async_payment_failed':
      return `The payment for checkout ${event.data.object.id} did not clear; nothing recorded`;
    case 'checkout.session.expired':
      return expireCheckoutSession(tx, event.data.object);
    case 'refund.created':
    case 'refund.updated':
    case 'refund.failed':
      return applyProcessorRefund(tx, deps, event.data.object, now);
    case 'charge.refunded':
      return applyChargeRefunds(tx, deps, event.data.object, now);
    default:
      return `Ignored: ${event.type}`;
  }
}

/**
 * The payments-apply job: applies one stored event exactly once. The event row is locked, an event
 * already applied is skipped, and `applied_at` with the outcome is written in the same transaction
 * as the effect — a crash anywhere before the commit leaves neither, so a retry (or the
 * reconciliation's re-queue) applies it once. The order events arrive in does not matter: each
 * effect checks the state it finds (an expiry after the payment changes nothing; a refund before
 * its payment throws, and the queue retries it later). Returns the outcome, or null for no such event.
 * The same queue carries the expiry of an invoice's stale checkouts (CheckoutExpiryJob), run here too.
 */
export async function applyStoredEvent(
  pool: Pool,
  deps: ApplyDeps,
  job: PaymentsApplyJob | CheckoutExpiryJob,
  now: Date,
): Promise<string | null> {
  // The queue's other job: stale checkouts to expire at the processor (checkout-expiry.ts).
  if (isCheckoutExpiryJob(job)) return expireStaleCheckouts(pool, processorFor(deps.config), job);
  return withTenant(pool, job.tenantId, async (tx) => {
    const { rows } = await tx.client.query<{ payload: Stripe.Event; applied_at: Date | null; outcome: string | null }>(
      `select payload, applied_at, outcome from processor_events where tenant_id = $1 and id = $2 for update`,
      [tx.tenantId, job.eventId],
    );
    const row = rows[0];
    if (!row) return null;
    if (row.applied_at) return row.outcome;
    const outcome = await dispatch(tx, deps, row.payload, now);
    await deps.afterEffect?.(job.eventId);
    await tx.client.query(`update processor_events set applied_at = $3, outcome = $4 where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      job.eventId,
      now,
      outcome,
    ]);
    return outcome;
  });
}
