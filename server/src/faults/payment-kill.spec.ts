import { clientInvoice } from '../payments/checkout-fixtures';
import { QUEUES } from '../queue/queues';
import { startTestServer } from '../testing/harness';
import { freshTestDatabase, queueDrained } from './databases';
import { type FaultDb, openFaultDb } from './fault-db';
import { killWorkerApplyingPayment, type PaymentFixture } from './kill-payment';
import { type MailCatcher, startMailCatcher } from './mail-catcher';
import { startObjectStore } from './processes';

// Kill -9 a worker process (server/src/main.ts worker) while it applies a card payment (a stored
// checkout.session.completed event, as the webhook stores it, through the payments-apply queue),
// restart one: applied exactly once, also when queued again. The killed job's expiry is brought
// forward (db-waits.ts expireAndRetryNow); `ops/faults/run.ts --real-time` waits for it instead.

let database: Awaited<ReturnType<typeof freshTestDatabase>>;
let db: FaultDb;
let catcher: MailCatcher;
let s3: Awaited<ReturnType<typeof startObjectStore>>;
let env: Record<string, string>;
let fixture: PaymentFixture;
beforeAll(async () => {
  database = await freshTestDatabase('payment_kill');
  db = await openFaultDb(database.urls);
  // A client's issued invoice, made through the API, its e-mails sent; then only the spawned workers work.
  const t = await startTestServer(database.urls);
  const f = await clientInvoice(t, 'Fault Payment Plaster');
  fixture = { firmId: f.firmId, invoiceId: f.invoiceId, total: '250.00' };
  await queueDrained(db.jobs, QUEUES.mailSend);
  await t.stop();
  catcher = await startMailCatcher();
  s3 = await startObjectStore();
  env = { ...database.urls, SMTP_PORT: String(catcher.port), S3_ENDPOINT: s3.endpoint };
}, 90_000);
afterAll(async () => {
  await db?.close();
  await database?.drop();
  await catcher?.close();
  await s3?.stop();
});

it('a worker killed inside the payment transaction: the payment is applied exactly once after a restart', async () => {
  const r = await killWorkerApplyingPayment(db, catcher, fixture, env, { movedClock: true });
  expect(r).toMatchObject({
    // The payment was written when the worker died, and rolled back with its transaction.
    paymentWrittenAtKill: true,
    paymentsAfterKill: 0,
    appliedAfterKill: 0,
    // Applied once by the next worker, and not again when queued once more; the receipt number not skipped.
    payments: 1,
    receiptNumbers: [1],
    invoiceStatus: 'paid',
    outcome: 'Payment RCT-0001 recorded: 250.00 USD',
    receiptMails: 1,
    exitCode: 0,
  });
}, 120_000);
