import type { DepositCreditRuleSetting, PaymentTermsSetting, RetainageSetting } from './billing-settings-types';
import type { ChangeOrderSummary } from './change-order-types';
import type { InvoiceSummary } from './invoice-types';

/**
 * A job's billing, without zod: the schedule the office edits (lines with triggers that add up to
 * the contract sum), the work the crew marks done (layers on surfaces), the schedule of values for
 * progress billing, and the job's history. Money: decimal strings in the job's currency.
 */

/** What makes a billing-schedule line due. */
export type BillingTrigger =
  | { readonly kind: 'acceptance' }
  | { readonly kind: 'date'; readonly date: string }
  | { readonly kind: 'layerComplete'; readonly layerId: string }
  | { readonly kind: 'walkthrough' };

export const BILLING_TRIGGER_KINDS = ['acceptance', 'date', 'layerComplete', 'walkthrough'] as const;
export type BillingTriggerKind = (typeof BILLING_TRIGGER_KINDS)[number];
export const BILLING_TRIGGER_LABELS: Readonly<Record<BillingTriggerKind, string>> = {
  acceptance: 'When billing starts (on acceptance)',
  date: 'On a date',
  layerComplete: 'When a layer is finished on every surface it covers',
  walkthrough: 'At the final walkthrough',
};

export const BILLING_METHODS = ['schedule', 'progress'] as const;
export type BillingMethod = (typeof BILLING_METHODS)[number];
export const BILLING_METHOD_LABELS: Readonly<Record<BillingMethod, string>> = {
  schedule: 'By the payment schedule (deposit, stage payments, final)',
  progress: 'By progress, monthly or as work is done (schedule of values, retainage)',
};

/** The firm's billing settings as copied onto the job when billing starts. */
export interface BillingTerms {
  readonly depositCapName: string;
  /** the cap in money for this job's contract sum; null when the rule is "none" */
  readonly depositCap: string | null;
  readonly terms: PaymentTermsSetting;
  readonly retainage: RetainageSetting;
  readonly depositCredit: DepositCreditRuleSetting;
}

export const SCHEDULE_LINE_STATUSES = ['draft', 'scheduled', 'ready', 'invoiced'] as const;
export type ScheduleLineStatus = (typeof SCHEDULE_LINE_STATUSES)[number];
export const SCHEDULE_LINE_STATUS_LABELS: Readonly<Record<ScheduleLineStatus, string>> = {
  draft: 'Not started',
  scheduled: 'Waiting for its trigger',
  ready: 'Ready to bill',
  invoiced: 'Invoiced',
};

export interface ScheduleLineView {
  readonly id: string;
  readonly position: number;
  readonly label: string;
  readonly role: 'deposit' | 'milestone' | 'final';
  readonly trigger: BillingTrigger;
  /** the layer a layerComplete trigger waits for (null otherwise) */
  readonly layerName: string | null;
  readonly amount: string;
  /** the engine's schedule date for the trigger (null: on acceptance / unknown) */
  readonly expectedOn: string | null;
  readonly status: ScheduleLineStatus;
  /** the live invoice billing this line (draft or issued), if any */
  readonly invoiceId: string | null;
  /** how far the trigger is: "3 of 5 surfaces done", "due 2026-12-14" */
  readonly triggerProgress: string;
}

/** PUT /api/jobs/:id/billing/schedule — the whole schedule; lines without `id` are new. */
export interface BillingScheduleUpdate {
  readonly method: BillingMethod;
  readonly lines: ReadonlyArray<{
    readonly id?: string;
    readonly label: string;
    readonly role: 'deposit' | 'milestone' | 'final';
    readonly trigger: BillingTrigger;
    readonly amount: string;
  }>;
}

/** One layer on one surface: what the crew and the office mark done. */
export interface WorkItemView {
  readonly id: string;
  readonly position: number;
  readonly roomName: string;
  readonly surfaceId: string;
  readonly surfaceName: string;
  readonly layerId: string;
  readonly layerName: string;
  readonly layerOrder: number;
  readonly doneOn: string | null;
  /** the number of the approved change order that added this work (a redo of a sold surface has its own); null: sold */
  readonly changeOrder: number | null;
}

