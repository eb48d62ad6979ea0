/** Fewer digits than this cannot tell one person's number from another's. */
const PHONE_MIN_DIGITS = 7;

/** Digits only, so "(555) 010-0100" and "555.010.0100" compare equal; too short to tell people apart: none. */
export function phoneDigits(phone: string): string {
  const digits = phone.replace(/\D/g, '');
  return digits.length >= PHONE_MIN_DIGITS ? digits : '';
}

/**
 * The digits of a search that looks like a phone number (digits with the usual spaces, dots, dashes,
 * brackets and plus), else none: only then is it worth comparing every row's phone by its digits.
 */
export function phoneSearchDigits(q: string): string {
  return /^[\d\s().+-]+$/.test(q.trim()) ? phoneDigits(q) : '';
}

/** SQL: a row's phone, digits only (compare with `like` against a phoneSearchDigits pattern). */
export const phoneDigitsSql = (column: string): string => `regexp_replace(${column}, '\\D', '', 'g')`;
