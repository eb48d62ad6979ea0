import type { InvoiceStatus, PaymentMethod, RefundStatus } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import { nextDocumentNumber } from '../billing/numbering';
import { localDate } from '../firms/local-date';
import type { Actor } from '../http/actor';
import { notFound } from '../http/problem';
import { receiptNumber } from './payment-read';
import { enqueueReceiptMail, type ReceiptMailDeps } from './receipt-mail';

/** What the processor (or the office, for an offline refund) says became of a refund. */
export type RefundOutcome =
  | { readonly status: 'succeeded'; readonly processorRefundId?: string | null }
  | { readonly status: 'failed'; readonly processorRefundId?: string | null; readonly message: string }
  | { readonly status: 'pending'; readonly processorRefundId: string };

interface LockedRefund {
  id: string;
  payment_id: string;
  invoice_id: string;
  method: PaymentMethod;
  status: RefundStatus;
  amount: string;
  currency: string;
  reason: string;
  reference: string;
  processor_refund_id: string | null;
}

/**
 * Locks a refund's invoice, then its payment, then the refund itself — the order every money
 * writer takes (recordPayment locks the invoice first), so two of them never wait on each other in a circle.
 */
export async function lockRefund(tx: TenantTx, refundId: string): Promise<LockedRefund> {
  const ids = (
    await tx.client.query<{ invoice_id: string; payment_id: string }>(
      `select invoice_id, payment_id from refunds where tenant_id = $1 and id = $2`,
      [tx.tenantId, refundId],
    )
  ).rows[0];
  if (!ids) throw notFound('refund');
  await tx.client.query(`select 1 from invoices where tenant_id = $1 and id = $2 for update`, [tx.tenantId, ids.invoice_id]);
  await tx.client.query(`select 1 from payments where tenant_id = $1 and id = $2 for update`, [tx.tenantId, ids.payment_id]);
  const { rows } = await tx.client.query<LockedRefund>(
    `select id, payment_id, invoice_id, method, status, amount::text as amount, currency, reason, reference, processor_refund_id
       from refunds where tenant_id = $1 and id = $2 for update`,
    [tx.tenantId, refundId],
  );
  return rows[0];
}

/**
 * Moves a pending refund to its final state, in the caller's transaction. Only pending → succeeded
 * or pending → failed does anything, so the route that asked the processor, the processor's event
 * and the reconciliation may all call it: the first one settles it, the others find it settled.
 * Returns what happened, in words.
 */
