import path from 'node:path';
import { loadConfig } from '../config';
import { createLogger } from '../http/logger';
import { startQueue } from '../queue/job-queue';
import { type PaymentsApplyJob, QUEUES } from '../queue/queues';
import { testDatabaseUrls } from '../testing/test-env';
import { applyStoredEvent } from './apply-event';
import { Pool } from 'pg';

/**
 * A payments-apply worker in a process of its own, for the worker-kill spec (apply-event-kill.spec.ts)
 * only: run with `node --import tsx`. With LB_APPLY_STALL=1 it stalls inside the apply transaction
 * after the event's effect is written (before its commit), saying so on stdout, until it is killed.
 */
async function main(): Promise<void> {
  const config = loadConfig({
    NODE_ENV: 'test',
    ...testDatabaseUrls(),
    SESSION_SECRET: 'test-session-secret-that-is-long-enough-123',
    PUBLIC_URL: 'http://localhost:4300',
    ROOT_DIR: path.resolve(__dirname, '../../..'),
    LOG_LEVEL: 'silent',
  });
  const logger = createLogger(config);
  const pool = new Pool({ connectionString: config.DATABASE_JOBS_URL, max: 2 });
  const queue = await startQueue(config, logger);
  const stall = process.env['LB_APPLY_STALL'] === '1';
  const deps = {
    queue,
    config,
    afterEffect: stall
      ? async (eventId: string) => {
          process.stdout.write(`stalled ${eventId}\n`);
          await new Promise(() => undefined);
        }
      : undefined,
  };
  await queue.boss.work<PaymentsApplyJob>(QUEUES.paymentsApply, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => {
    if (!job) return;
    // This process's own clock, as main.ts gives the app (a test-only process: no injected clock to follow).
    // eslint-disable-next-line no-restricted-syntax
    const outcome = await applyStoredEvent(pool, deps, job.data, new Date());
    process.stdout.write(`applied ${job.data.eventId} ${outcome ?? ''}\n`);
  });
  process.stdout.write('ready\n');
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
