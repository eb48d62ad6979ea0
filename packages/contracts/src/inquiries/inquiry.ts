import { z } from 'zod';
import { email } from '../auth/fields';
import { clientCreate, siteCreate } from '../clients/client';
import { PHONE_MAX_LENGTH } from '../common/field-limits';
import { isoDate, moneyAmount, pageQuery, requiredText, text, uuid, yearBuilt } from '../common/fields';
import { SEARCH_MAX_LENGTH } from '../common/lists';
import { requestSchema } from '../common/schema-check';
import {
  BUDGET_RANGES,
  INQUIRY_LIMITS as L,
  INQUIRY_SORTS,
  INQUIRY_SOURCES,
  INQUIRY_STAGES,
  isReferralSource,
  LOGGED_ACTIVITY_KINDS,
  PUBLIC_SOURCES,
  UNASSIGNED,
  type ActivityCreate,
  type InquiryConvert,
  type InquiryCreate,
  type InquiryStage,
  type InquiryUpdate,
  type PublicInquiryRequest,
  type StageLikelihoodUpdate,
  type StageMove,
} from './inquiry-types';

const phone = text(PHONE_MAX_LENGTH, 'Phone');
const budgetRange = z.enum(BUDGET_RANGES, { error: 'Choose a budget range from the list.' });

/** The public inquiry form. `website` is a honeypot; `startedAt` a signed stamp from the page, `renewedFrom` the one it replaced. */
export const publicInquiryRequest = requestSchema<PublicInquiryRequest>()(
  z
    .strictObject({
      name: requiredText(L.contactName, 'Enter your name.'),
      email,
      phone,
      siteAddress: requiredText(L.siteAddress, 'Enter the address of the place to be finished.'),
      yearBuilt: z.union([yearBuilt, z.literal('')]).optional(),
      // a JSON boolean (the page's plain form post turns its checkbox into one: public-routes.ts); "false" is no yes
      yearBuiltUnknown: z.boolean({ error: 'Tick "Not sure" or leave it.' }).optional(),
      rooms: requiredText(L.rooms, 'Tell us which rooms and surfaces.'),
      finishIdea: text(L.finishIdea),
      timeline: text(L.timeline),
      budgetRange: budgetRange.default(''),
      heardFrom: z.enum(PUBLIC_SOURCES, { error: 'Choose how you heard of us.' }),
      referrerName: text(L.referrerName),
      consent: z.literal(true, { error: 'Tick the box so we may contact you about this inquiry.' }),
      website: z.string().max(200).optional(),
      startedAt: z.string().max(200).optional(),
      renewedFrom: z.string().max(200).optional(),
    })
    .superRefine((v, ctx) => {
      if (isReferralSource(v.heardFrom) && !v.referrerName) {
        ctx.addIssue({ code: 'custom', path: ['referrerName'], message: 'Tell us who referred you, so we can thank them.' });
      }
      if ((v.yearBuilt === undefined || v.yearBuilt === '') && !v.yearBuiltUnknown) {
        ctx.addIssue({ code: 'custom', path: ['yearBuilt'], message: 'Enter the year the building was built, or tick "Not sure".' });
      }
    }),
);

/** Inquiry fields as staff edit them; no defaults here, so a partial update never blanks a field. */
const inquiryFields = {
  contactName: requiredText(L.contactName, 'Enter the contact name.'),
  email: z.union([email, z.literal('')]),
  phone,
  siteAddress: text(L.siteAddress),
  yearBuilt: yearBuilt.nullable(),
  rooms: text(L.rooms),
  finishIdea: text(L.finishIdea),
  timeline: text(L.timeline),
  budgetRange,
  source: z.enum(INQUIRY_SOURCES, { error: 'Choose where the inquiry came from.' }),
  referrerName: text(L.referrerName),
  estimatedValue: moneyAmount.nullable(),
  assigneeUserId: uuid('person').nullable(),
  nextFollowUp: isoDate.nullable(),
};

