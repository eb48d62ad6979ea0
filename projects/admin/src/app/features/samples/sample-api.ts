import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { ClientSummary, KeysetPage, SampleBoardCreate, SampleBoardUpdate, SampleBoardView } from '@layerbook/contracts/types';
import { Observable, firstValueFrom } from 'rxjs';

const id = (value: string) => encodeURIComponent(value);

/** Where the sample-board reads live, for the components' httpResource calls. */
export const SAMPLES_URL = '/api/samples';
export const boardUrl = (boardId: string) => `${SAMPLES_URL}/${id(boardId)}`;
export const boardPhotosUrl = (boardId: string) => `${boardUrl(boardId)}/photos`;
/** DELETE `${BOARD_PHOTO_BASE}/:photoId` */
export const BOARD_PHOTO_BASE = `${SAMPLES_URL}/photos`;
export const FINISH_SYSTEMS_URL = '/api/library/systems';

/** The writes of /api/samples, plus the client look-ups the new-board form needs. */
@Injectable({ providedIn: 'root' })
export class SampleApi {
  private readonly http = inject(HttpClient);

  create(body: SampleBoardCreate): Promise<SampleBoardView> {
    return firstValueFrom(this.http.post<SampleBoardView>(SAMPLES_URL, body));
  }

  update(boardId: string, body: SampleBoardUpdate): Promise<SampleBoardView> {
    return firstValueFrom(this.http.patch<SampleBoardView>(boardUrl(boardId), body));
  }

  show(boardId: string): Promise<SampleBoardView> {
    return firstValueFrom(this.http.post<SampleBoardView>(`${boardUrl(boardId)}/show`, {}));
  }

  startNextRound(boardId: string): Promise<SampleBoardView> {
    return firstValueFrom(this.http.post<SampleBoardView>(`${boardUrl(boardId)}/next-round`, {}));
  }

  searchClients(q: string): Observable<KeysetPage<ClientSummary>> {
    return this.http.get<KeysetPage<ClientSummary>>('/api/clients', { params: new HttpParams().set('limit', 20).set('q', q.trim()) });
  }
}
