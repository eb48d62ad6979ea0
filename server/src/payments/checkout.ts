import { randomUUID } from 'node:crypto';
import { type CheckoutStart, INVOICE_KIND_LABELS, type InvoiceKind, type InvoiceStatus } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { DomainInputError, toProcessorAmount } from '@layerbook/domain';
import type { Request } from 'express';
import type Stripe from 'stripe';
import { moneyOut } from '../billing/money';
import type { AppContext } from '../context';
import { withClient } from '../http/guards';
import type { ClientPrincipal } from '../http/principal';
import { conflict, HttpError, notFound } from '../http/problem';
import { clientIdOf } from '../proposals/client-proposals';
import { enqueueCheckoutExpiry } from './checkout-expiry';
import { payOnlineFor } from './portal-pay';
import { processorFor } from './processor';

/** How long the processor keeps a checkout open (Stripe allows 30 minutes to 24 hours). */
export const CHECKOUT_LIFETIME_SECONDS = 60 * 60;
/** An open checkout is offered again only while it has this long left, so the client is not sent to a page about to lapse. */
const REUSE_MARGIN_SECONDS = 10 * 60;

interface PayableInvoice {
  id: string;
  client_id: string;
  status: InvoiceStatus;
  kind: InvoiceKind;
  number_text: string;
  currency: string;
  due: string;
  job_title: string;
  client_email: string;
}

/** The signed-in client's own invoice (never a draft), with what is due; 404 for anyone else's. */
export async function loadPayableInvoice(tx: TenantTx, client: ClientPrincipal, invoiceId: string, lock = false): Promise<PayableInvoice> {
  const clientId = await clientIdOf(tx, client);
  if (!clientId) throw notFound('invoice');
  const { rows } = await tx.client.query<PayableInvoice>(
    `select i.id, i.client_id, i.status, i.kind, i.number_text, i.currency,
            (i.total - i.amount_paid - i.amount_credited)::numeric(14, 2)::text as due, j.title as job_title, c.email as client_email
       from invoices i join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id
       join clients c on c.tenant_id = i.tenant_id and c.id = i.client_id
      where i.tenant_id = $1 and i.id = $2 and i.client_id = $3 and i.status <> 'draft'${lock ? ' for update of i' : ''}`,
    [tx.tenantId, invoiceId, clientId],
  );
  if (!rows[0]) throw notFound('invoice');
  return rows[0];
}

/**
 * 409 when the invoice cannot be paid by card now, in the API's English. The portal says it in the
 * client's language by this call, the status and the field (portal core/errors/problem-words.ts):
 * `amount` is below the smallest card payment, anything else "cannot be paid by card now". So only
 * the minimum names `amount`; the other refusals name the field that stops them, or none.
 */
function refuseUnpayable(isOnline: boolean, inv: PayableInvoice): void {
  if (!isOnline) throw conflict('This firm takes no card payments online; the invoice says how to pay.');
  if (inv.status === 'paid') throw conflict(`Invoice ${inv.number_text} is already paid.`);
  if (inv.status === 'void') throw conflict(`Invoice ${inv.number_text} is void: there is nothing to pay.`);
  const pay = payOnlineFor(isOnline, { status: inv.status, currency: inv.currency, amountDue: inv.due });
  if (pay.canPayOnline) return;
  const reason = pay.payOnlineReason;
  switch (reason?.code) {
    case 'refunded':
      throw conflict('The firm gave back what was paid on this invoice, so it is not paid by card here. Please ask the firm.');
    case 'currencyNotOffered': {
      const message = `Card payment is not offered in ${reason.currency}; please pay another way.`;
      throw conflict(message, [{ field: 'currency', message }]);
    }
    case 'belowMinimum': {
      const message = `Below the smallest card payment, ${reason.minimum} ${reason.currency}; please pay another way.`;
      throw conflict(message, [{ field: 'amount', message }]);
    }
    case undefined:
      throw conflict(`Nothing is due on invoice ${inv.number_text}.`);
  }
}

/** The amount due in the processor's integer units; an amount it cannot charge is a 409 naming amount. */
function processorAmount(due: string, currency: string): number {
  try {
    return toProcessorAmount(due, currency);
  } catch (error) {
    if (!(error instanceof DomainInputError)) throw error;
    throw conflict(`This amount cannot be paid by card: ${error.message}`, [{ field: 'amount', message: error.message }]);
  }
}

