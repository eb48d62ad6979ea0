import pino from 'pino';
import { loadConfig } from '../config';
import { startQueue } from './job-queue';
import { QUEUES } from './queues';

/**
 * Operator command: queue a job now instead of waiting for its schedule.
 *   node server/dist/queue/cli.js follow-ups      — send today's follow-up digests for every firm
 */
async function run(command: string | undefined): Promise<void> {
  const config = loadConfig();
  const queue = await startQueue(config, pino({ level: 'warn' }));
  try {
    if (command === 'follow-ups') {
      await queue.boss.send(QUEUES.followUpSweep, { force: true });
      console.log('Queued the follow-up sweep for every firm.');
    } else {
      throw new Error(`Unknown command "${command ?? ''}". Try: follow-ups`);
    }
  } finally {
    await queue.boss.stop({ graceful: false, wait: true, close: true });
  }
}

run(process.argv[2]).catch((error) => {
  console.error(String(error));
  process.exit(1);
});
