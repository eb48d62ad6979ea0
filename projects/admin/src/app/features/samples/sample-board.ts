/**
 * The sample-board API's shapes (server/src/samples/schemas.ts), copied as types only: the
 * contracts package does not export a `samples` module yet. Keep the two in step.
 */
export type SampleStatus = 'draft' | 'shown' | 'approved' | 'changes_requested';

export interface SnapshotLayer {
  readonly position: number;
  readonly name: string;
  readonly method: string;
  readonly coats: number;
  readonly products: ReadonlyArray<{ readonly id: string; readonly name: string; readonly parts?: number }>;
  readonly mixBy?: 'volume' | 'weight';
  readonly coverageShare?: number;
  readonly dilution?: { readonly share: number; readonly convention: string };
  readonly waitHoursAfter: number;
}

export interface FinishSnapshot {
  readonly systemId: string;
  readonly systemName: string;
  readonly description: string;
  readonly takenAt: string;
  readonly layers: readonly SnapshotLayer[];
}

export interface BoardPhoto {
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

export interface SampleBoard {
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
  readonly finishSteps: readonly string[];
  readonly notes: string;
  readonly clientComment: string;
  readonly decidedAt: string | null;
  readonly decidedByName: string | null;
  readonly hasNextRound: boolean;
  readonly photos: readonly BoardPhoto[];
  readonly createdAt: string;
  readonly updatedAt: string;
}

export interface SampleBoardCreate {
  readonly clientId: string;
  readonly siteId?: string;
  readonly finishSystemId?: string;
  readonly label: string;
  readonly notes: string;
}
