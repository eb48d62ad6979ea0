import { z } from 'zod';
import { email } from '../auth/fields';
import { isoDate, moneyAmount, pageQuery, requiredText, text, uuid, yearBuilt } from '../common/fields';

/** Stages in order. Plain words; the labels live beside them so both apps say the same thing. */
export const INQUIRY_STAGES = ['new', 'contacted', 'visit_booked', 'samples', 'proposal_sent', 'won', 'lost'] as const;
export type InquiryStage = (typeof INQUIRY_STAGES)[number];
export const STAGE_LABELS: Record<InquiryStage, string> = {
  new: 'New',
  contacted: 'Contacted',
  visit_booked: 'Site visit booked',
  samples: 'Samples',
  proposal_sent: 'Proposal sent',
  won: 'Won',
  lost: 'Lost',
};
/** Default likelihoods: common practice, no source; each firm calibrates its own in settings. */
export const DEFAULT_STAGE_LIKELIHOOD: Record<InquiryStage, number> = {
  new: 10,
  contacted: 15,
  visit_booked: 25,
  samples: 50,
  proposal_sent: 60,
  won: 100,
  lost: 0,
};

export const INQUIRY_SOURCES = ['web_form', 'phone', 'designer_referral', 'contractor_referral', 'past_client', 'showroom', 'other'] as const;
export type InquirySource = (typeof INQUIRY_SOURCES)[number];
export const SOURCE_LABELS: Record<InquirySource, string> = {
  web_form: 'Inquiry form',
  phone: 'Phone call',
  designer_referral: 'Designer referral',
  contractor_referral: 'Contractor referral',
  past_client: 'Past client',
  showroom: 'Showroom or portfolio',
  other: 'Other',
};
/** What the public form offers (web_form is implied by using it). */
export const PUBLIC_SOURCES = ['designer_referral', 'contractor_referral', 'past_client', 'showroom', 'other', 'search_or_social'] as const;

export const BUDGET_RANGES = ['', 'under_5k', '5k_15k', '15k_40k', 'over_40k', 'not_sure'] as const;
export const BUDGET_LABELS: Record<(typeof BUDGET_RANGES)[number], string> = {
  '': '—',
  under_5k: 'Under 5,000',
  '5k_15k': '5,000 – 15,000',
  '15k_40k': '15,000 – 40,000',
  over_40k: 'Over 40,000',
  not_sure: 'Not sure yet',
};

const phone = text(40, 'Phone');

/** The public inquiry form. `website` is a honeypot; `startedAt` a signed timestamp from the page. */
export const publicInquiryRequest = z
  .strictObject({
    name: requiredText(120, 'Enter your name.'),
    email,
    phone,
    siteAddress: requiredText(300, 'Enter the address of the place to be finished.'),
    yearBuilt: z.union([yearBuilt, z.literal('')]).optional(),
    yearBuiltUnknown: z.coerce.boolean().optional(),
    rooms: requiredText(2000, 'Tell us which rooms and surfaces.'),
    finishIdea: text(2000),
    timeline: text(200),
    budgetRange: z.enum(BUDGET_RANGES, { error: 'Choose a budget range from the list.' }).default(''),
    heardFrom: z.enum(PUBLIC_SOURCES, { error: 'Choose how you heard of us.' }),
    referrerName: text(120),
    consent: z.literal(true, { error: 'Tick the box so we may contact you about this inquiry.' }),
    website: z.string().max(200).optional(),
    startedAt: z.string().max(200).optional(),
  })
  .superRefine((v, ctx) => {
    if ((v.heardFrom === 'designer_referral' || v.heardFrom === 'contractor_referral') && !v.referrerName) {
      ctx.addIssue({ code: 'custom', path: ['referrerName'], message: 'Tell us who referred you, so we can thank them.' });
    }
    if ((v.yearBuilt === undefined || v.yearBuilt === '') && !v.yearBuiltUnknown) {
      ctx.addIssue({ code: 'custom', path: ['yearBuilt'], message: 'Enter the year the building was built, or tick "Not sure".' });
    }
  });
export type PublicInquiryRequest = z.infer<typeof publicInquiryRequest>;

