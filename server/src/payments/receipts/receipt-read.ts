import type { PaymentMethod, PortalReceipt } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import Decimal from 'decimal.js';
import { moneyOut } from '../../billing/money';
import { loadPrintableInvoice, type PrintableInvoice, type Reader } from '../../billing/pdf/printable';
import { localDate } from '../../firms/local-date';
import { notFound } from '../../http/problem';
import { receiptNumber } from '../payment-read';

/** The receipts of one invoice for the portal: its payments' and its succeeded refunds', oldest first. */
export async function listPortalReceipts(tx: TenantTx, invoiceId: string): Promise<PortalReceipt[]> {
  const { rows } = await tx.client.query<{
    id: string;
    kind: 'payment' | 'refund';
    receipt_no: number;
    on: string;
    method: PaymentMethod;
    amount: string;
    currency: string;
  }>(
    `select id, 'payment' as kind, receipt_no, received_on::text as "on", method, amount::text as amount, currency
       from payments where tenant_id = $1 and invoice_id = $2 and receipt_no is not null
     union all
     select id, 'refund', receipt_no, refunded_on::text, method, amount::text, currency
       from refunds where tenant_id = $1 and invoice_id = $2 and status = 'succeeded' and receipt_no is not null
     order by receipt_no`,
    [tx.tenantId, invoiceId],
  );
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    number: receiptNumber(r.receipt_no) as string,
    on: r.on,
    method: r.method,
    amount: moneyOut(r.amount, r.currency),
    currency: r.currency,
  }));
}

/** The payment a receipt speaks of (for a refund: the payment it gives back from). */
export interface ReceiptPayment {
  readonly id: string;
  readonly number: string | null;
  readonly method: PaymentMethod;
  readonly reference: string;
  readonly receivedOn: string;
  readonly amount: string;
  readonly applied: string;
  /** amount − applied: kept as the client's credit when it was paid */
  readonly credit: string;
  readonly refunded: string;
}

/** Everything a receipt PDF prints, read in one firm transaction; money at the currency's minor units. */
export interface PrintableReceipt {
  readonly kind: 'payment' | 'refund';
  readonly id: string;
  /** "RCT-0007" */
  readonly number: string;
  /** the day the money came in (payment) or went back (refund) */
  readonly on: string;
  readonly currency: string;
  readonly amount: string;
  readonly method: PaymentMethod;
  readonly reference: string;
  /** refunds: why */
  readonly reason: string;
  readonly payment: ReceiptPayment;
  /** the invoice as it stands now (its amount due, its frozen document for the firm's heading) */
  readonly invoice: PrintableInvoice;
  /** the firm's date when the receipt was printed: what is due is told as of that day */
  readonly printedOn: string;
}

interface PaymentRow {
  id: string;
  invoice_id: string;
  receipt_no: number | null;
  method: PaymentMethod;
  reference: string;
  received_on: string;
  amount: string;
  amount_applied: string;
  amount_refunded: string;
  currency: string;
  time_zone: string;
}

const clientFilter = (reader: Reader, column: string) => (reader.kind === 'client' ? `and ${column} = $3` : '');
const readerParams = (reader: Reader) => (reader.kind === 'client' ? [reader.clientId] : []);

async function loadPayment(tx: TenantTx, id: string, reader: Reader): Promise<PaymentRow | undefined> {
  const { rows } = await tx.client.query<PaymentRow>(
    `select p.id, p.invoice_id, p.receipt_no, p.method, p.reference, p.received_on::text as received_on, p.amount::text as amount,
            p.amount_applied::text as amount_applied, p.amount_refunded::text as amount_refunded, p.currency, f.time_zone
       from payments p join firms f on f.id = p.tenant_id
      where p.tenant_id = $1 and p.id = $2 ${clientFilter(reader, 'p.client_id')}`,
    [tx.tenantId, id, ...readerParams(reader)],
  );
  return rows[0];
}

function toReceiptPayment(p: PaymentRow): ReceiptPayment {
  const money = (v: string) => moneyOut(v, p.currency);
  return {
    id: p.id,
    number: receiptNumber(p.receipt_no),
    method: p.method,
    reference: p.reference,
    receivedOn: p.received_on,
    amount: money(p.amount),
    applied: money(p.amount_applied),
    credit: money(new Decimal(p.amount).minus(p.amount_applied).toFixed(2)),
    refunded: money(p.amount_refunded),
  };
}

/** A payment's receipt: the office reads any of the firm's, a client only their own (404 otherwise). */
export async function loadPaymentReceipt(tx: TenantTx, id: string, reader: Reader, now: Date): Promise<PrintableReceipt> {
  const p = await loadPayment(tx, id, reader);
  if (!p || p.receipt_no === null) throw notFound('receipt');
  const payment = toReceiptPayment(p);
  return {
    kind: 'payment',
    id: p.id,
    number: payment.number as string,
    on: p.received_on,
    currency: p.currency,
    amount: payment.amount,
    method: p.method,
    reference: p.reference,
    reason: '',
    payment,
    invoice: await loadPrintableInvoice(tx, p.invoice_id, reader, now),
    printedOn: localDate(p.time_zone, now),
  };
}

/** A succeeded refund's receipt (a pending or failed refund has none: 404). */
export async function loadRefundReceipt(tx: TenantTx, id: string, reader: Reader, now: Date): Promise<PrintableReceipt> {
  const { rows } = await tx.client.query<{
    id: string;
    payment_id: string;
    receipt_no: number;
    refunded_on: string;
    amount: string;
    currency: string;
    method: PaymentMethod;
    reference: string;
    reason: string;
  }>(
    `select id, payment_id, receipt_no, refunded_on::text as refunded_on, amount::text as amount, currency, method, reference, reason
       from refunds where tenant_id = $1 and id = $2 and status = 'succeeded' and receipt_no is not null ${clientFilter(reader, 'client_id')}`,
    [tx.tenantId, id, ...readerParams(reader)],
  );
  const r = rows[0];
  if (!r) throw notFound('receipt');
  const p = await loadPayment(tx, r.payment_id, reader);
  if (!p) throw notFound('receipt');
  return {
    kind: 'refund',
    id: r.id,
    number: receiptNumber(r.receipt_no) as string,
    on: r.refunded_on,
    currency: r.currency,
    amount: moneyOut(r.amount, r.currency),
    method: r.method,
    reference: r.reference,
    reason: r.reason,
    payment: toReceiptPayment(p),
    invoice: await loadPrintableInvoice(tx, p.invoice_id, reader, now),
    printedOn: localDate(p.time_zone, now),
  };
}
