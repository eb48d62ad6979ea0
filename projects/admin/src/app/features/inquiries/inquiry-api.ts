import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type {
  ActivityCreate,
  InquiryConversion,
  InquiryConvert,
  InquiryCreate,
  InquiryDetail,
  InquiryStage,
  InquiryUpdate,
  StageMove,
} from '@layerbook/contracts/types';

/** The inquiry changes; reads are resources in the pages that show them. */
@Injectable({ providedIn: 'root' })
export class InquiryApi {
  private readonly http = inject(HttpClient);

  create(body: InquiryCreate): Promise<InquiryDetail> {
    return firstValueFrom(this.http.post<InquiryDetail>('/api/inquiries', body));
  }

  update(id: string, body: InquiryUpdate): Promise<InquiryDetail> {
    return firstValueFrom(this.http.patch<InquiryDetail>(inquiryUrl(id), body));
  }

  moveStage(id: string, stage: InquiryStage, lostReason?: string): Promise<InquiryDetail> {
    const body: StageMove = stage === 'lost' ? { stage, lostReason } : { stage };
    return firstValueFrom(this.http.post<InquiryDetail>(`${inquiryUrl(id)}/stage`, body));
  }

  addActivity(id: string, body: ActivityCreate): Promise<InquiryDetail> {
    return firstValueFrom(this.http.post<InquiryDetail>(`${inquiryUrl(id)}/activities`, body));
  }

  convert(id: string, body: InquiryConvert = {}): Promise<InquiryConversion> {
    return firstValueFrom(this.http.post<InquiryConversion>(`${inquiryUrl(id)}/convert`, body));
  }
}

export function inquiryUrl(id: string): string {
  return `/api/inquiries/${encodeURIComponent(id)}`;
}
