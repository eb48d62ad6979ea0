import { InjectionToken, type Signal, inject } from '@angular/core';
import type { JobProgressView } from '@layerbook/contracts/types';
import { OfflineMarks } from './offline/offline-marks';

export type LayerMarkKind = 'layerDone' | 'layerReopened';

/** A mark the phone holds until the server counts it; `refused` ones stay (with the server's words) until dismissed. */
export interface PendingMark {
  readonly clientKey: string;
  readonly workItemId: string;
  readonly kind: LayerMarkKind;
  readonly on: string;
  readonly state: 'waiting' | 'refused';
  readonly problem?: string;
}

/**
 * How the sheet marks a layer done or reopens it: what it needs of the offline service (offline/),
 * which keeps marks made without a connection and sends them later. Specs give a fake.
 */
export interface SheetMarks {
  /** resolves once the mark is counted or safely kept on the phone */
  mark(jobId: string, workItemId: string, kind: LayerMarkKind, on: string): Promise<void>;
  pending(jobId: string): Signal<readonly PendingMark[]>;
  /** the server's answer to the last mark it counted from this phone (null before any) */
  progress(jobId: string): Signal<JobProgressView | null>;
  /** forgets a refused mark once read */
  dismiss(clientKey: string): void;
  readonly online: Signal<boolean>;
}

export const SHEET_MARKS = new InjectionToken<SheetMarks>('SHEET_MARKS', { providedIn: 'root', factory: () => inject(OfflineMarks) });
