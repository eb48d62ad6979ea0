/**
 * Clients, their people and sites without zod: kinds with their words, field limits, what the
 * apps send and what the client and site routes answer. The zod schemas (client.ts) use these.
 */
import type { Language } from '../firms/firm-types';
import type { InquiryStage } from '../inquiries/inquiry-types';

export const CLIENT_KINDS = ['homeowner', 'designer', 'general_contractor', 'other'] as const;
export type ClientKind = (typeof CLIENT_KINDS)[number];
export const CLIENT_KIND_LABELS: Readonly<Record<ClientKind, string>> = {
  homeowner: 'Homeowner',
  designer: 'Interior designer',
  general_contractor: 'General contractor',
  other: 'Other',
};

export function isClientKind(value: unknown): value is ClientKind {
  return typeof value === 'string' && (CLIENT_KINDS as readonly string[]).includes(value);
}

/** Longest value of each text field of a client, a contact and a site. */
export const CLIENT_LIMITS = {
  name: 160,
  notes: 5000,
  contactName: 120,
  roleTitle: 80,
  siteLabel: 80,
  // as long as an inquiry's siteAddress (INQUIRY_LIMITS), which filing an inquiry copies here whole
  addressLine1: 300,
  addressLine2: 200,
  city: 80,
  region: 80,
  postalCode: 20,
  accessNotes: 2000,
} as const;

/** A new site's country until someone says otherwise. */
export const DEFAULT_COUNTRY = 'US';

// What the apps send.
export interface ClientCreate {
  readonly kind: ClientKind;
  readonly isCompany: boolean;
  readonly name: string;
  readonly email: string;
  readonly phone: string;
  readonly notes: string;
  /** the language of the client's portal, e-mails and PDFs; null or left out = the firm's language */
  readonly language?: Language | null;
}
/** PATCH /api/clients/:id changes only what it names. */
export type ClientUpdate = Partial<ClientCreate>;

export interface ContactCreate {
  readonly name: string;
  readonly email: string;
  readonly phone: string;
  readonly roleTitle: string;
}

export interface SiteCreate {
  readonly label: string;
  readonly addressLine1: string;
  readonly addressLine2: string;
  readonly city: string;
  readonly region: string;
  readonly postalCode: string;
  /** ISO 3166-1 alpha-2; left out on create = the firm's country */
  readonly country?: string;
  readonly yearBuilt: number | null;
  readonly accessNotes: string;
}
/** PATCH /api/sites/:id changes only what it names. */
export type SiteUpdate = Partial<SiteCreate>;

// What the client and site routes answer.
export interface SiteView extends SiteCreate {
  readonly id: string;
  readonly country: string;
  readonly clientId: string;
  /** Built before 1978 (lead-safe work rules apply); null when the year is not known. */
  readonly isPre1978: boolean | null;
}

export interface ContactView extends ContactCreate {
  readonly id: string;
}

/** One client in the list (GET /api/clients, keyset) and the answer to a create or edit. */
export interface ClientSummary {
  readonly id: string;
  readonly kind: ClientKind;
  readonly isCompany: boolean;
  readonly name: string;
  readonly email: string;
  readonly phone: string;
  readonly createdAt: string;
}

/** An inquiry filed under a client. */
export interface ClientInquiry {
  readonly id: string;
  readonly contactName: string;
  readonly stage: InquiryStage;
  readonly createdAt: string;
}

/** GET /api/clients/:id. */
export interface ClientDetail extends ClientSummary {
  readonly notes: string;
  /** the client's own language choice; null = the firm's language */
  readonly language: Language | null;
  readonly contacts: readonly ContactView[];
  readonly sites: readonly SiteView[];
  readonly inquiries: readonly ClientInquiry[];
}

/** Why a client may be the same person as the one at hand: the same e-mail, phone number or name. */
export const CLIENT_MATCH_REASONS = ['email', 'phone', 'name'] as const;
export type ClientMatchReason = (typeof CLIENT_MATCH_REASONS)[number];
export const CLIENT_MATCH_REASON_LABELS: Readonly<Record<ClientMatchReason, string>> = {
  email: 'same e-mail',
  phone: 'same phone',
  name: 'same name',
};

/** GET /api/inquiries/:id/client-matches and GET /api/clients/:id/matches: clients that may be the same. */
export interface ClientMatch extends ClientSummary {
  readonly matchedOn: readonly ClientMatchReason[];
}

/** POST /api/clients/:id/merge: everything of this client moves to `intoClientId`, then this one goes. */
export interface ClientMerge {
  readonly intoClientId: string;
}
