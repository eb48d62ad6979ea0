import type { PaymentMethod, RefundCreate, RefundStatus, RefundView } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { addDays, DomainInputError, toProcessorAmount } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import { decimalsMessage, fitsCurrency, moneyOut } from '../billing/money';
import { localDate } from '../firms/local-date';
import type { Actor } from '../http/actor';
import { badRequest, conflict, notFound } from '../http/problem';
import { longDate } from '../i18n/long-date';
import { toRefundView } from './payment-read';
import type { ReceiptMailDeps } from './receipt-mail';
import { settleRefund } from './refund-settle';

interface LockedPayment {
  invoice_id: string;
  client_id: string;
  method: PaymentMethod;
  amount: string;
  amount_refunded: string;
  currency: string;
  received_on: string;
  processor_payment_intent_id: string | null;
  pending: string;
  credit_used: string;
  time_zone: string;
}

/** A card refund reserved (pending) and ready to be sent to the processor outside the transaction. */
export interface CardRefundToSend {
  readonly refundId: string;
  readonly paymentIntentId: string;
  /** the processor's integer amount */
  readonly processorAmount: number;
}

export type RefundStart =
  { readonly kind: 'recorded'; readonly view: RefundView } | { readonly kind: 'card'; readonly send: CardRefundToSend };

/**
 * POST /api/payments/:id/refunds, the part inside the firm's transaction. Locks the invoice and
 * the payment, then checks the amount against what may still be given back: the amount paid, less
 * what was refunded, less refunds on their way, less any of its credit used on another invoice —
 * so ten refunds asked at once never give back more than was paid. An offline refund (cheque,
 * transfer, cash) is recorded as succeeded at once, with its receipt; a card refund is reserved
 * as pending, its row id the processor's idempotency key, for the caller to send.
 * A refund of a payment on a void invoice is allowed: voiding needs every payment on it refunded
 * first, so all that can be left there is credit kept for the client, which is theirs to have back.
 */
