import { DATE_YEAR_MESSAGE, HOLIDAYS_MAX, ISO_DATE_PATTERN } from '@layerbook/contracts/types';
import { isDateYearAllowed } from '../../shared/forms/iso-date';

/** One day off as typed into settings: a calendar day, or what is wrong with it (the API's words). */
export type HolidayReading = { readonly date: string } | { readonly error: string };

/** Reads "2026-12-25" (spaces around it allowed) against the days already off. */
export function readHoliday(text: string, current: readonly string[]): HolidayReading {
  const date = text.trim();
  if (!ISO_DATE_PATTERN.test(date)) return { error: 'Enter a date as YYYY-MM-DD, like 2026-12-25.' };
  const [year, month, day] = date.split('-').map(Number);
  // Before the calendar check, as the API does (Date.UTC reads the years 0–99 as 1900–1999).
  if (!isDateYearAllowed(year)) return { error: DATE_YEAR_MESSAGE };
  const asUtc = new Date(Date.UTC(year, month - 1, day));
  if (asUtc.getUTCFullYear() !== year || asUtc.getUTCMonth() !== month - 1 || asUtc.getUTCDate() !== day) {
    return { error: 'That date does not exist.' };
  }
  if (current.includes(date)) return { error: 'That day is already off.' };
  if (current.length >= HOLIDAYS_MAX) return { error: `At most ${HOLIDAYS_MAX} days off; remove past ones first.` };
  return { date };
}

/** The list with one more day, in date order (YYYY-MM-DD sorts as text). */
export function withHoliday(current: readonly string[], date: string): string[] {
  return [...new Set([...current, date])].sort();
}

export function withoutHoliday(current: readonly string[], date: string): string[] {
  return current.filter((d) => d !== date);
}
