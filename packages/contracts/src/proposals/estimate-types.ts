import type { EstimateResultJson } from '@layerbook/domain';
import type { EstimateContext } from '../engine/context';

/*
 * The estimate builder's vocabulary, limits, request bodies and answers, free of zod so the apps
 * can import them (`@layerbook/contracts/types`); the schemas in estimate.ts are checked against them.
 */

export const ESTIMATE_STATUSES = ['draft', 'proposed', 'accepted', 'declined'] as const;
export type EstimateStatus = (typeof ESTIMATE_STATUSES)[number];
export const ESTIMATE_STATUS_LABELS: Readonly<Record<EstimateStatus, string>> = {
  draft: 'Draft',
  proposed: 'Proposal sent',
  accepted: 'Accepted',
  declined: 'Declined',
};

export const COST_LINE_KINDS = ['equipment', 'subcontracts', 'sundries'] as const;
export type CostLineKind = (typeof COST_LINE_KINDS)[number];

export const ESTIMATE_INPUT_LIMITS = {
  titleMax: 160,
  optionLabelMax: 80,
  addOnLabelMax: 120,
  costLabelMax: 120,
  /** options (A, B, C, D) priced side by side */
  optionsMax: 4,
  addOnsMax: 20,
  /** per kind of cost line */
  costLinesMax: 20,
  addOnHoursMax: 10_000,
  /** option and add-on ids: letters, digits, - and _ */
  shortIdMax: 40,
  discountPercentMax: 100,
  /** internal notes and notes for the client, each */
  notesMax: 4000,
} as const;

/** The pattern of option and add-on ids ("A", "addon-2"). */
export const ESTIMATE_SHORT_ID_PATTERN = new RegExp(`^[A-Za-z0-9_-]{1,${ESTIMATE_INPUT_LIMITS.shortIdMax}}$`);

export interface EstimateVariantInput {
  id: string;
  label: string;
  /** which finish system goes on each surface this option prices */
  surfaces: { surfaceId: string; finishSystemId: string }[];
}

export interface EstimateAddOnInput {
  id: string;
  label: string;
  labourHours: number;
  /** a decimal string */
  materialsCost: string;
}

export interface CostLineInput {
  label: string;
  /** a decimal string */
  amount: string;
}

export type EstimateDiscountInput = { kind: 'percent'; percent: number } | { kind: 'amount'; amount: string };

/**
 * What the office chooses for an estimate (PUT /api/estimates/:id/inputs). A variant assigns a
 * finish system to each surface it prices ("Option A: polished lime plaster", "Option B:
 * limewash"); add-ons are alternates priced from their own labour and materials. Amounts are
 * decimal strings; percentages whole numbers.
 */
export interface EstimateInputs {
  title: string;
  startDate: string;
  isOccupied: boolean;
  variants: EstimateVariantInput[];
  addOns: EstimateAddOnInput[];
  equipment: CostLineInput[];
  subcontracts: CostLineInput[];
  sundries: CostLineInput[];
  discount: EstimateDiscountInput | null;
  /** price per unit² by finish system id, for the per-area comparison */
  perAreaRates: Record<string, string>;
  /** for the office only (pricing reminders, access, suppliers): never reaches a proposal, its PDF or the portal */
  internalNotes?: string;
  /** for the client: a new proposal's notes start from these */
  clientNotes?: string;
}

/**
 * PUT /api/estimates/:id/inputs: the inputs and the `computedAt` of the estimate as it was loaded (null
 * before its first save). Another save since answers 409 naming `computedAt`; a body without it is not checked.
 */
export interface EstimateSave extends EstimateInputs {
  computedAt?: string | null;
}

/** POST /api/estimates. */
export interface EstimateCreate {
  siteId: string;
  inquiryId: string | null;
  title: string;
  startDate: string;
}

/** One row of GET /api/estimates. */
export interface EstimateListItem {
  readonly id: string;
  readonly title: string;
  readonly status: EstimateStatus;
  /** the first option's quoted price, a decimal string; null until first saved */
  readonly price: string | null;
  readonly siteId: string;
  readonly clientId: string;
  readonly clientName: string;
  readonly updatedAt: string;
}

/** One option's numbers as the server computed them on save. */
export interface EstimateOptionResult {
  readonly id: string;
  readonly label: string;
  readonly result: EstimateResultJson;
}

/** GET /api/estimates/:id: the office's choices, the server's numbers and what to recompute from. */
export interface EstimateView {
  readonly id: string;
  readonly siteId: string;
  readonly clientId: string;
  readonly inquiryId: string | null;
  readonly title: string;
  readonly status: EstimateStatus;
  readonly inputs: EstimateInputs;
  /** the server's numbers, per option; null until the first save with a finish on some surface */
  /** `lengthUnit`: the unit the sizes were computed in, the firm's when saved (results saved before it was kept lack it) */
  readonly result: { readonly variants: readonly EstimateOptionResult[]; readonly lengthUnit?: 'ft' | 'm' } | null;
  readonly price: string | null;
  readonly computedAt: string | null;
  /** what the browser needs to recompute live with the same engine */
  readonly context: EstimateContext;
}
