import nodemailer from 'nodemailer';
import { Pool } from 'pg';
import type { Logger } from 'pino';
import type { Config } from '../config';
import { sendOutboxMail } from '../mail/send-mail-job';
import { sendFollowUpDigest, sweepFollowUps } from './follow-ups';
import type { StartedQueue } from './job-queue';
import { FOLLOW_UP_SWEEP_CRON, FollowUpDigestJob, FollowUpSweepJob, MailSendJob, QUEUES } from './queues';

export interface Workers {
  stop(): Promise<void>;
}

/** Registers every job handler. Runs in the web process by default, or alone in `worker` mode. */
export async function startWorkers(config: Config, queue: StartedQueue, logger: Logger, now: () => Date = () => new Date()): Promise<Workers> {
  const pool = new Pool({ connectionString: config.DATABASE_JOBS_URL, max: 4, application_name: 'layerbook-worker' });
  const transport = nodemailer.createTransport({ host: config.SMTP_HOST, port: config.SMTP_PORT, secure: false, ignoreTLS: true });
  const { boss } = queue;
  await boss.work<MailSendJob>(QUEUES.mailSend, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => {
    if (job) await sendOutboxMail(pool, transport, config.MAIL_FROM, job.data, logger);
  });
  await boss.work<FollowUpSweepJob>(QUEUES.followUpSweep, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
    if (job) await sweepFollowUps(pool, queue, job.data ?? {}, now());
  });
  await boss.work<FollowUpDigestJob>(QUEUES.followUpDigest, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
    if (job) await sendFollowUpDigest(pool, queue, config, job.data, logger);
  });
  // Declared once; pg-boss keeps one schedule per queue however many processes call this.
  await boss.schedule(QUEUES.followUpSweep, FOLLOW_UP_SWEEP_CRON, {}, { tz: 'UTC' });
  return {
    async stop() {
      for (const name of [QUEUES.mailSend, QUEUES.followUpSweep, QUEUES.followUpDigest]) await boss.offWork(name);
      transport.close();
      await pool.end();
    },
  };
}
