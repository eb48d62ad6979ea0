import { CLIENT_BOARD_STATUS_LABELS, type ClientBoardStatus } from '@layerbook/contracts/types';

const ICONS: Readonly<Record<ClientBoardStatus, string>> = {
  shown: 'hourglass_top',
  approved: 'verified',
  changes_requested: 'edit_note',
};

/** Where a board stands, in the contract's words and an icon (never colour alone). */
export const BOARD_STATUS_WORDS: Readonly<Record<ClientBoardStatus, { readonly text: string; readonly icon: string }>> = {
  shown: { text: CLIENT_BOARD_STATUS_LABELS.shown, icon: ICONS.shown },
  approved: { text: CLIENT_BOARD_STATUS_LABELS.approved, icon: ICONS.approved },
  changes_requested: { text: CLIENT_BOARD_STATUS_LABELS.changes_requested, icon: ICONS.changes_requested },
};
