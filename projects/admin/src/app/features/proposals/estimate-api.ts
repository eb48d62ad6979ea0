import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, firstValueFrom } from 'rxjs';
import type { ClientDetail, ClientSummary, EstimateCreate, EstimateInputs, Page } from '@layerbook/contracts';
import type { EstimateContext } from '@layerbook/contracts/engine';
import type { ResultJson } from './result-json';

export type EstimateStatus = 'draft' | 'proposed' | 'accepted' | 'declined';

export interface EstimateListItem {
  readonly id: string;
  readonly title: string;
  readonly status: string;
  /** the first option's quoted price, a decimal string; null until first saved */
  readonly price: string | null;
  readonly siteId: string;
  readonly clientId: string;
  readonly clientName: string;
  readonly updatedAt: string;
}

export interface SavedOption {
  readonly id: string;
  readonly label: string;
  readonly result: ResultJson;
}

/** GET /api/estimates/:id: the office's choices, the server's numbers and what to recompute from. */
export interface EstimateView {
  readonly id: string;
  readonly siteId: string;
  readonly clientId: string;
  readonly inquiryId: string | null;
  readonly title: string;
  readonly status: string;
  readonly inputs: EstimateInputs;
  readonly result: { readonly variants: readonly SavedOption[] } | null;
  readonly price: string | null;
  readonly computedAt: string | null;
  readonly context: EstimateContext;
}

@Injectable({ providedIn: 'root' })
export class EstimateApi {
  private readonly http = inject(HttpClient);

  list(): Promise<{ items: EstimateListItem[] }> {
    return firstValueFrom(this.http.get<{ items: EstimateListItem[] }>('/api/estimates'));
  }

  get(id: string): Promise<EstimateView> {
    return firstValueFrom(this.http.get<EstimateView>(`/api/estimates/${encodeURIComponent(id)}`));
  }

  create(body: EstimateCreate): Promise<EstimateView> {
    return firstValueFrom(this.http.post<EstimateView>('/api/estimates', body));
  }

  saveInputs(id: string, inputs: EstimateInputs): Promise<EstimateView> {
    return firstValueFrom(this.http.put<EstimateView>(`/api/estimates/${encodeURIComponent(id)}/inputs`, inputs));
  }

  /** Client search for choosing where the work is. */
  findClients(q: string): Observable<Page<ClientSummary>> {
    return this.http.get<Page<ClientSummary>>('/api/clients', { params: new HttpParams().set('q', q.trim()).set('limit', 20) });
  }

  client(id: string): Promise<ClientDetail> {
    return firstValueFrom(this.http.get<ClientDetail>(`/api/clients/${encodeURIComponent(id)}`));
  }
}
