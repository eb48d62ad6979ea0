import type { SampleStatus } from '@layerbook/contracts/types';

/** An icon beside each word, so a status never reads by colour alone. */
const ICONS: Readonly<Record<SampleStatus, string>> = {
  draft: 'brush',
  shown: 'visibility',
  approved: 'verified',
  changes_requested: 'edit_note',
};

/** Status in words (a key of the samples words, English as the contract's labels) and an icon. */
export const STATUS_WORDS: Readonly<Record<SampleStatus, { readonly key: string; readonly icon: string }>> = {
  draft: { key: 'samples.status.draft', icon: ICONS.draft },
  shown: { key: 'samples.status.shown', icon: ICONS.shown },
  approved: { key: 'samples.status.approved', icon: ICONS.approved },
  changes_requested: { key: 'samples.status.changes_requested', icon: ICONS.changes_requested },
};
