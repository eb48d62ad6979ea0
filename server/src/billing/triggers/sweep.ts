import type { Pool } from 'pg';
import { localDate, localHour } from '../../firms/local-date';
import { sendFirmDay } from '../../queue/firm-day';
import type { StartedQueue } from '../../queue/job-queue';
import { BILLING_LOCAL_HOUR, type BillingDailyJob, type BillingSweepJob, QUEUES } from '../../queue/queues';

/**
 * Hourly: finds the firms where it is now BILLING_LOCAL_HOUR and queues each one's billing day
 * (date triggers, reminders) for its local date. The singleton key (firm + local date) keeps a
 * repeated sweep from queueing the day again while it waits; the day itself is safe to run twice.
 */
export async function sweepBilling(pool: Pool, queue: StartedQueue, job: BillingSweepJob, now: Date): Promise<number> {
  const { rows } = await pool.query<{ id: string; time_zone: string }>(`select id, time_zone from firms`);
  const only = job.tenantIds ? new Set(job.tenantIds) : null;
  let queued = 0;
  for (const firm of rows) {
    if (only && !only.has(firm.id)) continue;
    if (!job.force && localHour(firm.time_zone, now) !== BILLING_LOCAL_HOUR) continue;
    const data: BillingDailyJob = { tenantId: firm.id, localDate: localDate(firm.time_zone, now) };
    if (await sendFirmDay(pool, queue, QUEUES.billingDaily, data)) queued++;
  }
  return queued;
}
