import { QUEUES } from '../queue/queues';
import { signUpFirm, startTestServer } from '../testing/harness';
import { freshTestDatabase, queueDrained } from './databases';
import { type FaultDb, openFaultDb } from './fault-db';
import { killWorkerSendingMail, MAIL_WORKERS_PER_PROCESS } from './kill-mail';
import { type MailCatcher, startMailCatcher } from './mail-catcher';
import { startObjectStore } from './processes';

// Kill -9 a worker process (server/src/main.ts worker) mid-send, restart one, and count: nothing
// lost, duplicates no more than the messages in flight. The killed jobs' expiry is brought forward
// (db-waits.ts expireAndRetryNow); `ops/faults/run.ts --real-time` waits for it instead. The kill
// mid-payment is payment-kill.spec.ts.

let database: Awaited<ReturnType<typeof freshTestDatabase>>;
let db: FaultDb;
let catcher: MailCatcher;
let s3: Awaited<ReturnType<typeof startObjectStore>>;
let env: Record<string, string>;
let firmId: string;
beforeAll(async () => {
  database = await freshTestDatabase('kill');
  db = await openFaultDb(database.urls);
  // A firm (its e-mails sent), made through the API; then only the spawned workers work.
  const t = await startTestServer(database.urls);
  firmId = (await signUpFirm(t.app, 'Fault Kill Plaster')).firmId;
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
  const r = await killWorkerSendingMail(db, catcher, firmId, env, { count: 10, movedClock: true });
  expect(r).toMatchObject({
    // The kill caught one message per mail worker of the process between SMTP's 250 and the commit.
    inFlightAtKill: MAIL_WORKERS_PER_PROCESS,
    sent: 10,
    // At-least-once delivery: those in flight went out again (same Message-ID); nothing else twice.
    duplicates: MAIL_WORKERS_PER_PROCESS,
    duplicatesWereInFlight: true,
    deliveries: 10 + MAIL_WORKERS_PER_PROCESS,
    exitCode: 0,
  });
}, 120_000);
