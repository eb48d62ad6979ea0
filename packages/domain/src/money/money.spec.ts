import Decimal from 'decimal.js';
import { fromMinorUnits, roundToCurrency, toMinorUnits } from './money';

describe('minor units', () => {
  it.each([
    ['10.00', 'USD', 1000],
    ['500', 'JPY', 500],
    ['1.234', 'KWD', 1234],
  ])('%s %s is %d minor units', (amount, currency, minor) => {
    // ISO 4217 exponents via currency-codes package
    expect(toMinorUnits(amount, currency)).toBe(minor);
    expect(fromMinorUnits(minor, currency).equals(amount)).toBe(true);
  });

  it('refuses amounts finer than the minor unit', () => {
    expect(() => toMinorUnits('1.005', 'USD')).toThrow('more than 2 decimal places');
    expect(() => toMinorUnits('1.5', 'JPY')).toThrow('more than 0 decimal places');
  });

  it('rounds half away from zero to the currency', () => {
    expect(roundToCurrency('2.345', 'USD').toString()).toBe('2.35');
    expect(roundToCurrency(new Decimal('-2.345'), 'USD').toString()).toBe('-2.35');
    expect(roundToCurrency('1234.5', 'JPY').toString()).toBe('1235');
  });
});
