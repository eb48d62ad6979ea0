import type { CashJobs, CashReceivables, CashReceived, InvoiceDetail, JobBillingView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { billingJob } from '../billing/billing-fixtures';
import { insertInvoice } from '../billing/pdf/invoice-fixtures';
import { startTestServer, type TestServer } from '../testing/harness';

/*
 * The figures the database keeps for the Cash page (cash_open_balances and its rollups per due date
 * and per client, cash_received_days, cash_job_totals; triggers in the cash_figures_rls and
 * cash_open_rollups_rls migrations) against the same sums recomputed from
 * the base tables, after writes through the billing and payment API and straight into the tables.
 */

let t: TestServer;
type Firm = Awaited<ReturnType<typeof billingJob>>;
let a: Firm;
let b: Firm;

/** The kept rows and the same sums from invoices, payments, refunds and change orders, as sorted text. */
const KEPT = {
  balances: `select client_id || ' ' || due_on || ' ' || owed || ' ' || invoice_count as r from cash_open_balances where tenant_id = $1`,
  dueDays: `select due_on || ' ' || owed || ' ' || invoice_count as r from cash_open_due_days where tenant_id = $1`,
  clients: `select client_id || ' ' || owed || ' ' || invoice_count as r from cash_open_clients where tenant_id = $1`,
  received: `select kind || ' ' || day || ' ' || amount || ' ' || count as r from cash_received_days where tenant_id = $1`,
  jobs: `select job_id || ' ' || issued || ' ' || credited || ' ' || paid || ' ' || change_orders as r from cash_job_totals where tenant_id = $1`,
};
const RECOMPUTED = {
  balances: `select client_id || ' ' || due_on || ' ' || sum(total - amount_paid - amount_credited) || ' ' || count(*) as r from invoices
              where tenant_id = $1 and status in ('issued', 'part_paid', 'refunded') and due_on is not null
                and total - amount_paid - amount_credited > 0
              group by client_id, due_on`,
  dueDays: `select due_on || ' ' || sum(total - amount_paid - amount_credited) || ' ' || count(*) as r from invoices
              where tenant_id = $1 and status in ('issued', 'part_paid', 'refunded') and due_on is not null
                and total - amount_paid - amount_credited > 0
              group by due_on`,
  clients: `select client_id || ' ' || sum(total - amount_paid - amount_credited) || ' ' || count(*) as r from invoices
              where tenant_id = $1 and status in ('issued', 'part_paid', 'refunded') and due_on is not null
                and total - amount_paid - amount_credited > 0
              group by client_id`,
  // money counts in its invoice's currency only: a card payment taken in another currency is the client's credit, noted for a person
  received: `select 'payment ' || received_on || ' ' || sum(p.amount) || ' ' || count(*) as r from payments p
               join invoices i on i.tenant_id = p.tenant_id and i.id = p.invoice_id and i.currency = p.currency
              where p.tenant_id = $1 group by received_on
             union all
             select 'refund ' || refunded_on || ' ' || sum(r.amount) || ' ' || count(*) from refunds r
               join invoices i on i.tenant_id = r.tenant_id and i.id = r.invoice_id and i.currency = r.currency
              where r.tenant_id = $1 and r.status = 'succeeded' group by refunded_on`,
  // a job with nothing billed or approved yet may have no row, or a row of zeros after a draft was issued and voided back to zero
  jobs: `select job_id || ' ' || sum(issued) || ' ' || sum(credited) || ' ' || sum(paid) || ' ' || sum(change_orders) as r from (
           select job_id, total as issued, amount_credited as credited, amount_paid as paid, 0 as change_orders from invoices
            where tenant_id = $1 and status <> 'draft'
           union all
           select job_id, 0, 0, 0, amount from change_orders where tenant_id = $1 and status = 'approved') parts
         group by job_id`,
};

const rows = (f: Firm, text: string) =>
  withTenant(t.ctx.pool, f.firmId, async (tx) => (await tx.client.query<{ r: string }>(text, [tx.tenantId])).rows.map((x) => x.r).sort());
const sql = (f: Firm, text: string, values: unknown[] = []) =>
  withTenant(t.ctx.pool, f.firmId, async (tx) => (await tx.client.query(text, [tx.tenantId, ...values])).rows);

async function expectKeptEqualsRecomputed(f: Firm): Promise<void> {
  for (const key of ['balances', 'dueDays', 'clients', 'received', 'jobs'] as const) {
    const kept = await rows(f, KEPT[key]);
    expect({ [key]: kept }).toEqual({ [key]: await rows(f, RECOMPUTED[key]) });
    expect(kept.length).toBeGreaterThan(0);
  }
}

/** Issue, part-pay, pay, void (credit note), refund through the API; progress retainage and its release, change orders and a settled refund in the tables. */
async function mixedWrites(f: Firm, scale: number): Promise<void> {
  const ok = (res: { status: number; body: unknown }, status = 200) => {
    if (res.status !== status) throw new Error(`${res.status} ${JSON.stringify(res.body)}`);
    return res.body as InvoiceDetail;
  };
  const started = ok(await f.send('post', `/api/jobs/${f.jobId}/billing/start`)) as unknown as JobBillingView;
  const [deposit, stage, dated] = started.lines;
  const depositId = await f.lineDraft(deposit.id);
  const stageId = await f.lineDraft(stage.id);
  const datedId = await f.lineDraft(dated.id);
  // a draft has no part anywhere
  await insertInvoice(t, f.firmId, f.jobId, { kind: 'milestone', status: 'draft', total: '123.00' });
  await f.issue(depositId, { send: false, issuedOn: '2026-12-01' });
  await f.issue(stageId, { send: false, issuedOn: '2026-12-02' });
  const datedIssued = await f.issue(datedId, { send: false, issuedOn: '2026-12-03' });

  const pay = (id: string, amount: string, receivedOn: string) =>
    f.send('post', `/api/invoices/${id}/payments`, { method: 'cheque', amount, receivedOn, reference: '' }).then((r) => ok(r));
  await pay(depositId, (10 * scale).toFixed(2), '2026-12-04'); // part paid
  const paidUp = await pay(depositId, new Decimal(deposit.amount).minus(10 * scale).toFixed(2), '2026-12-05'); // paid
  expect(paidUp.status).toBe('paid');
  ok(await f.send('post', `/api/invoices/${stageId}/void`, { reason: 'Billed before the coat was done' })); // credit note
  const datedPaid = await pay(datedId, datedIssued.amountDue, '2026-12-06');
  const refunded = await f.send('post', `/api/payments/${datedPaid.payments[0].id}/refunds`, {
    method: 'cheque',
    reason: 'One room less',
    amount: (5 * scale).toFixed(2),
  });
  expect(refunded.status).toBe(201);

  // A progress application holding retainage, paid, then part of the retainage billed and part paid.
  await sql(f, `update jobs set billing_method = 'progress' where tenant_id = $1 and id = $2`, [f.jobId]);
  const progress = await insertInvoice(t, f.firmId, f.jobId, {
    kind: 'progress',
    status: 'issued',
    number: 900,
    issuedOn: '2026-12-07',
    dueOn: '2026-12-21',
    total: (1000 * scale).toFixed(2),
  });
  await sql(f, `update invoices set retainage_held = $3, issued_at = now() where tenant_id = $1 and id = $2`, [
    progress,
    (100 * scale).toFixed(2),
  ]);
  await sql(f, `update invoices set status = 'paid', amount_paid = total where tenant_id = $1 and id = $2`, [progress]);
  const release = await insertInvoice(t, f.firmId, f.jobId, {
    kind: 'retainage',
    status: 'issued',
    number: 901,
    issuedOn: '2026-12-08',
    dueOn: '2026-12-22',
    total: (40 * scale).toFixed(2),
  });
  await sql(f, `update invoices set status = 'part_paid', amount_paid = $3 where tenant_id = $1 and id = $2`, [
    release,
    (15 * scale).toFixed(2),
  ]);
  // A refund sent to the processor (pending), then gone through.
  const [payment] = await sql(f, `select id, invoice_id, client_id from payments where tenant_id = $1 and invoice_id = $2`, [depositId]);
  const [pending] = await sql(
    f,
    `insert into refunds (tenant_id, payment_id, invoice_id, client_id, method, status, amount, currency, refunded_on, reason)
     values ($1, $2, $3, $4, 'cheque', 'pending', $5, 'USD', '2026-12-09', 'Colour changed') returning id`,
    [payment['id'], payment['invoice_id'], payment['client_id'], (2 * scale).toFixed(2)],
  );
  await sql(f, `update refunds set status = 'succeeded' where tenant_id = $1 and id = $2`, [pending['id']]);
  // A card payment the processor took in euros on a dollar invoice, and a refund of part of it: neither is dollars received.
  const [euros] = await sql(
    f,
    `insert into payments (tenant_id, invoice_id, client_id, method, amount, amount_applied, currency, received_on, receipt_no)
     values ($1, $2, $3, 'card', $4, 0, 'EUR', '2026-12-10', 9000) returning id`,
    [payment['invoice_id'], payment['client_id'], (30 * scale).toFixed(2)],
  );
  await sql(
    f,
    `insert into refunds (tenant_id, payment_id, invoice_id, client_id, method, status, amount, currency, refunded_on, reason)
     values ($1, $2, $3, $4, 'card', 'succeeded', $5, 'EUR', '2026-12-11', 'Paid in the wrong currency')`,
    [euros['id'], payment['invoice_id'], payment['client_id'], (10 * scale).toFixed(2)],
  );
  // Change orders: drafted, then approved; another approved and declined again.
  await sql(
    f,
    `insert into change_orders (tenant_id, job_id, number, title, pricing, price, amount, status)
     values ($1, $2, 901, 'Extra glaze', 'lumpSum', $3, $3, 'draft'), ($1, $2, 902, 'Niche', 'lumpSum', 70, 70, 'approved')`,
    [f.jobId, (250 * scale).toFixed(2)],
  );
  await sql(f, `update change_orders set status = 'approved' where tenant_id = $1 and job_id = $2 and number = 901`, [f.jobId]);
  await sql(f, `update change_orders set status = 'declined' where tenant_id = $1 and job_id = $2 and number = 902`, [f.jobId]);
}

beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-20T15:00:00Z'));
  a = await billingJob(t, 'Kept Figures Plaster');
  b = await billingJob(t, 'Kept Figures Glaze');
  await mixedWrites(a, 1);
  await mixedWrites(b, 3);
}, 180_000);
afterAll(() => t.stop());

