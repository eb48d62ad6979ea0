/**
 * Payments for the cash bench, written as the owner role inside the demo firm's tenant transaction:
 * 20,000 payments over the firm's paid and part-paid invoices (received a few days after issue),
 * and one refund in forty of them, half gone through.
 */
import { Pool } from 'pg';

export const PAYMENTS = 20_000;

export async function loadCashBench(ownerUrl: string, firmId: string): Promise<void> {
  const owner = new Pool({ connectionString: ownerUrl, max: 1 });
  const c = await owner.connect();
  try {
    await c.query('begin');
    await c.query(`select set_config('app.tenant_id', $1, true)`, [firmId]);
    await c.query(
      `insert into payments (tenant_id, invoice_id, client_id, method, amount, amount_applied, currency, received_on, receipt_no)
       select i.tenant_id, i.id, i.client_id, (array['card', 'cheque', 'transfer', 'cash'])[1 + n % 4], i.amount_paid, i.amount_paid,
              i.currency, i.issued_on + (n % 12)::int, 500000 + n
         from (select i.*, row_number() over (order by i.issued_on desc, i.id) as n from invoices i
                where i.tenant_id = $1 and i.status in ('paid', 'part_paid') and i.amount_paid > 0) i
        where n <= $2`,
      [firmId, PAYMENTS],
    );
    await c.query(
      `insert into refunds (tenant_id, payment_id, invoice_id, client_id, method, status, amount, currency, refunded_on, reason)
       select p.tenant_id, p.id, p.invoice_id, p.client_id, p.method, case when p.receipt_no % 80 = 0 then 'succeeded' else 'failed' end,
              round(p.amount / 10, 2), p.currency, p.received_on + 3, 'Bench refund'
         from payments p where p.tenant_id = $1 and p.receipt_no >= 500000 and p.receipt_no % 40 = 0`,
      [firmId],
    );
    await c.query('commit');
  } catch (error) {
    await c.query('rollback');
    throw error;
  } finally {
    c.release();
  }
  await owner.query('analyze');
  await owner.end();
}
