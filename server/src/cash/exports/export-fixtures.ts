import { withTenant } from '@layerbook/db';
import { acceptedJob, insertInvoice, type InvoiceSpec } from '../../billing/pdf/invoice-fixtures';
import type { TestServer } from '../../testing/harness';

/**
 * Test set-up for the export spec (no spec of its own): an accepted job, then invoices, payments,
 * refunds and credit notes written straight into the tables as billing and payments leave them,
 * so each file's rows and totals are known in advance.
 */
export async function exportFirm(t: TestServer, firmName: string) {
  const f = await acceptedJob(t, firmName);

  const invoice = (number: number, issuedOn: string, total: string, more: Partial<InvoiceSpec> = {}) =>
    insertInvoice(t, f.firmId, f.jobId, {
      kind: 'milestone',
      status: 'issued',
      number,
      issuedOn,
      dueOn: issuedOn,
      total,
      lines: [{ label: 'Stage payment', amount: total }],
      ...more,
    });

  /** A payment with its receipt number; `refunded` is what the refunds given for it add up to. */
  const payment = (
    invoiceId: string,
    p: { receiptNo: number; receivedOn: string; amount: string; applied?: string; refunded?: string; reference?: string },
  ) =>
    withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const { rows } = await tx.client.query<{ id: string }>(
        `insert into payments (tenant_id, invoice_id, client_id, method, amount, amount_applied, amount_refunded, currency, received_on,
           reference, receipt_no)
         select i.tenant_id, i.id, i.client_id, 'cheque', $3, $4, $5, i.currency, $6, $7, $8 from invoices i
          where i.tenant_id = $1 and i.id = $2 returning id`,
        [tx.tenantId, invoiceId, p.amount, p.applied ?? p.amount, p.refunded ?? '0', p.receivedOn, p.reference ?? '', p.receiptNo],
      );
      return rows[0].id;
    });

  const refund = (
    paymentId: string,
    r: { receiptNo: number | null; refundedOn: string; amount: string; status: 'succeeded' | 'pending' | 'failed'; reason: string },
  ) =>
    withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(
        `insert into refunds (tenant_id, payment_id, invoice_id, client_id, method, status, amount, currency, refunded_on, reason, receipt_no)
         select p.tenant_id, p.id, p.invoice_id, p.client_id, 'cheque', $3, $4, p.currency, $5, $6, $7 from payments p
          where p.tenant_id = $1 and p.id = $2`,
        [tx.tenantId, paymentId, r.status, r.amount, r.refundedOn, r.reason, r.receiptNo],
      ),
    );

  const creditNote = (invoiceId: string, number: number, issuedOn: string, reason: string) =>
    withTenant(t.ctx.pool, f.firmId, async (tx) => {
      await tx.client.query(`update invoices set status = 'void', amount_credited = total where tenant_id = $1 and id = $2`, [
        tx.tenantId,
        invoiceId,
      ]);
      await tx.client.query(
        `insert into credit_notes (tenant_id, invoice_id, number, number_text, issued_on, currency, amount, reason, document)
         select i.tenant_id, i.id, $3, $4, $5, i.currency, i.total, $6, coalesce(i.document, '{}') from invoices i
          where i.tenant_id = $1 and i.id = $2`,
        [tx.tenantId, invoiceId, number, `CN-${String(number).padStart(4, '0')}`, issuedOn, reason],
      );
    });

  /** A client of the firm (through the API), for invoices made out to someone else. */
  const client = async (name: string, phone = '') => {
    const res = await f.agent.post('/api/clients').set('x-csrf-token', f.csrf()).send({ kind: 'homeowner', name, phone });
    if (res.status !== 201) throw new Error(`client not made: ${res.status} ${JSON.stringify(res.body)}`);
    return (res.body as { id: string }).id;
  };

  /** `count` payments on one invoice, one a day through 2026 over and over, with long references (a big file). */
  const manyPayments = (invoiceId: string, count: number) =>
    withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(
        `insert into payments (tenant_id, invoice_id, client_id, method, amount, amount_applied, currency, received_on, reference, receipt_no)
         select i.tenant_id, i.id, i.client_id, 'transfer', ((g % 97) + 1)::numeric + 0.25, ((g % 97) + 1)::numeric + 0.25, i.currency,
                date '2026-01-01' + (g % 365), 'Bulk transfer ' || g || ' — standing order for the plaster and glaze work', 100000 + g
           from invoices i, generate_series(1, $3::int) g where i.tenant_id = $1 and i.id = $2`,
        [tx.tenantId, invoiceId, count],
      ),
    );

  /** A column's sum straight from the firm's table, as text: `dbSum('total', 'invoices', "issued_on >= '2026-11-01'")`. */
  const dbSum = (column: string, table: string, where: string) =>
    withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const { rows } = await tx.client.query<{ sum: string }>(
        `select coalesce(sum(${column}), 0)::text as sum from ${table} where tenant_id = $1 and ${where}`,
        [tx.tenantId],
      );
      return rows[0].sum;
    });

  return { ...f, invoice, payment, refund, creditNote, client, manyPayments, dbSum };
}
