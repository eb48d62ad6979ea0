import { type InvoiceDocument, type InvoiceStatus, type PaymentMethod } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { formatMoney } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { moneyOut } from '../billing/money';
import { localeOf, translator } from '../i18n/catalog';
import { clientReader } from '../i18n/reader';
import type { Config } from '../config';
import { enqueueMail } from '../mail/outbox';
import { formatsFor } from '../proposals/pdf/format';
import type { JobQueue } from '../queue/job-queue';
import { receiptNumber } from './payment-read';
import { receiptMail } from './receipts/receipt-templates';

export interface ReceiptMailDeps {
  readonly queue: JobQueue;
  readonly config: Config;
}

interface ReceiptRow {
  invoice_id: string;
  receipt_no: number | null;
  method: PaymentMethod;
  reference: string;
  on: string;
  amount: string;
  currency: string;
  reason: string;
  credit: string;
  payment_receipt_no: number | null;
  invoice_number: string | null;
  invoice_currency: string;
  invoice_status: InvoiceStatus;
  amount_due: string;
  document: InvoiceDocument | null;
  firm_name: string;
  client_id: string;
  client_name: string;
  client_email: string;
}

const INVOICE_AND_CLIENT = `join invoices i on i.tenant_id = p.tenant_id and i.id = p.invoice_id
  join clients c on c.tenant_id = i.tenant_id and c.id = i.client_id join firms f on f.id = i.tenant_id`;
const INVOICE_FACTS = `i.number_text as invoice_number, i.currency as invoice_currency, i.status as invoice_status, i.document, f.name as firm_name,
  c.id as client_id, c.name as client_name, c.email as client_email,
  (case when i.status = 'void' then 0 else greatest(i.total - i.amount_paid - i.amount_credited, 0) end)::numeric(14, 2)::text as amount_due`;

/**
 * Queues the receipt e-mail for a payment or a succeeded refund through the outbox, in the
 * caller's transaction (so a rollback sends nothing), from the firm, to the client's e-mail; each
 * receipt goes once (its purpose key). The e-mail links the invoice in the portal, where the receipt
 * PDF downloads. A client without an e-mail, or a receipt without a number, gets nothing.
 */
export async function enqueueReceiptMail(
  tx: TenantTx,
  deps: ReceiptMailDeps,
  receipt: { readonly kind: 'payment' | 'refund'; readonly id: string },
): Promise<void> {
  const sql =
    receipt.kind === 'payment'
      ? `select p.invoice_id, p.receipt_no, p.method, p.reference, p.received_on::text as "on", p.amount::text as amount, p.currency,
                '' as reason, (p.amount - p.amount_applied)::text as credit, null::int as payment_receipt_no, ${INVOICE_FACTS}
           from payments p ${INVOICE_AND_CLIENT} where p.tenant_id = $1 and p.id = $2`
      : `select r.invoice_id, r.receipt_no, r.method, r.reference, r.refunded_on::text as "on", r.amount::text as amount, r.currency,
                r.reason, '0' as credit, p.receipt_no as payment_receipt_no, ${INVOICE_FACTS}
           from refunds r join payments p on p.tenant_id = r.tenant_id and p.id = r.payment_id ${INVOICE_AND_CLIENT}
          where r.tenant_id = $1 and r.id = $2 and r.status = 'succeeded'`;
  const row = (await tx.client.query<ReceiptRow>(sql, [tx.tenantId, receipt.id])).rows[0];
  const to = row?.client_email.trim().toLowerCase();
  if (!row || row.receipt_no === null || !to) return;
  // In the client's language (theirs, else the firm's), numbers and dates for it in the firm's country.
  const reader = await clientReader(tx, row.client_id);
  const locale = localeOf(reader.language, reader.country);
  const t = translator(reader.language);
  const money = (amount: string, currency: string) => formatMoney(moneyOut(amount, currency), currency, locale);
  const number = receiptNumber(row.receipt_no) as string;
  const toCard = receipt.kind === 'refund' && row.method === 'card';
  const by = t(`mail.receipt.how.${row.method}`);
  const how = toCard
    ? t('mail.receipt.how.backToCard')
    : row.reference && row.method !== 'card'
      ? t('mail.receipt.how.withReference', { how: by, reference: row.reference })
      : by;
  const mail = receiptMail({
    kind: receipt.kind,
    firmName: row.document?.firm.name ?? row.firm_name,
    clientName: row.client_name,
    number,
    invoiceNumber: row.invoice_number ?? t('mail.receipt.theInvoice'),
    jobTitle: row.document?.jobTitle ?? '',
    amount: money(row.amount, row.currency),
    how,
    on: formatsFor(locale, row.currency).date(row.on),
    amountDue: new Decimal(row.amount_due).greaterThan(0) ? money(row.amount_due, row.invoice_currency) : null,
    isInvoiceRefunded: row.invoice_status === 'refunded',
    credit: new Decimal(row.credit).greaterThan(0) ? money(row.credit, row.currency) : null,
    paymentNumber: receiptNumber(row.payment_receipt_no),
    reason: row.reason,
    url: `${deps.config.PUBLIC_URL}/portal/invoices/${row.invoice_id}`,
    toCard,
    language: reader.language,
  });
  await enqueueMail(tx, deps.queue, {
    purposeKey: `receipt:${receipt.kind}:${receipt.id}`,
    tenantId: tx.tenantId,
    to,
    sender: 'firm',
    ...mail,
  });
}
