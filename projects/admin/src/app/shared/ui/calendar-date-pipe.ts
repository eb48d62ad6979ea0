import { LOCALE_ID, Pipe, PipeTransform, inject } from '@angular/core';

/**
 * Shows a calendar date from the API ("2026-03-14") as words. It is read and written in UTC so
 * the day never shifts with the viewer's time zone: a follow-up date is a day, not an instant.
 */
@Pipe({ name: 'calendarDate' })
export class CalendarDatePipe implements PipeTransform {
  private readonly locale = inject(LOCALE_ID);

  transform(isoDate: string | null | undefined, style: 'medium' | 'full' = 'medium'): string {
    return isoDate ? formatCalendarDate(isoDate, this.locale, style) : '';
  }
}

export function formatCalendarDate(isoDate: string, locale: string, style: 'medium' | 'full' = 'medium'): string {
  const date = new Date(`${isoDate}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) {
    return isoDate;
  }
  return new Intl.DateTimeFormat(locale, { dateStyle: style, timeZone: 'UTC' }).format(date);
}
