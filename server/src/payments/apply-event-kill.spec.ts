import { type ChildProcess, spawn } from 'node:child_process';
import path from 'node:path';
import { withTenant } from '@layerbook/db';
import { Pool } from 'pg';
import PgBoss from 'pg-boss';
import type Stripe from 'stripe';
import { startTestServer, type TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';
import { clientInvoice, eventually, invoiceBooks, storedEvents } from './checkout-fixtures';
import { storeEvent } from './events';
import { type ReconcileQueue, requeueUnapplied } from './reconcile';

// Kill the worker while it applies an event: the payment it wrote dies with its transaction, and
// the event, still unapplied, is applied once by the next worker.

const WORKER = path.join(__dirname, 'apply-event-worker.ts');

interface Worker {
  readonly child: ChildProcess;
  /** resolves with the first stdout line that starts with `prefix` */
  said(prefix: string): Promise<string>;
}

function startWorker(stall: boolean): Worker {
  const child = spawn(process.execPath, ['--import', 'tsx', WORKER], {
    cwd: path.resolve(__dirname, '../../..'),
    env: { ...process.env, LB_APPLY_STALL: stall ? '1' : '0' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  let out = '';
  const waiters: Array<{ prefix: string; resolve: (line: string) => void }> = [];
  child.stdout.on('data', (chunk: Buffer) => {
    out += chunk.toString();
    for (const w of [...waiters]) {
      const line = out.split('\n').find((l) => l.startsWith(w.prefix));
      if (line) {
        waiters.splice(waiters.indexOf(w), 1);
        w.resolve(line);
      }
    }
  });
  return {
    child,
    said: (prefix) =>
      new Promise((resolve, reject) => {
        const line = out.split('\n').find((l) => l.startsWith(prefix));
        if (line) return resolve(line);
        const timer = setTimeout(() => reject(new Error(`the worker never said "${prefix}"; it said: ${out}`)), 40_000);
        waiters.push({ prefix, resolve: (l) => (clearTimeout(timer), resolve(l)) });
      }),
  };
}

let t: TestServer;
let pool: Pool;
let jobsPool: Pool;
let boss: PgBoss;
const workers: ChildProcess[] = [];
beforeAll(async () => {
  t = await startTestServer();
  pool = new Pool({ connectionString: testDatabaseUrls().DATABASE_URL, max: 3 });
  jobsPool = new Pool({ connectionString: testDatabaseUrls().DATABASE_JOBS_URL, max: 2 });
  boss = new PgBoss({ connectionString: testDatabaseUrls().DATABASE_JOBS_URL, schema: 'pgboss', max: 2 });
  await boss.start();
});
afterAll(async () => {
  for (const w of workers) if (w.exitCode === null) w.kill('SIGKILL');
  await boss.stop({ graceful: false, wait: true });
  await pool.end();
  await jobsPool.end();
});

it('a worker killed inside the apply transaction leaves no payment; the next worker applies the event once', async () => {
  const f = await clientInvoice(t, 'Killed Worker Plaster');
  // From here on only the spawned workers apply events: this server's own workers stop.
  await t.stop();
  const db = { ctx: { pool } };
  const queue: ReconcileQueue = {
    boss,
    send: async (name, data, tx) =>
      void (await boss.send(name, data, { db: { executeSql: (text, values) => tx.client.query(text, values) } })),
  };
  const sessionId = `cs_test_killed_${Date.now()}`;
  await withTenant(pool, f.firmId, (tx) =>
    tx.client.query(
      `insert into checkout_sessions (tenant_id, invoice_id, client_id, processor_session_id, amount, currency, url)
       select tenant_id, id, client_id, $3, '250.00', 'USD', 'http://127.0.0.1/pay' from invoices where tenant_id = $1 and id = $2`,
      [tx.tenantId, f.invoiceId, sessionId],
    ),
  );
  const session = {
    id: sessionId,
    object: 'checkout.session',
    status: 'complete',
    payment_status: 'paid',
    amount_total: 25000,
    currency: 'usd',
    payment_intent: `pi_${sessionId}`,
    metadata: { tenant_id: f.firmId, invoice_id: f.invoiceId },
  } as unknown as Stripe.Checkout.Session;
  const event = {
    id: `evt_killed_${Date.now()}`,
    object: 'event',
    type: 'checkout.session.completed',
    created: Math.floor(Date.now() / 1000),
    data: { object: session },
  } as unknown as Stripe.Event;

  const first = startWorker(true);
  workers.push(first.child);
  await first.said('ready');
  expect(await storeEvent(pool, queue, f.firmId, event, 'webhook')).toBe('stored');
  expect(await first.said('stalled')).toBe(`stalled ${event.id}`);
  // The payment is written but not committed: nobody else sees it.
  expect((await invoiceBooks(db, f.firmId, f.invoiceId)).payments).toEqual([]);
  first.child.kill('SIGKILL');
  await new Promise((resolve) => first.child.once('exit', resolve));
  // PostgreSQL rolls the dead connection's transaction back: still no payment, the event unapplied.
  await eventually(async () => (await storedEvents(db, f.firmId)).every((e) => !e.applied_at), 'the event unapplied');
  expect((await invoiceBooks(db, f.firmId, f.invoiceId)).payments).toEqual([]);

  const second = startWorker(false);
  workers.push(second.child);
  await second.said('ready');
  // The killed job is still the queue's 'active' one until it expires; the reconciliation queues again
  // what is stored but unapplied after a minute (its clock two minutes on), as the queue's role.
  const requeued = await requeueUnapplied(jobsPool, queue, new Date(Date.now() + 120_000));
  expect(requeued).toBeGreaterThanOrEqual(1);
  expect(await second.said(`applied ${event.id}`)).toBe(`applied ${event.id} Payment RCT-0001 recorded: 250.00 USD`);
  // Queued again once more (say, the first job's retry after expiry): applied already, nothing happens.
  await requeueUnapplied(jobsPool, queue, new Date(Date.now() + 120_000));
  const books = await invoiceBooks(db, f.firmId, f.invoiceId);
  expect(books.status).toBe('paid');
  expect(books.payments.map((x) => [x.amount, x.receipt_no])).toEqual([['250.00', 1]]);
  expect((await storedEvents(db, f.firmId)).map((e) => [e.id, Boolean(e.applied_at)])).toEqual([[event.id, true]]);
  second.child.kill('SIGTERM');
}, 90_000);
