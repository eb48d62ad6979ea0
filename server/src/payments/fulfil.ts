import { isUuid, type TenantTx } from '@layerbook/db';
import { fromProcessorAmount, minorUnitDigits, toProcessorAmount } from '@layerbook/domain';
import type Stripe from 'stripe';
import { localDate } from '../firms/local-date';
import { SYSTEM_ACTOR } from '../http/actor';
import { notePaidWhenNotAsked, notePaymentMismatch } from './attention';
import { enqueueCheckoutExpiry } from './checkout-expiry';
import { enqueueReceiptMail, type ReceiptMailDeps } from './receipt-mail';
import { recordPayment } from './record-payment';

export interface Fulfilment {
  /** what happened, in words, kept as the event's outcome */
  readonly outcome: string;
  readonly paymentId: string | null;
  readonly receiptNumber: string | null;
}

interface CheckoutRow {
  id: string;
  invoice_id: string;
  amount: string;
  currency: string;
  status: 'open' | 'complete' | 'expired';
}

/** Our checkout for a processor session, locked for the rest of the transaction; null when it is not ours. */
async function lockCheckout(tx: TenantTx, sessionId: string): Promise<CheckoutRow | null> {
  const { rows } = await tx.client.query<CheckoutRow>(
    `select id, invoice_id, amount::text as amount, currency, status from checkout_sessions
      where tenant_id = $1 and processor_session_id = $2 for update`,
    [tx.tenantId, sessionId],
  );
  return rows[0] ?? null;
}

/**
 * A session we created whose checkout row was never written (the server stopped between the
 * processor's answer and our insert): its metadata names our invoice and checkout, so the row is
 * written now from what the session asked — the payment is recorded, never lost. Null when the
 * metadata names no invoice of this firm.
 */
async function adoptCheckout(tx: TenantTx, session: Stripe.Checkout.Session): Promise<CheckoutRow | null> {
  const invoiceId = session.metadata?.['invoice_id'];
  const checkoutId = session.metadata?.['checkout_id'];
  const asked = paidAmount(session);
  if (!invoiceId || !isUuid(invoiceId) || !checkoutId || !isUuid(checkoutId) || !asked) return null;
  const { rowCount } = await tx.client.query(
    `insert into checkout_sessions (id, tenant_id, invoice_id, client_id, processor_session_id, amount, currency, url)
     select $3, i.tenant_id, i.id, i.client_id, $4, $5, $6, $7 from invoices i where i.tenant_id = $1 and i.id = $2
     on conflict do nothing`,
    [tx.tenantId, invoiceId, checkoutId, session.id, asked.amount, asked.currency, session.url ?? ''],
  );
  return rowCount ? lockCheckout(tx, session.id) : null;
}

const paymentIntentId = (session: Stripe.Checkout.Session): string | null =>
  typeof session.payment_intent === 'string' ? session.payment_intent : (session.payment_intent?.id ?? null);

/**
 * When the processor took the money: the charge's `created`, or the PaymentIntent's when the
 * charge is not expanded; `fallback` (the event's time) when the session names only the
 * PaymentIntent's id — as a webhook's session does.
 */
function takenAt(session: Stripe.Checkout.Session, fallback: Date): Date {
  const intent = session.payment_intent;
  if (!intent || typeof intent === 'string') return fallback;
  const charge = intent.latest_charge;
  return new Date((charge && typeof charge !== 'string' ? charge.created : intent.created) * 1000);
}

/** The processor's amount in major units, or null when it names a currency we cannot read. */
function paidAmount(session: Stripe.Checkout.Session): { amount: string; currency: string } | null {
  if (session.amount_total === null || !session.currency) return null;
  const currency = session.currency.toUpperCase();
  try {
    return { amount: fromProcessorAmount(session.amount_total, currency).toFixed(minorUnitDigits(currency)), currency };
  } catch {
    return null;
  }
}

/**
 * Records the payment of a paid Checkout Session, in the caller's transaction — whoever asks: the
 * webhook's event, the client's return from the processor's page, or the reconciliation. Idempotent:
 * recordPayment finds a payment already recorded for the session and writes nothing. What was really
 * paid (the processor's amount_total and currency) is what is recorded; when it differs from what
 * our checkout asked, the payment is still recorded (a different currency stays whole as the client's
 * credit), the outcome says it needs attention and the invoice gets a note for Today (attention.ts);
 * so does a payment of what the checkout asked that the invoice no longer took in full (voided or
 * settled meanwhile: the rest is credit). The receipt e-mail, and the expiry of the invoice's other
 * checkouts still open, are queued in the same transaction.
 * The payment is dated in the firm's zone by when the processor took it (takenAt; `paidAt` when the
 * session does not say). A card payment's reference stays empty: the client reads "Payment by card"
 * and the receipt number, and the processor's PaymentIntent id is kept apart for the office.
 */
