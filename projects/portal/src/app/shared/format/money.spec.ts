import { describe, expect, it } from 'vitest';
import { formatDay, formatMoment, formatMoney } from './money';

describe('portal formatting', () => {
  it.each([
    // day, locale, words — CLDR "long" date patterns
    ['2026-03-01', 'en-US', 'March 1, 2026'],
    ['2026-12-31', 'en-GB', '31 December 2026'],
    ['2026-01-05', 'de-DE', '5. Januar 2026'],
  ])('reads %s in %s as %s, whatever the browser zone', (day, locale, words) => {
    expect(formatDay(day, locale)).toBe(words);
  });

  it('shows a moment with its date and time', () => {
    expect(formatMoment('2026-06-15T12:00:00Z', 'en-US')).toMatch(/June 1[45], 2026 at \d{1,2}:\d{2}/);
  });

  it('formats money with the one shared formatter (exact decimal strings)', () => {
    expect(formatMoney('12345678901234567.89', 'USD', 'en-US')).toBe('$12,345,678,901,234,567.89');
  });
});
