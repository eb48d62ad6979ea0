import type { Pool, PoolClient } from 'pg';
import PgBoss from 'pg-boss';
import { until } from './processes';

/**
 * Holds `LOCK TABLE <table> IN <mode> MODE` in an open transaction of the owner role, so a worker or
 * request that reaches a conflicting statement waits there: a kill or a signal then lands at a known
 * point of real code, with no test hook in it. `release` rolls the holder back.
 */
export async function holdTableLock(
  ownerPool: Pool,
  table: string,
  mode: 'SHARE' | 'ACCESS EXCLUSIVE',
): Promise<{ release(): Promise<void> }> {
  const client: PoolClient = await ownerPool.connect();
  await client.query('begin');
  await client.query(`lock table ${client.escapeIdentifier(table)} in ${mode} mode`);
  let held = true;
  return {
    async release() {
      if (!held) return;
      held = false;
      await client.query('rollback');
      client.release();
    },
  };
}

export interface Waiter {
  readonly pid: number;
  readonly query: string;
}

/**
 * Backends of `application` waiting for a lock while running a statement that starts with `statement`.
 * `pool` must log in as the same role as those backends: PostgreSQL shows another role's statement
 * and wait only to superusers and pg_read_all_stats.
 */
export async function lockWaiters(pool: Pool, application: string, statement: string): Promise<Waiter[]> {
  const { rows } = await pool.query<Waiter>(
    `select pid, query from pg_stat_activity
      where application_name = $1 and wait_event_type = 'Lock' and state = 'active' and ltrim(query) ilike $2 || '%'`,
    [application, statement],
  );
  return rows;
}

/** Waits until `count` such backends wait (the in-flight work reached the held lock). */
export function awaitLockWaiters(pool: Pool, application: string, statement: string, count: number, timeoutMs = 60_000): Promise<Waiter[]> {
  return until(
    `${count} ${application} backend(s) waiting at "${statement}"`,
    async () => {
      const waiting = await lockWaiters(pool, application, statement);
      return waiting.length >= count ? waiting : null;
    },
    timeoutMs,
  );
}

/** Whether backend `pid` holds a row-exclusive lock on `table`: it has written rows there in its open transaction. */
export async function hasWritten(pool: Pool, pid: number, table: string): Promise<boolean> {
  const { rows } = await pool.query(
    `select 1 from pg_locks l join pg_class c on c.oid = l.relation
      where l.pid = $1 and c.relname = $2 and l.mode = 'RowExclusiveLock' and l.granted`,
    [pid, table],
  );
  return rows.length > 0;
}

/** The ids of a queue's jobs in the 'active' state (taken by a worker, not yet completed or failed). */
export async function activeJobs(jobsPool: Pool, queue: string): Promise<string[]> {
  const { rows } = await jobsPool.query<{ id: string }>(`select id from pgboss.job where name = $1 and state = 'active'`, [queue]);
  return rows.map((r) => r.id);
}

/**
 * A killed worker's jobs stay 'active' until their expiry (the queue's expireInSeconds) has passed;
 * pg-boss's maintenance (every two minutes) then fails them by timeout and they are retried after the
 * queue's retry delay. The real wait is up to a few minutes (ops/faults/run.ts --real-time measures
 * it); here the clock is moved on for those jobs only: their start is set back past the expiry, a
 * pg-boss of our own runs its maintenance every second (the same expiry query), and the retry is
 * made due now. Resolves once every one of them is back in 'retry' (or has finished).
 */
export async function expireAndRetryNow(jobsUrl: string, jobsPool: Pool, ids: readonly string[]): Promise<void> {
  if (!ids.length) return;
  await jobsPool.query(
    `update pgboss.job set started_on = started_on - expire_in - interval '1 second' where id = any($1::uuid[]) and state = 'active'`,
    [ids],
  );
  const boss = new PgBoss({
    connectionString: jobsUrl,
    schema: 'pgboss',
    max: 2,
    supervise: true,
    schedule: false,
    maintenanceIntervalSeconds: 1,
  });
  boss.on('error', () => undefined);
  await boss.start();
  try {
    await until(
      'the killed jobs to be failed by timeout and queued for retry',
      async () => {
        const { rows } = await jobsPool.query<{ state: string }>(`select state from pgboss.job where id = any($1::uuid[])`, [ids]);
        return rows.length === ids.length && rows.every((r) => r.state !== 'active');
      },
      30_000,
    );
  } finally {
    await boss.stop({ graceful: false, wait: true });
  }
  await jobsPool.query(`update pgboss.job set start_after = now() where id = any($1::uuid[]) and state = 'retry'`, [ids]);
}