export async function fulfilCheckoutSession(
  tx: TenantTx,
  deps: ReceiptMailDeps,
  session: Stripe.Checkout.Session,
  paidAt: Date,
  now: Date,
): Promise<Fulfilment> {
  const checkout = (await lockCheckout(tx, session.id)) ?? (await adoptCheckout(tx, session));
  if (!checkout) return { outcome: `Ignored: no checkout of ours for ${session.id}`, paymentId: null, receiptNumber: null };
  if (session.payment_status !== 'paid') {
    return { outcome: `Waiting: the payment for checkout ${session.id} has not cleared`, paymentId: null, receiptNumber: null };
  }
  const paid = paidAmount(session);
  if (!paid) {
    return {
      outcome: `Needs attention: checkout ${session.id} is paid but the processor gave no amount we can read`,
      paymentId: null,
      receiptNumber: null,
    };
  }
  const asked = toProcessorAmount(checkout.amount, checkout.currency);
  const matches = paid.currency === checkout.currency && session.amount_total === asked;
  const zone = (await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tx.tenantId])).rows[0];
  const intent = paymentIntentId(session);
  const recorded = await recordPayment(tx, SYSTEM_ACTOR, {
    invoiceId: checkout.invoice_id,
    method: 'card',
    amount: paid.amount,
    currency: paid.currency,
    receivedOn: localDate(zone.time_zone, takenAt(session, paidAt)),
    reference: '',
    processorSessionId: session.id,
    processorPaymentIntentId: intent ?? undefined,
  });
  if (!recorded.alreadyRecorded) await enqueueReceiptMail(tx, deps, { kind: 'payment', id: recorded.paymentId });
  const note = {
    invoiceId: checkout.invoice_id,
    paymentId: recorded.paymentId,
    receiptNumber: recorded.receiptNumber,
    amount: paid.amount,
    currency: paid.currency,
    asked: checkout.amount,
    askedCurrency: checkout.currency,
  };
  if (!recorded.alreadyRecorded && !matches) await notePaymentMismatch(tx, note);
  // What the checkout asked, but the invoice no longer did (voided or settled meanwhile): credit, and a note.
  const unasked = matches && recorded.credit !== '0.00';
  if (!recorded.alreadyRecorded && unasked) {
    await notePaidWhenNotAsked(tx, { ...note, credit: recorded.credit, invoiceStatus: recorded.invoiceStatus });
  }
  await tx.client.query(
    `update checkout_sessions set status = 'complete', completed_at = coalesce(completed_at, $3) where tenant_id = $1 and id = $2`,
    [tx.tenantId, checkout.id, now],
  );
  // The amount due changed: the invoice's other checkouts still open stop taking money once this commits.
  if (!recorded.alreadyRecorded) await enqueueCheckoutExpiry(tx, deps.queue, checkout.invoice_id);
  const words = `${paid.amount} ${paid.currency}`;
  const outcome = recorded.alreadyRecorded
    ? `Payment ${recorded.receiptNumber} already recorded`
    : matches
      ? `${unasked ? 'Needs attention: ' : ''}Payment ${recorded.receiptNumber} recorded: ${words}` +
        (unasked ? `, ${recorded.credit} kept as credit (the invoice is ${recorded.invoiceStatus.replace('_', ' ')})` : '')
      : `Needs attention: paid ${words} where the checkout asked ${checkout.amount} ${checkout.currency}; ` +
        `payment ${recorded.receiptNumber} recorded, ${recorded.applied} on the invoice, ${recorded.credit} kept as credit`;
  return { outcome, paymentId: recorded.paymentId, receiptNumber: recorded.receiptNumber };
}

/** A checkout the processor let lapse: ours is marked expired unless it was paid meanwhile (then nothing changes). */
export async function expireCheckoutSession(tx: TenantTx, session: Stripe.Checkout.Session): Promise<string> {
  const checkout = await lockCheckout(tx, session.id);
  if (!checkout) return `Ignored: no checkout of ours for ${session.id}`;
  if (checkout.status !== 'open') return `Checkout ${session.id} already ${checkout.status}; nothing changed`;
  await tx.client.query(`update checkout_sessions set status = 'expired' where tenant_id = $1 and id = $2`, [tx.tenantId, checkout.id]);
  return `Checkout ${session.id} expired unpaid`;
}
