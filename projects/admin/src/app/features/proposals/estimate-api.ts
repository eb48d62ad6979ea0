import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, firstValueFrom } from 'rxjs';
import type {
  ClientDetail,
  ClientSummary,
  EstimateCreate,
  EstimateInputs,
  EstimateSave,
  EstimateView,
  InquiryDetail,
  KeysetPage,
} from '@layerbook/contracts/types';

/** GET: newest first, one keyset page at a time (`?after=` the previous page's nextCursor). */
export const ESTIMATES_URL = '/api/estimates';

const estimateUrl = (id: string) => `${ESTIMATES_URL}/${encodeURIComponent(id)}`;

@Injectable({ providedIn: 'root' })
export class EstimateApi {
  private readonly http = inject(HttpClient);

  get(id: string): Promise<EstimateView> {
    return firstValueFrom(this.http.get<EstimateView>(estimateUrl(id)));
  }

  create(body: EstimateCreate): Promise<EstimateView> {
    return firstValueFrom(this.http.post<EstimateView>(ESTIMATES_URL, body));
  }

  /** `computedAt`: the last save this copy was loaded from (null before the first); another save since answers 409. */
  saveInputs(id: string, inputs: EstimateInputs, computedAt: string | null): Promise<EstimateView> {
    const body: EstimateSave = { ...inputs, computedAt };
    return firstValueFrom(this.http.put<EstimateView>(`${estimateUrl(id)}/inputs`, body));
  }

  /** Client search for choosing where the work is. */
  findClients(q: string): Observable<KeysetPage<ClientSummary>> {
    return this.http.get<KeysetPage<ClientSummary>>('/api/clients', { params: new HttpParams().set('q', q.trim()).set('limit', 20) });
  }

  /** The inquiry an estimate is started from (its client and site, once filed). */
  inquiry(id: string): Promise<InquiryDetail> {
    return firstValueFrom(this.http.get<InquiryDetail>(`/api/inquiries/${encodeURIComponent(id)}`));
  }

  client(id: string): Promise<ClientDetail> {
    return firstValueFrom(this.http.get<ClientDetail>(`/api/clients/${encodeURIComponent(id)}`));
  }
}
