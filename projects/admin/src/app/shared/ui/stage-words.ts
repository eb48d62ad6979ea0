import type { InquirySource, InquiryStage } from '@layerbook/contracts';

// Kept here rather than imported from the contracts package: see core/auth/roles.ts for why.
// The `satisfies` checks fail the build if the API's stages or sources change under us.

export const INQUIRY_STAGES = [
  'new',
  'contacted',
  'visit_booked',
  'samples',
  'proposal_sent',
  'won',
  'lost',
] as const satisfies readonly InquiryStage[];

export const STAGE_LABELS = {
  new: 'New',
  contacted: 'Contacted',
  visit_booked: 'Site visit booked',
  samples: 'Samples',
  proposal_sent: 'Proposal sent',
  won: 'Won',
  lost: 'Lost',
} as const satisfies Record<InquiryStage, string>;

/** An icon per stage, so a stage never reads by colour alone. */
export const STAGE_ICONS = {
  new: 'fiber_new',
  contacted: 'call',
  visit_booked: 'event',
  samples: 'palette',
  proposal_sent: 'description',
  won: 'handshake',
  lost: 'block',
} as const satisfies Record<InquiryStage, string>;

export const INQUIRY_SOURCES = [
  'web_form',
  'phone',
  'designer_referral',
  'contractor_referral',
  'past_client',
  'showroom',
  'other',
] as const satisfies readonly InquirySource[];

export const SOURCE_LABELS = {
  web_form: 'Inquiry form',
  phone: 'Phone call',
  designer_referral: 'Designer referral',
  contractor_referral: 'Contractor referral',
  past_client: 'Past client',
  showroom: 'Showroom or portfolio',
  other: 'Other',
} as const satisfies Record<InquirySource, string>;

type MissingStage = Exclude<InquiryStage, (typeof INQUIRY_STAGES)[number]>;
type MissingSource = Exclude<InquirySource, (typeof INQUIRY_SOURCES)[number]>;
export const ALL_STAGES_LISTED: [MissingStage | MissingSource] extends [never] ? true : never = true;

export function isStage(value: unknown): value is InquiryStage {
  return typeof value === 'string' && (INQUIRY_STAGES as readonly string[]).includes(value);
}

export function isSource(value: unknown): value is InquirySource {
  return typeof value === 'string' && (INQUIRY_SOURCES as readonly string[]).includes(value);
}

export function isReferral(source: InquirySource | null | undefined): boolean {
  return source === 'designer_referral' || source === 'contractor_referral';
}
