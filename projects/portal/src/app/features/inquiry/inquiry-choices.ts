import type { PublicInquiryRequest } from '@layerbook/contracts';

// Copied from packages/contracts (importing its values would pull zod into the bundle).
// The `satisfies` checks and the `Covers` checks below fail the build if the API's choices change.

type BudgetRange = PublicInquiryRequest['budgetRange'];
export type HeardFrom = PublicInquiryRequest['heardFrom'];

export const BUDGET_CHOICES = [
  { value: '', label: 'Rather not say' },
  { value: 'under_5k', label: 'Under 5,000' },
  { value: '5k_15k', label: '5,000 – 15,000' },
  { value: '15k_40k', label: '15,000 – 40,000' },
  { value: 'over_40k', label: 'Over 40,000' },
  { value: 'not_sure', label: 'Not sure yet' },
] as const satisfies readonly { value: BudgetRange; label: string }[];

export const HEARD_FROM_CHOICES = [
  { value: 'designer_referral', label: 'An interior designer referred me' },
  { value: 'contractor_referral', label: 'A builder or contractor referred me' },
  { value: 'past_client', label: 'I have worked with you before' },
  { value: 'showroom', label: 'Your showroom or portfolio' },
  { value: 'search_or_social', label: 'Search or social media' },
  { value: 'other', label: 'Other' },
] as const satisfies readonly { value: HeardFrom; label: string }[];

/** The choices for which the API asks who referred the prospect. */
const REFERRALS: ReadonlySet<string> = new Set<HeardFrom>(['designer_referral', 'contractor_referral']);

export function isReferral(heardFrom: string): boolean {
  return REFERRALS.has(heardFrom);
}

/** `true` only when every value of `All` is listed. */
type Covers<All, Listed> = [Exclude<All, Listed>] extends [never] ? true : false;
const coversBudgets: Covers<BudgetRange, (typeof BUDGET_CHOICES)[number]['value']> = true;
const coversSources: Covers<HeardFrom, (typeof HEARD_FROM_CHOICES)[number]['value']> = true;
void [coversBudgets, coversSources];
