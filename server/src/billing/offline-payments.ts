import type { OfflinePaymentCreate } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { addDays, yearBefore } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { localDate } from '../firms/local-date';
import type { Actor } from '../http/actor';
import { badRequest, conflict, notFound } from '../http/problem';
import { findRecordedPayment, recordPayment, type RecordedPayment } from '../payments/record-payment';
import { decimalsMessage, fitsCurrency, moneyOut } from './money';
import { longDate } from '../i18n/long-date';

/**
 * POST /api/invoices/:id/payments — a cheque, transfer or cash received against an open invoice:
 * at most the amount due (400 naming amount), received on a day from a year before the invoice's
 * date to the firm's tomorrow (400 naming receivedOn), then the invoice is part paid or paid, with a
 * numbered receipt (recordPayment).
 */
export async function recordOfflinePayment(
  tx: TenantTx,
  actor: Actor,
  id: string,
  body: OfflinePaymentCreate,
  now: Date,
): Promise<RecordedPayment> {
  const inv = (
    await tx.client.query<{
      status: string;
      client_id: string;
      currency: string;
      due: string;
      issued_on: string | null;
      time_zone: string;
    }>(
      `select i.status, i.client_id, i.currency, (i.total - i.amount_paid - i.amount_credited)::text as due,
              i.issued_on::text as issued_on, f.time_zone
         from invoices i join firms f on f.id = i.tenant_id
        where i.tenant_id = $1 and i.id = $2 for update of i`,
      [tx.tenantId, id],
    )
  ).rows[0];
  if (!inv) throw notFound('invoice');
  if (body.clientKey !== undefined) {
    // Sent again (the first answer was lost): the first one counted; answer the same, whatever changed since.
    // The invoice's row lock above makes a second copy wait here until the first has committed.
    const earlier = await findRecordedPayment(tx, { clientKey: body.clientKey });
    if (earlier && earlier.invoiceId !== id) {
      throw conflict('This payment’s key was already used for another invoice.', [
        { field: 'clientKey', message: 'Use a new key for each payment.' },
      ]);
    }
    if (earlier) return { ...earlier, invoiceStatus: inv.status as RecordedPayment['invoiceStatus'], alreadyRecorded: true };
  }
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
  checkReceivedOn(body.receivedOn, inv.issued_on, localDate(inv.time_zone, now));
  return recordPayment(tx, actor, {
    invoiceId: id,
    method: body.method,
    amount: body.amount,
    currency: inv.currency,
    receivedOn: body.receivedOn,
    reference: body.reference,
    clientKey: body.clientKey,
  });
}

/**
 * Money is received today or earlier — tomorrow is allowed for the office a time zone ahead (as
 * the invoice date). A cheque handed over at signing may predate the invoice, but not by more than
 * a year (a typed year is the usual slip).
 */
function checkReceivedOn(receivedOn: string, issuedOn: string | null, today: string): void {
  const latest = addDays(today, 1);
  if (receivedOn > latest)
    throw badRequest([{ field: 'receivedOn', message: `The day received cannot be later than ${longDate(latest)}.` }]);
  const earliest = yearBefore(issuedOn ?? today);
  if (receivedOn < earliest) {
    throw badRequest([
      { field: 'receivedOn', message: `The day received cannot be earlier than ${longDate(earliest)}, a year before the invoice's date.` },
    ]);
  }
}
