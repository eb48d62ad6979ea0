/**
 * The owner's activity view, without zod (GET /api/audit). Every change the firm's people, its
 * clients and the system make is in the audit log under an action name (`invoice.issued`); the
 * kinds below sort those names into the groups the owner filters by.
 */
import type { KeysetPage } from '../common/lists';

export const AUDIT_KINDS = ['signIns', 'library', 'estimates', 'invoices', 'voids', 'payments', 'jobs', 'clients', 'team'] as const;
export type AuditKind = (typeof AUDIT_KINDS)[number];

export interface AuditKindRule {
  /** action names in this kind, whatever their prefix says */
  readonly exact: readonly string[];
  /** action names starting with one of these, unless another kind names them exactly */
  readonly prefixes: readonly string[];
}

/**
 * Which actions each kind holds. An exact name wins over any prefix, so `firm.estimating_settings_changed`
 * is a price change although `firm.` is the team-and-settings prefix. Every kind is disjoint from the others.
 */
export const AUDIT_KIND_RULES: Readonly<Record<AuditKind, AuditKindRule>> = {
  signIns: { exact: ['firm.secondFactorRequired'], prefixes: ['staff.'] },
  library: { exact: ['firm.estimating_settings_changed'], prefixes: ['product.', 'finish_system.'] },
  estimates: { exact: [], prefixes: ['estimate.', 'proposal.', 'change_order.', 'samples.'] },
  invoices: {
    exact: ['invoice.drafted', 'invoice.updated', 'invoice.deleted', 'invoice.issued', 'invoice.sent', 'invoice.reminded'],
    prefixes: ['billing.'],
  },
  voids: { exact: ['invoice.voided'], prefixes: ['credit_note.'] },
  payments: {
    exact: ['invoice.payment_recorded', 'invoice.payment_needs_attention', 'invoice.attention_cleared'],
    prefixes: ['invoice.refund_', 'payment.', 'refund.'],
  },
  jobs: { exact: [], prefixes: ['job.', 'jobs.', 'progress.', 'takeoff.'] },
  clients: { exact: [], prefixes: ['client.', 'inquiry.', 'inquiry_stages.'] },
  team: { exact: [], prefixes: ['member.', 'invitation.', 'firm.', 'demo.'] },
};

const EXACT_KIND = new Map<string, AuditKind>(AUDIT_KINDS.flatMap((kind) => AUDIT_KIND_RULES[kind].exact.map((a) => [a, kind] as const)));

/** The kind an action belongs to (null: none yet — it still shows under "everything"). */
export function auditKindOf(action: string): AuditKind | null {
  const exact = EXACT_KIND.get(action);
  if (exact) return exact;
  return AUDIT_KINDS.find((kind) => AUDIT_KIND_RULES[kind].prefixes.some((p) => action.startsWith(p))) ?? null;
}

/** Where a record of the log is seen in the admin app; `id` is null for a page without one (team, settings). */
export const AUDIT_RECORD_AREAS = [
  'invoice',
  'job',
  'client',
  'estimate',
  'inquiry',
  'sampleBoard',
  'finishSystem',
  'products',
  'team',
  'settings',
] as const;
export type AuditRecordArea = (typeof AUDIT_RECORD_AREAS)[number];

export interface AuditRecordLink {
  readonly area: AuditRecordArea;
  readonly id: string | null;
}

export interface AuditActor {
  readonly kind: 'staff' | 'client' | 'system';
  /** the staff member's user id, or the portal user's id for a client */
  readonly id: string | null;
  /** null for the system, or a person no longer found */
  readonly name: string | null;
  readonly email: string | null;
}

/** One line of the firm's activity. */
export interface AuditEntry {
  readonly id: string;
  /** ISO instant */
  readonly at: string;
  readonly actor: AuditActor;
  /** the stored action name, e.g. `invoice.issued` */
  readonly action: string;
  readonly kind: AuditKind | null;
  /** what kind of record, e.g. `invoice`, and its id */
  readonly entity: string;
  readonly entityId: string | null;
  /** what happened, in a sentence built from the entry's data ("Issued invoice INV-0007 for 1200.00, due 2026-12-31.") */
  readonly summary: string;
  /** the page that shows the record, when there is one */
  readonly link: AuditRecordLink | null;
}

export type AuditPage = KeysetPage<AuditEntry>;

/** GET /api/audit?person=&kind=&action=&record=&from=&to=&after=&limit= — days are the firm's calendar days. */
export interface AuditListRequest {
  readonly person?: string;
  readonly kind?: AuditKind;
  readonly action?: string;
  readonly record?: string;
  readonly from?: string;
  readonly to?: string;
  readonly after?: string;
  readonly limit: number;
}

/** Longest action name a filter accepts. */
export const AUDIT_ACTION_MAX_LENGTH = 80;

/** The export's format: manifest.json's `formatVersion` (raised when a file's shape changes). */
export const FIRM_EXPORT_FORMAT_VERSION = 1;