/** Staff log an inquiry from a call or a referral. */
export const inquiryCreate = requestSchema<InquiryCreate>()(
  z.strictObject({
    ...inquiryFields,
    email: inquiryFields.email.default(''),
    phone: phone.default(''),
    siteAddress: inquiryFields.siteAddress.default(''),
    yearBuilt: inquiryFields.yearBuilt.default(null),
    rooms: inquiryFields.rooms.default(''),
    finishIdea: inquiryFields.finishIdea.default(''),
    timeline: inquiryFields.timeline.default(''),
    budgetRange: inquiryFields.budgetRange.default(''),
    referrerName: inquiryFields.referrerName.default(''),
    estimatedValue: inquiryFields.estimatedValue.default(null),
    assigneeUserId: inquiryFields.assigneeUserId.default(null),
    nextFollowUp: inquiryFields.nextFollowUp.default(null),
  }),
);

export const inquiryUpdate = requestSchema<InquiryUpdate>()(z.strictObject(inquiryFields).partial());

export const stageMove = requestSchema<StageMove>()(
  z
    .strictObject({
      stage: z.enum(INQUIRY_STAGES, { error: 'Choose a stage from the list.' }),
      lostReason: text(L.lostReason).optional(),
    })
    .superRefine((v, ctx) => {
      if (v.stage === 'lost' && !v.lostReason) {
        ctx.addIssue({ code: 'custom', path: ['lostReason'], message: 'Say why it was lost; it helps pricing later.' });
      }
    }),
);

export const activityCreate = requestSchema<ActivityCreate>()(
  z.strictObject({
    kind: z.enum(LOGGED_ACTIVITY_KINDS, { error: 'Choose note, call or e-mail.' }),
    body: requiredText(L.activityBody, 'Write what happened.'),
  }),
);

export const inquiryListQuery = z.strictObject({
  stage: z.enum(INQUIRY_STAGES, { error: 'Unknown stage.' }).optional(),
  source: z.enum(INQUIRY_SOURCES, { error: 'Unknown source.' }).optional(),
  assignee: z.union([uuid('person'), z.literal(UNASSIGNED)]).optional(),
  q: z
    .string()
    .trim()
    .max(SEARCH_MAX_LENGTH, { error: `Search with at most ${SEARCH_MAX_LENGTH} characters.` })
    .optional(),
  sort: z.enum(INQUIRY_SORTS, { error: 'Unknown sort.' }).default('newest'),
  ...pageQuery,
});
export type InquiryListQuery = z.infer<typeof inquiryListQuery>;

// A JSON number, never coerced (null, "" and false are not 0 %), with at most two decimals as the column keeps them.
const likelihood = z
  .number({ error: 'Enter a percentage.' })
  .min(0, { error: 'Use 0 to 100.' })
  .max(100, { error: 'Use 0 to 100.' })
  .refine((v) => /^\d+(\.\d{1,2})?$/.test(String(v)), { error: 'Use at most two decimals.' });

export const stageLikelihoodUpdate = requestSchema<StageLikelihoodUpdate>()(
  z.strictObject({
    likelihoods: z.strictObject(Object.fromEntries(INQUIRY_STAGES.map((s) => [s, likelihood])) as Record<InquiryStage, typeof likelihood>),
  }),
);

/** Booking a visit or winning: make or link the client and site from the inquiry without retyping. */
export const inquiryConvert = requestSchema<InquiryConvert>()(
  z
    .strictObject({
      clientId: uuid('client').optional(),
      client: clientCreate.optional(),
      siteId: uuid('site').optional(),
      site: siteCreate.optional(),
    })
    // One way each: an existing one by id, or a new one; both at once would leave one quietly unused.
    .superRefine((v, ctx) => {
      if (v.clientId !== undefined && v.client !== undefined)
        ctx.addIssue({ code: 'custom', path: ['client'], message: 'Choose an existing client or describe a new one, not both.' });
      if (v.siteId !== undefined && v.site !== undefined)
        ctx.addIssue({ code: 'custom', path: ['site'], message: 'Choose an existing site or describe a new one, not both.' });
    }),
);

export const inquiryIdParam = z.strictObject({ id: uuid('inquiry id') });
