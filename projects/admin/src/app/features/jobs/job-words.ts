import type { JobPayment } from './job-api';

export interface StatusLook {
  readonly word: string;
  /** an icon beside the word, so a status never reads by colour alone */
  readonly icon: string;
}

const JOB_STATUS: Readonly<Record<string, StatusLook>> = {
  accepted: { word: 'Accepted', icon: 'handshake' },
  scheduled: { word: 'Scheduled', icon: 'event' },
  in_progress: { word: 'Under way', icon: 'format_paint' },
  on_hold: { word: 'On hold', icon: 'pause_circle' },
  complete: { word: 'Finished', icon: 'task_alt' },
  completed: { word: 'Finished', icon: 'task_alt' },
  closed: { word: 'Closed', icon: 'inventory' },
  cancelled: { word: 'Cancelled', icon: 'block' },
};

const PAYMENT_STATUS: Readonly<Record<string, StatusLook>> = {
  draft: { word: 'Draft', icon: 'edit_note' },
  planned: { word: 'Planned', icon: 'schedule' },
  scheduled: { word: 'Scheduled', icon: 'schedule' },
  due: { word: 'Due', icon: 'notifications' },
  invoiced: { word: 'Invoiced', icon: 'receipt_long' },
  paid: { word: 'Paid', icon: 'paid' },
  overdue: { word: 'Overdue', icon: 'alarm' },
  void: { word: 'Void', icon: 'block' },
};

function plain(status: string): StatusLook {
  const word = status.replace(/_/g, ' ');
  return { word: word.charAt(0).toUpperCase() + word.slice(1), icon: 'label' };
}

export const jobStatus = (status: string): StatusLook => JOB_STATUS[status] ?? plain(status);
export const paymentStatus = (status: string): StatusLook => PAYMENT_STATUS[status] ?? plain(status);

/** When a payment falls due, in trade words (the trigger if the API sends it, else the role). */
export function paymentWhen(payment: JobPayment): string {
  switch (payment.trigger?.kind ?? payment.role) {
    case 'acceptance':
    case 'deposit':
      return 'On acceptance';
    case 'layerComplete':
    case 'milestone':
      return 'When the base coats are done';
    case 'walkthrough':
    case 'final':
      return 'On completion, after the walk-through';
    default:
      return payment.label;
  }
}

/** "30.00" → "30", "33.5" → "33.5"; null or blank → null (the rest of the sum). */
export function percentText(percent: number | string | null | undefined): string | null {
  if (percent === null || percent === undefined || percent === '') return null;
  const text = String(percent);
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}
