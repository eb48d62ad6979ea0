import type { SnapshotPaymentTrigger } from '../proposals/proposal-snapshot';

export const JOB_STATUSES = ['scheduled', 'in_progress', 'complete', 'cancelled'] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

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
  readonly role: 'deposit' | 'milestone' | 'final';
  readonly trigger: SnapshotPaymentTrigger;
  readonly percent: string | null;
  readonly amount: string;
  readonly expectedOn: string | null;
  readonly status: 'draft' | 'scheduled' | 'invoiced';
}

export interface JobDetail extends JobSummary {
  readonly estimateId: string;
  readonly proposalVersionId: string;
  readonly siteId: string;
  /** street, town — where the crew goes */
  readonly siteAddress: string;
  readonly inquiryId: string | null;
  readonly acceptedVariantId: string;
  readonly paymentSchedule: readonly PaymentScheduleLineView[];
}
