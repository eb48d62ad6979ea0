import { TestBed } from '@angular/core/testing';
import { describe, expect, it } from 'vitest';
import { Language } from '../../../../../shared/i18n/language';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { formatCalendarDate } from './calendar-date-pipe';
import { MoneyPipe } from './money-pipe';

async function pipeIn(language: 'en' | 'es', country: string): Promise<MoneyPipe> {
  TestBed.configureTestingModule({ providers: [MoneyPipe, provideTestI18n({})] });
  const current = TestBed.inject(Language);
  current.setRegion(country);
  await current.use(language);
  return TestBed.inject(MoneyPipe);
}

describe('MoneyPipe', () => {
  it.each([
    // amount, currency, language, country, shown — digits per ISO 4217, patterns per CLDR (Intl)
    ['12500.00', 'USD', 'en', 'US', '$12,500.00'],
    ['-12.5', 'USD', 'en', 'US', '-$12.50'],
    ['1234.5', 'JPY', 'en', 'US', '¥1,235'],
    ['12500.00', 'USD', 'es', 'US', '$12,500.00'],
    ['1234.5', 'EUR', 'es', 'ES', '1234,50\u00a0€'],
  ])('shows %s %s in %s-%s as %s', async (amount, currency, language, country, shown) => {
    expect((await pipeIn(language as 'en' | 'es', country)).transform(amount, currency)).toBe(shown);
  });

  it.each([
    [null, 'USD', ''],
    [undefined, 'USD', ''],
    ['', 'USD', ''],
    ['12.50', null, '12.50'],
    ['12.50', '', '12.50'],
  ])('shows %j in %j as %j', async (amount, currency, shown) => {
    expect((await pipeIn('en', 'US')).transform(amount, currency)).toBe(shown);
  });

  it('shows what it cannot format as the server sent it', async () => {
    const pipe = await pipeIn('en', 'US');
    expect(pipe.transform('not a number', 'USD')).toBe('not a number USD');
    expect(pipe.transform('5', 'XAU')).toBe('5 XAU');
  });
});

describe('formatCalendarDate', () => {
  it.each([
    // CLDR medium date patterns (Intl), read in UTC so the day never shifts
    ['2026-03-14', 'en-US', 'Mar 14, 2026'],
    ['2026-03-14', 'es-US', '14 mar 2026'],
    ['not a day', 'en-US', 'not a day'],
  ])('shows %s in %s as %s', (iso, locale, shown) => {
    expect(formatCalendarDate(iso, locale)).toBe(shown);
  });
});
