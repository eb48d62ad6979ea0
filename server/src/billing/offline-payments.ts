import type { OfflinePaymentCreate } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import Decimal from 'decimal.js';
import type { Actor } from '../http/actor';
import { badRequest, conflict, notFound } from '../http/problem';
import { recordPayment, type RecordedPayment } from '../payments/record-payment';
import { decimalsMessage, fitsCurrency, moneyOut } from './money';

/**
 * POST /api/invoices/:id/payments — a cheque, transfer or cash received against an open invoice:
 * at most the amount due (400 naming amount), then the invoice is part paid or paid, with a numbered receipt (recordPayment).
 */
export async function recordOfflinePayment(tx: TenantTx, actor: Actor, id: string, body: OfflinePaymentCreate): Promise<RecordedPayment> {
  const inv = (
    await tx.client.query<{ status: string; client_id: string; currency: string; due: string }>(
      `select status, client_id, currency, (total - amount_paid - amount_credited)::text as due from invoices where tenant_id = $1 and id = $2 for update`,
      [tx.tenantId, id],
    )
  ).rows[0];
  if (!inv) throw notFound('invoice');
  // A refunded invoice is owed again: money received for it may be recorded anew.
  if (inv.status !== 'issued' && inv.status !== 'part_paid' && inv.status !== 'refunded') {
    throw conflict(
      inv.status === 'draft' ? 'Issue the invoice before recording a payment.' : `This invoice is ${inv.status.replace('_', ' ')}.`,
    );
  }
  const amount = new Decimal(body.amount);
  const due = new Decimal(inv.due);
  if (!fitsCurrency(body.amount, inv.currency)) {
    throw badRequest([{ field: 'amount', message: decimalsMessage(inv.currency) }]);
  }
  if (amount.lessThanOrEqualTo(0)) throw badRequest([{ field: 'amount', message: 'Enter the amount received.' }]);
  if (amount.greaterThan(due)) throw badRequest([{ field: 'amount', message: `At most the amount due, ${moneyOut(due, inv.currency)}.` }]);
  return recordPayment(tx, actor, {
    invoiceId: id,
    method: body.method,
    amount: body.amount,
    currency: inv.currency,
    receivedOn: body.receivedOn,
    reference: body.reference,
  });
}
