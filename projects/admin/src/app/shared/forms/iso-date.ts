import type { AbstractControl, ValidationErrors } from '@angular/forms';
import { DATE_YEAR_MAX, DATE_YEAR_MESSAGE, DATE_YEAR_MIN } from '@layerbook/contracts/types';

/**
 * The datepicker works with local Date objects; the API with calendar days ("2026-03-14").
 * Both directions use local date parts, so midnight in the viewer's zone never moves the day.
 */
export function toIsoDate(date: Date | null): string | null {
  if (!date || Number.isNaN(date.getTime())) {
    return null;
  }
  const month = String(date.getMonth() + 1).padStart(2, '0');
  const day = String(date.getDate()).padStart(2, '0');
  return `${date.getFullYear()}-${month}-${day}`;
}

export function fromIsoDate(isoDate: string | null | undefined): Date | null {
  const match = isoDate ? /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate) : null;
  return match ? new Date(Number(match[1]), Number(match[2]) - 1, Number(match[3])) : null;
}

/**
 * The firm's today as a datepicker's local Date: the calendar day it is now in the firm's time zone
 * (the day the API dates things by), not the viewer's; the viewer's when the zone is unknown.
 */
export function firmToday(timeZone: string | null | undefined, now = new Date()): Date {
  if (!timeZone) return new Date(now.getFullYear(), now.getMonth(), now.getDate());
  const parts = new Intl.DateTimeFormat('en-US', { timeZone, year: 'numeric', month: 'numeric', day: 'numeric' }).formatToParts(now);
  const part = (type: string) => Number(parts.find((p) => p.type === type)?.value);
  return new Date(part('year'), part('month') - 1, part('day'));
}

/** Whether a calendar day's year is one the API takes (DATE_YEAR_MIN to DATE_YEAR_MAX). */
export function isDateYearAllowed(year: number): boolean {
  return Number.isInteger(year) && year >= DATE_YEAR_MIN && year <= DATE_YEAR_MAX;
}

/**
 * Refuses a day outside the years the API takes (a typed 0026 for 2026), as the API does. Takes a
 * datepicker's Date or a "YYYY-MM-DD" text; an empty or unreadable value is left to other validators.
 */
export function dateYearInRange(control: AbstractControl<Date | string | null>): ValidationErrors | null {
  const value = control.value;
  let year: number | null = null;
  if (value instanceof Date) year = Number.isNaN(value.getTime()) ? null : value.getFullYear();
  else if (typeof value === 'string') {
    const match = /^\s*(\d{4})-\d{2}-\d{2}\s*$/.exec(value);
    year = match ? Number(match[1]) : null;
  }
  return year === null || isDateYearAllowed(year) ? null : { dateYear: { min: DATE_YEAR_MIN, max: DATE_YEAR_MAX } };
}

/** The words for `dateYear`, the API's own: add them to each date field's words. */
export const DATE_YEAR_WORDS = { dateYear: DATE_YEAR_MESSAGE } as const;
