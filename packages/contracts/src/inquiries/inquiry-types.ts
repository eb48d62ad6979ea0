/**
 * Inquiries without zod: stages, sources, budgets and log kinds with their words, field limits,
 * what the apps send and what every inquiry route answers. The zod schemas (inquiry.ts) are built
 * from these, so both apps and the server say and check the same thing.
 */
import type { ClientCreate, SiteCreate } from '../clients/client-types';

/** Stages in order. Plain words; the labels live beside them so both apps say the same thing. */
export const INQUIRY_STAGES = ['new', 'contacted', 'visit_booked', 'samples', 'proposal_sent', 'won', 'lost'] as const;
export type InquiryStage = (typeof INQUIRY_STAGES)[number];
export const STAGE_LABELS: Readonly<Record<InquiryStage, string>> = {
  new: 'New',
  contacted: 'Contacted',
  visit_booked: 'Site visit booked',
  samples: 'Samples',
  proposal_sent: 'Proposal sent',
  won: 'Won',
  lost: 'Lost',
};
/** Default likelihoods: common practice, no source; each firm calibrates its own in settings. */
export const DEFAULT_STAGE_LIKELIHOOD: Readonly<Record<InquiryStage, number>> = {
  new: 10,
  contacted: 15,
  visit_booked: 25,
  samples: 50,
  proposal_sent: 60,
  won: 100,
  lost: 0,
};
/** Booking the visit or winning the work files the prospect as a client with their site. */
export const STAGES_THAT_FILE_A_CLIENT: readonly InquiryStage[] = ['visit_booked', 'won'];

export function isInquiryStage(value: unknown): value is InquiryStage {
  return typeof value === 'string' && (INQUIRY_STAGES as readonly string[]).includes(value);
}

/** Won and lost are closed: no follow-up is overdue on them and they leave the pipeline. */
export function isOpenStage(stage: InquiryStage): boolean {
  return stage !== 'won' && stage !== 'lost';
}

export const INQUIRY_SOURCES = [
  'web_form',
  'phone',
  'designer_referral',
  'contractor_referral',
  'past_client',
  'showroom',
  'other',
] as const;
export type InquirySource = (typeof INQUIRY_SOURCES)[number];
export const SOURCE_LABELS: Readonly<Record<InquirySource, string>> = {
  web_form: 'Inquiry form',
  phone: 'Phone call',
  designer_referral: 'Designer referral',
  contractor_referral: 'Contractor referral',
  past_client: 'Past client',
  showroom: 'Showroom or portfolio',
  other: 'Other',
};

export function isInquirySource(value: unknown): value is InquirySource {
  return typeof value === 'string' && (INQUIRY_SOURCES as readonly string[]).includes(value);
}

/** Referrals keep who referred (they may be owed thanks or a fee). */
export const REFERRAL_SOURCES = ['designer_referral', 'contractor_referral'] as const;

export function isReferralSource(source: string | null | undefined): boolean {
  return (REFERRAL_SOURCES as readonly (string | null | undefined)[]).includes(source);
}

/** What the public form offers (web_form is implied by using it). */
export const PUBLIC_SOURCES = ['designer_referral', 'contractor_referral', 'past_client', 'showroom', 'search_or_social', 'other'] as const;
export type PublicSource = (typeof PUBLIC_SOURCES)[number];
/** The public form's words, said by the prospect. */
export const PUBLIC_SOURCE_LABELS: Readonly<Record<PublicSource, string>> = {
  designer_referral: 'An interior designer referred me',
  contractor_referral: 'A builder or contractor referred me',
  past_client: 'I have worked with you before',
  showroom: 'Your showroom or portfolio',
  search_or_social: 'Search or social media',
  other: 'Other',
};

/** '' is "not said". */
export const BUDGET_RANGES = ['', 'under_5k', '5k_15k', '15k_40k', 'over_40k', 'not_sure'] as const;
export type BudgetRange = (typeof BUDGET_RANGES)[number];
export const BUDGET_LABELS: Readonly<Record<BudgetRange, string>> = {
  '': 'Not said',
  under_5k: 'Under 5,000',
  '5k_15k': '5,000 – 15,000',
  '15k_40k': '15,000 – 40,000',
  over_40k: 'Over 40,000',
  not_sure: 'Not sure yet',
};
/** The public form's words: a prospect may rather not say. */
export const PUBLIC_BUDGET_LABELS: Readonly<Record<BudgetRange, string>> = { ...BUDGET_LABELS, '': 'Rather not say' };

export function isBudgetRange(value: unknown): value is BudgetRange {
  return typeof value === 'string' && (BUDGET_RANGES as readonly string[]).includes(value);
}

/** Every kind of line in an inquiry's log. */
export const ACTIVITY_KINDS = ['created', 'note', 'call', 'email', 'stage_change', 'assignment', 'follow_up', 'converted'] as const;
export type ActivityKind = (typeof ACTIVITY_KINDS)[number];
/** The kinds staff write by hand; the rest the server logs as things change. */
export const LOGGED_ACTIVITY_KINDS = ['note', 'call', 'email'] as const;
export type LoggedActivityKind = (typeof LOGGED_ACTIVITY_KINDS)[number];
export const LOGGED_ACTIVITY_LABELS: Readonly<Record<LoggedActivityKind, string>> = {
  note: 'Note',
  call: 'Call',
  email: 'E-mail',
};

