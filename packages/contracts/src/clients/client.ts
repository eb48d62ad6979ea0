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

const siteFields = {
  label: text(80),
  addressLine1: requiredText(200, 'Enter the street address.'),
  addressLine2: text(200),
  city: text(80),
  region: text(80),
  postalCode: text(20),
  country: z.string().trim().regex(/^[A-Z]{2}$/, { error: 'Use a two-letter country code, like US.' }),
  yearBuilt: yearBuilt.nullable(),
  accessNotes: text(2000),
};
export const siteCreate = z.strictObject({
  ...siteFields,
  label: siteFields.label.default(''),
  addressLine2: siteFields.addressLine2.default(''),
  city: siteFields.city.default(''),
  region: siteFields.region.default(''),
  postalCode: siteFields.postalCode.default(''),
  country: siteFields.country.default('US'),
  yearBuilt: siteFields.yearBuilt.default(null),
  accessNotes: siteFields.accessNotes.default(''),
});
export type SiteCreate = z.infer<typeof siteCreate>;
/** No defaults: a partial update changes only what it names. */
export const siteUpdate = z.strictObject(siteFields).partial();

export const contactCreate = z.strictObject({
  name: requiredText(120, 'Enter the contact name.'),
  email: optionalEmail,
  phone: text(40).default(''),
  roleTitle: text(80).default(''),
});
export type ContactCreate = z.infer<typeof contactCreate>;

const clientFields = {
  kind: z.enum(CLIENT_KINDS, { error: 'Choose homeowner, designer, general contractor or other.' }),
  isCompany: z.boolean({ error: 'Say whether this is a company.' }),
  name: requiredText(160, 'Enter the client name.'),
  email: z.union([email, z.literal('')]),
  phone: text(40),
  notes: text(5000),
};
export const clientCreate = z.strictObject({
  ...clientFields,
  isCompany: clientFields.isCompany.default(false),
  email: clientFields.email.default(''),
  phone: clientFields.phone.default(''),
  notes: clientFields.notes.default(''),
});
export type ClientCreate = z.infer<typeof clientCreate>;
export const clientUpdate = z.strictObject(clientFields).partial();

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
