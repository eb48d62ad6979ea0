/**
 * A calendar day (YYYY-MM-DD) written out for people: "December 3, 2026" in en-US. Messages to the
 * office name days this way — the month spelled out reads the same wherever the firm is.
 */
export function longDate(isoDay: string, locale = 'en-US'): string {
  return new Intl.DateTimeFormat(locale, { dateStyle: 'long', timeZone: 'UTC' }).format(new Date(`${isoDay}T00:00:00Z`));
}
