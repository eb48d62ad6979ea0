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
    stop: () => boss.stop({ graceful: true, timeout: 10_000, wait: true }),
  };
}
