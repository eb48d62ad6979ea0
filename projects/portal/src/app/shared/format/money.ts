/** Money arrives as decimal strings ("1250.00"); the one formatter reads them exactly. */
export { formatMoney } from '@layerbook/domain';

/** A calendar day (YYYY-MM-DD) in words, read as that day wherever the browser is. */
export function formatDay(isoDay: string, locale: string): string {
  return new Intl.DateTimeFormat(locale, { dateStyle: 'long', timeZone: 'UTC' }).format(new Date(`${isoDay}T00:00:00Z`));
}

/** A moment (ISO timestamp) as a date in the reader's own zone. */
export function formatMoment(iso: string, locale: string): string {
  return new Intl.DateTimeFormat(locale, { dateStyle: 'long', timeStyle: 'short' }).format(new Date(iso));
}
