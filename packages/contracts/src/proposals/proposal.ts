import { z } from 'zod';
import { isoDate, requiredText, text, uuid } from '../common/fields';
import {
  PROPOSAL_EXCLUSION_MAX,
  PROPOSAL_EXCLUSIONS_MAX,
  PROPOSAL_TEXT_MAX,
  type ProposalCreate,
  type ProposalTerms,
  type ProposalUpdate,
} from './proposal-types';

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
  text: text(PROPOSAL_TEXT_MAX, 'The terms'),
}) satisfies z.ZodType<ProposalTerms>;

const exclusions = z
  .array(requiredText(PROPOSAL_EXCLUSION_MAX, 'Write the exclusion or remove the line.'))
  .max(PROPOSAL_EXCLUSIONS_MAX, { error: `At most ${PROPOSAL_EXCLUSIONS_MAX} exclusions.` });

export const proposalCreate = z.strictObject({
  estimateId: uuid('estimate id'),
  /** the offer stands until this day (firm's calendar), which must be after today */
  expiresOn: isoDate,
  terms: proposalTerms.partial().optional(),
  exclusions: exclusions.optional(),
  notes: text(PROPOSAL_TEXT_MAX, 'The notes').optional(),
}) satisfies z.ZodType<ProposalCreate>;

/** Only a draft can change; a sent version is frozen and a change is a new version. */
export const proposalUpdate = z.strictObject({
  expiresOn: isoDate.optional(),
  terms: proposalTerms.partial().optional(),
  exclusions: exclusions.optional(),
  notes: text(PROPOSAL_TEXT_MAX, 'The notes').optional(),
}) satisfies z.ZodType<ProposalUpdate>;

export const proposalListQuery = z.strictObject({ estimateId: uuid('estimate id').optional() });
