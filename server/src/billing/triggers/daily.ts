import { withTenant } from '@layerbook/db';
import type { Pool } from 'pg';
import type { Logger } from 'pino';
import type { Config } from '../../config';
import { SYSTEM_ACTOR } from '../../http/actor';
import type { JobQueue } from '../../queue/job-queue';
import type { BillingDailyJob } from '../../queue/queues';
import { sendDueReminders } from '../reminders/send-reminders';
import { evaluateJobBilling } from './evaluate';

/**
 * One firm's billing day, on its local date: every started job's triggers are checked (date
 * triggers come due here; the others were met as the work was marked, and are met again harmlessly),
 * each job in its own transaction so one job's trouble holds no other back; then the reminders.
 * Safe to run twice for a day: drafts and reminders are each made once.
 */
export async function runBillingDaily(
  pool: Pool,
  queue: JobQueue,
  config: Config,
  job: BillingDailyJob,
  logger: Logger,
  now: Date,
): Promise<{ drafted: number; reminded: number }> {
  const jobIds = await withTenant(pool, job.tenantId, async (tx) => {
    const { rows } = await tx.client.query<{ id: string }>(
      `select id from jobs where tenant_id = $1 and billing_started_at is not null and status <> 'cancelled' order by created_at, id`,
      [tx.tenantId],
    );
    return rows.map((r) => r.id);
  });
  let drafted = 0;
  const failures: unknown[] = [];
  for (const jobId of jobIds) {
    try {
      drafted += await withTenant(pool, job.tenantId, (tx) => evaluateJobBilling(tx, jobId, job.localDate, SYSTEM_ACTOR));
    } catch (err) {
      logger.error({ err, tenantId: job.tenantId, jobId }, 'billing day: could not check a job');
      failures.push(err);
    }
  }
  const reminded = await withTenant(pool, job.tenantId, (tx) => sendDueReminders(tx, queue, config, job.localDate, now));
  logger.info({ tenantId: job.tenantId, localDate: job.localDate, drafted, reminded: reminded.length }, 'billing day done');
  // The queue retries the day (what was done stays done, once).
  if (failures.length) throw failures[0];
  return { drafted, reminded: reminded.length };
}
