import { describe, expect, it } from 'vitest';
import { formatAmount, formatCalendarDay, formatDate, formatInstant, formatNumber } from './format';

describe('formatAmount', () => {
  it.each([
    // amount, currency, locale, shown — digits per ISO 4217, patterns per CLDR
    ['12500.00', 'USD', 'en-US', '$12,500.00'],
    ['-12.5', 'USD', 'en-US', '-$12.50'],
    ['1234.5', 'JPY', 'en-US', '¥1,235'],
    ['1234.5', 'EUR', 'de-DE', '1.234,50\u00a0€'],
    ['12500.00', 'USD', 'es-US', '$12,500.00'],
    ['12500.00', 'MXN', 'es-MX', '$12,500.00'],
    ['12500.00', 'EUR', 'es-ES', '12.500,00\u00a0€'],
    // exact: a float would lose the last cent (IEEE 754 has 15–17 significant digits)
    ['98765432109876543.21', 'USD', 'en-US', '$98,765,432,109,876,543.21'],
  ])('shows %s %s in %s as %s', (amount, currency, locale, shown) => {
    expect(formatAmount(amount, currency, locale)).toBe(shown);
  });

  it.each([
    [null, 'USD', ''],
    [undefined, 'USD', ''],
    ['', 'USD', ''],
    ['12.50', null, '12.50'],
    ['12.50', '', '12.50'],
    ['not a number', 'USD', 'not a number USD'],
    ['5', 'XAU', '5 XAU'],
  ])('shows %j in %j as %j', (amount, currency, shown) => {
    expect(formatAmount(amount, currency, 'en-US')).toBe(shown);
  });
});

describe('formatCalendarDay', () => {
  it.each([
    // CLDR date patterns
    ['2026-03-14', 'en-US', 'medium', 'Mar 14, 2026'],
    ['2026-03-14', 'en-US', 'long', 'March 14, 2026'],
    ['2026-03-14', 'es-US', 'long', '14 de marzo de 2026'],
    ['2026-01-01', 'es-MX', 'full', 'jueves, 1 de enero de 2026'],
  ] as const)('shows %s in %s (%s) as %s', (day, locale, style, shown) => {
    expect(formatCalendarDay(day, locale, style)).toBe(shown);
  });

  it('never shifts the day (read in UTC)', () => {
    expect(formatCalendarDay('2026-12-31', 'en-US', 'long')).toBe('December 31, 2026');
  });

  it('shows what is not a day as sent', () => {
    expect(formatCalendarDay('someday', 'en-US')).toBe('someday');
  });
});

describe('formatInstant and formatDate', () => {
  it('shows an instant in the given zone, with and without the time', () => {
    // 13:30 UTC is 09:30 in New York after the March DST change (UTC−4), IANA tz database; ICU
    // versions differ on the space before AM (U+202F or U+0020)
    expect(formatInstant('2026-03-14T13:30:00Z', 'en-US', 'medium', 'short', 'America/New_York').replace(/\s/g, ' ')).toBe(
      'Mar 14, 2026, 9:30 AM',
    );
    expect(formatInstant('2026-03-14T13:30:00Z', 'en-US', 'long', null, 'UTC')).toBe('March 14, 2026');
    expect(formatInstant('2026-03-14T13:30:00Z', 'es-US', 'long', null, 'UTC')).toBe('14 de marzo de 2026');
  });

  it('falls back to the reader zone for an unknown zone name, and shows nonsense as sent', () => {
    expect(formatInstant('2026-03-14T13:30:00Z', 'en-US', 'long', null, 'Nowhere/Else')).toMatch(/2026/);
    expect(formatInstant('nonsense', 'en-US')).toBe('nonsense');
  });

  it('tells a day from an instant', () => {
    expect(formatDate('2026-03-14', 'en-US', 'long')).toBe('March 14, 2026');
    expect(formatDate('2026-03-14T13:30:00Z', 'en-US', 'long', null, 'UTC')).toBe('March 14, 2026');
    expect(formatDate(null, 'en-US')).toBe('');
  });
});

describe('formatNumber', () => {
  it.each([
    // CLDR number symbols: en uses "," for groups, es-ES "." and ","
    [1234.5, 'en-US', {}, '1,234.5'],
    ['1234.5', 'es-MX', {}, '1,234.5'],
    ['12345.5', 'es-ES', {}, '12.345,5'],
    [0.25, 'en-US', { style: 'percent' }, '25%'],
    ['2.456', 'en-US', { maximumFractionDigits: 1 }, '2.5'],
    ['12345678901234567.89', 'en-US', { maximumFractionDigits: 2 }, '12,345,678,901,234,567.89'],
  ] as const)('shows %j in %s (%j) as %s', (value, locale, options, shown) => {
    expect(formatNumber(value, locale, options)).toBe(shown);
  });

  it.each([
    [null, ''],
    [undefined, ''],
    ['', ''],
    ['lots', 'lots'],
    [Number.NaN, 'NaN'],
  ])('shows %j as %j', (value, shown) => {
    expect(formatNumber(value, 'en-US')).toBe(shown);
  });
});
