import { SAMPLE_STATUS_LABELS, type SampleStatus } from '@layerbook/contracts/types';

/** An icon beside each word, so a status never reads by colour alone. */
const ICONS: Readonly<Record<SampleStatus, string>> = {
  draft: 'brush',
  shown: 'visibility',
  approved: 'verified',
  changes_requested: 'edit_note',
};

/** Status in words (the contract's) and an icon. */
export const STATUS_WORDS: Readonly<Record<SampleStatus, { readonly text: string; readonly icon: string }>> = {
  draft: { text: SAMPLE_STATUS_LABELS.draft, icon: ICONS.draft },
  shown: { text: SAMPLE_STATUS_LABELS.shown, icon: ICONS.shown },
  approved: { text: SAMPLE_STATUS_LABELS.approved, icon: ICONS.approved },
  changes_requested: { text: SAMPLE_STATUS_LABELS.changes_requested, icon: ICONS.changes_requested },
};
