import type { ProposalVersionStatus } from '@layerbook/contracts';

export interface StatusLook {
  readonly word: string;
  /** an icon beside the word, so a status never reads by colour alone */
  readonly icon: string;
}

export const VERSION_STATUS = {
  draft: { word: 'Draft', icon: 'edit_note' },
  sent: { word: 'Sent', icon: 'outgoing_mail' },
  accepted: { word: 'Accepted', icon: 'handshake' },
  declined: { word: 'Declined', icon: 'block' },
  changes_requested: { word: 'Changes asked for', icon: 'rate_review' },
  superseded: { word: 'Replaced by a newer version', icon: 'history' },
} as const satisfies Record<ProposalVersionStatus, StatusLook>;

export function versionStatus(status: string): StatusLook {
  return (VERSION_STATUS as Record<string, StatusLook>)[status] ?? { word: status.replace(/_/g, ' '), icon: 'help' };
}

/** The terms wording a new proposal starts from; the office edits it freely. */
export const DEFAULT_TERMS_TEXT =
  'Deposit due on acceptance; progress payment when the base coats are done; the balance on completion.';

export const DEFAULT_EXCLUSIONS = ['Repairs to the plaster beneath', 'Moving furniture'];

/** How long a new offer stands unless the office says otherwise. */
export const DEFAULT_VALID_DAYS = 30;
