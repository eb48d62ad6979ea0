import { z } from 'zod';
import { isoDate, requiredText, text, uuid } from '../common/fields';

const percent = (label: string) =>
  z
    .number({ error: `Enter ${label} as a whole percentage.` })
    .int({ error: 'Use a whole percentage.' })
    .min(0, { error: 'Cannot be negative.' })
    .max(100, { error: 'At most 100 %.' });

/**
 * How the client pays, as the office chooses it: a deposit on acceptance, a progress payment when
 * the base layers are finished everywhere, and the rest on completion. Missing values take the
 * defaults (30 % and 40 %); the engine turns them into amounts per option.
 */
export const proposalTerms = z.strictObject({
  depositPercent: percent('the deposit'),
  progressPercent: percent('the progress payment'),
  /** free wording printed under "Terms" (due dates, cancellation right, warranty) */
  text: text(4000, 'The terms'),
});
export type ProposalTerms = z.infer<typeof proposalTerms>;

export const DEFAULT_PROPOSAL_TERMS: ProposalTerms = { depositPercent: 30, progressPercent: 40, text: '' };

const exclusions = z.array(requiredText(300, 'Write the exclusion or remove the line.')).max(30, { error: 'At most 30 exclusions.' });

export const proposalCreate = z.strictObject({
  estimateId: uuid('estimate id'),
  /** the offer stands until this day (firm's calendar), which must be after today */
  expiresOn: isoDate,
  terms: proposalTerms.partial().optional(),
  exclusions: exclusions.optional(),
  notes: text(4000, 'The notes').optional(),
});
export type ProposalCreate = z.infer<typeof proposalCreate>;

/** Only a draft can change; a sent version is frozen and a change is a new version. */
export const proposalUpdate = z.strictObject({
  expiresOn: isoDate.optional(),
  terms: proposalTerms.partial().optional(),
  exclusions: exclusions.optional(),
  notes: text(4000, 'The notes').optional(),
});
export type ProposalUpdate = z.infer<typeof proposalUpdate>;

export const proposalListQuery = z.strictObject({ estimateId: uuid('estimate id').optional() });

export const PROPOSAL_VERSION_STATUSES = ['draft', 'sent', 'accepted', 'declined', 'changes_requested', 'superseded'] as const;
export type ProposalVersionStatus = (typeof PROPOSAL_VERSION_STATUSES)[number];
