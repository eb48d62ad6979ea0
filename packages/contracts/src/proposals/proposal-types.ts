/**
 * The zod-free half of proposal versions: statuses with their words, field limits, the terms and
 * the bodies the admin app sends. The zod schemas in `proposal.ts` are checked against these.
 */

export const PROPOSAL_VERSION_STATUSES = ['draft', 'sent', 'accepted', 'declined', 'changes_requested', 'superseded'] as const;
export type ProposalVersionStatus = (typeof PROPOSAL_VERSION_STATUSES)[number];

/** How the office reads a version's state. */
export const PROPOSAL_VERSION_STATUS_LABELS: Readonly<Record<ProposalVersionStatus, string>> = {
  draft: 'Draft',
  sent: 'Sent',
  accepted: 'Accepted',
  declined: 'Declined',
  changes_requested: 'Changes asked for',
  superseded: 'Replaced by a newer version',
};

/** How the client reads the same state in the portal, where the answer is theirs to give. */
export const PROPOSAL_CLIENT_STATUS_LABELS: Readonly<Record<ProposalVersionStatus, string>> = {
  draft: 'Being prepared',
  sent: 'Waiting for your answer',
  accepted: 'Accepted',
  declined: 'Declined',
  changes_requested: 'Changes asked for',
  superseded: 'Replaced by a newer version',
};

/** Terms wording and notes. */
export const PROPOSAL_TEXT_MAX = 4000;
export const PROPOSAL_EXCLUSION_MAX = 300;
export const PROPOSAL_EXCLUSIONS_MAX = 30;
/** What a client may write when declining or asking for changes. */
export const PROPOSAL_COMMENT_MAX = 2000;
export const SIGNED_NAME_MIN = 2;
export const SIGNED_NAME_MAX = 120;

/**
 * How the client pays, as the office chooses it: a deposit on acceptance, a progress payment when
 * the base layers are finished everywhere, and the rest on completion (whole percentages).
 */
export interface ProposalTerms {
  readonly depositPercent: number;
  readonly progressPercent: number;
  /** free wording printed under "Terms" (due dates, cancellation right, warranty) */
  readonly text: string;
}

export const DEFAULT_PROPOSAL_TERMS: ProposalTerms = { depositPercent: 30, progressPercent: 40, text: '' };

/** POST /api/proposals: version N+1 of an estimate's proposal, as a draft. */
export interface ProposalCreate {
  readonly estimateId: string;
  /** the offer stands until this day (firm's calendar), which must be after today */
  readonly expiresOn: string;
  readonly terms?: Partial<ProposalTerms>;
  readonly exclusions?: string[];
  readonly notes?: string;
}

/** PATCH /api/proposals/:id: only a draft can change. */
export interface ProposalUpdate {
  readonly expiresOn?: string;
  readonly terms?: Partial<ProposalTerms>;
  readonly exclusions?: string[];
  readonly notes?: string;
}

/** The client's typed signature on one option, with the add-ons they take (none when absent). */
export interface ProposalAcceptance {
  readonly variantId: string;
  readonly addOnIds?: readonly string[];
  readonly signedName: string;
  readonly consent: true;
}

export interface ProposalDecline {
  readonly comment?: string;
}

export interface ProposalChangeRequest {
  readonly comment: string;
}
