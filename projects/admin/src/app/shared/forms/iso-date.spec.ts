import { describe, expect, it } from 'vitest';
import { fromIsoDate, toIsoDate } from './iso-date';

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