export async function settleRefund(
  tx: TenantTx,
  deps: ReceiptMailDeps,
  actor: Actor,
  refundId: string,
  outcome: RefundOutcome,
  now: Date,
): Promise<string> {
  const refund = await lockRefund(tx, refundId);
  if (refund.status !== 'pending') return `Refund already ${refund.status === 'succeeded' ? 'recorded' : 'marked failed'}`;
  const processorRefundId = outcome.processorRefundId ?? refund.processor_refund_id;
  if (outcome.status === 'pending') {
    await tx.client.query(`update refunds set processor_refund_id = $3, updated_at = $4 where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      refundId,
      processorRefundId,
      now,
    ]);
    return 'Refund still pending at the processor';
  }
  if (outcome.status === 'failed') {
    await tx.client.query(
      `update refunds set status = 'failed', failure_message = $3, processor_refund_id = $4, updated_at = $5 where tenant_id = $1 and id = $2`,
      [tx.tenantId, refundId, outcome.message, processorRefundId, now],
    );
    await recordAudit(tx, {
      actorUserId: actor.userId,
      actorKind: actor.kind,
      action: 'invoice.refund_failed',
      entity: 'invoice',
      entityId: refund.invoice_id,
      data: { refundId, paymentId: refund.payment_id, amount: refund.amount, message: outcome.message },
    });
    return `Refund failed: ${outcome.message}`;
  }
  const receipt = await applyRefundEffects(tx, actor, refund, processorRefundId, now);
  await enqueueReceiptMail(tx, deps, { kind: 'refund', id: refundId });
  return `Refund ${receipt} recorded`;
}

/**
 * A refund's effect on the money, with the invoice, payment and refund already locked: it comes
 * first out of the payment's credit part (what was kept as the client's credit and not used since),
 * then out of the part applied to the invoice, which lowers the invoice's amount paid and moves its
 * status (nothing paid left: refunded; some: part paid; still all: paid; a void invoice stays void).
 * The refund takes the next receipt number. Returns it.
 */
async function applyRefundEffects(
  tx: TenantTx,
  actor: Actor,
  refund: LockedRefund,
  processorRefundId: string | null,
  now: Date,
): Promise<string> {
  const facts = (
    await tx.client.query<{ status: InvoiceStatus; client_id: string; credit_left: string; time_zone: string }>(
      `select i.status, i.client_id, f.time_zone,
              coalesce((select sum(c.amount) from client_credits c
                         where c.tenant_id = i.tenant_id and c.payment_id = $3 and c.used_on_invoice_id is null), 0)::text as credit_left
         from invoices i join firms f on f.id = i.tenant_id where i.tenant_id = $1 and i.id = $2`,
      [tx.tenantId, refund.invoice_id, refund.payment_id],
    )
  ).rows[0];
  const amount = new Decimal(refund.amount);
  const fromCredit = Decimal.min(amount, Decimal.max(new Decimal(facts.credit_left), 0));
  const fromApplied = amount.minus(fromCredit);
  // The check on payments (refunded ≤ amount) backs the reservation rule: a refund never gives back more than was paid.
  await tx.client.query(`update payments set amount_refunded = amount_refunded + $3::numeric where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    refund.payment_id,
    amount.toFixed(2),
  ]);
  let status = facts.status;
  if (fromApplied.greaterThan(0)) {
    const updated = await tx.client.query<{ status: InvoiceStatus }>(
      `update invoices set amount_paid = amount_paid - $3::numeric,
              status = case when status = 'void' then status
                            when amount_paid - $3::numeric <= 0 then 'refunded'
                            when total - (amount_paid - $3::numeric) - amount_credited <= 0 then 'paid'
                            else 'part_paid' end,
              updated_at = $4
        where tenant_id = $1 and id = $2 returning status`,
      [tx.tenantId, refund.invoice_id, fromApplied.toFixed(2), now],
    );
    status = updated.rows[0].status;
  }
  if (fromCredit.greaterThan(0)) {
    await tx.client.query(
      `insert into client_credits (tenant_id, client_id, payment_id, amount, currency, note, meta) values ($1, $2, $3, $4, $5, $6, $7)`,
      [
        tx.tenantId,
        facts.client_id,
        refund.payment_id,
        fromCredit.negated().toFixed(2),
        refund.currency,
        'Refunded to the client',
        JSON.stringify({ refundId: refund.id }),
      ],
    );
  }
  const receiptNo = await nextDocumentNumber(tx, 'receipt');
  const refundedOn = localDate(facts.time_zone, now);
  await tx.client.query(
    `update refunds set status = 'succeeded', receipt_no = $3, processor_refund_id = $4, updated_at = $5,
            refunded_on = case when method = 'card' then $6::date else refunded_on end
      where tenant_id = $1 and id = $2`,
    [tx.tenantId, refund.id, receiptNo, processorRefundId, now, refundedOn],
  );
  const receipt = receiptNumber(receiptNo) as string;
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'invoice.refund_recorded',
    entity: 'invoice',
    entityId: refund.invoice_id,
    data: {
      refundId: refund.id,
      paymentId: refund.payment_id,
      receipt,
      amount: amount.toFixed(2),
      fromApplied: fromApplied.toFixed(2),
      fromCredit: fromCredit.toFixed(2),
      method: refund.method,
      reference: refund.reference,
      reason: refund.reason,
      processorRefundId,
      statusBefore: facts.status,
      statusAfter: status,
    },
  });
  return receipt;
}
