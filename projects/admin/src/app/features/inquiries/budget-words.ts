import type { InquiryCreate } from '@layerbook/contracts';

// Copied from the contracts package (see core/auth/roles.ts for why); checked against its type.
type BudgetRange = InquiryCreate['budgetRange'];

export const BUDGET_CHOICES = [
  { value: '', label: 'Not asked' },
  { value: 'under_5k', label: 'Under 5,000' },
  { value: '5k_15k', label: '5,000 – 15,000' },
  { value: '15k_40k', label: '15,000 – 40,000' },
  { value: 'over_40k', label: 'Over 40,000' },
  { value: 'not_sure', label: 'Not sure yet' },
] as const satisfies readonly { value: BudgetRange; label: string }[];

type MissingBudget = Exclude<BudgetRange, (typeof BUDGET_CHOICES)[number]['value']>;
export const ALL_BUDGETS_LISTED: [MissingBudget] extends [never] ? true : never = true;

export function budgetLabel(value: string): string {
  return BUDGET_CHOICES.find((choice) => choice.value === value)?.label ?? value;
}
