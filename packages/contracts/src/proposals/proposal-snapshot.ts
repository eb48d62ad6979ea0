import type { DepositCapPresetId } from '../billing/billing-settings-types';
import type { ProposalTerms, ProposalVersionStatus } from './proposal-types';

/**
 * What the client reads and signs, frozen once sent: everything the PDF and the portal page show,
 * with no reference to live records. Money is decimal strings in `currency` (already at its
 * minor-unit precision); quantities are plain numbers rounded for display.
 */
export interface ProposalSnapshot {
  readonly schemaVersion: 1;
  readonly title: string;
  readonly issuedOn: string;
  readonly expiresOn: string;
  readonly currency: string;
  /** the locale money and dates are printed in */
  readonly locale: string;
  readonly lengthUnit: 'ft' | 'm';
  readonly firm: { readonly name: string; readonly addressLines: readonly string[]; readonly phone: string };
  readonly client: { readonly name: string; readonly email: string; readonly phone: string };
  readonly site: { readonly label: string; readonly addressLines: readonly string[]; readonly yearBuilt: number | null };
  readonly scope: readonly SnapshotRoom[];
  readonly options: readonly SnapshotOption[];
  readonly addOns: readonly SnapshotPrice[];
  readonly exclusions: readonly string[];
  readonly notes: string;
  readonly terms: ProposalTerms;
  /** the deposit rule the firm chose for its jurisdiction, by name ("No deposit limit" too); absent from older snapshots */
  readonly depositRule?: string;
  /** the ready-made rule it is, so a client reading another language reads its name in their words; absent for a rule the firm named */
  readonly depositRuleId?: DepositCapPresetId;
  readonly safety: { readonly standing: string; readonly cautions: readonly SnapshotCaution[] };
  /**
   * The lead-safe notice of a home built before 1978, or of one whose year is unknown while the
   * work disturbs paint (40 CFR 745); null when neither. Absent from snapshots made before it existed.
   */
  readonly leadNotice?: SnapshotLeadNotice | null;
}

export interface SnapshotLeadNotice {
  readonly title: string;
  readonly bullets: readonly string[];
  readonly rule: string;
  /** "A US federal rule.", and for a firm outside the US to check its own rules; absent from older snapshots */
  readonly jurisdiction?: string;
}

export interface SnapshotRoom {
  readonly id: string;
  readonly name: string;
  readonly surfaces: ReadonlyArray<{
    readonly id: string;
    readonly name: string;
    readonly measure: 'area' | 'length';
    readonly quantity: number;
    /** "ft²", "m²", "ft" or "m" */
    readonly unit: string;
    /** the finish each option puts on this surface (null: not in that option) */
    readonly finishes: ReadonlyArray<{ readonly optionId: string; readonly finish: string | null }>;
  }>;
}

export interface SnapshotPrice {
  readonly id: string;
  readonly label: string;
  readonly price: string;
  readonly tax: string;
  readonly total: string;
}

export type SnapshotPaymentTrigger =
  { readonly kind: 'acceptance' } | { readonly kind: 'layerComplete'; readonly layerId: string } | { readonly kind: 'walkthrough' };

export interface SnapshotPayment {
  readonly id: string;
  readonly label: string;
  readonly role: 'deposit' | 'milestone' | 'final';
  readonly trigger: SnapshotPaymentTrigger;
  /** the percentage asked for (null when a deposit cap turned it into a fixed amount or for the rest) */
  readonly percent: number | null;
  readonly amount: string;
  /** when the schedule expects it (null: on acceptance) */
  readonly expectedOn: string | null;
}

export interface SnapshotOption extends SnapshotPrice {
  readonly schedule: {
    readonly startDate: string;
    readonly finishDate: string;
    readonly workingDays: number;
    readonly milestones: ReadonlyArray<{ readonly id: string; readonly label: string; readonly date: string }>;
  };
  readonly payments: readonly SnapshotPayment[];
  readonly isDepositCapped: boolean;
}

export interface SnapshotCaution {
  readonly id: string;
  readonly title: string;
  readonly bullets: readonly string[];
  readonly rule: string;
  /** "A US federal rule." or "Guidance, not a regulation.", plus the outside-US line; absent from older snapshots */
  readonly jurisdiction?: string;
  readonly standing: string;
}

export interface ProposalVersionSummary {
  readonly id: string;
  readonly estimateId: string;
  readonly version: number;
  readonly status: ProposalVersionStatus;
  readonly title: string;
  readonly snapshotHash: string;
  readonly expiresOn: string;
  readonly sentAt: string | null;
  readonly decidedAt: string | null;
  readonly createdAt: string;
}

export interface ProposalVersionView extends ProposalVersionSummary {
  readonly snapshot: ProposalSnapshot;
  readonly acceptedVariantId: string | null;
  /** the add-ons the client took with the option (empty: none, or not accepted) */
  readonly acceptedAddOnIds: readonly string[];
  readonly signedName: string | null;
  readonly clientComment: string;
}
