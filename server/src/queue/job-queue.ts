import type { Tx } from '@layerbook/db';
import { Client } from 'pg';
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
  /** One job at a time per call, polled every half second; counted, so `stop` can wait for the handler. */
  work<T extends object>(name: string, handle: (data: T) => Promise<unknown>): Promise<void>;
  /** Takes no more jobs, lets the ones running finish and record their outcome, then closes pg-boss's pool. */
  stop(): Promise<void>;
}

export async function startQueue(config: Config, logger: Logger): Promise<StartedQueue> {
  // pg-boss creates and migrates its own schema, so it runs as the jobs role, not the RLS-bound web role.
  const boss = new PgBoss({ connectionString: config.DATABASE_JOBS_URL, schema: 'pgboss', max: 4, application_name: 'layerbook-jobs' });
  boss.on('error', (err) => logger.error({ err }, 'job queue error'));
  await boss.start();
  await oneProcessAtATime(config, async () => {
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
  });
  let running = 0;
  return {
    boss,
    async work<T extends object>(name: string, handle: (data: T) => Promise<unknown>) {
      await boss.work<T>(name, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => {
        if (!job) return;
        running += 1;
        try {
          await handle(job.data);
        } finally {
          running -= 1;
        }
      });
    },
    async send(name, data, tx) {
      await boss.send(name, data, { db: { executeSql: (text, values) => tx.client.query(text, values) } });
    },
    stop: () => stopBoss(boss, () => running === 0),
  };
}

interface PoolLike {
  waitingCount: number;
  idleCount: number;
  totalCount: number;
}

/**
 * pg-boss closes its pool as soon as no job is running, but a worker whose fetch is still on its way
 * then either waits forever (an ended pool never serves its queue; pg-boss's own loop checking that
 * its workers stopped keeps ticking) or takes a job it can no longer mark done (left active until it
 * expires). So the pool is closed here, once no fetch or handler is under way and each worker has
 * read that it should stop: a quiet moment seen after a timer turn (the steps of a worker's loop
 * follow each other without one).
 */
async function stopBoss(boss: PgBoss, handlersIdle: () => boolean): Promise<void> {
  await boss.stop({ graceful: true, timeout: 10_000, wait: true, close: false });
  const db = boss.getDb() as unknown as { pool?: PoolLike; close(): Promise<void> };
  const quiet = () => handlersIdle() && (!db.pool || (db.pool.waitingCount === 0 && db.pool.idleCount === db.pool.totalCount));
  for (let waited = 0, quietTurns = 0; quietTurns < 2 && waited < 15_000; waited += 25) {
    await new Promise((resolve) => setTimeout(resolve, 25));
    quietTurns = quiet() ? quietTurns + 1 : 0;
  }
  await db.close();
}

interface PoolLike {
  waitingCount: number;
  idleCount: number;
  totalCount: number;
}

/**
 * Several processes starting together on a fresh database would create the same queues (each a
 * partition table) and grant at once, and deadlock; an advisory lock held on a connection of its own
 * lets them set up one after another.
 */
async function oneProcessAtATime(config: Config, setUp: () => Promise<void>): Promise<void> {
  const client = new Client({ connectionString: config.DATABASE_JOBS_URL, application_name: 'layerbook-queue-setup' });
  await client.connect();
  try {
    await client.query(`select pg_advisory_lock(hashtext('layerbook-queue-setup'))`);
    await setUp();
  } finally {
    await client.end();
  }
}
