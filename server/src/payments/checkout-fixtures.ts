import type { CheckoutStart, CheckoutStatus } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import type { StripeFake } from '@layerbook/stripe-fake';
import { Pool } from 'pg';
import { acceptedJob, insertInvoice, type InvoiceSpec } from '../billing/pdf/invoice-fixtures';
import { startTestServer, TEST_STRIPE, type TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';
import { processorFor } from './processor';
import { reconcileEvents } from './reconcile';

/**
 * Test set-up for the online payment specs (no spec of its own): a test server that talks to its
 * local Stripe stand-in, whose signed webhooks reach the server's port, and a
 * client's issued invoice with helpers to start, pay and follow a checkout through the API.
 */

export const WEBHOOK_SECRET = TEST_STRIPE.webhookSecret;

export interface PaymentsServer {
  readonly t: TestServer;
  readonly fake: StripeFake;
  readonly webhookUrl: string;
  /** the jobs role's pool, for what only the queue's role may touch (the reconciliation cursor) */
  readonly jobsPool: Pool;
  /** runs the reconciliation now, as its job would */
  reconcile(now?: Date): ReturnType<typeof reconcileEvents>;
  stop(): Promise<void>;
}

/** A test server with online payments on, through its own Stripe stand-in (the harness's). */
export async function startPaymentsServer(): Promise<PaymentsServer> {
  const t = await startTestServer({}, { onlinePayments: true });
  const jobsPool = new Pool({ connectionString: testDatabaseUrls().DATABASE_JOBS_URL, max: 3 });
  return {
    t,
    fake: t.stripe,
    webhookUrl: `${t.baseUrl}/api/payments/webhook`,
    jobsPool,
    reconcile: (now = t.ctx.now()) => reconcileEvents(jobsPool, t.queue, processorFor(t.ctx.config)!, now),
    async stop() {
      await jobsPool.end();
      await t.stop();
    },
  };
}

/** A firm's client signed in to the portal with one issued invoice of theirs (a 250.00 deposit unless told). */
export async function clientInvoice(t: TestServer, firmName: string, spec: Partial<InvoiceSpec> = {}) {
  const f = await acceptedJob(t, firmName);
  const invoiceId = await insertInvoice(t, f.firmId, f.jobId, {
    kind: 'deposit',
    status: 'issued',
    number: 1,
    total: '250.00',
    lines: [{ label: 'Deposit on acceptance', amount: '250.00' }],
    ...spec,
  });
  const start = (id = invoiceId) =>
    f.client.agent.post(`/api/portal/invoices/${id}/checkout`).set('x-csrf-token', f.client.csrf()).send({});
  const started = async (id = invoiceId): Promise<CheckoutStart & { sessionId: string }> => {
    const res = await start(id);
    if (res.status !== 201) throw new Error(`checkout not started: ${res.status} ${JSON.stringify(res.body)}`);
    const body = res.body as CheckoutStart;
    return { ...body, sessionId: await sessionOf(t, f.firmId, body.checkoutId) };
  };
  const status = async (checkoutId: string, id = invoiceId): Promise<CheckoutStatus> => {
    const res = await f.client.agent.get(`/api/portal/invoices/${id}/checkout/${checkoutId}`);
    if (res.status !== 200) throw new Error(`status not read: ${res.status} ${JSON.stringify(res.body)}`);
    return res.body as CheckoutStatus;
  };
  return { ...f, invoiceId, start, started, status };
}

/** The processor's session id of one of our checkouts. */
export async function sessionOf(t: TestServer, firmId: string, checkoutId: string): Promise<string> {
  return withTenant(t.ctx.pool, firmId, async (tx) => {
    const { rows } = await tx.client.query<{ processor_session_id: string }>(
      `select processor_session_id from checkout_sessions where tenant_id = $1 and id = $2`,
      [tx.tenantId, checkoutId],
    );
    return rows[0].processor_session_id;
  });
}

/** A test server, or anything with its pool. */
export type PoolHolder = { readonly ctx: { readonly pool: Pool } };

/** What the books say of one invoice: its payments, receipts, credits and status. */
export async function invoiceBooks(t: PoolHolder, firmId: string, invoiceId: string) {
  return withTenant(t.ctx.pool, firmId, async (tx) => {
    const inv = (
      await tx.client.query<{ status: string; amount_paid: string }>(
        `select status, amount_paid::text as amount_paid from invoices where tenant_id = $1 and id = $2`,
        [tx.tenantId, invoiceId],
      )
    ).rows[0];
    const payments = (
      await tx.client.query<{ id: string; amount: string; amount_applied: string; currency: string; receipt_no: number | null }>(
        `select id, amount::text as amount, amount_applied::text as amount_applied, currency, receipt_no from payments
          where tenant_id = $1 and invoice_id = $2 order by created_at`,
        [tx.tenantId, invoiceId],
      )
    ).rows;
    const credits = (
      await tx.client.query<{ amount: string; currency: string; note: string }>(
        `select c.amount::text as amount, c.currency, c.note from client_credits c join payments p on p.tenant_id = c.tenant_id and p.id = c.payment_id
          where c.tenant_id = $1 and p.invoice_id = $2`,
        [tx.tenantId, invoiceId],
      )
    ).rows;
    return { status: inv.status, amountPaid: inv.amount_paid, payments, credits };
  });
}

/** The firm's stored processor events: how many, and how many applied, with their outcomes. */
export async function storedEvents(t: PoolHolder, firmId: string) {
  return withTenant(t.ctx.pool, firmId, async (tx) => {
    const { rows } = await tx.client.query<{
      id: string;
      type: string;
      received_via: string;
      applied_at: Date | null;
      outcome: string | null;
    }>(`select id, type, received_via, applied_at, outcome from processor_events where tenant_id = $1 order by received_at`, [tx.tenantId]);
    return rows;
  });
}

/** Polls until `check` returns something truthy (the queue applies events on its own time). */
export async function eventually<T>(check: () => Promise<T>, what: string, timeoutMs = 15_000): Promise<NonNullable<T>> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value) return value;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}
