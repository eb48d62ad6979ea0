import { z } from 'zod';
import { requiredText, text } from '../common/fields';

/**
 * The client's answer to a sent proposal in the portal. Acceptance is a typed signature: the
 * option chosen, the client's full name as they type it, and an explicit tick of consent.
 */
export const proposalAcceptance = z.strictObject({
  variantId: z.string({ error: 'Choose an option.' }).trim().min(1, { error: 'Choose an option.' }).max(60, { error: 'Choose an option.' }),
  signedName: z
    .string({ error: 'Type your full name to sign.' })
    .trim()
    .min(2, { error: 'Type your full name to sign (at least 2 characters).' })
    .max(120, { error: 'Use at most 120 characters.' }),
  consent: z.literal(true, { error: 'Tick the box to confirm you accept this proposal.' }),
});
export type ProposalAcceptance = z.infer<typeof proposalAcceptance>;

export const proposalDecline = z.strictObject({
  comment: text(2000, 'The comment').optional(),
});
export type ProposalDecline = z.infer<typeof proposalDecline>;

export const proposalChangeRequest = z.strictObject({
  comment: requiredText(2000, 'Say what you would like changed.'),
});
export type ProposalChangeRequest = z.infer<typeof proposalChangeRequest>;
