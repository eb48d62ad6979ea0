import { requiredText, text, uuid } from '@layerbook/contracts';
import { z } from 'zod';

/*
 * Request schemas and response shapes of the sample-board API. They live here, not in
 * @layerbook/contracts, until the contracts index exports a `samples` module; the apps keep
 * type-only copies of the views (features/samples/sample-board.ts in each app).
 */

export const SAMPLE_STATUSES = ['draft', 'shown', 'approved', 'changes_requested'] as const;
export type SampleStatus = (typeof SAMPLE_STATUSES)[number];

const label = requiredText(120, 'Give the board a label, like "Stair hall, board A".');
const notes = text(4000, 'Notes');

export const sampleBoardInput = z.strictObject({
  clientId: uuid('client'),
  siteId: uuid('site').optional(),
  estimateId: uuid('estimate').optional(),
  label,
  finishSystemId: uuid('finish system').optional(),
  notes: notes.default(''),
});
export type SampleBoardInput = z.infer<typeof sampleBoardInput>;

/** No defaults: a partial update changes only what it names. The finish can be chosen again while a draft. */
export const sampleBoardUpdate = z.strictObject({ label, notes, finishSystemId: uuid('finish system').nullable() }).partial();
export type SampleBoardUpdate = z.infer<typeof sampleBoardUpdate>;

export const sampleBoardListQuery = z.strictObject({
  clientId: uuid('client').optional(),
  siteId: uuid('site').optional(),
});

export const boardPhotoFields = z.strictObject({
  caption: z.string().trim().max(200, { error: 'Keep the caption under 200 characters.' }).optional(),
});

export const changeRequest = z.strictObject({
  comment: requiredText(2000, 'Tell us what you would like changed.'),
});

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
  readonly layer: Record<string, unknown>;
}

export interface FinishSnapshot {
  readonly systemId: string;
  readonly systemName: string;
  readonly description: string;
  readonly takenAt: string;
  readonly layers: readonly SnapshotLayer[];
}

export interface BoardPhotoView {
  readonly id: string;
  readonly boardId: string;
  readonly fileId: string;
  readonly caption: string;
  readonly originalName: string;
  readonly thumbnailUrl: string;
  readonly downloadUrl: string;
  readonly width: number | null;
  readonly height: number | null;
  readonly createdAt: string;
}

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

export interface ClientBoardPhoto {
  readonly id: string;
  readonly caption: string;
  readonly thumbnailUrl: string;
  readonly width: number | null;
  readonly height: number | null;
}

export interface ClientBoardView {
  readonly id: string;
  readonly label: string;
  readonly round: number;
  readonly status: Exclude<SampleStatus, 'draft'>;
  readonly firmName: string;
  readonly finishName: string | null;
  readonly finishSteps: readonly string[];
  readonly clientComment: string;
  readonly decidedAt: string | null;
  readonly photos: readonly ClientBoardPhoto[];
}
