import { z } from 'zod';
import { FIRM_NAME_MAX_LENGTH, FIRM_NAME_MIN_LENGTH } from '../auth/auth-types';
import { CURRENCY_CODE_PATTERN, PHONE_MAX_LENGTH } from '../common/field-limits';
import { requestSchema } from '../common/schema-check';
import { isCountryCode } from './countries';
import { FIRM_PROFILE_LIMITS, LANGUAGES, UNIT_SYSTEMS, type FirmSettingsUpdate } from './firm-types';

/** ISO 4217 code: three capital letters. The server checks it is a currency it can bill in. */
const currency = z
  .string({ error: 'Choose a currency.' })
  .regex(CURRENCY_CODE_PATTERN, { error: 'Use a three-letter currency code, like USD.' });

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

const line = (label: string, max: number) =>
  z
    .string({ error: `Enter the ${label}.` })
    .trim()
    .max(max, { error: `Use at most ${max} characters.` });

export const firmSettingsUpdate = requestSchema<FirmSettingsUpdate>()(
  z.strictObject({
    name: line('firm name', FIRM_NAME_MAX_LENGTH).min(FIRM_NAME_MIN_LENGTH, { error: 'Enter the firm name.' }),
    addressLine1: line('street address', FIRM_PROFILE_LIMITS.addressLine1),
    addressLine2: line('second address line', FIRM_PROFILE_LIMITS.addressLine2),
    city: line('town or city', FIRM_PROFILE_LIMITS.city),
    region: line('state, province or region', FIRM_PROFILE_LIMITS.region),
    postalCode: line('postal code', FIRM_PROFILE_LIMITS.postalCode),
    country: z
      .string({ error: 'Choose a country.' })
      .trim()
      .refine((code): boolean => isCountryCode(code), { error: 'Choose a country from the list (an ISO 3166-1 code, like US).' }),
    phone: line('phone number', PHONE_MAX_LENGTH),
    timeZone,
    currency,
    units: z.enum(UNIT_SYSTEMS, { error: 'Choose imperial or metric.' }),
    language: z.enum(LANGUAGES, { error: 'Choose English or Spanish.' }),
    taxId: line('tax number', FIRM_PROFILE_LIMITS.taxId).optional(),
  }),
);