export async function startRefund(
  tx: TenantTx,
  deps: ReceiptMailDeps & { readonly onlinePayments: boolean },
  actor: Actor,
  paymentId: string,
  body: RefundCreate,
  now: Date,
): Promise<RefundStart> {
  const invoiceId = (
    await tx.client.query<{ invoice_id: string }>(`select invoice_id from payments where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      paymentId,
    ])
  ).rows[0]?.invoice_id;
  if (!invoiceId) throw notFound('payment');
  await tx.client.query(`select 1 from invoices where tenant_id = $1 and id = $2 for update`, [tx.tenantId, invoiceId]);
  if (body.clientKey !== undefined) {
    const earlier = await refundSentAgain(tx, paymentId, body);
    if (earlier) return { kind: 'recorded', view: await readRefund(tx, earlier) };
  }
  const p = (
    await tx.client.query<LockedPayment>(
      `select p.invoice_id, p.client_id, p.method, p.amount::text as amount, p.amount_refunded::text as amount_refunded, p.currency,
              p.received_on::text as received_on, p.processor_payment_intent_id, f.time_zone,
              coalesce((select sum(r.amount) from refunds r
                         where r.tenant_id = p.tenant_id and r.payment_id = p.id and r.status = 'pending'), 0)::text as pending,
              coalesce((select sum(c.amount) from client_credits c
                         where c.tenant_id = p.tenant_id and c.payment_id = p.id and c.used_on_invoice_id is not null), 0)::text as credit_used
         from payments p join firms f on f.id = p.tenant_id
        where p.tenant_id = $1 and p.id = $2 for update of p`,
      [tx.tenantId, paymentId],
    )
  ).rows[0];
  const today = localDate(p.time_zone, now);
  const isCard = body.method === 'card';
  checkMethod(p, body.method, deps.onlinePayments);
  const processorAmount = checkAmount(p, body.amount, isCard);
  // Left out, a refund by hand is dated today, or the payment's own day when that is tomorrow.
  const refundedOn = isCard ? today : (body.refundedOn ?? (p.received_on > today ? p.received_on : today));
  if (!isCard) checkDate(p, refundedOn, today);

  const inserted = await tx.client.query<{ id: string }>(
    `insert into refunds (tenant_id, payment_id, invoice_id, client_id, method, status, amount, currency, refunded_on, reason, reference,
                          client_key, created_by)
     values ($1, $2, $3, $4, $5, 'pending', $6, $7, $8, $9, $10, $11, $12) returning id`,
    [
      tx.tenantId,
      paymentId,
      p.invoice_id,
      p.client_id,
      body.method,
      new Decimal(body.amount).toFixed(2),
      p.currency,
      refundedOn,
      body.reason,
      isCard ? '' : (body.reference ?? ''),
      body.clientKey ?? null,
      actor.userId,
    ],
  );
  const refundId = inserted.rows[0].id;
  if (isCard) {
    // Asked of the processor now, settled when it answers (or by its event): the trail shows both steps.
    await recordAudit(tx, {
      actorUserId: actor.userId,
      actorKind: actor.kind,
      action: 'invoice.refund_requested',
      entity: 'invoice',
      entityId: p.invoice_id,
      data: { refundId, paymentId, amount: new Decimal(body.amount).toFixed(2), method: body.method, reason: body.reason },
    });
    return { kind: 'card', send: { refundId, paymentIntentId: p.processor_payment_intent_id as string, processorAmount } };
  }
  await settleRefund(tx, deps, actor, refundId, { status: 'succeeded' }, now);
  return { kind: 'recorded', view: await readRefund(tx, refundId) };
}

/**
 * A refund sent again with its key (the first answer was lost): the first one counted, so its id is
 * answered — while it stands (succeeded, or still being sent back) and it is the same refund. A key
 * on another payment, on a refund that failed, or on one of another method or amount is 409 naming
 * `clientKey`: replaying it would tell the office a refund they did not ask for was made (the
 * dialog makes a new key after a refusal). The invoice's lock, taken before, makes a second copy wait
 * here until the first has committed. Null when the key is new.
 */
async function refundSentAgain(tx: TenantTx, paymentId: string, body: RefundCreate): Promise<string | null> {
  const { rows } = await tx.client.query<{ id: string; payment_id: string; status: RefundStatus; method: PaymentMethod; amount: string }>(
    `select id, payment_id, status, method, amount::text as amount from refunds where tenant_id = $1 and client_key = $2`,
    [tx.tenantId, body.clientKey],
  );
  const earlier = rows[0];
  if (!earlier) return null;
  const refuse = (detail: string) => conflict(detail, [{ field: 'clientKey', message: 'Use a new key for each refund.' }]);
  if (earlier.payment_id !== paymentId) throw refuse('This refund’s key was already used for another payment.');
  if (earlier.status === 'failed') throw refuse('This refund’s key belongs to a refund that failed: send the refund again as a new one.');
  if (earlier.method !== body.method || !new Decimal(earlier.amount).equals(body.amount)) {
    throw refuse('This refund’s key was already used for a refund of another method or amount.');
  }
  return earlier.id;
}

function checkMethod(p: LockedPayment, method: PaymentMethod, onlinePayments: boolean): void {
  if (method !== 'card') return;
  const problem = (message: string) => badRequest([{ field: 'method', message }]);
  if (p.method !== 'card') throw problem('Only a card payment can go back to the card: record this refund as cheque, transfer or cash.');
  if (!p.processor_payment_intent_id)
    throw problem('This card payment has no payment at the processor to refund: record the refund as cheque, transfer or cash.');
  if (!onlinePayments) throw problem('Online payments are not set up: record the refund as cheque, transfer or cash.');
}

/** 400 naming amount: positive, in the currency's coins (and the processor's, for a card), at most what may still be given back. */
function checkAmount(p: LockedPayment, raw: string, isCard: boolean): number {
  const problem = (message: string) => badRequest([{ field: 'amount', message }]);
  if (!fitsCurrency(raw, p.currency)) throw problem(decimalsMessage(p.currency));
  const amount = new Decimal(raw);
  if (amount.lessThanOrEqualTo(0)) throw problem('Enter the amount to refund.');
  const refundable = new Decimal(p.amount).minus(p.amount_refunded).minus(p.pending).minus(p.credit_used);
  if (amount.greaterThan(refundable)) {
    const money = (v: Decimal.Value) => moneyOut(new Decimal(v).toFixed(2), p.currency);
    const why = [
      new Decimal(p.amount_refunded).greaterThan(0) ? `${money(p.amount_refunded)} already refunded` : '',
      new Decimal(p.pending).greaterThan(0) ? `${money(p.pending)} being sent back` : '',
      new Decimal(p.credit_used).greaterThan(0) ? `${money(p.credit_used)} of its credit used on another invoice` : '',
    ].filter(Boolean);
    const of = `of this ${money(p.amount)} payment`;
    throw problem(
      refundable.lessThanOrEqualTo(0)
        ? `Nothing is left to refund ${of}${why.length ? ` (${why.join(', ')})` : ''}.`
        : `At most ${money(refundable)} can be refunded ${of}${why.length ? ` (${why.join(', ')})` : ''}.`,
    );
  }
  if (!isCard) return 0;
  try {
    return toProcessorAmount(amount, p.currency);
  } catch (error) {
    if (error instanceof DomainInputError) throw problem(error.message);
    throw error;
  }
}

/**
 * A refund by hand is dated from the payment's day to the firm's tomorrow — the same latest day as the
 * payment itself (for an office a time zone ahead), so money received can always be given back that day.
 */
function checkDate(p: LockedPayment, refundedOn: string, today: string): void {
  const problem = (message: string) => badRequest([{ field: 'refundedOn', message }]);
  const latest = addDays(today, 1);
  if (refundedOn > latest) throw problem(`A refund cannot be dated later than ${longDate(latest)}.`);
  if (refundedOn < p.received_on) throw problem(`A refund cannot be dated before the payment was received (${longDate(p.received_on)}).`);
}

export async function readRefund(tx: TenantTx, refundId: string): Promise<RefundView> {
  const { rows } = await tx.client.query<Parameters<typeof toRefundView>[0]>(
    `select id, payment_id, method, status, amount::text as amount, currency, refunded_on::text as refunded_on, reason, reference,
            receipt_no, failure_message
       from refunds where tenant_id = $1 and id = $2`,
    [tx.tenantId, refundId],
  );
  if (!rows[0]) throw notFound('refund');
  return toRefundView(rows[0]);
}

/** A pending card refund as it is sent again: by its own id (the same idempotency key), or looked up by the processor's id once known. */
export async function pendingCardRefund(
  tx: TenantTx,
  refundId: string,
): Promise<CardRefundToSend & { readonly processorRefundId: string | null }> {
  const { rows } = await tx.client.query<{
    status: string;
    method: PaymentMethod;
    amount: string;
    currency: string;
    processor_refund_id: string | null;
    processor_payment_intent_id: string | null;
  }>(
    `select r.status, r.method, r.amount::text as amount, r.currency, r.processor_refund_id, p.processor_payment_intent_id
       from refunds r join payments p on p.tenant_id = r.tenant_id and p.id = r.payment_id
      where r.tenant_id = $1 and r.id = $2`,
    [tx.tenantId, refundId],
  );
  const r = rows[0];
  if (!r) throw notFound('refund');
  if (r.status !== 'pending') throw conflict(`This refund is already ${r.status === 'succeeded' ? 'recorded' : 'marked failed'}.`);
  if (r.method !== 'card' || !r.processor_payment_intent_id) throw conflict('Only a card refund is sent to the processor.');
  return {
    refundId,
    paymentIntentId: r.processor_payment_intent_id,
    processorAmount: toProcessorAmount(r.amount, r.currency),
    processorRefundId: r.processor_refund_id,
  };
}
