import type { Pool } from 'pg';

/**
 * Resolves once `count` sessions of this test database wait for a lock: the request under test has
 * reached the row another transaction holds. `what` names it when it never does.
 */
export async function sessionsWaiting(pool: Pool, count: number, what: string): Promise<void> {
  for (let tries = 0; tries < 1000; tries++) {
    const { rows } = await pool.query<{ n: number }>(
      `select count(*)::int as n from pg_stat_activity where datname = current_database() and wait_event_type = 'Lock'`,
    );
    if ((rows[0]?.n ?? 0) >= count) return;
    await new Promise((resolve) => setImmediate(resolve));
  }
  throw new Error(`${what} never waited for the lock`);
}
