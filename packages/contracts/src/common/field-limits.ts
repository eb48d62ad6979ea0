/**
 * Limits and patterns that several areas' fields share. The zod schemas check them on the
 * server; the apps' validators use the same constants, so both sides refuse the same input.
 */

/** Money in API bodies is a decimal string ("1250.00"), never a float. */
export const MONEY_AMOUNT_PATTERN = /^\d{1,12}(\.\d{1,2})?$/;

/** A calendar day as the API sends and takes it: "2026-03-14". */
export const ISO_DATE_PATTERN = /^\d{4}-\d{2}-\d{2}$/;

/**
 * Years a calendar day may fall in. Outside them a date is a typing slip (0026 for 2026), and year
 * 0000 does not exist in PostgreSQL's calendar at all.
 */
export const DATE_YEAR_MIN = 1900;
export const DATE_YEAR_MAX = 2999;
/** What the API and the apps say of a day outside those years. */
export const DATE_YEAR_MESSAGE = `Enter a date between ${DATE_YEAR_MIN} and ${DATE_YEAR_MAX}.`;

/** ISO 3166-1 alpha-2, as typed in capitals: "US". */
export const COUNTRY_CODE_PATTERN = /^[A-Z]{2}$/;

/** ISO 4217: three capital letters, "USD". */
export const CURRENCY_CODE_PATTERN = /^[A-Z]{3}$/;

/** The year a building was built: older than any building we will see, and not far ahead. */
export const YEAR_BUILT_MIN = 1600;
export const YEAR_BUILT_MAX = 2100;

/** A phone number as typed, spaces and all. */
export const PHONE_MAX_LENGTH = 40;
