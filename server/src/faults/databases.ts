import { execFile } from 'node:child_process';
import path from 'node:path';
import { promisify } from 'node:util';
import { migrateDatabase } from '@layerbook/db';
import type { Pool } from 'pg';
import { TEST_DB, testDatabaseUrls } from '../testing/test-env';
import type { DatabaseUrls } from './fault-db';
import { ROOT, until } from './processes';

const run = promisify(execFile);

/**
 * A fresh, migrated database of its own on the test cluster (`<test db>_<suffix>`): spawned workers
 * then meet only this spec's jobs, not ones other specs left queued in the shared test database.
 */
export async function freshTestDatabase(suffix: string): Promise<{ name: string; urls: DatabaseUrls; drop(): Promise<void> }> {
  const name = `${TEST_DB}_${suffix}`;
  await run('bash', [path.join(ROOT, 'ops/pg-createdb.sh'), name, '--fresh'], { cwd: ROOT });
  const urls = testDatabaseUrls(name);
  await migrateDatabase(urls.DATABASE_OWNER_URL, path.join(ROOT, 'migrations'));
  return {
    name,
    urls,
    async drop() {
      const sql = `DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`;
      await run('bash', ['-c', `source ops/env.sh && as_pg psql -h "$PGDATA_DIR" -p "$LB_PG_PORT" -U postgres -qAt -c '${sql}'`], {
        cwd: ROOT,
      });
    },
  };
}

/** Waits until a queue has nothing waiting or running (a running server's workers drained it). */
export function queueDrained(jobsPool: Pool, queue: string, timeoutMs = 30_000): Promise<boolean> {
  return until(
    `the ${queue} queue drained`,
    async () => {
      const { rows } = await jobsPool.query<{ n: string }>(
        `select count(*) as n from pgboss.job where name = $1 and state in ('created', 'retry', 'active')`,
        [queue],
      );
      return Number(rows[0]?.n) === 0;
    },
    timeoutMs,
  );
}
