import { PROBLEM_CONTENT_TYPE } from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { HttpError } from '../http/problem';
import type { JobQueue, StartedQueue } from '../queue/job-queue';

/** A readiness check gives up after this long: a probe must answer while the database hangs. */
export const READY_CHECK_TIMEOUT_MS = 2000;

type CheckName = 'database' | 'queue';
type CheckResult = 'ok' | 'unreachable';

/** What reaches the queue's tables: pg-boss's own pool (the jobs role) when this process runs one. */
export interface SqlRunner {
  executeSql(text: string, values?: unknown[]): Promise<{ rows: unknown[] } | undefined>;
}

/** The started queue's database (pg-boss's pool), when the context carries a started queue. */
export function queueDatabase(queue: JobQueue): SqlRunner | undefined {
  return (queue as Partial<StartedQueue>).boss?.getDb();
}

/**
 * Probes for a load balancer or an orchestrator, outside /api: no session, no CSRF, no cookie, not
 * logged. `/healthz`: the process answers (no database). `/readyz`: the database answers through the
 * web pool and the job queue through its own (pg-boss's tables; a stopped queue counts as unreachable),
 * each within READY_CHECK_TIMEOUT_MS, run side by side; otherwise 503 problem+json naming what failed.
 */
export function healthRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/healthz', (_req, res) => {
    res.set('cache-control', 'no-store').json({ status: 'ok' });
  });
  router.get('/readyz', async (req, res) => {
    const [database, queue] = await Promise.all([check(() => ctx.pool.query('select 1')), check(() => queueReachable(ctx))]);
    const checks: Record<CheckName, CheckResult> = { database, queue };
    res.set('cache-control', 'no-store');
    if (database === 'ok' && queue === 'ok') {
      res.json({ status: 'ready', checks });
      return;
    }
    ctx.logger.warn({ checks }, 'not ready');
    const failed = [database !== 'ok' ? 'the database' : '', queue !== 'ok' ? 'the job queue' : ''].filter(Boolean).join(' and ');
    const problem = new HttpError(503, 'Not ready', `This server cannot reach ${failed} just now; send requests elsewhere.`);
    res
      .status(503)
      .type(PROBLEM_CONTENT_TYPE)
      .send(JSON.stringify({ ...problem.toProblem(typeof req.id === 'string' ? req.id : ''), checks }));
  });
  return router;
}

async function queueReachable(ctx: AppContext): Promise<void> {
  const db = queueDatabase(ctx.queue);
  const sql = 'select version from pgboss.version';
  // pg-boss answers undefined, not an error, once its pool is closed (the queue stopped).
  const answer = db ? await db.executeSql(sql) : await ctx.pool.query(sql);
  if (!answer || answer.rows.length === 0) throw new Error('job queue stopped or not installed');
}

async function check(probe: () => Promise<unknown>): Promise<CheckResult> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_resolve, reject) => {
    timer = setTimeout(() => reject(new Error('timed out')), READY_CHECK_TIMEOUT_MS);
  });
  try {
    await Promise.race([probe(), timeout]);
    return 'ok';
  } catch {
    return 'unreachable';
  } finally {
    clearTimeout(timer);
  }
}
