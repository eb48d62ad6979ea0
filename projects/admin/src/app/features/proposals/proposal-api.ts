import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { ItemList, ProposalCreate, ProposalUpdate, ProposalVersionSummary, ProposalVersionView } from '@layerbook/contracts/types';

/** Proposal versions of an estimate: drafts made from its saved numbers, frozen once sent. */
@Injectable({ providedIn: 'root' })
export class ProposalApi {
  private readonly http = inject(HttpClient);

  list(estimateId: string): Promise<ItemList<ProposalVersionSummary>> {
    const params = new HttpParams().set('estimateId', estimateId);
    return firstValueFrom(this.http.get<ItemList<ProposalVersionSummary>>('/api/proposals', { params }));
  }

  get(id: string): Promise<ProposalVersionView> {
    return firstValueFrom(this.http.get<ProposalVersionView>(`/api/proposals/${encodeURIComponent(id)}`));
  }

  create(body: ProposalCreate): Promise<ProposalVersionView> {
    return firstValueFrom(this.http.post<ProposalVersionView>('/api/proposals', body));
  }

  update(id: string, body: ProposalUpdate): Promise<ProposalVersionView> {
    return firstValueFrom(this.http.patch<ProposalVersionView>(`/api/proposals/${encodeURIComponent(id)}`, body));
  }

  send(id: string): Promise<ProposalVersionView> {
    return firstValueFrom(this.http.post<ProposalVersionView>(`/api/proposals/${encodeURIComponent(id)}/send`, {}));
  }

  /** A plain link: the browser downloads the attachment with the session cookie. */
  pdfHref(id: string): string {
    return `/api/proposals/${encodeURIComponent(id)}/pdf`;
  }
}
