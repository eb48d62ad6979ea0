import nodemailer from 'nodemailer';
import { Pool } from 'pg';
import type { Logger } from 'pino';
import { survivesDroppedConnections } from '../db-connections';
import type { Config } from '../config';
import { requeueStrandedMail } from '../mail/requeue';
import { sendOutboxMail } from '../mail/send-mail-job';
import { sendProposalReminders } from '../proposals/expiry-reminders';
import { runBillingDaily } from '../billing/triggers/daily';
import { runBillingEvaluate } from '../billing/triggers/evaluate';
import { sweepBilling } from '../billing/triggers/sweep';
import { applyStoredEvent } from '../payments/apply-event';
import { processorFor } from '../payments/processor';
import { reconcileEvents } from '../payments/reconcile';
import { sendFollowUpDigest, sweepFollowUps } from './follow-ups';
import type { StartedQueue } from './job-queue';
import { pruneExpired } from './prune';
import {
  BILLING_SWEEP_CRON,
  BillingDailyJob,
  BillingEvaluateJob,
  BillingSweepJob,
  FOLLOW_UP_SWEEP_CRON,
  FollowUpDigestJob,
  FollowUpSweepJob,
  MAIL_REQUEUE_CRON,
  MailSendJob,
  PaymentsApplyJob,
  PRUNE_EXPIRED_CRON,
  QUEUES,
} from './queues';

export interface Workers {
  stop(): Promise<void>;
}

/**
 * pg-boss 10 polls once per interval per worker, whatever it found; several workers per queue in one
 * process give concurrency, each handling one job so a failure retries only that job.
 */
async function workEach<T extends object>(
  queue: StartedQueue,
  name: string,
  workers: number,
  handle: (data: T) => Promise<unknown>,
): Promise<void> {
  for (let i = 0; i < workers; i++) await queue.work<T>(name, handle);
}

/**
 * Registers every job handler. Runs in the web process by default, or alone in `worker` mode.
 * `now` is the caller's clock (the app context's), so tests can move time for the jobs too.
 */
export async function startWorkers(config: Config, queue: StartedQueue, logger: Logger, now: () => Date): Promise<Workers> {
  const pool = new Pool({ connectionString: config.DATABASE_JOBS_URL, max: 4, application_name: 'layerbook-worker' });
  // A connection the database drops (restart, failover), idle or held by a job mid-send: logged, not a crash.
  survivesDroppedConnections(pool, logger);
  const transport = nodemailer.createTransport({ host: config.SMTP_HOST, port: config.SMTP_PORT, secure: false, ignoreTLS: true });
  const { boss } = queue;
  await workEach<MailSendJob>(queue, QUEUES.mailSend, 4, (data) => sendOutboxMail(pool, transport, config.MAIL_FROM, data, logger));
  await workEach<FollowUpSweepJob>(queue, QUEUES.followUpSweep, 1, (data) => sweepFollowUps(pool, queue, data ?? {}, now()));
  // Each firm's morning job: the follow-up digest for the staff, then reminders of proposals about to lapse.
  await workEach<FollowUpDigestJob>(queue, QUEUES.followUpDigest, 2, async (data) => {
    await sendFollowUpDigest(pool, queue, config, data, logger);
    await sendProposalReminders(pool, queue, config, data, logger, now());
  });
  // Billing: a job's triggers after a mark; hourly, each firm's billing day at its local hour (date triggers, reminders).
  await workEach<BillingEvaluateJob>(queue, QUEUES.billingEvaluate, 2, (data) => runBillingEvaluate(pool, data, now()));
  await workEach<BillingSweepJob>(queue, QUEUES.billingSweep, 1, (data) => sweepBilling(pool, queue, data ?? {}, now()));
  await workEach<BillingDailyJob>(queue, QUEUES.billingDaily, 2, (data) => runBillingDaily(pool, queue, config, data, logger, now()));
  // Payments: each stored processor event applied exactly once (several at a time); the reconciliation
  // fetches what the webhook missed and queues again what was never applied.
  const stripe = processorFor(config);
  const paymentDeps = { queue, config };
  await workEach<PaymentsApplyJob>(queue, QUEUES.paymentsApply, 3, (data) => applyStoredEvent(pool, paymentDeps, data, now()));
  await workEach<object>(queue, QUEUES.paymentsReconcile, 1, async () => {
    if (stripe) await reconcileEvents(pool, queue, stripe, now(), logger);
  });
  await workEach<object>(queue, QUEUES.pruneExpired, 1, async () => logger.info(await pruneExpired(pool, now()), 'pruned expired rows'));
  await workEach<object>(queue, QUEUES.mailRequeue, 1, async () => {
    const result = await requeueStrandedMail(pool, queue, now());
    if (result.requeued || result.failed) logger.warn(result, 'mail queued again after its send job gave up');
  });
  // Declared once; pg-boss keeps one schedule per queue however many processes call this.
  await boss.schedule(QUEUES.followUpSweep, FOLLOW_UP_SWEEP_CRON, {}, { tz: 'UTC' });
  await boss.schedule(QUEUES.pruneExpired, PRUNE_EXPIRED_CRON, {}, { tz: 'UTC' });
  await boss.schedule(QUEUES.mailRequeue, MAIL_REQUEUE_CRON, {}, { tz: 'UTC' });
  await boss.schedule(QUEUES.billingSweep, BILLING_SWEEP_CRON, {}, { tz: 'UTC' });
  if (stripe) await boss.schedule(QUEUES.paymentsReconcile, config.PAYMENTS_RECONCILE_CRON, {}, { tz: 'UTC' });
  return {
    async stop() {
      // The queue stops first (no more jobs, the running ones finished); here only what the workers opened.
      transport.close();
      await pool.end();
    },
  };
}
