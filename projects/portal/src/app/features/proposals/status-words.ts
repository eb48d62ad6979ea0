import type { ProposalVersionStatus } from '@layerbook/contracts';

/** How the client reads a proposal's state: plain words, always shown as text (never colour alone). */
export const PROPOSAL_STATUS_WORDS: Record<ProposalVersionStatus, string> = {
  draft: 'Being prepared',
  sent: 'Waiting for your answer',
  accepted: 'Accepted',
  declined: 'Declined',
  changes_requested: 'Changes asked for',
  superseded: 'Replaced by a newer version',
};
