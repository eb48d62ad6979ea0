/**
 * Change orders, without zod: numbered per job, priced with the engine (a finish on surfaces of
 * the site — new surfaces, or an added layer as its own finish) or as a lump sum, up or down;
 * sent to the client, who approves with a typed signature or declines in the portal. Only an
 * approved one changes the contract sum and re-spreads the unbilled schedule lines.
 */

export const CHANGE_ORDER_STATUSES = ['draft', 'sent', 'approved', 'declined'] as const;
export type ChangeOrderStatus = (typeof CHANGE_ORDER_STATUSES)[number];
export const CHANGE_ORDER_STATUS_LABELS: Readonly<Record<ChangeOrderStatus, string>> = {
  draft: 'Draft',
  sent: 'Waiting for the client',
  approved: 'Approved',
  declined: 'Declined',
};

/** Why a lump-sum change order carries no tax: the firm taxes the materials line only (a lump sum has none), or adds no tax. */
export type ChangeOrderTaxNote = 'materialsOnly' | 'noTax';

/** The office's words for each (the portal says them in the client's language). */
export const CHANGE_ORDER_TAX_NOTES: Readonly<Record<ChangeOrderTaxNote, string>> = {
  materialsOnly: 'No tax: the firm charges tax on the materials line only, and a lump sum has no materials line.',
  noTax: 'No tax: the firm adds no sales tax to its prices.',
};

export type ChangeOrderPricing =
  /** `price` before tax, negative to deduct; tax by the firm's mode */
  | { readonly kind: 'lumpSum'; readonly price: string }
  /** the engine prices `finishSystemId` on these takeoff surfaces of the job's site */
  | { readonly kind: 'engine'; readonly surfaceIds: readonly string[]; readonly finishSystemId: string };

/** POST /api/jobs/:id/change-orders; PATCH /api/change-orders/:id takes the same fields (drafts only). */
export interface ChangeOrderCreate {
  readonly title: string;
  readonly description: string;
  readonly pricing: ChangeOrderPricing;
}

/** PATCH /api/change-orders/:id — any of the create fields; a new `pricing` is priced again. */
export type ChangeOrderUpdate = Partial<ChangeOrderCreate>;

export interface ChangeOrderSummary {
  readonly id: string;
  readonly jobId: string;
  /** 1, 2, 3 … per job */
  readonly number: number;
  readonly title: string;
  readonly status: ChangeOrderStatus;
  readonly currency: string;
  readonly price: string;
  readonly tax: string;
  /** price + tax, signed */
  readonly amount: string;
  readonly sentAt: string | null;
  readonly decidedAt: string | null;
}

/** The engine's figures for an engine-priced change order, as the client reads them. */
export interface ChangeOrderEngineDetail {
  readonly finishName: string;
  readonly surfaces: ReadonlyArray<{ readonly room: string; readonly surface: string; readonly quantity: string }>;
  readonly labourHours: string;
  readonly workingDays: number;
}

export interface ChangeOrderView extends ChangeOrderSummary {
  /** the job it changes, for the reader */
  readonly jobTitle: string;
  readonly description: string;
  readonly pricingKind: 'lumpSum' | 'engine';
  /** how the office priced it (the lump sum, or the surfaces and finish), to change a draft */
  readonly pricing: ChangeOrderPricing;
  readonly engine: ChangeOrderEngineDetail | null;
  readonly signedName: string | null;
  readonly clientComment: string;
  /** the contract sum before and after approval, for the reader */
  readonly contractSumBefore: string;
  readonly contractSumAfter: string;
  /** why a lump sum carries no tax under the firm's tax mode (CHANGE_ORDER_TAX_NOTES); null otherwise */
  readonly taxNote: ChangeOrderTaxNote | null;
}

/** POST /api/portal/change-orders/:id/decision */
export type ChangeOrderDecision =
  | { readonly decision: 'approve'; readonly signedName: string; readonly consent: true; readonly comment?: string }
  | { readonly decision: 'decline'; readonly comment?: string };

export const CHANGE_ORDER_LIMITS = { titleMaxLength: 160, descriptionMaxLength: 4000, surfacesMax: 200, commentMaxLength: 2000 } as const;

/** A signed amount with at most two decimals: "-250.00" deducts (the currency's own minor units are checked by the server). */
export const SIGNED_MONEY_PATTERN = /^-?\d{1,12}(\.\d{1,2})?$/;
