import { withTenant } from '@layerbook/db';
import type { Pool } from 'pg';
import type { Logger } from 'pino';
import type { Config } from '../config';
import { localDate, localHour } from '../firms/local-date';
import { enqueueMail } from '../mail/outbox';
import { followUpDigestMail } from '../mail/inquiry-templates';
import { sendFirmDay } from './firm-day';
import type { StartedQueue } from './job-queue';
import { FOLLOW_UP_LOCAL_HOUR, FollowUpDigestJob, FollowUpSweepJob, QUEUES } from './queues';

/**
 * Finds the firms where it is now the morning hour and queues one digest job each. The singleton
 * key (firm + local date) makes a repeated sweep queue nothing new.
 */
export async function sweepFollowUps(pool: Pool, queue: StartedQueue, job: FollowUpSweepJob, now: Date): Promise<number> {
  const { rows } = await pool.query<{ id: string; time_zone: string }>(`select id, time_zone from firms`);
  let queued = 0;
  const only = job.tenantIds ? new Set(job.tenantIds) : null;
  for (const firm of rows) {
    if (only && !only.has(firm.id)) continue;
    if (!job.force && localHour(firm.time_zone, now) !== FOLLOW_UP_LOCAL_HOUR) continue;
    const data: FollowUpDigestJob = { tenantId: firm.id, localDate: localDate(firm.time_zone, now) };
    if (await sendFirmDay(pool, queue, QUEUES.followUpDigest, data)) queued++;
  }
  return queued;
}

interface DueRow {
  contact_name: string;
  next_follow_up: string;
  assignee_user_id: string | null;
}

/**
 * E-mails each person the open inquiries whose follow-up is due or overdue: their own, and the
 * unassigned ones (or assigned to someone no longer active) to the owners and office. Safe to run twice: one outbox row per person per day.
 */
export async function sendFollowUpDigest(
  pool: Pool,
  queue: StartedQueue,
  config: Config,
  job: FollowUpDigestJob,
  logger: Logger,
): Promise<void> {
  await withTenant(pool, job.tenantId, async (tx) => {
    const { rows: due } = await tx.client.query<DueRow>(
      `select contact_name, next_follow_up::text as next_follow_up, assignee_user_id from inquiries
        where tenant_id = $1 and next_follow_up <= $2::date and stage not in ('won', 'lost') order by next_follow_up, created_at`,
      [tx.tenantId, job.localDate],
    );
    if (!due.length) return;
    const { rows: people } = await tx.client.query<{ id: string; name: string; email: string; role: string; firm_name: string }>(
      `select u.id, u.name, u.email, m.role, f.name as firm_name from memberships m join users u on u.id = m.user_id join firms f on f.id = m.tenant_id
        where m.tenant_id = $1 and m.status = 'active'`,
      [tx.tenantId],
    );
    // An inquiry whose assignee no longer works here (deactivated) is nobody's: it goes to owners and office.
    const active = new Set(people.map((p) => p.id));
    const ownerOf = (d: DueRow) => (d.assignee_user_id !== null && active.has(d.assignee_user_id) ? d.assignee_user_id : null);
    for (const person of people) {
      const mine = due.filter((d) => ownerOf(d) === person.id || (ownerOf(d) === null && person.role !== 'crew'));
      if (!mine.length) continue;
      await enqueueMail(tx, queue, {
        purposeKey: `follow-ups:${tx.tenantId}:${job.localDate}:${person.id}`,
        tenantId: tx.tenantId,
        to: person.email,
        ...followUpDigestMail({
          name: person.name,
          firmName: person.firm_name,
          items: mine.map((d) => ({ contactName: d.contact_name, due: d.next_follow_up, overdue: d.next_follow_up < job.localDate })),
          url: `${config.PUBLIC_URL}/today`,
        }),
      });
    }
    logger.info({ tenantId: job.tenantId, localDate: job.localDate, due: due.length }, 'follow-up digest queued');
  });
}
