import {
  JOB_STATUS_LABELS,
  PAYMENT_LINE_STATUS_LABELS,
  type JobStatus,
  type PaymentLineStatus,
  type PaymentScheduleLineView,
} from '@layerbook/contracts/types';

export interface StatusLook {
  readonly word: string;
  /** an icon beside the word, so a status never reads by colour alone */
  readonly icon: string;
}

const JOB_ICONS: Readonly<Record<JobStatus, string>> = {
  scheduled: 'event',
  in_progress: 'format_paint',
  complete: 'task_alt',
  cancelled: 'block',
};

const PAYMENT_ICONS: Readonly<Record<PaymentLineStatus, string>> = {
  draft: 'edit_note',
  scheduled: 'schedule',
  invoiced: 'receipt_long',
};

export const jobStatus = (status: JobStatus): StatusLook => ({ word: JOB_STATUS_LABELS[status], icon: JOB_ICONS[status] });
export const paymentStatus = (status: PaymentLineStatus): StatusLook => ({
  word: PAYMENT_LINE_STATUS_LABELS[status],
  icon: PAYMENT_ICONS[status],
});

/** When a payment falls due, in trade words, from what the proposal said triggers it. */
export function paymentWhen(payment: Pick<PaymentScheduleLineView, 'trigger'>): string {
  switch (payment.trigger.kind) {
    case 'acceptance':
      return 'On acceptance';
    case 'layerComplete':
      return 'When the base coats are done';
    case 'walkthrough':
      return 'On completion, after the walk-through';
  }
}
