import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { ClientBoard } from './client-board';

const id = (value: string) => encodeURIComponent(value);

/** The signed-in client's sample boards: list, read, approve, ask for changes. */
@Injectable({ providedIn: 'root' })
export class BoardApi {
  private readonly http = inject(HttpClient);

  async list(): Promise<readonly ClientBoard[]> {
    return (await firstValueFrom(this.http.get<{ boards: ClientBoard[] }>('/api/portal/boards'))).boards;
  }

  get(boardId: string): Promise<ClientBoard> {
    return firstValueFrom(this.http.get<ClientBoard>(`/api/portal/boards/${id(boardId)}`));
  }

  approve(boardId: string): Promise<ClientBoard> {
    return firstValueFrom(this.http.post<ClientBoard>(`/api/portal/boards/${id(boardId)}/approve`, {}));
  }

  requestChanges(boardId: string, comment: string): Promise<ClientBoard> {
    return firstValueFrom(this.http.post<ClientBoard>(`/api/portal/boards/${id(boardId)}/request-changes`, { comment }));
  }
}
