import type { ProposalVersionStatus } from './proposal-types';
import type { ProposalSnapshot } from './proposal-snapshot';

/** The newest proposal version the client can read for a project (never a draft). */
export interface PortalLatestProposal {
  readonly id: string;
  readonly version: number;
  readonly status: ProposalVersionStatus;
  readonly expiresOn: string;
  /** past its expiry day in the firm's calendar */
  readonly isExpired: boolean;
  readonly sentAt: string | null;
}

/** A change order the firm sent on the project's job, as the projects list names it (never a draft). */
export interface PortalChangeOrderLink {
  readonly id: string;
  readonly number: number;
  readonly title: string;
  readonly status: 'sent' | 'approved' | 'declined';
  /** what the contract sum moves by, tax included; negative deducts */
  readonly amount: string;
  readonly currency: string;
}

/** One estimate of the client's with a sent proposal: the portal's list ("your projects"). */
export interface PortalProposalSummary {
  readonly estimateId: string;
  readonly title: string;
  readonly siteAddress: string;
  readonly latest: PortalLatestProposal;
  /** the accepted job's change orders, those awaiting an answer first, then by number */
  readonly changeOrders: readonly PortalChangeOrderLink[];
}

/** A proposal version as its client reads it: the frozen snapshot plus where it stands. */
export interface PortalProposal {
  readonly id: string;
  readonly version: number;
  readonly status: ProposalVersionStatus;
  readonly expiresOn: string;
  /** past its expiry day in the firm's calendar */
  readonly isExpired: boolean;
  /** no newer version was sent for the same project */
  readonly isLatest: boolean;
  readonly snapshot: ProposalSnapshot;
  readonly decidedAt: string | null;
  /** the firm's time zone (IANA): the time it was decided is read in it, on the page as on the signed copy */
  readonly timeZone: string;
  readonly acceptedVariantId: string | null;
  /** the add-ons the client took with the option (empty: none, or not accepted) */
  readonly acceptedAddOnIds: readonly string[];
  readonly signedName: string | null;
  readonly clientComment: string;
}

/**
 * POST /api/portal/proposals/:id/accept: the signed version, and the deposit invoice issued and
 * e-mailed in the acceptance (the firm's billing setting "issue and send" and a deposit due on
 * acceptance) for the client to pay now; null when the firm drafts it for the office first.
 */
export interface PortalProposalAccepted extends PortalProposal {
  readonly depositInvoiceId: string | null;
}
