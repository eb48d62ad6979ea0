import { type ClientBoardStatus } from '@layerbook/contracts/types';

const ICONS: Readonly<Record<ClientBoardStatus, string>> = {
  shown: 'hourglass_top',
  approved: 'verified',
  changes_requested: 'edit_note',
};

/** Where a board stands, as a words key (samples.status.*, the contract's words) and an icon (never colour alone). */
export const BOARD_STATUS_WORDS: Readonly<Record<ClientBoardStatus, { readonly text: string; readonly icon: string }>> = {
  shown: { text: 'samples.status.shown', icon: ICONS.shown },
  approved: { text: 'samples.status.approved', icon: ICONS.approved },
  changes_requested: { text: 'samples.status.changesRequested', icon: ICONS.changes_requested },
};
