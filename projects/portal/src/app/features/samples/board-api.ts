import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { ClientBoardView, SampleChangeRequest } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';

/** The signed-in client's boards (GET, `{ items }`) and one of them, for the pages' httpResource reads. */
export const BOARDS_URL = '/api/portal/boards';
export const boardUrl = (boardId: string) => `${BOARDS_URL}/${encodeURIComponent(boardId)}`;

/** The client's one answer per board: approve it, or ask for changes. */
@Injectable({ providedIn: 'root' })
export class BoardApi {
  private readonly http = inject(HttpClient);

  approve(boardId: string): Promise<ClientBoardView> {
    return firstValueFrom(this.http.post<ClientBoardView>(`${boardUrl(boardId)}/approve`, {}));
  }

  requestChanges(boardId: string, body: SampleChangeRequest): Promise<ClientBoardView> {
    return firstValueFrom(this.http.post<ClientBoardView>(`${boardUrl(boardId)}/request-changes`, body));
  }
}
