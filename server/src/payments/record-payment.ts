import type { InvoiceStatus, PaymentMethod } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import { nextDocumentNumber } from '../billing/numbering';
import type { Actor } from '../http/actor';
import { notFound } from '../http/problem';
import { receiptNumber } from './payment-read';

export interface PaymentInput {
  readonly invoiceId: string;
  readonly method: PaymentMethod;
  /** what the client paid, major units ("250.00") */
  readonly amount: string;
  readonly currency: string;
  readonly receivedOn: string;
  readonly reference: string;
  /** card payments: the processor's checkout session (unique: a second fulfilment finds the first) */
  readonly processorSessionId?: string;
  readonly processorPaymentIntentId?: string;
  /** offline payments: the office form's key (unique per firm) */
  readonly clientKey?: string;
}

export interface RecordedPayment {
  readonly paymentId: string;
  readonly receiptNumber: string;
  /** the part that went on the invoice */
  readonly applied: string;
  /** the rest, kept as the client's credit ("0.00" when none) */
  readonly credit: string;
  readonly invoiceStatus: InvoiceStatus;
  /** true when this checkout session's payment was already recorded: nothing was written */
  readonly alreadyRecorded: boolean;
}

interface LockedInvoice {
  status: InvoiceStatus;
  client_id: string;
  currency: string;
  number_text: string | null;
  due: string;
}

/**
 * Records money received against an invoice, in the caller's transaction: locks the invoice, puts
 * at most its amount due on it (status part paid or paid), keeps any rest as a client credit (never
 * lost — also when the invoice was settled or voided meanwhile, or the currency differs), takes
 * the next receipt number, and audits. Callers check what they must refuse first (offline: open
 * invoice, at most the amount due; card: the checkout's amount and currency). A card payment
 * already recorded for the same checkout session returns the first one (alreadyRecorded).
 * Mailing the receipt is the caller's (enqueueReceiptMail, in the same transaction).
 */
export async function recordPayment(tx: TenantTx, actor: Actor, input: PaymentInput): Promise<RecordedPayment> {
  const inv = (
    await tx.client.query<LockedInvoice>(
      `select status, client_id, currency, number_text, greatest(total - amount_paid - amount_credited, 0)::text as due
         from invoices where tenant_id = $1 and id = $2 for update`,
      [tx.tenantId, input.invoiceId],
    )
  ).rows[0];
  if (!inv) throw notFound('invoice');
  if (input.processorSessionId) {
    const earlier = await findRecordedPayment(tx, { sessionId: input.processorSessionId });
    if (earlier) return { ...earlier, invoiceStatus: inv.status, alreadyRecorded: true };
  }
  const amount = new Decimal(input.amount);
  const open = inv.status === 'issued' || inv.status === 'part_paid' || inv.status === 'refunded';
  const sameCurrency = input.currency === inv.currency;
  const applied = open && sameCurrency ? Decimal.min(amount, new Decimal(inv.due)) : new Decimal(0);
  const credit = amount.minus(applied);
  const receiptNo = await nextDocumentNumber(tx, 'receipt');
  const inserted = await tx.client.query<{ id: string }>(
    `insert into payments (tenant_id, invoice_id, client_id, method, amount, amount_applied, currency, received_on, reference,
                           receipt_no, processor_session_id, processor_payment_intent_id, client_key, created_by)
     values ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12, $13, $14) returning id`,
    [
      tx.tenantId,
      input.invoiceId,
      inv.client_id,
      input.method,
      input.amount,
      applied.toFixed(2),
      input.currency,
      input.receivedOn,
      input.reference,
      receiptNo,
      input.processorSessionId ?? null,
      input.processorPaymentIntentId ?? null,
      input.clientKey ?? null,
      actor.userId,
    ],
  );
  const paymentId = inserted.rows[0].id;
  let status = inv.status;
  if (applied.greaterThan(0)) {
    const updated = await tx.client.query<{ status: InvoiceStatus }>(
      `update invoices set amount_paid = amount_paid + $3::numeric,
              status = case when total - amount_paid - $3::numeric - amount_credited <= 0 then 'paid' else 'part_paid' end,
              updated_at = now()
        where tenant_id = $1 and id = $2 returning status`,
      [tx.tenantId, input.invoiceId, applied.toFixed(2)],
    );
    status = updated.rows[0].status;
  }
  if (credit.greaterThan(0)) {
    const note = !sameCurrency
      ? `Paid in ${input.currency}; the invoice is in ${inv.currency}.`
      : open
        ? `Paid beyond the amount due on ${inv.number_text ?? 'the invoice'}.`
        : `Paid after ${inv.number_text ?? 'the invoice'} was ${inv.status === 'void' ? 'voided' : 'settled'}.`;
    await tx.client.query(
      `insert into client_credits (tenant_id, client_id, payment_id, amount, currency, note) values ($1, $2, $3, $4, $5, $6)`,
      [tx.tenantId, inv.client_id, paymentId, credit.toFixed(2), input.currency, note],
    );
  }
  const receipt = receiptNumber(receiptNo) as string;
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'invoice.payment_recorded',
    entity: 'invoice',
    entityId: input.invoiceId,
    data: {
      paymentId,
      receipt,
      amount: input.amount,
      applied: applied.toFixed(2),
      credit: credit.toFixed(2),
      method: input.method,
      receivedOn: input.receivedOn,
      reference: input.reference,
    },
  });
  return {
    paymentId,
    receiptNumber: receipt,
    applied: applied.toFixed(2),
    credit: credit.toFixed(2),
    invoiceStatus: status,
    alreadyRecorded: false,
  };
}

/** A payment already recorded for a card checkout session, or for an office form's key; null when none. */
export async function findRecordedPayment(
  tx: TenantTx,
  by: { sessionId: string } | { clientKey: string },
): Promise<(Omit<RecordedPayment, 'invoiceStatus' | 'alreadyRecorded'> & { invoiceId: string }) | null> {
  const [column, value] = 'sessionId' in by ? ['processor_session_id', by.sessionId] : ['client_key', by.clientKey];
  const { rows } = await tx.client.query<{ id: string; invoice_id: string; receipt_no: number; amount: string; amount_applied: string }>(
    `select id, invoice_id, receipt_no, amount::text as amount, amount_applied::text as amount_applied from payments
      where tenant_id = $1 and ${column} = $2`,
    [tx.tenantId, value],
  );
  const p = rows[0];
  if (!p) return null;
  return {
    invoiceId: p.invoice_id,
    paymentId: p.id,
    receiptNumber: receiptNumber(p.receipt_no) as string,
    applied: new Decimal(p.amount_applied).toFixed(2),
    credit: new Decimal(p.amount).minus(p.amount_applied).toFixed(2),
  };
}
