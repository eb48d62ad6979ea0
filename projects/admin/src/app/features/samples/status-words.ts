import type { SampleStatus } from './sample-board';

/** Status in words and an icon, never by colour alone. */
export const STATUS_WORDS: Record<SampleStatus, { readonly text: string; readonly icon: string }> = {
  draft: { text: 'Being made', icon: 'brush' },
  shown: { text: 'With the client', icon: 'visibility' },
  approved: { text: 'Approved — control sample', icon: 'verified' },
  changes_requested: { text: 'Changes asked for', icon: 'edit_note' },
};
