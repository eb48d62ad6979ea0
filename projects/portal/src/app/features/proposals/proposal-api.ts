import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { ItemList, PortalProposal, PortalProposalSummary, ProposalAcceptance, ProposalChangeRequest, ProposalDecline } from '@layerbook/contracts';

/** The client's own proposal versions: read, accept, ask for changes, decline. */
@Injectable({ providedIn: 'root' })
export class ProposalApi {
  private readonly http = inject(HttpClient);

  async list(): Promise<readonly PortalProposalSummary[]> {
    return (await firstValueFrom(this.http.get<ItemList<PortalProposalSummary>>('/api/portal/proposals'))).items;
  }

  get(id: string): Promise<PortalProposal> {
    return firstValueFrom(this.http.get<PortalProposal>(`/api/portal/proposals/${encodeURIComponent(id)}`));
  }

  accept(id: string, body: ProposalAcceptance): Promise<PortalProposal> {
    return firstValueFrom(this.http.post<PortalProposal>(`/api/portal/proposals/${encodeURIComponent(id)}/accept`, body));
  }

  requestChanges(id: string, body: ProposalChangeRequest): Promise<PortalProposal> {
    return firstValueFrom(this.http.post<PortalProposal>(`/api/portal/proposals/${encodeURIComponent(id)}/request-changes`, body));
  }

  decline(id: string, body: ProposalDecline): Promise<PortalProposal> {
    return firstValueFrom(this.http.post<PortalProposal>(`/api/portal/proposals/${encodeURIComponent(id)}/decline`, body));
  }

  pdfUrl(id: string): string {
    return `/api/portal/proposals/${encodeURIComponent(id)}/pdf`;
  }
}
