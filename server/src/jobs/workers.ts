import nodemailer from 'nodemailer';
import { Pool } from 'pg';
import type { Logger } from 'pino';
import type { Config } from '../config';
import { sendOutboxMail } from '../mail/send-mail-job';
import type { StartedQueue } from './job-queue';
import { MailSendJob, QUEUES } from './queues';

export interface Workers {
  stop(): Promise<void>;
}

/** Registers every job handler. Runs in the web process by default, or alone in `worker` mode. */
export async function startWorkers(config: Config, queue: StartedQueue, logger: Logger): Promise<Workers> {
  const pool = new Pool({ connectionString: config.DATABASE_JOBS_URL, max: 4, application_name: 'layerbook-worker' });
  const transport = nodemailer.createTransport({ host: config.SMTP_HOST, port: config.SMTP_PORT, secure: false, ignoreTLS: true });
  await queue.boss.work<MailSendJob>(QUEUES.mailSend, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => {
    if (job) await sendOutboxMail(pool, transport, config.MAIL_FROM, job.data, logger);
  });
  return {
    async stop() {
      await queue.boss.offWork(QUEUES.mailSend);
      transport.close();
      await pool.end();
    },
  };
}
