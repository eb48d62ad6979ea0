import type { Tx } from '@layerbook/db';
import PgBoss from 'pg-boss';
import type { Logger } from 'pino';
import type { Config } from '../config';
import { QUEUE_OPTIONS, QueueName } from './queues';

/** The queue as the services see it: `send` joins the caller's transaction, so a rolled-back write sends nothing. */
export interface JobQueue {
  send(name: QueueName, data: object, tx: Tx): Promise<void>;
}

export interface StartedQueue extends JobQueue {
  readonly boss: PgBoss;
  stop(): Promise<void>;
}

export async function startQueue(config: Config, logger: Logger): Promise<StartedQueue> {
  // pg-boss creates and migrates its own schema, so it runs as the jobs role, not the RLS-bound web role.
  const boss = new PgBoss({ connectionString: config.DATABASE_JOBS_URL, schema: 'pgboss', max: 4, application_name: 'layerbook-jobs' });
  boss.on('error', (err) => logger.error({ err }, 'job queue error'));
  await boss.start();
  for (const { name, options } of QUEUE_OPTIONS) {
    const existing = await boss.getQueue(name);
    if (existing) await boss.updateQueue(name, { name, ...options });
    else await boss.createQueue(name, { name, ...options });
  }
  // The web role enqueues inside its own transactions, so it needs to insert jobs (and read queue policy).
  await boss.getDb().executeSql(
    `GRANT USAGE ON SCHEMA pgboss TO layerbook_app;
     GRANT SELECT ON ALL TABLES IN SCHEMA pgboss TO layerbook_app;
     GRANT INSERT ON pgboss.job TO layerbook_app;`,
    [],
  );
  return {
    boss,
    async send(name, data, tx) {
      await boss.send(name, data, { db: { executeSql: (text, values) => tx.client.query(text, values) } });
    },
    stop: () => stopBoss(boss),
  };
}

interface PoolLike {
  waitingCount: number;
  idleCount: number;
  totalCount: number;
}

/**
 * pg-boss closes its pool as soon as no job is running, but a worker whose fetch is still queued for
 * one of the pool's connections then waits forever (a pool that has ended never serves its queue), and
 * pg-boss's own loop checking that its workers stopped keeps ticking. So the pool is closed here, once
 * every fetch has come back and each worker has seen that it should stop.
 */
async function stopBoss(boss: PgBoss): Promise<void> {
  await boss.stop({ graceful: true, timeout: 10_000, wait: true, close: false });
  const db = boss.getDb() as unknown as { pool?: PoolLike; close(): Promise<void> };
  const settled = (pool: PoolLike) => pool.waitingCount === 0 && pool.idleCount === pool.totalCount;
  for (let waited = 0; db.pool && !settled(db.pool) && waited < 15_000; waited += 25) {
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
  // One more turn lets the last fetch's worker read its answer and mark itself stopped.
  await new Promise((resolve) => setTimeout(resolve, 25));
  await db.close();
}
