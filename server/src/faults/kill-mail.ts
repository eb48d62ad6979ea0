import { withTenant } from '@layerbook/db';
import { enqueueMail } from '../mail/outbox';
import { QUEUES } from '../queue/queues';
import { activeJobs, awaitLockWaiters, expireAndRetryNow, holdTableLock } from './db-waits';
import { type FaultDb, outboxRows } from './fault-db';
import type { MailCatcher } from './mail-catcher';
import { ensureStopped, startServerProcess, until } from './processes';

/** Mail-send jobs one worker process runs at once (server/src/queue/workers.ts: workEach(…, mailSend, 4, …)). */
export const MAIL_WORKERS_PER_PROCESS = 4;

export interface KillMailResult {
  readonly queued: number;
  /** messages the catcher had answered 250 when the worker died, their rows not yet marked sent */
  readonly inFlightAtKill: number;
  /** rows marked sent once the restarted worker is done (all of them: nothing lost) */
  readonly sent: number;
  readonly deliveries: number;
  /** deliveries beyond one per row */
  readonly duplicates: number;
  /** every duplicate is one of the messages in flight at the kill, with the same Message-ID */
  readonly duplicatesWereInFlight: boolean;
  /** from the restart until every row was sent */
  readonly recoveryMs: number;
  /** the restarted worker's exit code after SIGTERM */
  readonly exitCode: number | null;
}

/**
 * Kill -9 a worker process in the middle of sending mail, at the worst point: the SMTP server has
 * accepted the messages (250) but the outbox rows are not yet marked sent. The outbox table is held
 * under a SHARE lock, so each send job's `select … for update` passes, the message goes out, and its
 * `update mail_outbox set status = 'sent'` waits; the kill lands there. After a restart every row is
 * sent; the ones in flight go out a second time (at most the process's mail concurrency, same Message-ID).
 * `movedClock`: the killed jobs are expired at once (db-waits.ts) instead of after the real expiry.
 */
export async function killWorkerSendingMail(
  db: FaultDb,
  catcher: MailCatcher,
  tenantId: string,
  env: Record<string, string>,
  options: { count: number; movedClock: boolean },
): Promise<KillMailResult> {
  const prefix = `fault-mail:${Date.now()}:`;
  await withTenant(db.app, tenantId, async (tx) => {
    for (let i = 0; i < options.count; i++) {
      const n = String(i).padStart(2, '0');
      await enqueueMail(tx, db.queue, {
        purposeKey: `${prefix}${n}`,
        tenantId,
        to: `fault.mail.${n}@example.test`,
        subject: `Fault check ${n}`,
        html: `<p>Fault check ${n}</p>`,
        text: `Fault check ${n}`,
      });
    }
  });
  const rows = await outboxRows(db, prefix);
  const ids = new Set(rows.map((r) => `<${r.id}@layerbook.local>`));
  const ours = () => catcher.delivered.filter((m) => ids.has(m.messageId));

  const lock = await holdTableLock(db.owner, 'mail_outbox', 'SHARE');
  const first = startServerProcess('worker', env);
  let second: ReturnType<typeof startServerProcess> | undefined;
  try {
    await first.logged('Layerbook worker started');
    const waiting = await awaitLockWaiters(db.jobs, 'layerbook-worker', 'update mail_outbox set status', MAIL_WORKERS_PER_PROCESS);
    await until('the in-flight messages at the catcher', () => Promise.resolve(ours().length >= waiting.length));
    const inFlight = new Set(ours().map((m) => m.messageId));
    first.signal('SIGKILL');
    await first.exited;
    await lock.release();
    // The killed jobs are still 'active' in pg-boss; their messages went out, their rows say otherwise.
    const killedJobs = await activeJobs(db.jobs, QUEUES.mailSend);

    const restartedAt = Date.now();
    second = startServerProcess('worker', env);
    await second.logged('Layerbook worker started');
    if (options.movedClock) await expireAndRetryNow(db.urls.DATABASE_JOBS_URL, db.jobs, killedJobs);
    await until(
      'every outbox row sent',
      async () => (await outboxRows(db, prefix)).every((r) => r.status === 'sent'),
      options.movedClock ? 60_000 : 400_000,
    );
    const recoveryMs = Date.now() - restartedAt;
    const byId = new Map<string, number>();
    for (const m of ours()) byId.set(m.messageId, (byId.get(m.messageId) ?? 0) + 1);
    const duplicated = [...byId].filter(([, n]) => n > 1);
    second.signal('SIGTERM');
    const { code } = await second.exited;
    const final = await outboxRows(db, prefix);
    return {
      queued: options.count,
      inFlightAtKill: inFlight.size,
      sent: final.filter((r) => r.status === 'sent').length,
      deliveries: ours().length,
      duplicates: duplicated.reduce((sum, [, n]) => sum + n - 1, 0),
      duplicatesWereInFlight: duplicated.every(([id]) => inFlight.has(id)) && [...byId.keys()].length === options.count,
      recoveryMs,
      exitCode: code,
    };
  } finally {
    await lock.release();
    await ensureStopped(first);
    await ensureStopped(second);
  }
}
