import { Pool } from 'pg';
import PgBoss from 'pg-boss';
import type { JobQueue } from '../queue/job-queue';

export interface DatabaseUrls {
  readonly DATABASE_URL: string;
  readonly DATABASE_OWNER_URL: string;
  readonly DATABASE_JOBS_URL: string;
}

/** The three roles' pools on the database under test, and a queue that sends in the caller's transaction. */
export interface FaultDb {
  readonly urls: DatabaseUrls;
  /** the RLS-bound web role: tenant reads and writes, through withTenant */
  readonly app: Pool;
  /** the owner: table locks, pg_stat_activity */
  readonly owner: Pool;
  /** the jobs role: pg-boss's tables and the outbox */
  readonly jobs: Pool;
  readonly boss: PgBoss;
  /** the queue as the services see it (job-queue.ts): `send` joins the caller's transaction */
  readonly queue: JobQueue & { readonly boss: PgBoss };
  close(): Promise<void>;
}

export async function openFaultDb(urls: DatabaseUrls): Promise<FaultDb> {
  const app = new Pool({ connectionString: urls.DATABASE_URL, max: 3 });
  const owner = new Pool({ connectionString: urls.DATABASE_OWNER_URL, max: 3 });
  const jobs = new Pool({ connectionString: urls.DATABASE_JOBS_URL, max: 3 });
  // Connections a stopped cluster drops are reported here; the pool opens new ones when asked.
  for (const pool of [app, owner, jobs]) pool.on('error', () => undefined);
  const boss = new PgBoss({ connectionString: urls.DATABASE_JOBS_URL, schema: 'pgboss', max: 2, supervise: false, schedule: false });
  boss.on('error', () => undefined);
  await boss.start();
  const queue = {
    boss,
    async send(name: string, data: object, tx: Parameters<JobQueue['send']>[2]) {
      await boss.send(name, data, { db: { executeSql: (text, values) => tx.client.query(text, values) } });
    },
  };
  return {
    urls,
    app,
    owner,
    jobs,
    boss,
    queue,
    async close() {
      await boss.stop({ graceful: false, wait: true });
      await Promise.all([app.end(), owner.end(), jobs.end()]);
    },
  };
}

/** The outbox rows whose purpose starts with `prefix`: id and status (read as the jobs role, which sends them). */
export async function outboxRows(db: FaultDb, prefix: string): Promise<Array<{ id: string; status: string }>> {
  const { rows } = await db.jobs.query<{ id: string; status: string }>(
    `select id, status from mail_outbox where purpose_key like $1 || '%' order by purpose_key`,
    [prefix],
  );
  return rows;
}
