import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type {
  PortalProposal,
  PortalProposalAccepted,
  ProposalAcceptance,
  ProposalChangeRequest,
  ProposalDecline,
} from '@layerbook/contracts/types';

/** The client's proposals (GET, `{ items }`) and one of them, for the pages' httpResource reads. */
export const PROPOSALS_URL = '/api/portal/proposals';
export const proposalUrl = (id: string) => `${PROPOSALS_URL}/${encodeURIComponent(id)}`;

/** The client's answers to a proposal version: accept, ask for changes, decline; and its PDF. */
@Injectable({ providedIn: 'root' })
export class ProposalApi {
  private readonly http = inject(HttpClient);

  /** The signed version, with the deposit invoice when the firm issues it at acceptance. */
  accept(id: string, body: ProposalAcceptance): Promise<PortalProposalAccepted> {
    return firstValueFrom(this.http.post<PortalProposalAccepted>(`${proposalUrl(id)}/accept`, body));
  }

  requestChanges(id: string, body: ProposalChangeRequest): Promise<PortalProposal> {
    return firstValueFrom(this.http.post<PortalProposal>(`${proposalUrl(id)}/request-changes`, body));
  }

  decline(id: string, body: ProposalDecline): Promise<PortalProposal> {
    return firstValueFrom(this.http.post<PortalProposal>(`${proposalUrl(id)}/decline`, body));
  }

  pdfUrl(id: string): string {
    return `${proposalUrl(id)}/pdf`;
  }

  /** The signed copy (the PDF with the acceptance record), once the proposal is accepted. */
  signedPdfUrl(id: string): string {
    return `${proposalUrl(id)}/signed-pdf`;
  }
}
