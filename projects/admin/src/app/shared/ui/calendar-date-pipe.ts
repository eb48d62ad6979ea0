import { Pipe, type PipeTransform } from '@angular/core';
import { LbDatePipe, formatCalendarDay } from '../../../../../shared/i18n/format';

/**
 * `{{ day | calendarDate }}`: a calendar date from the API ("2026-03-14") as words in the reader's
 * language. It is read and written in UTC so the day never shifts with the viewer's time zone: a
 * follow-up date is a day, not an instant (the shared `lbDate`, under the name admin templates use).
 */
@Pipe({ name: 'calendarDate', pure: false })
export class CalendarDatePipe extends LbDatePipe implements PipeTransform {}

/** For words built in code: pass `inject(Language).locale()`. */
export function formatCalendarDate(isoDate: string, locale: string, style: 'medium' | 'full' = 'medium'): string {
  return formatCalendarDay(isoDate, locale, style);
}
