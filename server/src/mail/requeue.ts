import { withGlobal } from '@layerbook/db';
import type { Pool } from 'pg';
import type { JobQueue } from '../queue/job-queue';
import { QUEUES } from '../queue/queues';

/** An outbox row still pending this long after it was written, with no send job left, is queued again. */
export const STRANDED_AFTER_MINUTES = 10;
/** A row still unsent this long after it was written is marked failed (an operator may send it again: `cli mail-resend`). */
export const GIVE_UP_AFTER_DAYS = 3;
/** Rows queued again per run (the next run takes the rest). */
const BATCH = 500;

export interface RequeueResult {
  readonly requeued: number;
  readonly failed: number;
}

/**
 * The `mail-requeue` job (every quarter hour): a send job that used up its retries (the SMTP server
 * was down for half an hour) goes to the dead letters and its outbox row would stay pending for ever.
 * Rows pending with no send job waiting, retrying or running get a new one; rows unsent after
 * GIVE_UP_AFTER_DAYS are marked failed instead (a reset link three days late is no use). Sending stays
 * safe to repeat: the send job locks its row and skips one already sent. Runs as the jobs role.
 */
export async function requeueStrandedMail(pool: Pool, queue: JobQueue, now: Date): Promise<RequeueResult> {
  return withGlobal(pool, async (tx) => {
    const failed = await tx.client.query(
      `update mail_outbox set status = 'failed', last_error = coalesce(last_error, '') || ' (not sent within ${GIVE_UP_AFTER_DAYS} days)'
        where status = 'pending' and created_at < $1::timestamptz - make_interval(days => $2)`,
      [now.toISOString(), GIVE_UP_AFTER_DAYS],
    );
    const { rows } = await tx.client.query<{ id: string }>(
      `select o.id from mail_outbox o
        where o.status = 'pending' and o.created_at < $1::timestamptz - make_interval(mins => $2)
          and not exists (select 1 from pgboss.job j where j.name = $3 and j.state in ('created', 'retry', 'active')
                            and j.data->>'outboxId' = o.id::text)
        order by o.created_at limit ${BATCH} for update of o skip locked`,
      [now.toISOString(), STRANDED_AFTER_MINUTES, QUEUES.mailSend],
    );
    for (const { id } of rows) await queue.send(QUEUES.mailSend, { outboxId: id }, tx);
    return { requeued: rows.length, failed: failed.rowCount ?? 0 };
  });
}

/** The operator's `cli mail-resend`: every failed row pending again, and queued. */
export async function resendFailedMail(pool: Pool, queue: JobQueue): Promise<number> {
  return withGlobal(pool, async (tx) => {
    const { rows } = await tx.client.query<{ id: string }>(
      `update mail_outbox set status = 'pending' where status = 'failed' returning id`,
    );
    for (const { id } of rows) await queue.send(QUEUES.mailSend, { outboxId: id }, tx);
    return rows.length;
  });
}