describe('figures kept by the database', () => {
  it('equal a recompute from the base tables after issue, part-pay, pay, credit note, refund, void and retainage release, in both firms', async () => {
    await expectKeptEqualsRecomputed(a);
    await expectKeptEqualsRecomputed(b);
  });

  it('never show another firm: each firm reads only its own kept rows', async () => {
    for (const [f, other] of [
      [a, b],
      [b, a],
    ] as const) {
      for (const table of ['cash_open_balances', 'cash_open_due_days', 'cash_open_clients', 'cash_received_days', 'cash_job_totals']) {
        const [seen] = await sql(f, `select count(*)::int as n, count(*) filter (where tenant_id <> $1)::int as others from ${table}`);
        expect([table, seen['others']]).toEqual([table, 0]);
        expect(seen['n']).toBeGreaterThan(0);
        // asking for the other firm's rows by its id inside this firm's transaction finds none
        const [asked] = await sql(f, `select count(*)::int as n from ${table} where tenant_id = $2 and $1::uuid is not null`, [
          other.firmId,
        ]);
        expect([table, asked['n']]).toEqual([table, 0]);
      }
    }
  });

  it('are what the Cash page shows: receivables, cash by month and job money agree with the base tables', async () => {
    for (const [f, scale] of [
      [a, 1],
      [b, 3],
    ] as const) {
      const [owed] = await sql(
        f,
        `select sum(total - amount_paid - amount_credited)::text as owed from invoices
          where tenant_id = $1 and status in ('issued', 'part_paid', 'refunded') and total - amount_paid - amount_credited > 0`,
      );
      const receivables = (await f.agent.get('/api/cash/receivables')).body as CashReceivables;
      // the total is what is owed; retainage is shown apart: held on the last progress application less the release billed, 100 − 40 (× scale)
      expect(receivables.total).toBe(owed['owed']);
      expect(receivables.retainage).toBe((60 * scale).toFixed(2));

      const [cash] = await sql(
        f,
        `select (select sum(amount) from payments where tenant_id = $1 and currency = 'USD')::text as received,
                (select sum(amount) from refunds where tenant_id = $1 and status = 'succeeded' and currency = 'USD')::text as refunded`,
      );
      const received = (await f.agent.get('/api/cash/received')).body as CashReceived;
      expect(received.totals).toMatchObject({ received: cash['received'], refunded: new Decimal(cash['refunded'] as string).toFixed(2) });

      const [job] = await sql(
        f,
        `select sum(total)::text as invoiced, sum(amount_paid)::text as paid from invoices where tenant_id = $1 and job_id = $2 and status <> 'draft'`,
        [f.jobId],
      );
      const jobs = (await f.agent.get('/api/cash/jobs')).body as CashJobs;
      const row = jobs.jobs.find((j) => j.jobId === f.jobId);
      expect(row).toMatchObject({ paid: job['paid'], changeOrders: (250 * scale).toFixed(2) });
    }
  });
});
