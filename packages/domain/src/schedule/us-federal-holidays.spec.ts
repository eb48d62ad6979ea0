import { expectInputError } from '../errors/expect-input-error';
import { usFederalHolidays, usFederalHolidaysAhead } from './us-federal-holidays';

/**
 * The legal public holidays of 5 U.S.C. 6103(a); the observed day of a weekend date as OPM's
 * "Federal Holidays" page gives it (Saturday → Friday before, Sunday → Monday after). The
 * expected dates are OPM's published tables for 2026 and 2027 (from memory; each one checked
 * against a calendar by hand).
 */
describe('usFederalHolidays', () => {
  it.each([
    [
      2026,
      // Independence Day 2026 is a Saturday: observed Friday 3 July
      [
        '2026-01-01',
        '2026-01-19',
        '2026-02-16',
        '2026-05-25',
        '2026-06-19',
        '2026-07-03',
        '2026-09-07',
        '2026-10-12',
        '2026-11-11',
        '2026-11-26',
        '2026-12-25',
      ],
    ],
    [
      2027,
      // Juneteenth and Christmas fall on Saturdays, Independence Day on a Sunday
      [
        '2027-01-01',
        '2027-01-18',
        '2027-02-15',
        '2027-05-31',
        '2027-06-18',
        '2027-07-05',
        '2027-09-06',
        '2027-10-11',
        '2027-11-11',
        '2027-11-25',
        '2027-12-24',
      ],
    ],
    [
      2028,
      // New Year's Day 2028 is a Saturday: observed Friday 31 December 2027
      [
        '2027-12-31',
        '2028-01-17',
        '2028-02-21',
        '2028-05-29',
        '2028-06-19',
        '2028-07-04',
        '2028-09-04',
        '2028-10-09',
        '2028-11-10',
        '2028-11-23',
        '2028-12-25',
      ],
    ],
  ])('%i', (year, dates) => {
    expect(usFederalHolidays(year).map((h) => h.date)).toEqual(dates);
  });

  it('names each day as the statute does', () => {
    expect(usFederalHolidays(2026).find((h) => h.date === '2026-12-25')?.name).toBe('Christmas Day');
  });

  it('lists the year ahead of a day, that day included', () => {
    expect(usFederalHolidaysAhead('2026-12-02')).toEqual([
      '2026-12-25',
      '2027-01-01',
      '2027-01-18',
      '2027-02-15',
      '2027-05-31',
      '2027-06-18',
      '2027-07-05',
      '2027-09-06',
      '2027-10-11',
      '2027-11-11',
      '2027-11-25',
    ]);
    expect(usFederalHolidaysAhead('2026-12-25')[0]).toBe('2026-12-25');
  });

  it.each([[2020], [1.5], [Number.NaN]])('refuses the year %s', (year) => {
    expectInputError(() => usFederalHolidays(year), 'year', /2021/);
  });
});
