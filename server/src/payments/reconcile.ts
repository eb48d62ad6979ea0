import { withGlobal, withTenant } from '@layerbook/db';
import type { Pool } from 'pg';
import type { Logger } from 'pino';
import type Stripe from 'stripe';
import type PgBoss from 'pg-boss';
import type { JobQueue } from '../queue/job-queue';
import { type PaymentsApplyJob, QUEUES } from '../queue/queues';
import { CHECKOUT_LIFETIME_SECONDS } from './checkout';
import { expireStaleCheckouts, invoicesWithStaleCheckouts } from './checkout-expiry';
import { eventTenant, storeEvent } from './events';

/** The one processor account this server talks to (processor_sync keeps one row per account). */
export const SYNC_ACCOUNT = 'stripe';
/** Events are listed from a little before the last one seen: several share a second, and the processor's list may lag. */
export const RECONCILE_OVERLAP_SECONDS = 300;
/** A stored event still unapplied this long after it arrived is queued again (its job was lost, or its worker died). */
export const REQUEUE_AFTER_SECONDS = 60;
/**
 * An event is queued again at most once per this many seconds (pg-boss throttles sends with the
 * same singletonKey to one per slot), so an event that cannot apply yet, or a worker outage, does
 * not pile a new job (and its retries) onto the queue at every run.
 */
export const REQUEUE_SLOT_SECONDS = 60 * 60;

/** The queue, with its pg-boss for the re-queue's throttled send. */
export type ReconcileQueue = JobQueue & { readonly boss: Pick<PgBoss, 'send'> };

/** The event types whose effects we apply; the rest are not listed. */
export const APPLIED_EVENT_TYPES = [
  'checkout.session.completed',
  'checkout.session.async_payment_succeeded',
  'checkout.session.async_payment_failed',
  'checkout.session.expired',
  'refund.created',
  'refund.updated',
  'refund.failed',
  'charge.refunded',
] as const;

export interface ReconcileReport {
  readonly listed: number;
  readonly stored: number;
  readonly requeued: number;
  /** invoices whose stale checkouts were dealt with at the processor (sweepStaleCheckouts) */
  readonly checkoutsExpired: number;
  readonly cursor: number | null;
}

/**
 * The payments-reconcile job: lists the processor's events since the last one seen (less an
 * overlap), stores what the webhook never delivered (received_via 'reconcile') with its application
 * queued, queues again every stored event left unapplied for over a minute, expires checkouts left
 * open that the invoice no longer asks for (sweepStaleCheckouts), and advances the cursor.
 * Safe to run at any time and any number of times: storing is by event id, applying is exactly once.
 */
export async function reconcileEvents(
  pool: Pool,
  queue: ReconcileQueue,
  stripe: Stripe,
  now: Date,
  logger?: Pick<Logger, 'info' | 'warn'>,
): Promise<ReconcileReport> {
  const cursor = await withGlobal(pool, async (tx) => {
    await tx.client.query(`insert into processor_sync (account) values ($1) on conflict (account) do nothing`, [SYNC_ACCOUNT]);
    const { rows } = await tx.client.query<{ last_event_created: string | null }>(
      `select last_event_created from processor_sync where account = $1`,
      [SYNC_ACCOUNT],
    );
    return rows[0]?.last_event_created === null || rows[0]?.last_event_created === undefined ? null : Number(rows[0].last_event_created);
  });
  const params: Stripe.EventListParams = { limit: 100, types: [...APPLIED_EVENT_TYPES] };
  if (cursor !== null) params.created = { gte: Math.max(0, cursor - RECONCILE_OVERLAP_SECONDS) };
  let listed = 0;
  let stored = 0;
  let newest: { id: string; created: number } | null = null;
  for await (const event of stripe.events.list(params)) {
    listed++;
    if (!newest || event.created > newest.created) newest = { id: event.id, created: event.created };
    const tenantId = eventTenant(event);
    if (!tenantId) continue;
    const result = await storeEvent(pool, queue, tenantId, event, 'reconcile');
    if (result === 'stored') stored++;
    if (result === 'unknownFirm') logger?.warn({ eventId: event.id }, 'processor event names an unknown firm; not stored');
  }
  const requeued = await requeueUnapplied(pool, queue, now);
  const checkoutsExpired = await sweepStaleCheckouts(pool, stripe, now, logger);
  if (newest) {
    const { id, created } = newest;
    await withGlobal(pool, (tx) =>
      tx.client.query(
        `update processor_sync set last_event_id = $2, last_event_created = $3, updated_at = $4
          where account = $1 and (last_event_created is null or last_event_created <= $3)`,
        [SYNC_ACCOUNT, id, created, now],
      ),
    );
  }
  const report = { listed, stored, requeued, checkoutsExpired, cursor: newest?.created ?? cursor };
  if (stored || requeued || checkoutsExpired) logger?.info(report, 'processor events reconciled');
  return report;
}

/**
 * Queues again, firm by firm, each stored event not applied REQUEUE_AFTER_SECONDS after it arrived,
 * in the firm's transaction, at most once per event per REQUEUE_SLOT_SECONDS (singletonKey per event).
 * Returns how many events were due (a throttled send queues nothing).
 */
export async function requeueUnapplied(pool: Pool, queue: ReconcileQueue, now: Date): Promise<number> {
  const { rows: firms } = await pool.query<{ id: string }>(`select id from firms`);
  let requeued = 0;
  for (const firm of firms) {
    requeued += await withTenant(pool, firm.id, async (tx) => {
      const { rows } = await tx.client.query<{ id: string }>(
        `select id from processor_events
          where tenant_id = $1 and applied_at is null and received_at < $2::timestamptz - make_interval(secs => $3)`,
        [tx.tenantId, now, REQUEUE_AFTER_SECONDS],
      );
      for (const event of rows) {
        const data: PaymentsApplyJob = { tenantId: tx.tenantId, eventId: event.id };
        await queue.boss.send(QUEUES.paymentsApply, data, {
          singletonKey: `apply:${event.id}`,
          singletonSeconds: REQUEUE_SLOT_SECONDS,
          db: { executeSql: (text, values) => tx.client.query(text, values) },
        });
      }
      return rows.length;
    });
  }
  return requeued;
}

/**
 * Stale checkouts (checkout-expiry.ts) still open: those of an offline payment, whose route queues no
 * expiry, and any whose expiry job gave up. Expired at the processor firm by firm, invoice by invoice,
 * outside the firm's transaction; one that fails is logged and left to the next run. Only checkouts
 * opened within their lifetime: the processor has let older ones lapse. Returns how many invoices
 * had theirs dealt with.
 */
export async function sweepStaleCheckouts(pool: Pool, stripe: Stripe, now: Date, logger?: Pick<Logger, 'info' | 'warn'>): Promise<number> {
  const { rows: firms } = await pool.query<{ id: string }>(`select id from firms`);
  let expired = 0;
  for (const firm of firms) {
    const invoiceIds = await withTenant(pool, firm.id, (tx) => invoicesWithStaleCheckouts(tx, now, CHECKOUT_LIFETIME_SECONDS));
    for (const invoiceId of invoiceIds) {
      try {
        await expireStaleCheckouts(pool, stripe, { tenantId: firm.id, expireCheckoutsOf: invoiceId });
        expired++;
      } catch (error) {
        logger?.warn({ err: error, invoiceId }, 'stale checkout not expired at the processor; tried again at the next run');
      }
    }
  }
  return expired;
}
