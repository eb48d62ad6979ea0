import Decimal from 'decimal.js';
import { fromMinorUnits, roundToCurrency, roundsToZero, toMinorUnits, percentShare } from './money';

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

describe('roundsToZero', () => {
  // ISO 4217 exponents: USD 2, JPY 0, KWD 3; half away from zero as above.
  it.each([
    ['0.004', 'USD', true],
    ['0.005', 'USD', false],
    ['-0.004', 'USD', true],
    ['0.4', 'JPY', true],
    ['0.0004', 'KWD', true],
    ['0.0005', 'KWD', false],
    ['0', 'USD', true],
  ])('%s %s shows as zero: %s', (amount, currency, isZero) => expect(roundsToZero(amount, currency)).toBe(isZero));
});

describe('percentShare', () => {
  it('is the exact decimal fraction, where floating-point division is not', () => {
    // 4.712 % (Hawaii's general excise rate with a county surcharge; value from memory): 4.712 / 100 = 0.047119999999999995 in IEEE 754 double
    expect(4.712 / 100).not.toBe(0.04712);
    expect(percentShare(4.712)).toBe('0.04712');
    // 1,562.50 × 0.04712 = 73.625, to the cent half up 73.63 (exact decimal arithmetic)
    expect(roundToCurrency(new Decimal('1562.50').times(percentShare(4.712)), 'USD').toFixed(2)).toBe('73.63');
    expect(percentShare(8.25)).toBe('0.0825');
    expect(percentShare(0)).toBe('0');
  });
});
