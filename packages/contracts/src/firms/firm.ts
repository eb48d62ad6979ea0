import { z } from 'zod';

export const UNIT_SYSTEMS = ['imperial', 'metric'] as const;
export const LANGUAGES = ['en', 'es'] as const;

/** ISO 4217 code: three capital letters. The server checks it is a currency it can bill in. */
const currency = z
  .string({ error: 'Choose a currency.' })
  .regex(/^[A-Z]{3}$/, { error: 'Use a three-letter currency code, like USD.' });

const timeZone = z
  .string({ error: 'Choose a time zone.' })
  .min(1, { error: 'Choose a time zone.' })
  .refine((tz) => isKnownTimeZone(tz), { error: 'Choose a time zone from the list.' });

function isKnownTimeZone(tz: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}

const line = (label: string, max = 120) =>
  z.string({ error: `Enter the ${label}.` }).trim().max(max, { error: `Use at most ${max} characters.` });

export const firmSettingsUpdate = z.strictObject({
  name: line('firm name').min(2, { error: 'Enter the firm name.' }),
  addressLine1: line('street address'),
  addressLine2: line('second address line'),
  city: line('town or city', 80),
  region: line('state, province or region', 80),
  postalCode: line('postal code', 20),
  country: z.string().trim().regex(/^[A-Z]{2}$/, { error: 'Use a two-letter country code, like US.' }),
  phone: line('phone number', 40),
  timeZone,
  currency,
  units: z.enum(UNIT_SYSTEMS, { error: 'Choose imperial or metric.' }),
  language: z.enum(LANGUAGES, { error: 'Choose English or Spanish.' }),
});
export type FirmSettingsUpdate = z.infer<typeof firmSettingsUpdate>;

export interface FirmSettings extends FirmSettingsUpdate {
  readonly id: string;
  readonly slug: string;
  readonly updatedAt: string;
}

/** Currencies offered in the settings form (any Stripe currency is accepted by the API). */
export const COMMON_CURRENCIES = ['USD', 'CAD', 'EUR', 'GBP', 'AUD', 'NZD', 'MXN', 'CHF', 'JPY'] as const;
