/**
 * How a firm bills, without zod: the deposit limit it chose for its jurisdiction (with the rule's
 * name, printed on screen and on invoices), payment terms, retainage for progress billing, how a
 * deposit is credited on progress invoices, the reminder cadence and the number prefixes.
 * GET /api/firm/billing (owner, office), PUT (owner).
 */

/** A deposit limit as data. Percents are whole percents (10 = 10 %); amounts decimal strings. */
export type DepositCapSetting =
  | { readonly kind: 'none' }
  | { readonly kind: 'amount'; readonly amount: string }
  | { readonly kind: 'share'; readonly percent: number }
  | { readonly kind: 'lesserOf'; readonly amount: string; readonly percent: number };

export const DEPOSIT_CAP_KINDS = ['none', 'amount', 'share', 'lesserOf'] as const;
export type DepositCapKind = (typeof DEPOSIT_CAP_KINDS)[number];
export const DEPOSIT_CAP_KIND_LABELS: Readonly<Record<DepositCapKind, string>> = {
  none: 'No limit',
  amount: 'At most a fixed amount',
  share: 'At most a share of the contract',
  lesserOf: 'The lesser of an amount and a share of the contract',
};

/** Ready-made rules the settings form offers; the firm can still type its own. */
export type DepositCapPresetId = 'none' | 'caHomeImprovement';
export const DEPOSIT_CAP_PRESETS: ReadonlyArray<{
  readonly id: DepositCapPresetId;
  readonly name: string;
  readonly rule: DepositCapSetting;
}> = [
  { id: 'none', name: 'No deposit limit', rule: { kind: 'none' } },
  {
    id: 'caHomeImprovement',
    // California Business and Professions Code §7159 (deposit on a home improvement contract): the lesser of $1,000 or 10 % of the contract price.
    name: 'California home improvement contracts (Bus. & Prof. Code §7159): the lesser of $1,000 or 10 %',
    rule: { kind: 'lesserOf', amount: '1000.00', percent: 10 },
  },
];

export type PaymentTermsSetting = { readonly kind: 'onReceipt' } | { readonly kind: 'net'; readonly days: number };

/** Progress billing: how the deposit (an advance) comes off later progress invoices. */
export const DEPOSIT_CREDIT_RULES = ['prorata', 'next'] as const;
export type DepositCreditRuleSetting = (typeof DEPOSIT_CREDIT_RULES)[number];
export const DEPOSIT_CREDIT_RULE_LABELS: Readonly<Record<DepositCreditRuleSetting, string>> = {
  prorata: 'A share of the deposit off each progress invoice, in step with the work billed',
  next: 'The whole deposit off the next progress invoices until it is used up',
};

/**
 * What happens to a deposit due on acceptance when the client accepts: `draft` — the queue drafts
 * its invoice for the office to check and issue (billing starts when the office starts it);
 * `issueAndSend` — billing starts on the schedule as signed and the deposit invoice is issued with
 * its number and e-mailed in the acceptance itself, so the client can pay it at once.
 */
export const DEPOSIT_AT_ACCEPTANCE = ['draft', 'issueAndSend'] as const;
export type DepositAtAcceptanceSetting = (typeof DEPOSIT_AT_ACCEPTANCE)[number];
export const DEPOSIT_AT_ACCEPTANCE_LABELS: Readonly<Record<DepositAtAcceptanceSetting, string>> = {
  draft: 'Draft the deposit invoice for the office to check and issue',
  issueAndSend: 'Issue the deposit invoice and e-mail it to the client as soon as they accept',
};

export interface RetainageSetting {
  /** held on work done, whole percent (0 = none) */
  readonly workPercent: number;
  /** held on materials stored on site */
  readonly storedPercent: number;
  /** stop holding more once the job is this far complete (null: hold to the end) */
  readonly stopAtPercentComplete: number | null;
}

