import { z } from 'zod';
import { requiredText, text } from '../common/fields';
import { ESTIMATE_INPUT_LIMITS } from './estimate-types';
import {
  PROPOSAL_COMMENT_MAX,
  SIGNED_NAME_MAX,
  SIGNED_NAME_MIN,
  type ProposalAcceptance,
  type ProposalChangeRequest,
  type ProposalDecline,
} from './proposal-types';

const CHOOSE_ADD_ONS = 'Choose add-ons from this proposal.';

/**
 * The client's answer to a sent proposal in the portal. Acceptance is a typed signature: the
 * option chosen, the add-ons taken with it, the client's full name as they type it, and an explicit tick of consent.
 */
export const proposalAcceptance = z.strictObject({
  variantId: z.string({ error: 'Choose an option.' }).trim().min(1, { error: 'Choose an option.' }).max(60, { error: 'Choose an option.' }),
  addOnIds: z
    .array(z.string({ error: CHOOSE_ADD_ONS }).max(ESTIMATE_INPUT_LIMITS.shortIdMax, { error: CHOOSE_ADD_ONS }), { error: CHOOSE_ADD_ONS })
    .max(ESTIMATE_INPUT_LIMITS.addOnsMax, { error: CHOOSE_ADD_ONS })
    .optional(),
  signedName: z
    .string({ error: 'Type your full name to sign.' })
    .trim()
    .min(SIGNED_NAME_MIN, { error: `Type your full name to sign (at least ${SIGNED_NAME_MIN} characters).` })
    .max(SIGNED_NAME_MAX, { error: `Use at most ${SIGNED_NAME_MAX} characters.` }),
  consent: z.literal(true, { error: 'Tick the box to confirm you accept this proposal.' }),
}) satisfies z.ZodType<ProposalAcceptance>;

export const proposalDecline = z.strictObject({
  comment: text(PROPOSAL_COMMENT_MAX, 'The comment').optional(),
}) satisfies z.ZodType<ProposalDecline>;

export const proposalChangeRequest = z.strictObject({
  comment: requiredText(PROPOSAL_COMMENT_MAX, 'Say what you would like changed.'),
}) satisfies z.ZodType<ProposalChangeRequest>;
