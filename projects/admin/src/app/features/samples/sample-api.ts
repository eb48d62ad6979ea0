import { HttpClient, HttpEvent, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { ClientDetail, ClientSummary, FinishSystemSummary, Page } from '@layerbook/contracts';
import { Observable, firstValueFrom } from 'rxjs';
import type { BoardPhoto, SampleBoard, SampleBoardCreate, SampleBoardListItem } from './sample-board';

const id = (value: string) => encodeURIComponent(value);

/** /api/samples, plus the few client and library look-ups the new-board form needs. */
@Injectable({ providedIn: 'root' })
export class SampleApi {
  private readonly http = inject(HttpClient);

  list(filter: { clientId?: string } = {}): Promise<SampleBoardListItem[]> {
    const params = filter.clientId ? new HttpParams().set('clientId', filter.clientId) : undefined;
    return firstValueFrom(this.http.get<SampleBoardListItem[]>('/api/samples', { params }));
  }

  get(boardId: string): Promise<SampleBoard> {
    return firstValueFrom(this.http.get<SampleBoard>(`/api/samples/${id(boardId)}`));
  }

  create(body: SampleBoardCreate): Promise<SampleBoard> {
    return firstValueFrom(this.http.post<SampleBoard>('/api/samples', body));
  }

  update(boardId: string, body: { label?: string; notes?: string }): Promise<SampleBoard> {
    return firstValueFrom(this.http.patch<SampleBoard>(`/api/samples/${id(boardId)}`, body));
  }

  show(boardId: string): Promise<SampleBoard> {
    return firstValueFrom(this.http.post<SampleBoard>(`/api/samples/${id(boardId)}/show`, {}));
  }

  startNextRound(boardId: string): Promise<SampleBoard> {
    return firstValueFrom(this.http.post<SampleBoard>(`/api/samples/${id(boardId)}/next-round`, {}));
  }

  /** Every HTTP event, so the caller can show upload progress; the last one carries the photo. */
  uploadPhoto(boardId: string, file: File): Observable<HttpEvent<BoardPhoto>> {
    const form = new FormData();
    form.append('file', file, file.name);
    return this.http.post<BoardPhoto>(`/api/samples/${id(boardId)}/photos`, form, { reportProgress: true, observe: 'events' });
  }

  deletePhoto(photoId: string): Promise<unknown> {
    return firstValueFrom(this.http.delete(`/api/samples/photos/${id(photoId)}`));
  }

  searchClients(q: string): Observable<Page<ClientSummary>> {
    return this.http.get<Page<ClientSummary>>('/api/clients', { params: new HttpParams().set('limit', 20).set('q', q.trim()) });
  }

  client(clientId: string): Promise<ClientDetail> {
    return firstValueFrom(this.http.get<ClientDetail>(`/api/clients/${id(clientId)}`));
  }

  finishSystems(): Promise<FinishSystemSummary[]> {
    return firstValueFrom(this.http.get<FinishSystemSummary[]>('/api/library/systems'));
  }
}
