import { z } from 'zod';
import { email } from '../auth/fields';
import { pageQuery, requiredText, text, uuid, yearBuilt } from '../common/fields';

export const CLIENT_KINDS = ['homeowner', 'designer', 'general_contractor', 'other'] as const;
export type ClientKind = (typeof CLIENT_KINDS)[number];
export const CLIENT_KIND_LABELS: Record<ClientKind, string> = {
  homeowner: 'Homeowner',
  designer: 'Interior designer',
  general_contractor: 'General contractor',
  other: 'Other',
};

const optionalEmail = z.union([email, z.literal('')]).default('');

export const siteCreate = z.strictObject({
  label: text(80).default(''),
  addressLine1: requiredText(200, 'Enter the street address.'),
  addressLine2: text(200).default(''),
  city: text(80).default(''),
  region: text(80).default(''),
  postalCode: text(20).default(''),
  country: z.string().trim().regex(/^[A-Z]{2}$/, { error: 'Use a two-letter country code, like US.' }).default('US'),
  yearBuilt: yearBuilt.nullable().default(null),
  accessNotes: text(2000).default(''),
});
export type SiteCreate = z.infer<typeof siteCreate>;

export const contactCreate = z.strictObject({
  name: requiredText(120, 'Enter the contact name.'),
  email: optionalEmail,
  phone: text(40).default(''),
  roleTitle: text(80).default(''),
});
export type ContactCreate = z.infer<typeof contactCreate>;

export const clientCreate = z.strictObject({
  kind: z.enum(CLIENT_KINDS, { error: 'Choose homeowner, designer, general contractor or other.' }),
  isCompany: z.boolean().default(false),
  name: requiredText(160, 'Enter the client name.'),
  email: optionalEmail,
  phone: text(40).default(''),
  notes: text(5000).default(''),
});
export type ClientCreate = z.infer<typeof clientCreate>;
export const clientUpdate = clientCreate.partial().strict();

export const clientListQuery = z.strictObject({
  q: z.string().trim().max(100).optional(),
  kind: z.enum(CLIENT_KINDS, { error: 'Unknown kind.' }).optional(),
  ...pageQuery,
});

/** Booking a visit or winning: make or link the client and site from the inquiry without retyping. */
export const inquiryConvert = z.strictObject({
  clientId: uuid('client').optional(),
  client: clientCreate.optional(),
  siteId: uuid('site').optional(),
  site: siteCreate.optional(),
});
export type InquiryConvert = z.infer<typeof inquiryConvert>;

export interface SiteView extends SiteCreate {
  readonly id: string;
  readonly clientId: string;
  readonly isPre1978: boolean | null;
}
export interface ContactView extends ContactCreate {
  readonly id: string;
}
export interface ClientSummary {
  readonly id: string;
  readonly kind: ClientKind;
  readonly isCompany: boolean;
  readonly name: string;
  readonly email: string;
  readonly phone: string;
  readonly createdAt: string;
}
export interface ClientDetail extends ClientSummary {
  readonly notes: string;
  readonly contacts: readonly ContactView[];
  readonly sites: readonly SiteView[];
  readonly inquiries: readonly { id: string; contactName: string; stage: string; createdAt: string }[];
}
