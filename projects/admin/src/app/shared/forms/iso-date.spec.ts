import { FormControl } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { errorText } from './error-text';
import { DATE_YEAR_WORDS, dateYearInRange, firmToday, fromIsoDate, toIsoDate } from './iso-date';

describe('toIsoDate', () => {
  it.each([
    ['a day', new Date(2026, 2, 14), '2026-03-14'],
    ['the last minute of a day', new Date(2026, 11, 31, 23, 59), '2026-12-31'],
    ['a leap day', new Date(2028, 1, 29), '2028-02-29'],
    ['nothing', null, null],
    ['an invalid date', new Date('not a date'), null],
  ])('writes %s', (_case, date, expected) => {
    expect(toIsoDate(date)).toBe(expected);
  });
});

describe('fromIsoDate', () => {
  it.each([
    ['a day', '2026-03-14', new Date(2026, 2, 14)],
    ['nothing', null, null],
    ['empty text', '', null],
    ['a day and time', '2026-03-14T10:00', null],
  ])('reads %s as local midnight', (_case, text, expected) => {
    expect(fromIsoDate(text)).toEqual(expected);
  });

  it('round-trips with toIsoDate', () => {
    expect(toIsoDate(fromIsoDate('2027-01-01'))).toBe('2027-01-01');
  });
});

describe('firmToday', () => {
  it('is the calendar day in the firm’s zone, whatever the viewer’s', () => {
    // 03:30 UTC on December 5 is still December 4 in Los Angeles, already December 5 in Auckland.
    const now = new Date('2026-12-05T03:30:00Z');
    expect(toIsoDate(firmToday('America/Los_Angeles', now))).toBe('2026-12-04');
    expect(toIsoDate(firmToday('Pacific/Auckland', now))).toBe('2026-12-05');
    expect(toIsoDate(firmToday('America/New_York', new Date('2026-12-31T23:30:00-05:00')))).toBe('2026-12-31');
  });

  it('is the viewer’s day when the zone is unknown', () => {
    const now = new Date(2026, 2, 14, 23, 59);
    expect(toIsoDate(firmToday(null, now))).toBe('2026-03-14');
  });
});

describe('dateYearInRange (the API takes years 1900 to 2999)', () => {
  // new Date(26, …) means 1926; a datepicker reading "3/14/0026" holds the year 26 itself.
  const typed0026 = new Date(2026, 2, 14);
  typed0026.setFullYear(26);
  it.each([
    ['a day this century', new Date(2026, 2, 14), true],
    ['the first day of 1900', new Date(1900, 0, 1), true],
    ['the last day of 2999', new Date(2999, 11, 31), true],
    ['a typed 0026 for 2026', typed0026, false],
    ['a day in 1899', new Date(1899, 11, 31), false],
    ['a day in 3000', new Date(3000, 0, 1), false],
    ['the text 2026-03-14', '2026-03-14', true],
    ['the text 0000-01-01', '0000-01-01', false],
    ['the text 3000-01-01', '3000-01-01', false],
    ['nothing', null, true],
    ['an unreadable date', new Date('not a date'), true],
  ])('%s is %s', (_case, value, ok) => {
    const control = new FormControl<Date | string | null>(value, dateYearInRange);
    expect(control.valid).toBe(ok);
  });

  it("says what the API says: 'Enter a date between 1900 and 2999.'", () => {
    const control = new FormControl<Date | null>(new Date(3000, 0, 1), dateYearInRange);
    expect(errorText(control, { required: 'Enter a date.', ...DATE_YEAR_WORDS })).toBe('Enter a date between 1900 and 2999.');
  });
});
