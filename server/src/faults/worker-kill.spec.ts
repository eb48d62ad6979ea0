import { clientInvoice } from '../payments/checkout-fixtures';
import { startTestServer } from '../testing/harness';
import { QUEUES } from '../queue/queues';
import { freshTestDatabase, queueDrained } from './databases';
import { type FaultDb, openFaultDb } from './fault-db';
import { killWorkerApplyingPayment, type PaymentFixture } from './kill-payment';
import { killWorkerSendingMail, MAIL_WORKERS_PER_PROCESS } from './kill-mail';
import { type MailCatcher, startMailCatcher } from './mail-catcher';
import { startObjectStore } from './processes';

// Kill -9 a worker process (server/src/main.ts worker) mid-work, restart one, and count: nothing
// lost, payments applied exactly once, e-mail duplicates no more than the messages in flight.
// The killed jobs' expiry is brought forward (db-waits.ts expireAndRetryNow); ops/faults/run.ts
// --real-time waits for it instead.

let database: Awaited<ReturnType<typeof freshTestDatabase>>;
let db: FaultDb;
let catcher: MailCatcher;
let s3: Awaited<ReturnType<typeof startObjectStore>>;
let env: Record<string, string>;
let fixture: PaymentFixture;
beforeAll(async () => {
  database = await freshTestDatabase('kill');
  db = await openFaultDb(database.urls);
  // A firm with a client's issued invoice, made through the API; its e-mails sent; then only the spawned workers work.
  const t = await startTestServer(database.urls);
  const f = await clientInvoice(t, 'Fault Kill Plaster');
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

it('a worker killed after the SMTP server accepted its messages: every message sent, duplicates only of those in flight', async () => {
  const r = await killWorkerSendingMail(db, catcher, fixture.firmId, env, { count: 10, movedClock: true });
  // The kill caught one message per mail worker of the process between SMTP's 250 and the commit.
  expect(r.inFlightAtKill).toBe(MAIL_WORKERS_PER_PROCESS);
  expect(r.sent).toBe(10);
  // At-least-once delivery: those in flight went out again (same Message-ID); nothing else twice.
  expect(r.duplicates).toBe(r.inFlightAtKill);
  expect(r.duplicatesWereInFlight).toBe(true);
  expect(r.deliveries).toBe(10 + r.inFlightAtKill);
  expect(r.exitCode).toBe(0);
}, 120_000);

it('a worker killed inside the payment transaction: the payment is applied exactly once after a restart', async () => {
  const r = await killWorkerApplyingPayment(db, catcher, fixture, env, { movedClock: true });
  // The payment was written when the worker died, and rolled back with its transaction.
  expect(r.paymentWrittenAtKill).toBe(true);
  expect(r.paymentsAfterKill).toBe(0);
  expect(r.appliedAfterKill).toBe(0);
  // Applied once by the next worker, and not again when queued once more; the receipt number not skipped.
  expect(r.payments).toBe(1);
  expect(r.receiptNumbers).toEqual([1]);
  expect(r.invoiceStatus).toBe('paid');
  expect(r.outcome).toBe('Payment RCT-0001 recorded: 250.00 USD');
  expect(r.receiptMails).toBe(1);
  expect(r.exitCode).toBe(0);
}, 120_000);
