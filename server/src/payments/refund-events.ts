import type { AttentionReason } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { fromProcessorAmount, minorUnitDigits } from '@layerbook/domain';
import Decimal from 'decimal.js';
import type Stripe from 'stripe';
import { recordAudit } from '../audit/record';
import { SYSTEM_ACTOR } from '../http/actor';
import { localDate } from '../firms/local-date';
import type { ReceiptMailDeps } from './receipt-mail';
import { outcomeOf } from './refund-card';
import { settleRefund } from './refund-settle';

/**
 * Thrown when a refund event names a payment we have not recorded yet (its payment's event has not
 * been applied): the event's job should fail and be retried later, not be marked applied.
 */
export class RefundPaymentNotYetRecorded extends Error {
  constructor(readonly paymentIntentId: string) {
    super(`No payment recorded yet for ${paymentIntentId}; apply the refund event later`);
    this.name = 'RefundPaymentNotYetRecorded';
  }
}

const idOf = (value: string | { id: string } | null | undefined): string | null =>
  typeof value === 'string' ? value : (value?.id ?? null);

/**
 * Applies what the processor says of a refund, in the caller's (the event's) transaction:
 * - one we asked for (metadata.refund_id, or its processor id already on our row): a pending refund
 *   becomes succeeded (its effect on the payment and invoice, a receipt, the e-mail) or failed;
 * - one made at the processor's dashboard (no refund of ours): once succeeded, it is recorded as a
 *   new card refund against the payment found by its payment_intent — never twice (the processor's
 *   refund id is unique on our refunds).
 * A refund we recorded as succeeded that the processor later says failed (or one we marked failed that
 * succeeded) changes no figure: it is noted for a person (`invoice.refund_needs_attention`).
 * Safe to call any number of times: only the pending → final step does anything. Returns what it did, in words.
 */
export async function applyProcessorRefund(tx: TenantTx, deps: ReceiptMailDeps, refund: Stripe.Refund, now: Date): Promise<string> {
  const ours = await findOurRefund(tx, refund);
  if (ours?.status === 'failed' && refund.status === 'succeeded') {
    // We were told it failed (and freed its amount), yet the money went back: a person must look.
    return `Refund ${refund.id}: ${await needsAttention(tx, ours.invoiceId, refund, 'refundWentThroughAfter', 'the processor says a refund we had marked failed succeeded')}`;
  }
  if (ours?.status === 'succeeded' && outcomeOf(refund).status === 'failed') {
    // Recorded as given back (receipt made), yet the processor says it failed afterwards (a closed card,
    // rarely): the money is back with the firm and the client may not have it. A person must look.
    return `Refund ${refund.id}: ${await needsAttention(tx, ours.invoiceId, refund, 'refundFailedAfter', 'the processor says a refund we recorded as given back failed afterwards')}`;
  }
  if (ours) return `Refund ${refund.id}: ${await settleRefund(tx, deps, SYSTEM_ACTOR, ours.id, outcomeOf(refund), now)}`;
  if (refund.status !== 'succeeded')
    return `Refund ${refund.id}: not ours and not succeeded (${refund.status ?? 'no status'}); nothing recorded`;
  const paymentIntentId = idOf(refund.payment_intent);
  if (!paymentIntentId) return `Refund ${refund.id}: no payment named; nothing recorded`;
  return `Refund ${refund.id}: ${await recordDashboardRefund(tx, deps, refund, paymentIntentId, now)}`;
}

async function findOurRefund(tx: TenantTx, refund: Stripe.Refund): Promise<{ id: string; status: string; invoiceId: string } | null> {
  const ourId = refund.metadata?.['refund_id'];
  const { rows } = await tx.client.query<{ id: string; status: string; invoiceId: string }>(
    `select id, status, invoice_id as "invoiceId" from refunds where tenant_id = $1 and (processor_refund_id = $2 or ($3::text is not null and id::text = $3::text))
      order by (processor_refund_id = $2) desc limit 1`,
    [tx.tenantId, refund.id, ourId ?? null],
  );
  return rows[0] ?? null;
}

