import { withTenant, type TenantTx } from '@layerbook/db';
import type { Pool } from 'pg';
import Stripe from 'stripe';
import type { JobQueue } from '../queue/job-queue';
import { QUEUES } from '../queue/queues';

/**
 * A checkout asks the processor for the invoice's amount due as it was when the checkout opened. Once
 * that no longer stands — the invoice was voided or settled, money came in or went back, or a newer
 * checkout opened — its processor page must stop taking money, or a client with the old tab open pays
 * what nobody asks for (kept as credit, and a note for a person, if it still happens).
 *
 * Stale: open, and the invoice is no longer open for a card payment (issued or part paid), or the
 * checkout's amount or currency is not the amount due now, or a newer checkout of the invoice is open.
 */
const STALE = `c.status = 'open'
  and (i.status not in ('issued', 'part_paid')
       or c.currency <> i.currency
       or c.amount <> i.total - i.amount_paid - i.amount_credited
       or exists (select 1 from checkout_sessions n
                   where n.tenant_id = c.tenant_id and n.invoice_id = c.invoice_id and n.status = 'open' and n.created_at > c.created_at))`;
const FROM_CHECKOUTS = `from checkout_sessions c join invoices i on i.tenant_id = c.tenant_id and i.id = c.invoice_id`;

/**
 * Expiring an invoice's stale checkouts at the processor, as a job on the payments-apply queue (its
 * retries, backoff and dead letter suit a processor call; the queue's other jobs apply stored events).
 */
export interface CheckoutExpiryJob {
  readonly tenantId: string;
  readonly expireCheckoutsOf: string;
}

export const isCheckoutExpiryJob = (job: object): job is CheckoutExpiryJob => 'expireCheckoutsOf' in job;

/**
 * Queues the expiry of the invoice's stale checkouts, in the caller's transaction, so it runs once
 * that commits (and not at all if it rolls back); nothing when none is stale. Called after what makes
 * them stale: voiding, recording a card or offline payment, opening a newer checkout. The
 * reconciliation's sweep (`sweepStaleCheckouts`) expires any left open (a job that gave up).
 */
export async function enqueueCheckoutExpiry(tx: TenantTx, queue: JobQueue, invoiceId: string): Promise<void> {
  const { rowCount } = await tx.client.query(
    `select 1 ${FROM_CHECKOUTS} where c.tenant_id = $1 and c.invoice_id = $2 and ${STALE} limit 1`,
    [tx.tenantId, invoiceId],
  );
  if (!rowCount) return;
  const job: CheckoutExpiryJob = { tenantId: tx.tenantId, expireCheckoutsOf: invoiceId };
  await queue.send(QUEUES.paymentsApply, job, tx);
}

/** The invoices of the firm with a stale checkout opened less than `seconds` ago (older ones the processor has let lapse itself). */
export async function invoicesWithStaleCheckouts(tx: TenantTx, now: Date, seconds: number): Promise<string[]> {
  const { rows } = await tx.client.query<{ invoice_id: string }>(
    `select distinct c.invoice_id ${FROM_CHECKOUTS}
      where c.tenant_id = $1 and c.created_at > $2::timestamptz - make_interval(secs => $3) and ${STALE}`,
    [tx.tenantId, now, seconds],
  );
  return rows.map((r) => r.invoice_id);
}

/**
 * The job: each stale checkout of the invoice is expired at the processor (idempotency key per
 * checkout), then marked expired here from the processor's answer, as its `checkout.session.expired`
 * event would (whichever comes first; the other changes nothing). One the processor no longer holds
 * open was paid or lapsed there: a paid one is recorded by its own event (as credit, with a note,
 * when the invoice no longer asks for it). Throws when the processor does not answer, so the queue
 * tries again. Returns what it did, in words.
 */
export async function expireStaleCheckouts(pool: Pool, stripe: Stripe | null, job: CheckoutExpiryJob): Promise<string> {
  if (!stripe) return 'Ignored: online payments are off, so no checkout can be expired';
  const stale = await withTenant(pool, job.tenantId, async (tx) => {
    const { rows } = await tx.client.query<{ id: string; processor_session_id: string }>(
      `select c.id, c.processor_session_id ${FROM_CHECKOUTS} where c.tenant_id = $1 and c.invoice_id = $2 and ${STALE}`,
      [tx.tenantId, job.expireCheckoutsOf],
    );
    return rows;
  });
  const done: string[] = [];
  for (const checkout of stale) {
    const session = await expireAtProcessor(stripe, checkout.id, checkout.processor_session_id);
    if (session.status !== 'expired') {
      done.push(`Checkout ${session.id} is already ${session.status ?? 'closed'} at the processor; its event records it`);
      continue;
    }
    // Only while still open here: a payment recorded meanwhile made it complete, and that stands.
    await withTenant(pool, job.tenantId, (tx) =>
      tx.client.query(`update checkout_sessions set status = 'expired' where tenant_id = $1 and id = $2 and status = 'open'`, [
        tx.tenantId,
        checkout.id,
      ]),
    );
    done.push(`Checkout ${session.id} expired: the invoice no longer asks for it`);
  }
  return done.length ? done.join('; ') : `No stale checkout of invoice ${job.expireCheckoutsOf} to expire`;
}

async function expireAtProcessor(stripe: Stripe, checkoutId: string, sessionId: string): Promise<Stripe.Checkout.Session> {
  try {
    return await stripe.checkout.sessions.expire(sessionId, {}, { idempotencyKey: `expire-${checkoutId}` });
  } catch (error) {
    // Only an open session can be expired: one paid or lapsed meanwhile is read back as it stands.
    if (!(error instanceof Stripe.errors.StripeInvalidRequestError)) throw error;
    const session = await stripe.checkout.sessions.retrieve(sessionId);
    if (session.status === 'open') throw error;
    return session;
  }
}
