import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { JobProgressView, ProgressMark, StaffSession } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';
import type { QueuedMark } from './mark-queue';

/** The server's answer to one try: its HTTP status (0 = no answer) and body (JSON or problem+json). */
export interface SendResult {
  readonly status: number;
  readonly body: unknown;
}

/** The HTTP side of the offline marks, through the app's API interceptor (CSRF token, 401 → sign-in). */
@Injectable({ providedIn: 'root' })
export class MarkSender {
  private readonly http = inject(HttpClient);

  /** POST /api/jobs/:id/progress with the mark's own clientKey: a second copy of it counts once. */
  async post(mark: QueuedMark): Promise<SendResult> {
    const body: ProgressMark = { kind: mark.kind, workItemId: mark.workItemId, on: mark.on, clientKey: mark.clientKey };
    try {
      const res = await firstValueFrom(
        this.http.post<JobProgressView>(`/api/jobs/${encodeURIComponent(mark.jobId)}/progress`, body, {
          observe: 'response',
          // Past the service worker: a write it sees empties its offline copy of GET …/progress, even a write that fails.
          headers: { 'ngsw-bypass': '1' },
        }),
      );
      return { status: res.status, body: res.body };
    } catch (error) {
      return error instanceof HttpErrorResponse ? { status: error.status, body: error.error } : { status: 0, body: null };
    }
  }

  /** A fresh session answer (the interceptor keeps its CSRF token); null when the server cannot be reached. */
  async session(): Promise<StaffSession | null> {
    try {
      return await firstValueFrom(this.http.get<StaffSession>('/api/auth/session', { headers: { 'ngsw-bypass': '1' } }));
    } catch {
      return null;
    }
  }
}

export function isProgressView(body: unknown): body is JobProgressView {
  return typeof body === 'object' && body !== null && Array.isArray((body as { workItems?: unknown }).workItems);
}
