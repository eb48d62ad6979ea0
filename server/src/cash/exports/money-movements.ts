import type { PaymentMethod, RefundStatus } from '@layerbook/contracts';
import { moneyOut } from '../../billing/money';
import { receiptNumber } from '../../payments/payment-read';
import type { ExportSpec } from './export-spec';
import { neutralise } from './neutralise';

interface PaymentRow {
  receipt_no: number | null;
  received_on: string;
  client_name: string;
  invoice_number: string | null;
  method: PaymentMethod;
  reference: string;
  currency: string;
  amount: string;
  amount_applied: string;
  amount_refunded: string;
}

/**
 * Payments received in the range: what the client paid, the part that went on the invoice (the
 * rest is the client's credit) and what has been given back since (the refunds file dates each).
 */
export const paymentsExport: ExportSpec<PaymentRow> = {
  header: [
    'Receipt number',
    'Received on',
    'Client',
    'Invoice number',
    'Method',
    'Reference',
    'Currency',
    'Amount',
    'Applied to invoice',
    'Refunded',
  ],
  sql: `select p.receipt_no, p.received_on::text as received_on, c.name as client_name, i.number_text as invoice_number, p.method,
      p.reference, p.currency, p.amount::text as amount, p.amount_applied::text as amount_applied, p.amount_refunded::text as amount_refunded
    from payments p
    join clients c on c.tenant_id = p.tenant_id and c.id = p.client_id
    join invoices i on i.tenant_id = p.tenant_id and i.id = p.invoice_id
    where p.tenant_id = $1 and p.received_on between $2::date and $3::date
    order by p.received_on, p.receipt_no, p.id`,
  toCells: (r) => [
    receiptNumber(r.receipt_no) ?? '',
    r.received_on,
    neutralise(r.client_name),
    neutralise(r.invoice_number ?? ''),
    r.method,
    neutralise(r.reference),
    r.currency,
    moneyOut(r.amount, r.currency),
    moneyOut(r.amount_applied, r.currency),
    moneyOut(r.amount_refunded, r.currency),
  ],
};

interface RefundRow {
  receipt_no: number | null;
  refunded_on: string;
  status: RefundStatus;
  client_name: string;
  invoice_number: string | null;
  payment_receipt_no: number | null;
  method: PaymentMethod;
  reason: string;
  reference: string;
  currency: string;
  amount: string;
}

/** Refunds dated in the range, whatever their state (pending and failed ones say so: only succeeded money left the firm). */
export const refundsExport: ExportSpec<RefundRow> = {
  header: [
    'Receipt number',
    'Refunded on',
    'Status',
    'Client',
    'Invoice number',
    'Payment receipt number',
    'Method',
    'Reason',
    'Reference',
    'Currency',
    'Amount',
  ],
  sql: `select r.receipt_no, r.refunded_on::text as refunded_on, r.status, c.name as client_name, i.number_text as invoice_number,
      p.receipt_no as payment_receipt_no, r.method, r.reason, r.reference, r.currency, r.amount::text as amount
    from refunds r
    join payments p on p.tenant_id = r.tenant_id and p.id = r.payment_id
    join clients c on c.tenant_id = r.tenant_id and c.id = r.client_id
    join invoices i on i.tenant_id = r.tenant_id and i.id = r.invoice_id
    where r.tenant_id = $1 and r.refunded_on between $2::date and $3::date
    order by r.refunded_on, r.receipt_no, r.id`,
  toCells: (r) => [
    receiptNumber(r.receipt_no) ?? '',
    r.refunded_on,
    r.status,
    neutralise(r.client_name),
    neutralise(r.invoice_number ?? ''),
    receiptNumber(r.payment_receipt_no) ?? '',
    r.method,
    neutralise(r.reason),
    neutralise(r.reference),
    r.currency,
    moneyOut(r.amount, r.currency),
  ],
};
