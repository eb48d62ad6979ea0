import type { SnapshotPaymentTrigger } from '../proposals/proposal-snapshot';

export const JOB_STATUSES = ['scheduled', 'in_progress', 'complete', 'cancelled'] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

export const JOB_STATUS_LABELS: Readonly<Record<JobStatus, string>> = {
  scheduled: 'Scheduled',
  in_progress: 'Under way',
  complete: 'Finished',
  cancelled: 'Cancelled',
};

/**
 * POST /api/jobs/:id/status — the office moves a job on: finished (`complete`), reopened
 * (`in_progress`, from finished only) or cancelled (with a reason; once no invoice of it stands).
 */
export interface JobStatusChange {
  readonly status: 'complete' | 'in_progress' | 'cancelled';
  /** why it was cancelled (required then), kept in the job's history */
  readonly reason?: string;
}

export const JOB_CANCEL_REASON_MAX = 500;

/** Where a payment sits in the schedule: the deposit, a payment during the work, the balance. */
export const PAYMENT_LINE_ROLES = ['deposit', 'milestone', 'final'] as const;
export type PaymentLineRole = (typeof PAYMENT_LINE_ROLES)[number];

export const PAYMENT_LINE_STATUSES = ['draft', 'scheduled', 'invoiced'] as const;
export type PaymentLineStatus = (typeof PAYMENT_LINE_STATUSES)[number];

export const PAYMENT_LINE_STATUS_LABELS: Readonly<Record<PaymentLineStatus, string>> = {
  draft: 'Draft',
  scheduled: 'Scheduled',
  invoiced: 'Invoiced',
};

/** Accepted work as the office lists it. Money is a decimal string in `currency`. */
export interface JobSummary {
  readonly id: string;
  readonly title: string;
  readonly clientId: string;
  readonly clientName: string;
  readonly optionLabel: string;
  readonly contractSum: string;
  readonly currency: string;
  readonly status: JobStatus;
  readonly startDate: string | null;
  readonly finishDate: string | null;
  readonly createdAt: string;
}

export interface PaymentScheduleLineView {
  readonly id: string;
  readonly position: number;
  readonly label: string;
  readonly role: PaymentLineRole;
  readonly trigger: SnapshotPaymentTrigger;
  /** the layer a layerComplete trigger waits for, as the accepted option's schedule names it; null otherwise */
  readonly layerName: string | null;
  /** a decimal string ("30" or "33.5"); null for a fixed amount or the rest of the sum */
  readonly percent: string | null;
  readonly amount: string;
  readonly expectedOn: string | null;
  readonly status: PaymentLineStatus;
}

export interface JobDetail extends JobSummary {
  readonly estimateId: string;
  readonly proposalVersionId: string;
  readonly siteId: string;
  /** street, town — where the crew goes */
  readonly siteAddress: string;
  readonly inquiryId: string | null;
  readonly acceptedVariantId: string;
  /** in schedule order (by `position`) */
  readonly paymentSchedule: readonly PaymentScheduleLineView[];
}
