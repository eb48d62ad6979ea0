import { LOCALE_ID } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { describe, expect, it } from 'vitest';
import { MoneyPipe } from './money-pipe';

function pipeIn(locale: string): MoneyPipe {
  TestBed.configureTestingModule({
    providers: [MoneyPipe, { provide: LOCALE_ID, useValue: locale }],
  });
  return TestBed.inject(MoneyPipe);
}

describe('MoneyPipe', () => {
  it.each([
    // amount, currency, locale, shown — digits per ISO 4217, patterns per CLDR
    ['12500.00', 'USD', 'en-US', '$12,500.00'],
    ['-12.5', 'USD', 'en-US', '-$12.50'],
    ['1234.5', 'JPY', 'en-US', '¥1,235'],
    ['1234.5', 'EUR', 'de-DE', '1.234,50\u00a0€'],
  ])('shows %s %s in %s as %s', (amount, currency, locale, shown) => {
    expect(pipeIn(locale).transform(amount, currency)).toBe(shown);
  });

  it.each([
    [null, 'USD', ''],
    [undefined, 'USD', ''],
    ['', 'USD', ''],
    ['12.50', null, '12.50'],
    ['12.50', '', '12.50'],
  ])('shows %j in %j as %j', (amount, currency, shown) => {
    expect(pipeIn('en-US').transform(amount, currency)).toBe(shown);
  });

  it('shows what it cannot format as the server sent it', () => {
    const pipe = pipeIn('en-US');
    expect(pipe.transform('not a number', 'USD')).toBe('not a number USD');
    expect(pipe.transform('5', 'XAU')).toBe('5 XAU');
  });
});
