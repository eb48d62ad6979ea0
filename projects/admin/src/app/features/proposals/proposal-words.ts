import { PROPOSAL_VERSION_STATUS_LABELS, type ProposalVersionStatus } from '@layerbook/contracts/types';

export interface StatusLook {
  readonly word: string;
  /** an icon beside the word, so a status never reads by colour alone */
  readonly icon: string;
}

const VERSION_ICONS: Readonly<Record<ProposalVersionStatus, string>> = {
  draft: 'edit_note',
  sent: 'outgoing_mail',
  accepted: 'handshake',
  declined: 'block',
  changes_requested: 'rate_review',
  superseded: 'history',
};

/** A version's state in the contract's words, with its icon. */
export function versionStatus(status: ProposalVersionStatus): StatusLook {
  return { word: PROPOSAL_VERSION_STATUS_LABELS[status], icon: VERSION_ICONS[status] };
}

/**
 * The terms wording a new proposal starts from; the office edits it freely. The progress payment
 * is said as its payment line says it (the layer the schedule waits for), not as "the base coats".
 */
export const DEFAULT_TERMS_TEXT =
  'Deposit due on acceptance; progress payment when the layer named in the payment schedule is finished on every surface; the balance on completion.';

/** The hint beside the progress payment field, in the same words as the payment line. */
export const PROGRESS_PAYMENT_HINT = 'When the layer named in each payment schedule is finished everywhere. The rest is due on completion.';

export const DEFAULT_EXCLUSIONS = ['Repairs to the plaster beneath', 'Moving furniture'];

/** How long a new offer stands unless the office says otherwise. */
export const DEFAULT_VALID_DAYS = 30;
