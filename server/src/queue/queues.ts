import type PgBoss from 'pg-boss';

/** Every queue is declared once, here, with explicit retry, backoff, expiry and a dead letter. */
export const QUEUES = {
  mailSend: 'mail-send',
  mailRequeue: 'mail-requeue',
  mailDead: 'mail-dead',
  followUpSweep: 'follow-up-sweep',
  followUpDigest: 'follow-up-digest',
  followUpDead: 'follow-up-dead',
  pruneExpired: 'prune-expired',
  pruneDead: 'prune-dead',
  billingEvaluate: 'billing-evaluate',
  billingSweep: 'billing-sweep',
  billingDaily: 'billing-daily',
  billingDead: 'billing-dead',
  paymentsApply: 'payments-apply',
  paymentsReconcile: 'payments-reconcile',
  paymentsDead: 'payments-dead',
} as const;

export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

export const QUEUE_OPTIONS: ReadonlyArray<{ name: QueueName; options: Omit<PgBoss.Queue, 'name'> }> = [
  // The dead-letter queue first: a queue may only name one that exists.
  { name: QUEUES.mailDead, options: { retryLimit: 0, expireInSeconds: 60, retentionDays: 30 } },
  { name: QUEUES.followUpDead, options: { retryLimit: 0, expireInSeconds: 60, retentionDays: 30 } },
  { name: QUEUES.pruneDead, options: { retryLimit: 0, expireInSeconds: 60, retentionDays: 30 } },
  { name: QUEUES.billingDead, options: { retryLimit: 0, expireInSeconds: 60, retentionDays: 30 } },
  { name: QUEUES.paymentsDead, options: { retryLimit: 0, expireInSeconds: 60, retentionDays: 30 } },
  {
    name: QUEUES.paymentsApply,
    options: { retryLimit: 8, retryDelay: 5, retryBackoff: true, expireInSeconds: 120, retentionDays: 14, deadLetter: QUEUES.paymentsDead },
  },
  {
    name: QUEUES.paymentsReconcile,
    options: { retryLimit: 2, retryDelay: 60, retryBackoff: true, expireInSeconds: 300, retentionDays: 3, deadLetter: QUEUES.paymentsDead },
  },
  {
    name: QUEUES.billingEvaluate,
    options: { retryLimit: 5, retryDelay: 10, retryBackoff: true, expireInSeconds: 120, retentionDays: 7, deadLetter: QUEUES.billingDead },
  },
  {
    name: QUEUES.billingSweep,
    options: { retryLimit: 2, retryDelay: 60, retryBackoff: true, expireInSeconds: 300, retentionDays: 3, deadLetter: QUEUES.billingDead },
  },
  {
    name: QUEUES.billingDaily,
    // one firm's day (singletonKey firm:localDate) at most once queued and once running at a time: a repeated
    // sweep (its retry, an operator's rerun) queues no second copy beside the first (and sendFirmDay none behind it)
    options: {
      policy: 'stately',
      retryLimit: 5,
      retryDelay: 30,
      retryBackoff: true,
      expireInSeconds: 600,
      retentionDays: 7,
      deadLetter: QUEUES.billingDead,
    },
  },
  {
    name: QUEUES.pruneExpired,
    options: { retryLimit: 3, retryDelay: 60, retryBackoff: true, expireInSeconds: 300, retentionDays: 3, deadLetter: QUEUES.pruneDead },
  },
  {
    name: QUEUES.followUpSweep,
    options: { retryLimit: 2, retryDelay: 60, retryBackoff: true, expireInSeconds: 300, retentionDays: 3, deadLetter: QUEUES.followUpDead },
  },
  {
    name: QUEUES.followUpDigest,
    options: {
      policy: 'stately',
      retryLimit: 5,
      retryDelay: 30,
      retryBackoff: true,
      expireInSeconds: 300,
      retentionDays: 7,
      deadLetter: QUEUES.followUpDead,
    },
  },
  {
    name: QUEUES.mailRequeue,
    options: { retryLimit: 2, retryDelay: 60, retryBackoff: true, expireInSeconds: 300, retentionDays: 3, deadLetter: QUEUES.mailDead },
  },
  {
    name: QUEUES.mailSend,
    options: { retryLimit: 6, retryDelay: 15, retryBackoff: true, expireInSeconds: 120, retentionDays: 7, deadLetter: QUEUES.mailDead },
  },
];

export interface MailSendJob {
  readonly outboxId: string;
}

export interface FollowUpSweepJob {
  /** Run for every firm now, whatever its local hour (tests and the ops command). */
  readonly force?: boolean;
  /** Only these firms (an operator's targeted rerun, and tests that share a database). */
  readonly tenantIds?: readonly string[];
}

export interface FollowUpDigestJob {
  readonly tenantId: string;
  readonly localDate: string;
}

/** Hourly, on the hour plus five (UTC); each firm's digest goes out at FOLLOW_UP_LOCAL_HOUR its time. */
export const FOLLOW_UP_SWEEP_CRON = '5 * * * *';
export const FOLLOW_UP_LOCAL_HOUR = 7;

/** Every quarter hour: outbox rows whose send job used up its retries are queued again (mail/requeue.ts). */
export const MAIL_REQUEUE_CRON = '*/15 * * * *';

/** Hourly at twenty past (UTC): expired sessions, old form stamps and sign-in throttle windows go. */
export const PRUNE_EXPIRED_CRON = '20 * * * *';

/** A job's billing triggers to check now (after a progress mark, billing start, an approved change order). */
export interface BillingEvaluateJob {
  readonly tenantId: string;
  readonly jobId: string;
  /** a percent complete or stored materials was marked: a progress-billed job's open application is drafted or refreshed */
  readonly progressMarked?: boolean;
  /** another invoice of the job was issued or voided, or its contract sum or value lines changed: its open progress application is refigured for its own period */
  readonly refreshDraft?: boolean;
}

/** Like FollowUpSweepJob: force / tenantIds for tests and operators. */
export interface BillingSweepJob {
  readonly force?: boolean;
  readonly tenantIds?: readonly string[];
}

/** One firm's day: date triggers met and invoice reminders due, on `localDate` in its zone. */
export interface BillingDailyJob {
  readonly tenantId: string;
  readonly localDate: string;
}

/** Hourly at ten past (UTC); each firm's billing day runs at BILLING_LOCAL_HOUR its time. */
export const BILLING_SWEEP_CRON = '10 * * * *';
export const BILLING_LOCAL_HOUR = 8;

/** Apply one stored processor event (webhook or reconciliation stored it under its firm). */
export interface PaymentsApplyJob {
  readonly tenantId: string;
  readonly eventId: string;
}

/** List the processor's events since the last one seen and store and apply what is missing. */
export type PaymentsReconcileJob = Record<string, never>;
