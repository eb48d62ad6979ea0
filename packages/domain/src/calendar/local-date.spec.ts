import { expectInputError } from '../errors/expect-input-error';
import { addDays, daysBetween, fromDayNumber, isoWeekLabel, isoWeekday, mondayOf, toDayNumber, yearBefore } from './local-date';

describe('local calendar dates', () => {
  it.each([
    ['1970-01-01', 0, 4],
    ['2025-06-05', 20244, 4],
    ['2000-02-29', 11016, 2],
    ['2024-12-30', 20087, 1],
  ])('%s is day %d, ISO weekday %d', (date, day, weekday) => {
    expect(toDayNumber(date)).toBe(day);
    expect(fromDayNumber(day)).toBe(date);
    expect(isoWeekday(day)).toBe(weekday);
  });

  it.each([
    // ISO 8601 week dates (week 1 holds the year's first Thursday)
    ['2024-12-30', '2025-W01'],
    ['2021-01-03', '2020-W53'],
    ['2025-06-30', '2025-W27'],
  ])('%s is in %s', (date, week) => {
    expect(isoWeekLabel(toDayNumber(date))).toBe(week);
  });

  it('adds days across months and finds Mondays', () => {
    expect(addDays('2025-02-27', 2)).toBe('2025-03-01');
    expect(daysBetween('2025-02-28', '2025-06-30')).toBe(122);
    expect(fromDayNumber(mondayOf(toDayNumber('2025-06-08')))).toBe('2025-06-02');
  });

  it.each(['2025-02-30', '2025/01/01', '25-01-01'])('refuses %s', (bad) => {
    expectInputError(() => toDayNumber(bad), 'date');
  });

  it.each([
    ['2026-12-04', '2025-12-04'],
    ['2024-02-29', '2023-02-28'], // no 29 February in 2023 (Gregorian leap rule, ISO 8601)
    ['2025-03-01', '2024-03-01'],
  ])('a year before %s is %s', (date, earlier) => {
    expect(yearBefore(date)).toBe(earlier);
  });
});
