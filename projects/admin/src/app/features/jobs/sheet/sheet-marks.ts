import { HttpClient } from '@angular/common/http';
import { Injectable, InjectionToken, type Signal, computed, inject, signal } from '@angular/core';
import type { ProgressMark } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';

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
 * How the sheet marks a layer done or reopens it. The offline service (offline/) keeps marks made
 * without a connection and sends them later; until it is provided, marks go straight to the API.
 */
export interface SheetMarks {
  /** resolves once the mark is sent or safely kept on the phone */
  mark(jobId: string, workItemId: string, kind: LayerMarkKind, on: string): Promise<void>;
  pending(jobId: string): Signal<readonly PendingMark[]>;
  /** forgets a refused mark once read */
  dismiss(clientKey: string): void;
  readonly online: Signal<boolean>;
}

/** Straight to POST /api/jobs/:id/progress, one fresh clientKey per mark so a resent request counts once. */
@Injectable({ providedIn: 'root' })
export class DirectMarks implements SheetMarks {
  private readonly http = inject(HttpClient);
  private readonly none = signal<readonly PendingMark[]>([]);

  readonly online = computed(() => true);

  async mark(jobId: string, workItemId: string, kind: LayerMarkKind, on: string): Promise<void> {
    const mark: ProgressMark = { kind, workItemId, on, clientKey: crypto.randomUUID() };
    await firstValueFrom(this.http.post(`/api/jobs/${encodeURIComponent(jobId)}/progress`, mark));
  }

  pending(): Signal<readonly PendingMark[]> {
    return this.none.asReadonly();
  }

  dismiss(): void {
    // Nothing is kept: a refused mark was reported when it was made.
  }
}

export const SHEET_MARKS = new InjectionToken<SheetMarks>('SHEET_MARKS', { providedIn: 'root', factory: () => inject(DirectMarks) });