const processorDown = () =>
  new HttpError(
    502,
    'The card processor did not answer',
    'The card payment page could not be opened. Nothing was charged; try again in a moment.',
  );

/**
 * POST /api/portal/invoices/:id/checkout — sends the client to the processor's hosted page for the
 * invoice's amount due. An open checkout of the same amount with time left is offered again; else
 * a new Checkout Session is created (idempotency key = our checkout's id, so a retried call opens
 * one) and our checkout row keeps what was asked, to check the processor's answer against; an
 * older checkout of the invoice still open is expired at the processor after the commit (queued).
 * The invoice row stays locked from the reuse lookup until the new row is written, so two quick
 * starts (a double click, a second tab) wait for each other and the second reuses the first's
 * session. That holds the lock across the processor call, on this invoice only; if the call
 * fails nothing is written (a session made but not recorded simply expires unpaid, and one paid
 * anyway is recorded from its event by its metadata).
 */
export async function startCheckout(ctx: AppContext, req: Request, invoiceId: string): Promise<CheckoutStart> {
  const stripe = processorFor(ctx.config);
  const now = ctx.now();
  return withClient(ctx, req, async (tx, client) => {
    const inv = await loadPayableInvoice(tx, client, invoiceId, true);
    refuseUnpayable(stripe !== null, inv);
    const { rows } = await tx.client.query<{ id: string; url: string }>(
      `select id, url from checkout_sessions
        where tenant_id = $1 and invoice_id = $2 and status = 'open' and amount = $3::numeric and currency = $4
          and created_at > $5::timestamptz - make_interval(secs => $6) order by created_at desc limit 1`,
      [tx.tenantId, inv.id, inv.due, inv.currency, now, CHECKOUT_LIFETIME_SECONDS - REUSE_MARGIN_SECONDS],
    );
    if (rows[0]) return { url: rows[0].url, checkoutId: rows[0].id };
    const checkoutId = randomUUID();
    const session = await createSession(stripe!, req, inv, checkoutId, ctx.config.PUBLIC_URL, now);
    await tx.client.query(
      `insert into checkout_sessions (id, tenant_id, invoice_id, client_id, processor_session_id, amount, currency, url, created_at)
       values ($1, $2, $3, $4, $5, $6, $7, $8, $9)`,
      [checkoutId, tx.tenantId, inv.id, inv.client_id, session.id, moneyOut(inv.due, inv.currency), inv.currency, session.url, now],
    );
    // An older checkout still open (another amount, or about to lapse) stops taking money once this commits.
    await enqueueCheckoutExpiry(tx, ctx.queue, inv.id);
    return { url: session.url, checkoutId };
  });
}

/** The processor's Checkout Session for the amount due (idempotency key = our checkout id); 502 when it does not answer. */
async function createSession(
  stripe: Stripe,
  req: Request,
  inv: PayableInvoice,
  checkoutId: string,
  publicUrl: string,
  now: Date,
): Promise<Stripe.Checkout.Session & { url: string }> {
  const unitAmount = processorAmount(inv.due, inv.currency);
  const base = publicUrl.replace(/\/$/, '');
  const metadata = { tenant_id: req.user!.tenantId, invoice_id: inv.id, checkout_id: checkoutId };
  const params: Stripe.Checkout.SessionCreateParams = {
    mode: 'payment',
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: inv.currency.toLowerCase(),
          unit_amount: unitAmount,
          product_data: { name: `${inv.number_text} ${INVOICE_KIND_LABELS[inv.kind]} — ${inv.job_title}` },
        },
      },
    ],
    ...(inv.client_email ? { customer_email: inv.client_email } : {}),
    success_url: `${base}/portal/invoices/${inv.id}/payment/${checkoutId}`,
    cancel_url: `${base}/portal/invoices/${inv.id}?payment=cancelled`,
    expires_at: Math.floor(now.getTime() / 1000) + CHECKOUT_LIFETIME_SECONDS,
    metadata,
    payment_intent_data: { metadata },
  };
  let session: Stripe.Checkout.Session;
  try {
    session = await stripe.checkout.sessions.create(params, { idempotencyKey: checkoutId });
  } catch (error) {
    req.log?.error({ err: error, invoiceId: inv.id }, 'checkout session not created');
    throw processorDown();
  }
  if (!session.url) throw processorDown();
  return { ...session, url: session.url };
}
