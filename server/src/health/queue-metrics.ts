import { Gauge, type Registry } from 'prom-client';
import { QUEUES } from '../queue/queues';
import type { SqlRunner } from './health-routes';

/** Jobs states counted per queue: waiting (created, retry), running (active) and failed. */
export const COUNTED_STATES = ['created', 'retry', 'active', 'failed'] as const;

export interface BacklogOptions {
  /** The jobs role's connection (pg-boss's pool): it owns pgboss.* and may read the whole outbox. */
  readonly db: SqlRunner;
  /** Scrapes within this long of the last count reuse it (several scrapers, a dashboard refresh). */
  readonly cacheMs?: number;
  /** A count taking longer than this is dropped for this scrape (the gauges then have no samples). */
  readonly timeoutMs?: number;
}

interface Backlog {
  readonly jobs: ReadonlyArray<{ queue: string; state: string; count: number }>;
  readonly outbox: { pending: number; failed: number; oldestPendingSeconds: number };
}

// pg-boss 10 keeps jobs in pgboss.job until archived (completed and failed after 12 h by default);
// the fetch index covers created and retry, so only active and failed read further.
const JOBS_SQL = `select name as queue, state::text as state, count(*)::int as count
                    from pgboss.job where state in ('created', 'retry', 'active', 'failed') group by name, state`;
// The partial index mail_outbox_unsent (migrations) keeps this to the unsent rows. The age is on the
// database's clock, which stamped created_at.
const OUTBOX_SQL = `select count(*) filter (where status = 'pending')::int as pending,
                           count(*) filter (where status = 'failed')::int as failed,
                           coalesce(extract(epoch from now() - min(created_at) filter (where status = 'pending')), 0)::float8
                             as oldest_pending_seconds
                      from mail_outbox where status <> 'sent'`;

/**
 * Queue depth and failures per queue, and the mail outbox's backlog, read at scrape time: two
 * counting queries at most per `cacheMs` however many scrapes come, each given up after `timeoutMs`.
 */
export function registerBacklogMetrics(registry: Registry, options: BacklogOptions): void {
  const read = cachedReader(options);
  new Gauge({
    name: 'layerbook_backlog_read_ok',
    help: 'Whether the last scrape could count the job queue and the mail outbox (1) or not (0).',
    registers: [registry],
    async collect() {
      this.set((await read()) ? 1 : 0);
    },
  });
  new Gauge({
    name: 'layerbook_queue_jobs',
    help: 'Jobs per queue and state: created and retry are waiting, active are running, failed are kept until archived.',
    labelNames: ['queue', 'state'] as const,
    registers: [registry],
    async collect() {
      this.reset();
      const backlog = await read();
      if (!backlog) return;
      for (const queue of Object.values(QUEUES)) for (const state of COUNTED_STATES) this.set({ queue, state }, 0);
      for (const row of backlog.jobs) this.set({ queue: row.queue, state: row.state }, row.count);
    },
  });
  new Gauge({
    name: 'layerbook_mail_outbox_unsent',
    help: 'E-mails in the outbox not sent: pending (waiting or retrying) and failed (given up).',
    labelNames: ['status'] as const,
    registers: [registry],
    async collect() {
      this.reset();
      const backlog = await read();
      if (!backlog) return;
      this.set({ status: 'pending' }, backlog.outbox.pending);
      this.set({ status: 'failed' }, backlog.outbox.failed);
    },
  });
  new Gauge({
    name: 'layerbook_mail_outbox_oldest_pending_seconds',
    help: 'Age of the oldest pending e-mail in the outbox (0 when none is pending).',
    registers: [registry],
    async collect() {
      this.reset();
      const backlog = await read();
      if (!backlog) return;
      this.set(Math.max(0, backlog.outbox.oldestPendingSeconds));
    },
  });
}

/** One count shared by the gauges of a scrape and the scrapes that follow within `cacheMs` (a monotonic clock). */
function cachedReader({ db, cacheMs = 10_000, timeoutMs = 2_000 }: BacklogOptions): () => Promise<Backlog | null> {
  let last: { at: number; answer: Promise<Backlog | null> } | undefined;
  return () => {
    const at = performance.now();
    if (!last || at - last.at >= cacheMs) last = { at, answer: readBacklog(db, timeoutMs) };
    return last.answer;
  };
}

async function readBacklog(db: SqlRunner, timeoutMs: number): Promise<Backlog | null> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<null>((resolve) => {
    timer = setTimeout(() => resolve(null), timeoutMs);
  });
  const counts = Promise.all([db.executeSql(JOBS_SQL), db.executeSql(OUTBOX_SQL)]).then(([jobs, outbox]) => {
    if (!jobs || !outbox) return null; // the queue's pool is closed (shutting down)
    const o = outbox.rows[0] as { pending: number; failed: number; oldest_pending_seconds: number };
    return {
      jobs: jobs.rows as Backlog['jobs'],
      outbox: { pending: o.pending, failed: o.failed, oldestPendingSeconds: o.oldest_pending_seconds },
    };
  });
  try {
    return await Promise.race([counts.catch(() => null), timeout]);
  } finally {
    clearTimeout(timer);
  }
}
