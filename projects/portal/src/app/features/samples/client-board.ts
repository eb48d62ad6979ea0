/**
 * A sample board as the portal API answers it (server/src/samples/schemas.ts, ClientBoardView),
 * copied as types only: the contracts package does not export a `samples` module yet.
 */
export type ClientBoardStatus = 'shown' | 'approved' | 'changes_requested';

export interface ClientBoardPhoto {
  readonly id: string;
  readonly caption: string;
  readonly thumbnailUrl: string;
  readonly width: number | null;
  readonly height: number | null;
}

export interface ClientBoard {
  readonly id: string;
  readonly label: string;
  readonly round: number;
  readonly status: ClientBoardStatus;
  readonly firmName: string;
  readonly finishName: string | null;
  /** the finish in plain words, one line per layer in the order it goes on */
  readonly finishSteps: readonly string[];
  readonly clientComment: string;
  readonly decidedAt: string | null;
  readonly photos: readonly ClientBoardPhoto[];
}

/** Where a board stands, in words and an icon (never colour alone). */
export const BOARD_STATUS_WORDS: Record<ClientBoardStatus, { readonly text: string; readonly icon: string }> = {
  shown: { text: 'Waiting for your answer', icon: 'hourglass_top' },
  approved: { text: 'You approved this board', icon: 'verified' },
  changes_requested: { text: 'You asked for changes', icon: 'edit_note' },
};
