import { paymentLabel } from '@layerbook/contracts/engine';
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

/**
 * A payment line's name, said from its trigger as the proposal says it ("Progress payment when Base
 * coat is finished on every surface"), whatever older wording the line was stored with.
 */
export function paymentLine(payment: Pick<PaymentScheduleLineView, 'role' | 'trigger' | 'layerName'>): string {
  return paymentLabel(payment.role, payment.trigger, payment.layerName ?? undefined);
}
