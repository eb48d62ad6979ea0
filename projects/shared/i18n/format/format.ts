/// <reference lib="es2023.intl" />
// ES2023's Intl typings let NumberFormat take a numeric string (ECMA-402 NumberFormat v3), so a
// decimal from the API is formatted exactly, never through a float.
import { DomainInputError, formatMoney } from '@layerbook/domain';
import { dateTimeFormat, numberFormat } from './intl-cache';

export type DateStyle = 'short' | 'medium' | 'long' | 'full';

const CALENDAR_DAY = /^\d{4}-\d{2}-\d{2}$/;

/**
 * An API amount (a decimal string like "12500.00") in its currency for the reader's locale, through
 * the domain's exact formatter. Empty for no amount; the amount as sent when there is no currency;
 * "amount CUR" when the formatter refuses the value, rather than breaking the page.
 */
export function formatAmount(amount: string | null | undefined, currency: string | null | undefined, locale: string): string {
  if (amount === null || amount === undefined || amount === '') return '';
  if (!currency) return amount;
  try {
    return formatMoney(amount, currency, locale);
  } catch (error) {
    if (error instanceof DomainInputError) return `${amount} ${currency}`;
    throw error;
  }
}

/**
 * A calendar day ("2026-03-14") in words. Read and written in UTC so the day never shifts with the
 * reader's time zone: a due date is a day, not an instant. What is not a day shows as sent.
 */
export function formatCalendarDay(isoDay: string, locale: string, style: DateStyle = 'medium'): string {
  const date = CALENDAR_DAY.test(isoDay) ? new Date(`${isoDay}T00:00:00Z`) : new Date(Number.NaN);
  if (Number.isNaN(date.getTime())) return isoDay;
  return dateTimeFormat(locale, { dateStyle: style, timeZone: 'UTC' }).format(date);
}

/**
 * An instant (ISO timestamp) as a date, and a time unless `timeStyle` is null, in `timeZone` (an IANA
 * name such as the firm's) or else the reader's own zone. What is not a timestamp shows as sent.
 */
export function formatInstant(
  iso: string,
  locale: string,
  dateStyle: DateStyle = 'medium',
  timeStyle: DateStyle | null = 'short',
  timeZone?: string,
): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  const options: Intl.DateTimeFormatOptions = { dateStyle, ...(timeStyle ? { timeStyle } : {}), ...(timeZone ? { timeZone } : {}) };
  try {
    return dateTimeFormat(locale, options).format(date);
  } catch {
    // An unknown time zone name: the reader's own zone rather than a broken page.
    return dateTimeFormat(locale, { dateStyle, ...(timeStyle ? { timeStyle } : {}) }).format(date);
  }
}

/** A calendar day ("YYYY-MM-DD") as a day, anything else as an instant (see the two functions above). */
export function formatDate(
  value: string | null | undefined,
  locale: string,
  style: DateStyle = 'medium',
  timeStyle?: DateStyle | null,
  timeZone?: string,
): string {
  if (!value) return '';
  if (CALENDAR_DAY.test(value)) return formatCalendarDay(value, locale, style);
  return formatInstant(value, locale, style, timeStyle === undefined ? 'short' : timeStyle, timeZone);
}

/**
 * A number, or a decimal string kept exact, for the reader's locale (grouping, decimal mark).
 * Options are Intl.NumberFormat's (e.g. `{ maximumFractionDigits: 1 }`, `{ style: 'percent' }`).
 * What is not a number shows as sent.
 */
export function formatNumber(value: number | string | null | undefined, locale: string, options: Intl.NumberFormatOptions = {}): string {
  if (value === null || value === undefined || value === '') return '';
  if (typeof value === 'number') return Number.isFinite(value) ? numberFormat(locale, options).format(value) : String(value);
  const text = value.trim();
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(text)) return value;
  return numberFormat(locale, options).format(text as Intl.StringNumericLiteral);
}
