import { TestBed } from '@angular/core/testing';
import { beforeEach, describe, expect, it } from 'vitest';
import { Language } from '../language';
import { provideTestI18n } from '../testing';
import { LbDatePipe, LbMoneyPipe, LbNumberPipe } from './pipes';

describe('locale-aware pipes', () => {
  let language: Language;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideTestI18n({}), LbMoneyPipe, LbDatePipe, LbNumberPipe] });
    language = TestBed.inject(Language);
  });

  it('follow the current language and the firm country', async () => {
    const money = TestBed.inject(LbMoneyPipe);
    const date = TestBed.inject(LbDatePipe);
    const number = TestBed.inject(LbNumberPipe);
    expect(money.transform('1250.5', 'USD')).toBe('$1,250.50');
    expect(date.transform('2026-03-14', 'long')).toBe('March 14, 2026');

    await language.use('es');
    expect(date.transform('2026-03-14', 'long')).toBe('14 de marzo de 2026');
    expect(money.transform('1250.5', 'USD')).toBe('$1,250.50');

    language.setRegion('es');
    // CLDR es: "." groups, "," decimals, the sign after the number
    expect(money.transform('1250.5', 'EUR')).toBe('1250,50\u00a0€');
    expect(number.transform('12345.5')).toBe('12.345,5');
  });
});