/** A refund made at the processor's dashboard: recorded (succeeded) against our card payment, if it fits what is left. */
async function recordDashboardRefund(
  tx: TenantTx,
  deps: ReceiptMailDeps,
  refund: Stripe.Refund,
  paymentIntentId: string,
  now: Date,
): Promise<string> {
  const payment = (
    await tx.client.query<{ id: string; invoice_id: string; client_id: string; currency: string; time_zone: string }>(
      `select p.id, p.invoice_id, p.client_id, p.currency, f.time_zone from payments p join firms f on f.id = p.tenant_id
        where p.tenant_id = $1 and p.processor_payment_intent_id = $2 order by p.created_at limit 1`,
      [tx.tenantId, paymentIntentId],
    )
  ).rows[0];
  if (!payment) throw new RefundPaymentNotYetRecorded(paymentIntentId);
  await tx.client.query(`select 1 from invoices where tenant_id = $1 and id = $2 for update`, [tx.tenantId, payment.invoice_id]);
  const locked = (
    await tx.client.query<{ refundable: string }>(
      `select (p.amount - p.amount_refunded
               - coalesce((select sum(r.amount) from refunds r where r.tenant_id = p.tenant_id and r.payment_id = p.id and r.status = 'pending'), 0)
              )::text as refundable
         from payments p where p.tenant_id = $1 and p.id = $2 for update of p`,
      [tx.tenantId, payment.id],
    )
  ).rows[0];
  // Another event for the same refund may have recorded it while this one waited for the lock.
  if (await findOurRefund(tx, refund)) return 'already recorded';
  if (refund.currency.toUpperCase() !== payment.currency) {
    return needsAttention(
      tx,
      payment.invoice_id,
      refund,
      'refundOtherCurrency',
      `paid in ${payment.currency}, refunded in ${refund.currency.toUpperCase()}`,
    );
  }
  const amount = fromProcessorAmount(refund.amount, payment.currency);
  if (amount.greaterThan(new Decimal(locked.refundable))) {
    return needsAttention(
      tx,
      payment.invoice_id,
      refund,
      'refundMoreThanLeft',
      `${amount.toFixed(2)} is more than the ${locked.refundable} left on the payment`,
    );
  }
  const inserted = await tx.client.query<{ id: string }>(
    `insert into refunds (tenant_id, payment_id, invoice_id, client_id, method, status, amount, currency, refunded_on, reason, processor_refund_id)
     values ($1, $2, $3, $4, 'card', 'pending', $5, $6, $7, $8, $9) returning id`,
    [
      tx.tenantId,
      payment.id,
      payment.invoice_id,
      payment.client_id,
      amount.toFixed(2),
      payment.currency,
      localDate(payment.time_zone, now),
      refund.reason ? `Made at the processor (${refund.reason.replace(/_/g, ' ')})` : 'Made at the processor',
      refund.id,
    ],
  );
  return settleRefund(tx, deps, SYSTEM_ACTOR, inserted.rows[0].id, { status: 'succeeded', processorRefundId: refund.id }, now);
}

async function needsAttention(
  tx: TenantTx,
  invoiceId: string,
  refund: Stripe.Refund,
  reason: AttentionReason,
  why: string,
): Promise<string> {
  await recordAudit(tx, {
    actorUserId: null,
    actorKind: 'system',
    action: 'invoice.refund_needs_attention',
    entity: 'invoice',
    entityId: invoiceId,
    // In the currency's own units, as every other amount in the log (the processor counts its smallest unit).
    data: { reason, processorRefundId: refund.id, amount: processorAmountText(refund), currency: refund.currency?.toUpperCase(), why },
  });
  return `needs attention: ${why}; nothing recorded`;
}

function processorAmountText(refund: Stripe.Refund): string | number {
  try {
    const currency = refund.currency.toUpperCase();
    return fromProcessorAmount(refund.amount, currency).toFixed(minorUnitDigits(currency));
  } catch {
    return refund.amount;
  }
}
