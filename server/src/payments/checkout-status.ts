import type { CheckoutStatus } from '@layerbook/contracts';
import { withTenant, type TenantTx } from '@layerbook/db';
import type { Request } from 'express';
import Decimal from 'decimal.js';
import type Stripe from 'stripe';
import { moneyOut } from '../billing/money';
import type { AppContext } from '../context';
import { withClient } from '../http/guards';
import { notFound } from '../http/problem';
import { receiptNumber } from './payment-read';
import { loadPayableInvoice } from './checkout';
import { expireCheckoutSession, fulfilCheckoutSession } from './fulfil';
import { processorFor } from './processor';

/** The return page polls every ~1.5 s; the processor is asked about one checkout at most this often (one rate limit for all firms). */
export const ASK_PROCESSOR_EVERY_MS = 10_000;
/** When each checkout last asked the processor, in this process (a few servers each ask at most this often). */
const lastAsked = new Map<string, number>();

/** True (and remembered) when the processor may be asked about this checkout now. */
function mayAskProcessor(checkoutId: string, nowMs: number): boolean {
  const last = lastAsked.get(checkoutId);
  if (last !== undefined && nowMs - last < ASK_PROCESSOR_EVERY_MS && nowMs >= last) return false;
  lastAsked.set(checkoutId, nowMs);
  if (lastAsked.size > 5_000) {
    for (const [id, at] of lastAsked) if (nowMs - at >= ASK_PROCESSOR_EVERY_MS) lastAsked.delete(id);
  }
  return true;
}

interface CheckoutRow {
  id: string;
  processor_session_id: string;
  amount: string;
  currency: string;
  status: 'open' | 'complete' | 'expired';
}

async function readStatus(tx: TenantTx, row: CheckoutRow): Promise<CheckoutStatus> {
  const base = { checkoutId: row.id, amount: moneyOut(row.amount, row.currency), currency: row.currency };
  const none = { paymentId: null, receiptNumber: null, credit: null };
  if (row.status !== 'complete') return { ...base, state: row.status, ...none };
  const { rows } = await tx.client.query<{ id: string; receipt_no: number | null; amount: string; applied: string; currency: string }>(
    `select id, receipt_no, amount::text as amount, amount_applied::text as applied, currency from payments
      where tenant_id = $1 and processor_session_id = $2`,
    [tx.tenantId, row.processor_session_id],
  );
  const payment = rows[0];
  if (!payment) return { ...base, state: 'confirming', ...none };
  const credit = new Decimal(payment.amount).minus(payment.applied);
  return {
    ...base,
    state: 'paid',
    paymentId: payment.id,
    receiptNumber: receiptNumber(payment.receipt_no),
    credit: credit.greaterThan(0)
      ? {
          amount: moneyOut(credit, payment.currency),
          currency: payment.currency,
          isWholePayment: new Decimal(payment.applied).isZero(),
        }
      : null,
  };
}

async function loadCheckout(tx: TenantTx, invoiceId: string, checkoutId: string): Promise<CheckoutRow> {
  const { rows } = await tx.client.query<CheckoutRow>(
    `select id, processor_session_id, amount::text as amount, currency, status from checkout_sessions
      where tenant_id = $1 and id = $2 and invoice_id = $3`,
    [tx.tenantId, checkoutId, invoiceId],
  );
  if (!rows[0]) throw notFound('payment');
  return rows[0];
}

/**
 * GET /api/portal/invoices/:id/checkout/:checkoutId — where the client's payment stands, for the
 * page the processor sends them back to. While our checkout is open it asks the processor (at most
 * once per ASK_PROCESSOR_EVERY_MS per checkout; between asks it answers from our rows):
 * a paid session is fulfilled here and now (the same idempotent fulfilment as the webhook's), a
 * lapsed one is marked expired. `confirming` while the processor has completed the session but the
 * payment is not recorded yet (it has not cleared, or the processor could not be asked).
 */
export async function checkoutStatus(ctx: AppContext, req: Request, invoiceId: string, checkoutId: string): Promise<CheckoutStatus> {
  const row = await withClient(ctx, req, async (tx, client) => {
    await loadPayableInvoice(tx, client, invoiceId);
    return loadCheckout(tx, invoiceId, checkoutId);
  });
  const stripe = processorFor(ctx.config);
  if (row.status !== 'open' || !stripe || !mayAskProcessor(row.id, ctx.now().getTime())) {
    return withClient(ctx, req, (tx) => readStatus(tx, row));
  }
  let session: Stripe.Checkout.Session;
  try {
    session = await stripe.checkout.sessions.retrieve(row.processor_session_id, { expand: ['payment_intent.latest_charge'] });
  } catch (error) {
    req.log?.warn({ err: error, checkoutId }, 'checkout session not read from the processor');
    return withClient(ctx, req, (tx) => readStatus(tx, row));
  }
  const tenantId = req.user!.tenantId;
  const deps = { queue: ctx.queue, config: ctx.config };
  if (session.status === 'complete' && session.payment_status === 'paid') {
    // Dated by when the processor took the money (the expanded charge), not by this poll.
    await withTenant(ctx.pool, tenantId, (tx) => fulfilCheckoutSession(tx, deps, session, ctx.now(), ctx.now()));
  } else if (session.status === 'expired') {
    await withTenant(ctx.pool, tenantId, (tx) => expireCheckoutSession(tx, session));
  }
  return withClient(ctx, req, async (tx) => {
    const now = await loadCheckout(tx, invoiceId, checkoutId);
    const status = await readStatus(tx, now);
    return status.state === 'open' && session.status === 'complete' ? { ...status, state: 'confirming' } : status;
  });
}
