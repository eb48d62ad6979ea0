import type { FirmSettingsUpdate } from '@layerbook/contracts';

// Kept here rather than imported from the contracts package: see core/auth/roles.ts for why.
// The `satisfies` checks fail the build if the API's choices change under us.

export type UnitSystem = FirmSettingsUpdate['units'];
export type Language = FirmSettingsUpdate['language'];

export const UNIT_CHOICES = [
  { value: 'imperial', label: 'Imperial (ft, gal)' },
  { value: 'metric', label: 'Metric (m, L)' },
] as const satisfies readonly { value: UnitSystem; label: string }[];

export const LANGUAGE_CHOICES = [
  { value: 'en', label: 'English', lang: 'en' },
  { value: 'es', label: 'Español', lang: 'es' },
] as const satisfies readonly { value: Language; label: string; lang: string }[];

type MissingUnit = Exclude<UnitSystem, (typeof UNIT_CHOICES)[number]['value']>;
type MissingLanguage = Exclude<Language, (typeof LANGUAGE_CHOICES)[number]['value']>;
export const ALL_CHOICES_LISTED: [MissingUnit | MissingLanguage] extends [never] ? true : never = true;

/** Mirrors COMMON_CURRENCIES in the contracts package; the API accepts any Stripe currency. */
export const CURRENCY_CHOICES = ['USD', 'CAD', 'EUR', 'GBP', 'AUD', 'NZD', 'MXN', 'CHF', 'JPY'] as const;
