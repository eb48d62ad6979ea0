import type PgBoss from 'pg-boss';

/** Every queue is declared once, here, with explicit retry, backoff, expiry and a dead letter. */
export const QUEUES = {
  mailSend: 'mail-send',
  mailDead: 'mail-dead',
} as const;

export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

export const QUEUE_OPTIONS: ReadonlyArray<{ name: QueueName; options: Omit<PgBoss.Queue, 'name'> }> = [
  // The dead-letter queue first: a queue may only name one that exists.
  { name: QUEUES.mailDead, options: { retryLimit: 0, expireInSeconds: 60, retentionDays: 30 } },
  {
    name: QUEUES.mailSend,
    options: { retryLimit: 6, retryDelay: 15, retryBackoff: true, expireInSeconds: 120, retentionDays: 7, deadLetter: QUEUES.mailDead },
  },
];

export interface MailSendJob {
  readonly outboxId: string;
}