/** How the inquiry list may be sorted (`?sort=`). */
export const INQUIRY_SORTS = ['newest', 'oldest', 'value', 'follow_up'] as const;
export type InquirySort = (typeof INQUIRY_SORTS)[number];
export const INQUIRY_SORT_LABELS: Readonly<Record<InquirySort, string>> = {
  newest: 'Newest',
  oldest: 'Oldest',
  value: 'Highest value',
  follow_up: 'Next follow-up',
};

/** Longest value of each text field of an inquiry. */
export const INQUIRY_LIMITS = {
  contactName: 120,
  siteAddress: 300,
  rooms: 2000,
  finishIdea: 2000,
  timeline: 200,
  referrerName: 120,
  lostReason: 500,
  activityBody: 5000,
} as const;

/** `?assignee=none` lists inquiries no one has yet. */
export const UNASSIGNED = 'none';

// What the apps send.
/** Inquiry fields as staff log them (POST /api/inquiries). Money is a decimal string. */
export interface InquiryCreate {
  readonly contactName: string;
  readonly email: string;
  readonly phone: string;
  readonly siteAddress: string;
  readonly yearBuilt: number | null;
  readonly rooms: string;
  readonly finishIdea: string;
  readonly timeline: string;
  readonly budgetRange: BudgetRange;
  readonly source: InquirySource;
  readonly referrerName: string;
  readonly estimatedValue: string | null;
  readonly assigneeUserId: string | null;
  /** YYYY-MM-DD in the firm's calendar */
  readonly nextFollowUp: string | null;
}
/** PATCH /api/inquiries/:id changes only what it names. */
export type InquiryUpdate = Partial<InquiryCreate>;

export interface StageMove {
  readonly stage: InquiryStage;
  /** Required when the stage is `lost`. */
  readonly lostReason?: string;
}

export interface ActivityCreate {
  readonly kind: LoggedActivityKind;
  readonly body: string;
}

export interface StageLikelihoodUpdate {
  readonly likelihoods: Readonly<Record<InquiryStage, number>>;
}

/** Booking a visit or winning: make or link the client and site from the inquiry without retyping. */
export interface InquiryConvert {
  readonly clientId?: string;
  readonly client?: ClientCreate;
  readonly siteId?: string;
  readonly site?: SiteCreate;
}

/**
 * The public inquiry form. `website` is a honeypot; `startedAt` the signed stamp from the page;
 * `renewedFrom` the expired stamp a renewed form replaced (it shows the form was opened long ago).
 */
export interface PublicInquiryRequest {
  readonly name: string;
  readonly email: string;
  readonly phone: string;
  readonly siteAddress: string;
  readonly yearBuilt?: number | '';
  readonly yearBuiltUnknown?: boolean;
  readonly rooms: string;
  readonly finishIdea: string;
  readonly timeline: string;
  readonly budgetRange: BudgetRange;
  readonly heardFrom: PublicSource;
  readonly referrerName: string;
  readonly consent: true;
  readonly website?: string;
  readonly startedAt?: string;
  readonly renewedFrom?: string;
}

// What the inquiry routes answer.
/** One inquiry in the list (GET /api/inquiries, keyset), on the board and on Today. */
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

/** One line of an inquiry's log (InquiryDetail.activities). */
export interface InquiryActivity {
  readonly id: string;
  readonly kind: ActivityKind;
  readonly body: string;
  /** What changed, by kind: `{ from, to }` for stage, assignment and follow-up; `{ source }` when created. */
  readonly data: Readonly<Record<string, unknown>>;
  /** null for the public form and the system. */
  readonly actorName: string | null;
  readonly createdAt: string;
}

/** GET /api/inquiries/:id, and the answer to every change of one inquiry. */
export interface InquiryDetail extends InquirySummary {
  readonly yearBuilt: number | null;
  readonly rooms: string;
  readonly finishIdea: string;
  readonly timeline: string;
  readonly budgetRange: BudgetRange;
  readonly consentToContact: boolean;
  readonly lostReason: string;
  readonly clientId: string | null;
  readonly siteId: string | null;
  /** The log, newest first. */
  readonly activities: readonly InquiryActivity[];
}

/** One stage of the board (GET /api/inquiries/board answers ItemList<BoardColumn>). */
export interface BoardColumn {
  readonly stage: InquiryStage;
  readonly label: string;
  readonly likelihoodPercent: number;
  /** All inquiries in the stage; `items` holds the most recent of them. */
  readonly count: number;
  readonly items: readonly InquirySummary[];
}

/** One stage's chance of ending in work (GET/PUT /api/inquiries/stages answer ItemList<StageLikelihood>). */
export interface StageLikelihood {
  readonly stage: InquiryStage;
  readonly label: string;
  readonly likelihoodPercent: number;
}

/** The pipeline's value today; money as decimal strings in the firm's currency. */
export interface PipelineValue {
  readonly unweighted: string;
  readonly weighted: string;
  readonly openCount: number;
  readonly currency: string;
}

/** GET /api/inquiries/today: follow-ups late and due in the firm's calendar, and the pipeline. */
export interface TodayView {
  readonly localDate: string;
  /** the longest-waiting overdue follow-ups, oldest first; a long backlog is cut short */
  readonly overdue: readonly InquirySummary[];
  /** how many follow-ups are overdue in all (more than `overdue` holds when it is cut short) */
  readonly overdueCount: number;
  readonly dueToday: readonly InquirySummary[];
  readonly pipeline: PipelineValue;
}

/** POST /api/inquiries/:id/convert. */
export interface InquiryConversion {
  readonly clientId: string;
  readonly siteId: string | null;
}

/** GET /api/public/firms/:slug: enough to head the public form, plus its signed stamp. */
export interface PublicFirm {
  readonly name: string;
  readonly slug: string;
  readonly formStamp: string;
}