/** A schedule-of-values line (progress billing). */
export interface ValueLineView {
  readonly id: string;
  readonly position: number;
  readonly label: string;
  readonly scheduledValue: string;
  readonly changeOrderId: string | null;
  /** the latest reading from the work, to date (decimal string, "40" = 40 %) */
  readonly percentComplete: string;
  readonly storedMaterials: string;
  /** billed on issued progress invoices so far (work, excluding stored materials) */
  readonly billedWork: string;
}

/** PUT /api/jobs/:id/billing/value-lines — must add up to the contract sum to date. */
export interface ValueLinesUpdate {
  readonly lines: ReadonlyArray<{ readonly id?: string; readonly label: string; readonly scheduledValue: string }>;
}

/** POST /api/jobs/:id/progress — one mark from the work (office now, crew from the job sheet later). */
export type ProgressMark =
  | { readonly kind: 'layerDone'; readonly workItemId: string; readonly on: string; readonly clientKey?: string; readonly note?: string }
  | {
      readonly kind: 'layerReopened';
      readonly workItemId: string;
      readonly on: string;
      readonly clientKey?: string;
      readonly note?: string;
    }
  | {
      readonly kind: 'valuePercent';
      readonly valueLineId: string;
      readonly percentComplete: number;
      readonly on: string;
      readonly clientKey?: string;
      readonly note?: string;
    }
  | {
      readonly kind: 'storedMaterials';
      readonly valueLineId: string;
      readonly amount: string;
      readonly on: string;
      readonly clientKey?: string;
      readonly note?: string;
    }
  | { readonly kind: 'walkthrough'; readonly on: string; readonly clientKey?: string; readonly note?: string };

export const PROGRESS_KINDS = ['layerDone', 'layerReopened', 'valuePercent', 'storedMaterials', 'walkthrough'] as const;
export type ProgressKind = (typeof PROGRESS_KINDS)[number];

/** Limits of a progress mark: a phone's own key for the mark (so a mark sent twice counts once), and its note. */
export const PROGRESS_LIMITS = { clientKeyMaxLength: 100, noteMaxLength: 500 } as const;

/**
 * GET /api/jobs/:id/progress and the answer of POST (owner, office, crew): the work to mark and how
 * far it is, without money (crew read it), so value lines carry their label and percent only.
 */
export interface JobProgressView {
  readonly workItems: readonly WorkItemView[];
  readonly walkthroughOn: string | null;
  readonly valueLines: ReadonlyArray<{
    readonly id: string;
    readonly position: number;
    readonly label: string;
    readonly percentComplete: string;
  }>;
}

/** One entry of the job's history: progress, schedule changes, invoices, change orders. */
export interface JobHistoryEntry {
  readonly at: string;
  /** the day it happened on site (progress), or the day of the record */
  readonly on: string;
  /** "Lime base coat done on Dining room · Walls" */
  readonly text: string;
  readonly who: string;
  readonly kind: string;
}

/** GET /api/jobs/:id/billing (owner, office). */
export interface JobBillingView {
  readonly jobId: string;
  readonly currency: string;
  readonly method: BillingMethod;
  readonly originalContractSum: string;
  readonly contractSum: string;
  readonly contractTax: string;
  /** null until billing starts: the office starts it, or acceptance does when the firm issues the deposit at acceptance (until then the schedule is the acceptance draft) */
  readonly billingStartedAt: string | null;
  /** the firm's current rule before billing starts, the job's copy after */
  readonly terms: BillingTerms;
  readonly walkthroughOn: string | null;
  readonly lines: readonly ScheduleLineView[];
  readonly workItems: readonly WorkItemView[];
  readonly valueLines: readonly ValueLineView[];
  readonly invoices: readonly InvoiceSummary[];
  readonly changeOrders: readonly ChangeOrderSummary[];
  /** invoiced (issued, less credit notes), paid, and left to bill, for the job's header */
  readonly totals: { readonly invoiced: string; readonly paid: string; readonly unbilled: string; readonly retainageHeld: string };
  readonly readyToBill: number;
}

/** GET /api/jobs/:id/history — newest first. */
export interface JobHistory {
  readonly items: readonly JobHistoryEntry[];
}

/** Limits of the schedule and schedule-of-values editors (the API refuses more). */
export const BILLING_SCHEDULE_LIMITS = { labelMaxLength: 160, linesMax: 60 } as const;
