import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, firstValueFrom } from 'rxjs';
import type {
  ActivityCreate,
  BoardColumn,
  InquiryConvert,
  InquiryCreate,
  InquiryDetail,
  InquiryStage,
  InquirySummary,
  InquiryUpdate,
  Page,
} from '@layerbook/contracts';
import type { InquiryFilters } from './inquiry-filters';

@Injectable({ providedIn: 'root' })
export class InquiryApi {
  private readonly http = inject(HttpClient);

  /** An Observable, so a newer search can cancel an older one (switchMap). */
  list(filters: InquiryFilters, after: string | null = null): Observable<Page<InquirySummary>> {
    let params = new HttpParams().set('sort', filters.sort).set('limit', 50);
    for (const key of ['stage', 'source', 'assignee', 'q'] as const) {
      const value = filters[key];
      if (value) {
        params = params.set(key, value);
      }
    }
    if (after) {
      params = params.set('after', after);
    }
    return this.http.get<Page<InquirySummary>>('/api/inquiries', { params });
  }

  board(): Promise<BoardColumn[]> {
    return firstValueFrom(this.http.get<BoardColumn[]>('/api/inquiries/board'));
  }

  get(id: string): Promise<InquiryDetail> {
    return firstValueFrom(this.http.get<InquiryDetail>(`/api/inquiries/${encodeURIComponent(id)}`));
  }

  create(body: InquiryCreate): Promise<InquiryDetail> {
    return firstValueFrom(this.http.post<InquiryDetail>('/api/inquiries', body));
  }

  update(id: string, body: InquiryUpdate): Promise<InquiryDetail> {
    return firstValueFrom(this.http.patch<InquiryDetail>(`/api/inquiries/${encodeURIComponent(id)}`, body));
  }

  moveStage(id: string, stage: InquiryStage, lostReason?: string): Promise<InquiryDetail> {
    const body = stage === 'lost' ? { stage, lostReason } : { stage };
    return firstValueFrom(this.http.post<InquiryDetail>(`/api/inquiries/${encodeURIComponent(id)}/stage`, body));
  }

  addActivity(id: string, body: ActivityCreate): Promise<InquiryDetail> {
    return firstValueFrom(
      this.http.post<InquiryDetail>(`/api/inquiries/${encodeURIComponent(id)}/activities`, body),
    );
  }

  convert(id: string, body: InquiryConvert = {}): Promise<{ clientId: string; siteId: string | null }> {
    return firstValueFrom(
      this.http.post<{ clientId: string; siteId: string | null }>(
        `/api/inquiries/${encodeURIComponent(id)}/convert`,
        body,
      ),
    );
  }
}
