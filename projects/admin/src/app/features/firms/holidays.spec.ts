import { describe, expect, it } from 'vitest';
import { readHoliday, withHoliday, withoutHoliday } from './holidays';

describe('readHoliday', () => {
  it.each([
    ['2026-12-25', [], { date: '2026-12-25' }],
    [' 2027-01-01 ', ['2026-12-25'], { date: '2027-01-01' }],
    ['2028-02-29', [], { date: '2028-02-29' }],
    ['', [], { error: 'Enter a date as YYYY-MM-DD, like 2026-12-25.' }],
    ['12/25/2026', [], { error: 'Enter a date as YYYY-MM-DD, like 2026-12-25.' }],
    ['Christmas', [], { error: 'Enter a date as YYYY-MM-DD, like 2026-12-25.' }],
    ['2026-02-30', [], { error: 'That date does not exist.' }],
    ['2027-02-29', [], { error: 'That date does not exist.' }],
    ['2026-13-01', [], { error: 'That date does not exist.' }],
    // the API's years and words (DATE_YEAR_MIN / DATE_YEAR_MAX)
    ['0000-01-01', [], { error: 'Enter a date between 1900 and 2999.' }],
    ['1899-12-31', [], { error: 'Enter a date between 1900 and 2999.' }],
    ['0026-12-25', [], { error: 'Enter a date between 1900 and 2999.' }],
    ['3000-01-01', [], { error: 'Enter a date between 1900 and 2999.' }],
    ['1900-01-01', [], { date: '1900-01-01' }],
    ['2999-12-31', [], { date: '2999-12-31' }],
    ['2026-12-25', ['2026-12-25'], { error: 'That day is already off.' }],
  ])('reads %j (days off %j)', (text, current, reading) => {
    expect(readHoliday(text, current)).toEqual(reading);
  });

  it('refuses a day past the limit the API keeps', () => {
    const full = Array.from({ length: 100 }, (_, i) => `2030-01-${String((i % 28) + 1).padStart(2, '0')}-${i}`);
    expect(readHoliday('2026-12-25', full)).toEqual({ error: 'At most 100 days off; remove past ones first.' });
  });
});

describe('withHoliday / withoutHoliday', () => {
  it('adds in date order, once, and removes', () => {
    const list = withHoliday(withHoliday(['2027-01-01'], '2026-12-25'), '2026-12-25');
    expect(list).toEqual(['2026-12-25', '2027-01-01']);
    expect(withoutHoliday(list, '2026-12-25')).toEqual(['2027-01-01']);
  });
});
