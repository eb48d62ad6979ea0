import type { InvoiceDetail, RefundCreate } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { acceptedJob, insertInvoice } from '../billing/pdf/invoice-fixtures';
import { staffActor } from '../http/actor';
import type { TestServer } from '../testing/harness';
import { recordPayment, type PaymentInput } from './record-payment';

/**
 * Test set-up for the refund and receipt specs (no spec of its own): an accepted job (the portal
 * fixture's client, signed in) with an issued deposit invoice INV-0001 for `total` in `currency`, and helpers to
 * record payments, ask for refunds and read the money back from the tables.
 */
export async function issuedInvoice(t: TestServer, firmName: string, total = '100.00', currency = 'USD') {
  const f = await acceptedJob(t, firmName);
  if (currency !== 'USD') {
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update jobs set currency = $3 where tenant_id = $1 and id = $2`, [tx.tenantId, f.jobId, currency]),
    );
  }
  const invoiceId = await insertInvoice(t, f.firmId, f.jobId, {
    kind: 'deposit',
    status: 'issued',
    number: 1,
    issuedOn: '2026-12-01',
    dueOn: '2026-12-15',
    total,
    lines: [{ label: 'Deposit on acceptance', amount: total }],
  });
  const post = (url: string, body: object) => f.agent.post(url).set('x-csrf-token', f.csrf()).send(body);

  /** A cheque recorded by the office through the API (at most the amount due); returns the payment's id. */
  const payOffline = async (amount: string, reference = '1042', receivedOn = '2026-12-10') => {
    const res = await post(`/api/invoices/${invoiceId}/payments`, { method: 'cheque', amount, receivedOn, reference });
    if (res.status !== 200) throw new Error(`payment not recorded: ${res.status} ${JSON.stringify(res.body)}`);
    const payments = (res.body as InvoiceDetail).payments;
    return payments[payments.length - 1].id;
  };

  /** Money recorded as recordPayment would for a card or an overpayment (beyond the amount due: the rest is a credit). */
  const payDirect = async (input: Partial<PaymentInput> & { amount: string }) =>
    withTenant(t.ctx.pool, f.firmId, (tx) =>
      recordPayment(tx, staffActor({ id: f.userId, role: 'owner' }), {
        invoiceId,
        method: 'transfer',
        currency,
        receivedOn: '2026-12-10',
        reference: '',
        ...input,
      }),
    );

  const refund = (paymentId: string, body: Partial<RefundCreate> & { amount: string }) =>
    post(`/api/payments/${paymentId}/refunds`, { method: 'cheque', reason: 'Fewer rooms than planned', ...body });

  /** The invoice and payment rows as stored. */
  const money = async (paymentId: string) =>
    withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const inv = (
        await tx.client.query<{ status: string; amount_paid: string }>(
          `select status, amount_paid::text as amount_paid from invoices where tenant_id = $1 and id = $2`,
          [tx.tenantId, invoiceId],
        )
      ).rows[0];
      const pay = (
        await tx.client.query<{ amount_refunded: string }>(
          `select amount_refunded::text as amount_refunded from payments where tenant_id = $1 and id = $2`,
          [tx.tenantId, paymentId],
        )
      ).rows[0];
      const credit = (
        await tx.client.query<{ sum: string }>(
          `select coalesce(sum(amount), 0)::text as sum from client_credits where tenant_id = $1 and payment_id = $2`,
          [tx.tenantId, paymentId],
        )
      ).rows[0].sum;
      return { status: inv.status, amountPaid: inv.amount_paid, refunded: pay.amount_refunded, credit };
    });

  /** The invoice's audit entries of one action, oldest first. */
  const audit = async (action: string) =>
    withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const { rows } = await tx.client.query<{ data: Record<string, unknown> }>(
        `select data from audit_log where tenant_id = $1 and entity_id = $2 and action = $3 order by created_at, id`,
        [tx.tenantId, invoiceId, action],
      );
      return rows.map((r) => r.data);
    });

  return { ...f, invoiceId, post, payOffline, payDirect, refund, money, audit };
}
