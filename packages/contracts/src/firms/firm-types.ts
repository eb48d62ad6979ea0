/**
 * The firm's profile without zod: its choices with their words, field limits, what the owner
 * sends and what GET/PATCH /api/firm answer. The zod schema (firm.ts) is built from these.
 */

export const UNIT_SYSTEMS = ['imperial', 'metric'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];
export const UNIT_SYSTEM_LABELS: Readonly<Record<UnitSystem, string>> = {
  imperial: 'Imperial (ft, gal)',
  metric: 'Metric (m, L)',
};

export const LANGUAGES = ['en', 'es'] as const;
export type Language = (typeof LANGUAGES)[number];
/** Each language named in itself, so a reader of either finds theirs. */
export const LANGUAGE_LABELS: Readonly<Record<Language, string>> = {
  en: 'English',
  es: 'Español',
};

/** Currencies offered in the settings form (the API accepts any ISO 4217 code it can bill in). */
export const COMMON_CURRENCIES = ['USD', 'CAD', 'EUR', 'GBP', 'AUD', 'NZD', 'MXN', 'CHF', 'JPY'] as const;

/** Longest value of each text field of the firm's profile. */
export const FIRM_PROFILE_LIMITS = {
  addressLine1: 120,
  addressLine2: 120,
  city: 80,
  region: 80,
  postalCode: 20,
  /** VAT, GST, EIN… as printed on invoices */
  taxId: 40,
} as const;

// What the owner sends (PATCH /api/firm).
export interface FirmSettingsUpdate {
  readonly name: string;
  readonly addressLine1: string;
  readonly addressLine2: string;
  readonly city: string;
  readonly region: string;
  readonly postalCode: string;
  readonly country: string;
  readonly phone: string;
  readonly timeZone: string;
  readonly currency: string;
  readonly units: UnitSystem;
  readonly language: Language;
  /** the firm's tax registration printed on invoices ('' for none); left as it is when not sent */
  readonly taxId?: string;
}

/** GET and PATCH /api/firm. */
export interface FirmSettings extends FirmSettingsUpdate {
  readonly id: string;
  readonly slug: string;
  readonly taxId: string;
  /** the logo printed on invoices (the files route), null when none; set by POST /api/firm/logo, removed by DELETE */
  readonly logoUrl: string | null;
  readonly updatedAt: string;
}

/** The logo's form field in POST /api/firm/logo (multipart, one image). */
export const FIRM_LOGO_FIELD = 'file';