/** Inquiry fields as staff edit them; no defaults here, so a partial update never blanks a field. */
const inquiryFields = {
  contactName: requiredText(120, 'Enter the contact name.'),
  email: z.union([email, z.literal('')]),
  phone,
  siteAddress: text(300),
  yearBuilt: yearBuilt.nullable(),
  rooms: text(2000),
  finishIdea: text(2000),
  timeline: text(200),
  budgetRange: z.enum(BUDGET_RANGES, { error: 'Choose a budget range from the list.' }),
  source: z.enum(INQUIRY_SOURCES, { error: 'Choose where the inquiry came from.' }),
  referrerName: text(120),
  estimatedValue: moneyAmount.nullable(),
  assigneeUserId: uuid('person').nullable(),
  nextFollowUp: isoDate.nullable(),
};

/** Staff log an inquiry from a call or a referral. */
export const inquiryCreate = z.strictObject({
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
});
export type InquiryCreate = z.infer<typeof inquiryCreate>;

export const inquiryUpdate = z.strictObject(inquiryFields).partial();
export type InquiryUpdate = z.infer<typeof inquiryUpdate>;

export const stageMove = z
  .strictObject({
    stage: z.enum(INQUIRY_STAGES, { error: 'Choose a stage from the list.' }),
    lostReason: text(500).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.stage === 'lost' && !v.lostReason) ctx.addIssue({ code: 'custom', path: ['lostReason'], message: 'Say why it was lost; it helps pricing later.' });
  });
export type StageMove = z.infer<typeof stageMove>;

export const activityCreate = z.strictObject({
  kind: z.enum(['note', 'call', 'email'], { error: 'Choose note, call or e-mail.' }),
  body: requiredText(5000, 'Write what happened.'),
});
export type ActivityCreate = z.infer<typeof activityCreate>;

export const INQUIRY_SORTS = ['newest', 'oldest', 'value', 'follow_up'] as const;
export const inquiryListQuery = z.strictObject({
  stage: z.enum(INQUIRY_STAGES, { error: 'Unknown stage.' }).optional(),
  source: z.enum(INQUIRY_SOURCES, { error: 'Unknown source.' }).optional(),
  assignee: z.union([uuid('person'), z.literal('none')]).optional(),
  q: z.string().trim().max(100, { error: 'Search with at most 100 characters.' }).optional(),
  sort: z.enum(INQUIRY_SORTS, { error: 'Unknown sort.' }).default('newest'),
  ...pageQuery,
});
export type InquiryListQuery = z.infer<typeof inquiryListQuery>;

export const stageLikelihoodUpdate = z.strictObject({
  likelihoods: z.strictObject(
    Object.fromEntries(
      INQUIRY_STAGES.map((s) => [s, z.coerce.number({ error: 'Enter a percentage.' }).min(0, { error: 'Use 0 to 100.' }).max(100, { error: 'Use 0 to 100.' })]),
    ) as Record<InquiryStage, z.ZodCoercedNumber>,
  ),
});

export interface InquirySummary {
  readonly id: string;
  readonly contactName: string;
  readonly email: string;
  readonly phone: string;
  readonly siteAddress: string;
  readonly stage: InquiryStage;
  readonly source: InquirySource;
  readonly referrerName: string;
  readonly estimatedValue: string | null;
  readonly assigneeUserId: string | null;
  readonly assigneeName: string | null;
  readonly nextFollowUp: string | null;
  readonly isFollowUpOverdue: boolean;
  readonly createdAt: string;
}

export interface InquiryActivity {
  readonly id: string;
  readonly kind: 'created' | 'note' | 'call' | 'email' | 'stage_change' | 'assignment' | 'follow_up' | 'converted';
  readonly body: string;
  readonly data: Record<string, unknown>;
  readonly actorName: string | null;
  readonly createdAt: string;
}

export interface InquiryDetail extends InquirySummary {
  readonly yearBuilt: number | null;
  readonly rooms: string;
  readonly finishIdea: string;
  readonly timeline: string;
  readonly budgetRange: string;
  readonly consentToContact: boolean;
  readonly lostReason: string;
  readonly clientId: string | null;
  readonly siteId: string | null;
  readonly activities: readonly InquiryActivity[];
}

export interface BoardColumn {
  readonly stage: InquiryStage;
  readonly label: string;
  readonly likelihoodPercent: number;
  readonly count: number;
  readonly items: readonly InquirySummary[];
}

export interface TodayView {
  readonly localDate: string;
  readonly overdue: readonly InquirySummary[];
  readonly dueToday: readonly InquirySummary[];
  readonly pipeline: { readonly unweighted: string; readonly weighted: string; readonly openCount: number; readonly currency: string };
}
