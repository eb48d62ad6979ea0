import { Pool } from 'pg';
import { loadConfig } from '../config';
import { resendFailedMail } from '../mail/requeue';
import { createLogger } from '../http/logger';
import { startQueue } from './job-queue';
import { QUEUES } from './queues';

/**
 * Operator command: queue a job now instead of waiting for its schedule.
 *   node server/dist/queue/cli.js follow-ups      — send today's follow-up digests for every firm
 *   node server/dist/queue/cli.js mail-resend     — send again every e-mail marked failed (not sent within days)
 */
async function run(command: string | undefined): Promise<void> {
  const config = loadConfig();
  const queue = await startQueue(config, createLogger({ NODE_ENV: config.NODE_ENV, LOG_LEVEL: 'warn' }));
  try {
    if (command === 'follow-ups') {
      await queue.boss.send(QUEUES.followUpSweep, { force: true });
      console.log('Queued the follow-up sweep for every firm.');
    } else if (command === 'mail-resend') {
      const pool = new Pool({ connectionString: config.DATABASE_JOBS_URL, max: 1 });
      try {
        console.log(`Queued ${await resendFailedMail(pool, queue)} failed e-mails to send again.`);
      } finally {
        await pool.end();
      }
    } else {
      throw new Error(`Unknown command "${command ?? ''}". Try: follow-ups, mail-resend`);
    }
  } finally {
    await queue.boss.stop({ graceful: false, wait: true, close: true });
  }
}

run(process.argv[2]).catch((error) => {
  console.error(String(error));
  process.exit(1);
});
