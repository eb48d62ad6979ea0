import { z } from 'zod';
import { email } from '../auth/fields';
import { PHONE_MAX_LENGTH } from '../common/field-limits';
import { isCountryCode } from '../firms/countries';
import { LANGUAGES } from '../firms/firm-types';
import { pageQuery, requiredText, text, uuid, yearBuilt } from '../common/fields';
import { SEARCH_MAX_LENGTH } from '../common/lists';
import { requestSchema } from '../common/schema-check';
import {
  CLIENT_KINDS,
  CLIENT_LIMITS as L,
  type ClientCreate,
  type ClientMerge,
  type ClientUpdate,
  type ContactCreate,
  type SiteCreate,
  type SiteUpdate,
} from './client-types';

const optionalEmail = z.union([email, z.literal('')]);

/** Site fields with no defaults, so a partial update never blanks a field it does not name. */
const siteFields = {
  label: text(L.siteLabel),
  addressLine1: requiredText(L.addressLine1, 'Enter the street address.'),
  addressLine2: text(L.addressLine2),
  city: text(L.city),
  region: text(L.region),
  postalCode: text(L.postalCode),
  // The same ISO 3166-1 list as the firm's country (firms/countries.ts): "UN" or "XX" are refused.
  country: z
    .string({ error: 'Choose a country.' })
    .trim()
    .refine((code): boolean => isCountryCode(code), { error: 'Choose a country from the list (an ISO 3166-1 code, like US).' }),
  yearBuilt: yearBuilt.nullable(),
  accessNotes: text(L.accessNotes),
};
export const siteCreate = requestSchema<SiteCreate>()(
  z.strictObject({
    ...siteFields,
    label: siteFields.label.default(''),
    addressLine2: siteFields.addressLine2.default(''),
    city: siteFields.city.default(''),
    region: siteFields.region.default(''),
    postalCode: siteFields.postalCode.default(''),
    // Left out, the site is in the firm's country (clients/service.ts).
    country: siteFields.country.optional(),
    yearBuilt: siteFields.yearBuilt.default(null),
    accessNotes: siteFields.accessNotes.default(''),
  }),
);
export const siteUpdate = requestSchema<SiteUpdate>()(z.strictObject(siteFields).partial());

export const contactCreate = requestSchema<ContactCreate>()(
  z.strictObject({
    name: requiredText(L.contactName, 'Enter the contact name.'),
    email: optionalEmail.default(''),
    phone: text(PHONE_MAX_LENGTH).default(''),
    roleTitle: text(L.roleTitle).default(''),
  }),
);

const clientFields = {
  kind: z.enum(CLIENT_KINDS, { error: 'Choose homeowner, designer, general contractor or other.' }),
  isCompany: z.boolean({ error: 'Say whether this is a company.' }),
  name: requiredText(L.name, 'Enter the client name.'),
  email: optionalEmail,
  phone: text(PHONE_MAX_LENGTH),
  notes: text(L.notes),
  // null = the firm's language; left out on create = null
  language: z.enum(LANGUAGES, { error: 'Choose English or Spanish, or leave it to the firm.' }).nullable().optional(),
};
export const clientCreate = requestSchema<ClientCreate>()(
  z.strictObject({
    ...clientFields,
    isCompany: clientFields.isCompany.default(false),
    email: clientFields.email.default(''),
    phone: clientFields.phone.default(''),
    notes: clientFields.notes.default(''),
  }),
);
export const clientUpdate = requestSchema<ClientUpdate>()(z.strictObject(clientFields).partial());

export const clientListQuery = z.strictObject({
  q: z.string().trim().max(SEARCH_MAX_LENGTH).optional(),
  kind: z.enum(CLIENT_KINDS, { error: 'Unknown kind.' }).optional(),
  ...pageQuery,
});
export type ClientListQuery = z.infer<typeof clientListQuery>;

export const clientIdParam = z.strictObject({ id: uuid('client id') });
export const siteIdParam = z.strictObject({ id: uuid('site id') });

export const clientMerge = requestSchema<ClientMerge>()(z.strictObject({ intoClientId: uuid('client to keep') }));