export interface ReminderCadenceSetting {
  readonly isOn: boolean;
  /** a friendly note this many days before the due date (null: none) */
  readonly daysBefore: number | null;
  readonly onDueDate: boolean;
  /** then every N days after the due date (null: none) */
  readonly everyDaysAfter: number | null;
  /** at most this many reminders after the due date */
  readonly maxAfter: number;
}

export interface BillingSettings {
  readonly depositCap: DepositCapSetting;
  /** the rule's name as the firm wants it printed ("No deposit limit" for none) */
  readonly depositCapName: string;
  readonly terms: PaymentTermsSetting;
  readonly retainage: RetainageSetting;
  readonly depositCredit: DepositCreditRuleSetting;
  /** the deposit due on acceptance: drafted for the office, or issued and e-mailed at once */
  readonly depositAtAcceptance: DepositAtAcceptanceSetting;
  readonly reminders: ReminderCadenceSetting;
  /** "INV-" → INV-0001 */
  readonly invoicePrefix: string;
  /** "CN-" → CN-0001 */
  readonly creditNotePrefix: string;
  /** printed at the foot of every invoice (bank details, thanks…) */
  readonly invoiceFooter: string;
}

/** Reminders every so many days after the due date, but none of them: a contradiction the firm resolves. */
export const NONE_AFTER_WORDS = 'Send at least one reminder after the due date, or untick “Then again after the due date”.';

/** Receipts are numbered RCT-0001…; the firm's own prefixes must differ from it and from each other. */
export const RECEIPT_PREFIX = 'RCT-';

/** What is wrong when two kinds of document would print one number (see prefixClash). */
export const PREFIX_CLASH_WORDS = {
  receipts: `${RECEIPT_PREFIX} numbers the receipts; use another prefix.`,
  same: 'Use a prefix other than the invoices’, so a credit note’s number is never an invoice’s.',
} as const;

export type PrefixClash = keyof typeof PREFIX_CLASH_WORDS;

/**
 * Whether a pair of prefixes would print one number on two kinds of document (compared trimmed
 * and without regard to case): the field to change and why, or null when they are apart.
 */
export function prefixClash(
  invoicePrefix: string,
  creditNotePrefix: string,
): { readonly field: 'invoicePrefix' | 'creditNotePrefix'; readonly clash: PrefixClash } | null {
  const same = (a: string, b: string) => a.trim().toUpperCase() === b.trim().toUpperCase();
  if (same(invoicePrefix, RECEIPT_PREFIX)) return { field: 'invoicePrefix', clash: 'receipts' };
  if (same(creditNotePrefix, RECEIPT_PREFIX)) return { field: 'creditNotePrefix', clash: 'receipts' };
  if (same(invoicePrefix, creditNotePrefix)) return { field: 'creditNotePrefix', clash: 'same' };
  return null;
}

export const BILLING_LIMITS = {
  termsDays: { min: 1, max: 365 },
  percent: { min: 0, max: 100 },
  reminderDays: { min: 1, max: 90 },
  maxAfter: { min: 0, max: 12 },
  prefixMaxLength: 12,
  depositCapNameMaxLength: 200,
  footerMaxLength: 1000,
} as const;

export const DEFAULT_BILLING_SETTINGS: BillingSettings = {
  depositCap: { kind: 'none' },
  depositCapName: 'No deposit limit',
  terms: { kind: 'net', days: 14 },
  retainage: { workPercent: 0, storedPercent: 0, stopAtPercentComplete: null },
  depositCredit: 'prorata',
  depositAtAcceptance: 'draft',
  reminders: { isOn: true, daysBefore: 3, onDueDate: true, everyDaysAfter: 7, maxAfter: 3 },
  invoicePrefix: 'INV-',
  creditNotePrefix: 'CN-',
  invoiceFooter: '',
};

export interface BillingSettingsView {
  readonly settings: BillingSettings;
  /** true until the owner saves the firm's own values */
  readonly isDefault: boolean;
  readonly currency: string;
}
