import { z } from 'zod';
import { requiredText, text, uuid } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import { SIGNED_NAME_MAX, SIGNED_NAME_MIN } from '../proposals/proposal-types';
import {
  CHANGE_ORDER_LIMITS as L,
  SIGNED_MONEY_PATTERN,
  type ChangeOrderCreate,
  type ChangeOrderDecision,
  type ChangeOrderPricing,
  type ChangeOrderUpdate,
} from './change-order-types';

/** Signed: a change order adds or deducts; zero moves nothing, so it is refused. */
const signedPrice = z
  .string({ error: 'Enter an amount, like 1250.00 (or -250.00 to deduct).' })
  .trim()
  .regex(SIGNED_MONEY_PATTERN, { error: 'Enter an amount with at most two decimals, like 1250.00 (or -250.00 to deduct).', abort: true })
  .refine((v) => !/^-?0*(\.0*)?$/.test(v), { error: 'Enter an amount other than zero.' });

const pricing = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('lumpSum'), price: signedPrice }),
    z.strictObject({
      kind: z.literal('engine'),
      surfaceIds: z
        .array(uuid('surface id'))
        .min(1, { error: 'Choose at least one surface.' })
        .max(L.surfacesMax, { error: `Choose at most ${L.surfacesMax} surfaces.` })
        .readonly(),
      finishSystemId: uuid('finish system id'),
    }),
  ],
  { error: 'Choose a lump sum or pricing from surfaces.' },
) satisfies z.ZodType<ChangeOrderPricing>;

const title = requiredText(L.titleMaxLength, 'Give the change order a title.');
const description = text(L.descriptionMaxLength, 'The description');

/** POST /api/jobs/:id/change-orders */
export const changeOrderCreate = requestSchema<ChangeOrderCreate>()(
  z.strictObject({ title, description: description.default(''), pricing }),
);

/** PATCH /api/change-orders/:id — no defaults, so a field left out stays as it is. */
export const changeOrderUpdate = requestSchema<ChangeOrderUpdate>()(
  z.strictObject({ title: title.optional(), description: description.optional(), pricing: pricing.optional() }),
);

/** The client's answer in the portal: approval is a typed signature with a ticked box, as for a proposal. */
export const changeOrderDecision = requestSchema<ChangeOrderDecision>()(
  z.discriminatedUnion(
    'decision',
    [
      z.strictObject({
        decision: z.literal('approve'),
        signedName: z
          .string({ error: 'Type your full name to sign.' })
          .trim()
          .min(SIGNED_NAME_MIN, { error: `Type your full name to sign (at least ${SIGNED_NAME_MIN} characters).` })
          .max(SIGNED_NAME_MAX, { error: `Use at most ${SIGNED_NAME_MAX} characters.` }),
        consent: z.literal(true, { error: 'Tick the box to confirm you approve this change.' }),
        comment: text(L.commentMaxLength, 'The comment').optional(),
      }),
      z.strictObject({ decision: z.literal('decline'), comment: text(L.commentMaxLength, 'The comment').optional() }),
    ],
    { error: 'Choose to approve or decline.' },
  ),
);
