import { withTenant } from '@layerbook/db';
import { acceptedJob, insertInvoice, type InvoiceSpec } from '../billing/pdf/invoice-fixtures';
import type { TestServer } from '../testing/harness';

/**
 * Test set-up for the cash spec (no spec of its own): an accepted job (its payment schedule not yet
 * billed), then invoices, payments, refunds and inquiries written straight into the tables as
 * billing, payments and inquiries leave them, so every figure is known in advance.
 */
export async function cashFirm(t: TestServer, firmName: string) {
  const f = await acceptedJob(t, firmName);
  const sql = <R extends object = Record<string, unknown>>(text: string, values: unknown[] = []) =>
    withTenant(t.ctx.pool, f.firmId, async (tx) => (await tx.client.query<R>(text, [tx.tenantId, ...values])).rows);

  /** An issued invoice (issued_at on its issue day, so the latest application is known). */
  const invoice = async (
    number: number,
    issuedOn: string,
    dueOn: string,
    total: string,
    more: Partial<InvoiceSpec> & { retainageHeld?: string } = {},
  ) => {
    const { retainageHeld, ...spec } = more;
    const id = await insertInvoice(t, f.firmId, f.jobId, { kind: 'milestone', status: 'issued', number, issuedOn, dueOn, total, ...spec });
    await sql(`update invoices set issued_at = $3::date + time '12:00', retainage_held = $4 where tenant_id = $1 and id = $2`, [
      id,
      issuedOn,
      retainageHeld ?? '0',
    ]);
    // a progress application means the job is billed by progress (retainage is held on such jobs)
    if (spec.kind === 'progress') await sql(`update jobs set billing_method = 'progress' where tenant_id = $1 and id = $2`, [f.jobId]);
    return id;
  };

  const payment = async (invoiceId: string, receiptNo: number, receivedOn: string, amount: string) =>
    (
      await sql<{ id: string }>(
        `insert into payments (tenant_id, invoice_id, client_id, method, amount, amount_applied, currency, received_on, receipt_no)
         select i.tenant_id, i.id, i.client_id, 'cheque', $3::numeric, $3::numeric, i.currency, $4::date, $5::int from invoices i where i.tenant_id = $1 and i.id = $2
         returning id`,
        [invoiceId, amount, receivedOn, receiptNo],
      )
    )[0].id;

  const refund = (paymentId: string, refundedOn: string, amount: string, status: 'succeeded' | 'failed') =>
    sql(
      `insert into refunds (tenant_id, payment_id, invoice_id, client_id, method, status, amount, currency, refunded_on, reason)
       select p.tenant_id, p.id, p.invoice_id, p.client_id, 'cheque', $3::text, $4::numeric, p.currency, $5::date, 'Fewer rooms' from payments p
        where p.tenant_id = $1 and p.id = $2`,
      [paymentId, status, amount, refundedOn],
    );

  const creditNote = (invoiceId: string, number: number, issuedOn: string) =>
    sql(
      `with v as (update invoices set status = 'void', amount_credited = total where tenant_id = $1 and id = $2 returning *)
       insert into credit_notes (tenant_id, invoice_id, number, number_text, issued_on, currency, amount, reason, document)
       select v.tenant_id, v.id, $3::int, 'CN-' || lpad($3::int::text, 4, '0'), $4::date, v.currency, v.total, 'Wrong stage', coalesce(v.document, '{}') from v`,
      [invoiceId, number, issuedOn],
    );

  const inquiry = async (stage: string, estimatedValue: string | null, nextFollowUp: string | null) =>
    (
      await sql<{ id: string }>(
        `insert into inquiries (tenant_id, contact_name, source, stage, estimated_value, next_follow_up) values ($1, 'Ivy Inquirer', 'phone', $2, $3, $4)
         returning id`,
        [stage, estimatedValue, nextFollowUp],
      )
    )[0].id;

  return { ...f, sql, invoice, payment, refund, creditNote, inquiry };
}
