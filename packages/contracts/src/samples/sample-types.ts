import type { PhotoThumbnail, BoardPhotoView } from '../files/photo-types';

/**
 * Sample boards, zod-free: statuses with their words, field limits, the views the API answers
 * and the bodies the admin app sends. The zod schemas in `samples.ts` are checked against these.
 */

export const SAMPLE_STATUSES = ['draft', 'shown', 'approved', 'changes_requested'] as const;
export type SampleStatus = (typeof SAMPLE_STATUSES)[number];

/** How the office reads a board's state. */
export const SAMPLE_STATUS_LABELS: Readonly<Record<SampleStatus, string>> = {
  draft: 'Being made',
  shown: 'With the client',
  approved: 'Approved — control sample',
  changes_requested: 'Changes asked for',
};

/** What a client may see: drafts stay in the office. */
export const CLIENT_BOARD_STATUSES = ['shown', 'approved', 'changes_requested'] as const;
export type ClientBoardStatus = (typeof CLIENT_BOARD_STATUSES)[number];

/** How the client reads the same state in the portal. */
export const CLIENT_BOARD_STATUS_LABELS: Readonly<Record<ClientBoardStatus, string>> = {
  shown: 'Waiting for your answer',
  approved: 'You approved this board',
  changes_requested: 'You asked for changes',
};

export const SAMPLE_LABEL_MAX = 120;
export const SAMPLE_NOTES_MAX = 4000;
/** What a client may write when asking for changes. */
export const SAMPLE_COMMENT_MAX = 2000;

/** One layer as it was when the board was made, with product names resolved. */
export interface SnapshotLayer {
  readonly position: number;
  readonly name: string;
  readonly method: string;
  readonly coats: number;
  /** the product, or the mix components in parts ("1 part Umber tint paint, 4 parts Glazing medium") */
  readonly products: ReadonlyArray<{ readonly id: string; readonly name: string; readonly parts?: number }>;
  readonly mixBy?: 'volume' | 'weight';
  readonly coverageShare?: number;
  readonly dilution?: { readonly share: number; readonly convention: string };
  readonly waitHoursAfter: number;
  /** the engine's layer as stored in the library that day, so the recipe can be reproduced exactly */
  readonly layer: Readonly<Record<string, unknown>>;
}

/** The finish system copied onto the board when it was made (or its finish last chosen). */
export interface FinishSnapshot {
  readonly systemId: string;
  readonly systemName: string;
  readonly description: string;
  readonly takenAt: string;
  readonly layers: readonly SnapshotLayer[];
}

/** GET /api/samples (a KeysetPage, newest first): one line per board with its first photo. */
export interface SampleBoardListItem {
  readonly id: string;
  readonly label: string;
  readonly clientId: string;
  readonly clientName: string;
  readonly siteId: string | null;
  readonly round: number;
  readonly status: SampleStatus;
  readonly finishName: string | null;
  readonly photoCount: number;
  readonly coverThumbnailUrl: string | null;
  readonly decidedAt: string | null;
  readonly createdAt: string;
}

/** GET /api/samples/:id and the answer of every change to a board. */
export interface SampleBoardView {
  readonly id: string;
  readonly label: string;
  readonly round: number;
  readonly status: SampleStatus;
  readonly clientId: string;
  readonly clientName: string;
  readonly siteId: string | null;
  readonly siteAddress: string | null;
  readonly estimateId: string | null;
  readonly finishSystemId: string | null;
  readonly finish: FinishSnapshot | null;
  /** the finish in plain words, one line per layer, as the client reads it */
  readonly finishSteps: readonly string[];
  readonly notes: string;
  readonly clientComment: string;
  readonly decidedAt: string | null;
  readonly decidedByName: string | null;
  /** true once a later round of this board exists */
  readonly hasNextRound: boolean;
  readonly photos: readonly BoardPhotoView[];
  readonly createdAt: string;
  readonly updatedAt: string;
}

/** A board's photo as its client sees it: the thumbnail, and the full photo to look closely at the finish. */
export interface ClientBoardPhoto extends PhotoThumbnail {
  readonly downloadUrl: string;
}

/** A board as its client reads it in the portal (GET /api/portal/boards items, …/:id). */
export interface ClientBoardView {
  readonly id: string;
  readonly label: string;
  readonly round: number;
  readonly status: ClientBoardStatus;
  readonly firmName: string;
  readonly finishName: string | null;
  /**
   * the finish in plain words, one line per layer in the order it goes on, in the client's language
   * (the system's words by key, samples.steps in the server's catalog; names as the firm typed them)
   */
  readonly finishSteps: readonly string[];
  readonly clientComment: string;
  readonly decidedAt: string | null;
  /** the firm's IANA time zone: `decidedAt` is shown as the firm's day, the same on the server render and in the browser */
  readonly timeZone: string;
  /** thumbnails, each with the full photo to open (the portal's own routes) */
  readonly photos: readonly ClientBoardPhoto[];
}

/** POST /api/samples */
export interface SampleBoardCreate {
  readonly clientId: string;
  readonly siteId?: string;
  readonly estimateId?: string;
  readonly label: string;
  readonly finishSystemId?: string;
  /** empty when left out */
  readonly notes?: string;
}

/** PATCH /api/samples/:id: only what it names changes; the finish only while a draft. */
export interface SampleBoardUpdate {
  readonly label?: string;
  readonly notes?: string;
  readonly finishSystemId?: string | null;
}

/** GET /api/samples?clientId=&siteId=&after=&limit= */
export interface SampleBoardListQuery {
  readonly clientId?: string;
  readonly siteId?: string;
  /** the previous page's `nextCursor` */
  readonly after?: string;
  /** 1 to PAGE_SIZE_MAX; PAGE_SIZE_DEFAULT when left out */
  readonly limit?: number;
}

/** POST /api/portal/boards/:id/request-changes */
export interface SampleChangeRequest {
  readonly comment: string;
}
