import { longDate } from './long-date';

describe('longDate', () => {
  it('writes a calendar day out in the locale, never shifted by a time zone', () => {
    // ECMA-402 (Intl.DateTimeFormat, dateStyle "long") as Node's ICU renders it
    expect(longDate('2026-12-03')).toBe('December 3, 2026');
    expect(longDate('2027-01-01', 'es-MX')).toBe('1 de enero de 2027');
    expect(longDate('2028-02-29', 'en-GB')).toBe('29 February 2028');
  });
});
