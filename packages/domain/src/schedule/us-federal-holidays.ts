import { type IsoDate, fromDayNumber, isoWeekday, toDayNumber } from '../calendar/local-date';
import { DomainInputError } from '../errors/domain-input-error';

/** A holiday as the law fixes it: a date, or the nth (or last, n = -1) given weekday of a month. */
type HolidayRule = { name: string; month: number } & ({ day: number } | { weekday: number; nth: number });

/** The eleven legal public holidays of 5 U.S.C. 6103(a), weekdays numbered ISO (1 = Monday). */
const RULES: readonly HolidayRule[] = [
  { name: 'New Year’s Day', month: 1, day: 1 },
  { name: 'Birthday of Martin Luther King, Jr.', month: 1, weekday: 1, nth: 3 },
  { name: 'Washington’s Birthday', month: 2, weekday: 1, nth: 3 },
  { name: 'Memorial Day', month: 5, weekday: 1, nth: -1 },
  { name: 'Juneteenth National Independence Day', month: 6, day: 19 },
  { name: 'Independence Day', month: 7, day: 4 },
  { name: 'Labor Day', month: 9, weekday: 1, nth: 1 },
  { name: 'Columbus Day', month: 10, weekday: 1, nth: 2 },
  { name: 'Veterans Day', month: 11, day: 11 },
  { name: 'Thanksgiving Day', month: 11, weekday: 4, nth: 4 },
  { name: 'Christmas Day', month: 12, day: 25 },
];

const iso = (year: number, month: number, day: number) =>
  `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;

function dayOf(rule: HolidayRule, year: number): number {
  if ('day' in rule) {
    const day = toDayNumber(iso(year, rule.month, rule.day));
    // Observed day for a Monday–Friday week (OPM, "Federal Holidays"): Saturday → the Friday
    // before, Sunday → the Monday after.
    const weekday = isoWeekday(day);
    return weekday === 6 ? day - 1 : weekday === 7 ? day + 1 : day;
  }
  if (rule.nth > 0) {
    const first = toDayNumber(iso(year, rule.month, 1));
    return first + ((rule.weekday - isoWeekday(first) + 7) % 7) + (rule.nth - 1) * 7;
  }
  const nextMonth = rule.month === 12 ? toDayNumber(iso(year + 1, 1, 1)) : toDayNumber(iso(year, rule.month + 1, 1));
  const last = nextMonth - 1;
  return last - ((isoWeekday(last) - rule.weekday + 7) % 7);
}

/**
 * The US federal holidays of a year, on the days they are observed (a weekend date moves to
 * the Friday before or the Monday after), in date order. New Year's Day of the next year may be
 * observed on 31 December of this one; it is listed with its own year.
 */
export function usFederalHolidays(year: number): Array<{ date: IsoDate; name: string }> {
  if (!Number.isInteger(year) || year < 2021 || year > 9998) {
    // Juneteenth became a legal public holiday in 2021; earlier years would need a different list.
    throw new DomainInputError('year', 'Use a year from 2021 on.');
  }
  return RULES.map((rule) => ({ date: fromDayNumber(dayOf(rule, year)), name: rule.name })).sort((a, b) => a.date.localeCompare(b.date));
}

/** Observed US federal holidays from `from` (inclusive) to one year later (exclusive). */
export function usFederalHolidaysAhead(from: IsoDate): IsoDate[] {
  const start = toDayNumber(from, 'from');
  const year = Number(from.slice(0, 4));
  const end = toDayNumber(iso(year + 1, Number(from.slice(5, 7)), 1)) + Number(from.slice(8, 10)) - 1;
  return [...usFederalHolidays(year), ...usFederalHolidays(year + 1), ...usFederalHolidays(year + 2)]
    .map((h) => h.date)
    .filter((d) => {
      const n = toDayNumber(d);
      return n >= start && n < end;
    });
}
