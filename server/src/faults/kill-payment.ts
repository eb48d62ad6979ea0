import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import type Stripe from 'stripe';
import { invoiceBooks, storedEvents } from '../payments/checkout-fixtures';
import { storeEvent } from '../payments/events';
import { type PaymentsApplyJob, QUEUES } from '../queue/queues';
import { activeJobs, awaitLockWaiters, expireAndRetryNow, hasWritten, holdTableLock } from './db-waits';
import type { FaultDb } from './fault-db';
import type { MailCatcher } from './mail-catcher';
import { ensureStopped, startServerProcess, until } from './processes';

export interface KillPaymentResult {
  /** the killed worker had written the payment (uncommitted) when it died */
  readonly paymentWrittenAtKill: boolean;
  /** payments and applied events visible right after the kill (both 0: its transaction rolled back) */
  readonly paymentsAfterKill: number;
  readonly appliedAfterKill: number;
  /** after the restart, and after the event was queued once more */
  readonly payments: number;
  readonly receiptNumbers: number[];
  readonly invoiceStatus: string;
  readonly outcome: string | null;
  /** receipt e-mails delivered for the payment */
  readonly receiptMails: number;
  readonly recoveryMs: number;
  readonly exitCode: number | null;
}

/** A client's issued invoice of `total` and a checkout of it, as the checkout route leaves it. */
export interface PaymentFixture {
  readonly firmId: string;
  readonly invoiceId: string;
  readonly total: string;
}

/**
 * Kill -9 a worker process while it applies a card payment (a stored `checkout.session.completed`
 * event, as the webhook stores it, applied through the payments-apply queue). The outbox is held under
 * a SHARE lock, so the apply transaction runs up to the receipt e-mail's outbox insert — after the
 * payment row and the invoice's new balance are written — and waits there; the kill lands there.
 * After a restart the event is applied exactly once, also when its job is queued again.
 */
export async function killWorkerApplyingPayment(
  db: FaultDb,
  catcher: MailCatcher,
  fixture: PaymentFixture,
  env: Record<string, string>,
  options: { movedClock: boolean },
): Promise<KillPaymentResult> {
  const { firmId, invoiceId, total } = fixture;
  const sessionId = `cs_test_fault_${Date.now()}`;
  await withTenant(db.app, firmId, (tx) =>
    tx.client.query(
      `insert into checkout_sessions (tenant_id, invoice_id, client_id, processor_session_id, amount, currency, url)
       select tenant_id, id, client_id, $3, $4, 'USD', 'http://127.0.0.1/pay' from invoices where tenant_id = $1 and id = $2`,
      [tx.tenantId, invoiceId, sessionId, total],
    ),
  );
  // Stripe's amount_total is in the currency's minor unit (cents for USD).
  const cents = new Decimal(total).times(100).toNumber();
  const event = {
    id: `evt_fault_${Date.now()}`,
    object: 'event',
    type: 'checkout.session.completed',
    created: Math.floor(Date.now() / 1000),
    data: {
      object: {
        id: sessionId,
        object: 'checkout.session',
        status: 'complete',
        payment_status: 'paid',
        amount_total: cents,
        currency: 'usd',
        payment_intent: `pi_${sessionId}`,
        metadata: { tenant_id: firmId, invoice_id: invoiceId },
      },
    },
  } as unknown as Stripe.Event;
  const holder = { ctx: { pool: db.app } };
  const receipts = async () =>
    (
      await db.jobs.query<{ id: string; status: string }>(
        `select id, status from mail_outbox where tenant_id = $1 and purpose_key like 'receipt:payment:%'`,
        [firmId],
      )
    ).rows;

  const lock = await holdTableLock(db.owner, 'mail_outbox', 'SHARE');
  const first = startServerProcess('worker', env);
  let second: ReturnType<typeof startServerProcess> | undefined;
  try {
    // What the webhook route does with a verified event: store it and queue its application, in one transaction.
    if ((await storeEvent(db.app, db.queue, firmId, event, 'webhook')) !== 'stored') throw new Error('the event was not stored');
    await first.logged('Layerbook worker started');
    const [waiter] = await awaitLockWaiters(db.jobs, 'layerbook-worker', 'insert into mail_outbox', 1);
    const paymentWrittenAtKill = await hasWritten(db.owner, waiter.pid, 'payments');
    first.signal('SIGKILL');
    await first.exited;
    await lock.release();
    // PostgreSQL rolls the dead connection's transaction back once it notices the connection is gone.
    await until(
      'the killed backend to end',
      async () => !(await db.jobs.query(`select 1 from pg_stat_activity where pid = $1`, [waiter.pid])).rowCount,
    );
    const paymentsAfterKill = (await invoiceBooks(holder, firmId, invoiceId)).payments.length;
    const appliedAfterKill = (await storedEvents(holder, firmId)).filter((e) => e.id === event.id && e.applied_at).length;
    const killedJobs = await activeJobs(db.jobs, QUEUES.paymentsApply);

    const restartedAt = Date.now();
    second = startServerProcess('worker', env);
    await second.logged('Layerbook worker started');
    if (options.movedClock) await expireAndRetryNow(db.urls.DATABASE_JOBS_URL, db.jobs, killedJobs);
    await until(
      'the event applied',
      async () => (await storedEvents(holder, firmId)).some((e) => e.id === event.id && e.applied_at),
      options.movedClock ? 60_000 : 400_000,
    );
    const recoveryMs = Date.now() - restartedAt;
    // Queued once more (a late retry, the reconciliation): applied already, so nothing happens.
    const data: PaymentsApplyJob = { tenantId: firmId, eventId: event.id };
    const again = await db.boss.send(QUEUES.paymentsApply, data);
    await until('the second application to finish', async () => {
      const { rows } = await db.jobs.query<{ state: string }>(`select state from pgboss.job where id = $1`, [again]);
      return rows[0]?.state === 'completed';
    });
    await until('the receipt e-mail sent', async () => (await receipts()).some((r) => r.status === 'sent'));
    const receiptIds = new Set((await receipts()).map((r) => `<${r.id}@layerbook.local>`));
    second.signal('SIGTERM');
    const { code } = await second.exited;
    const books = await invoiceBooks(holder, firmId, invoiceId);
    return {
      paymentWrittenAtKill,
      paymentsAfterKill,
      appliedAfterKill,
      payments: books.payments.length,
      receiptNumbers: books.payments.map((p) => p.receipt_no ?? 0),
      invoiceStatus: books.status,
      outcome: (await storedEvents(holder, firmId)).find((e) => e.id === event.id)?.outcome ?? null,
      receiptMails: catcher.delivered.filter((m) => receiptIds.has(m.messageId)).length,
      recoveryMs,
      exitCode: code,
    };
  } finally {
    await lock.release();
    await ensureStopped(first);
    await ensureStopped(second);
  }
}
