import {
  LOGGED_ACTIVITY_LABELS,
  SOURCE_LABELS,
  STAGE_LABELS,
  isInquirySource,
  isInquiryStage,
  type InquiryActivity,
} from '@layerbook/contracts/types';

export interface ActivityLine {
  readonly icon: string;
  /** What happened, in one short line. */
  readonly title: string;
  /** What was said or written, if anything. */
  readonly body: string;
}

/** Turns one log entry into words; `nameOf` finds a person's name from the user id stored in it. */
export function describeActivity(
  activity: InquiryActivity,
  nameOf: (userId: unknown) => string | null,
  formatDate: (isoDate: string) => string,
): ActivityLine {
  const data = activity.data;
  switch (activity.kind) {
    case 'created': {
      const source = data['source'];
      const from = isInquirySource(source) ? ` (${SOURCE_LABELS[source]})` : '';
      return { icon: 'add_circle', title: `Inquiry logged${from}`, body: activity.body };
    }
    case 'note':
      return { icon: 'sticky_note_2', title: LOGGED_ACTIVITY_LABELS.note, body: activity.body };
    case 'call':
      return { icon: 'call', title: LOGGED_ACTIVITY_LABELS.call, body: activity.body };
    case 'email':
      return { icon: 'mail', title: LOGGED_ACTIVITY_LABELS.email, body: activity.body };
    case 'stage_change':
      return {
        icon: 'swap_horiz',
        title: `Stage: ${stageName(data['from'])} → ${stageName(data['to'])}`,
        body: activity.body ? `Reason: ${activity.body}` : '',
      };
    case 'assignment': {
      const to = data['to'] ? (nameOf(data['to']) ?? 'someone no longer on the team') : null;
      return { icon: 'person', title: to ? `Assigned to ${to}` : 'No longer assigned to anyone', body: '' };
    }
    case 'follow_up': {
      const to = typeof data['to'] === 'string' ? formatDate(data['to']) : null;
      const from = typeof data['from'] === 'string' ? formatDate(data['from']) : null;
      const title = to ? (from ? `Follow-up moved from ${from} to ${to}` : `Follow-up set for ${to}`) : 'Follow-up date cleared';
      return { icon: 'event', title, body: '' };
    }
    case 'converted':
      return { icon: 'folder_shared', title: 'Filed as a client', body: '' };
  }
}

function stageName(stage: unknown): string {
  return isInquiryStage(stage) ? STAGE_LABELS[stage] : 'unknown';
}
