/**
 * Money arrives as decimal strings ("1250.00"). Intl formats a numeric string exactly
 * (ECMA-402 "Intl.NumberFormat v3"), so no JavaScript float ever holds an amount; the cast only
 * satisfies the ES2022 typings, which predate string input.
 */
export function formatMoney(amount: string, currency: string, locale: string): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(amount as unknown as number);
}

/** A calendar day (YYYY-MM-DD) in words, read as that day wherever the browser is. */
export function formatDay(isoDay: string, locale: string): string {
  return new Intl.DateTimeFormat(locale, { dateStyle: 'long', timeZone: 'UTC' }).format(new Date(`${isoDay}T00:00:00Z`));
}

/** A moment (ISO timestamp) as a date in the reader's own zone. */
export function formatMoment(iso: string, locale: string): string {
  return new Intl.DateTimeFormat(locale, { dateStyle: 'long', timeStyle: 'short' }).format(new Date(iso));
}
