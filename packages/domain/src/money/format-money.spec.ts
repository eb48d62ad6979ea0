import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { formatMoney } from './format-money';

// Intl separates some symbols with a no-break space (U+00A0), which the expected strings spell out.
const NBSP = '\u00a0';

describe('formatMoney', () => {
  it.each([
    // amount, currency, locale, expected, source
    // ISO 4217: USD has 2 minor-unit digits; CLDR en-US currency pattern "¤#,##0.00".
    ['1234.5', 'USD', 'en-US', '$1,234.50'],
    ['0', 'USD', 'en-US', '$0.00'],
    ['1000000', 'USD', 'en-US', '$1,000,000.00'],
    // Beyond a float's 15–17 significant digits: Intl reads the string exactly (ECMA-402 NumberFormat v3).
    ['12345678901234567.89', 'USD', 'en-US', '$12,345,678,901,234,567.89'],
    // ISO 4217: JPY has 0 minor-unit digits.
    ['1235', 'JPY', 'en-US', '¥1,235'],
    ['1234.5', 'JPY', 'en-US', '¥1,235'],
    // ISO 4217: KWD has 3 minor-unit digits; CLDR en has no symbol for it, so the code shows.
    ['1.2345', 'KWD', 'en-US', `KWD${NBSP}1.235`],
    // CLDR de-DE: "." groups, "," decimals, symbol after a no-break space.
    ['1234.5', 'EUR', 'de-DE', `1.234,50${NBSP}€`],
    ['-1234.5', 'EUR', 'de-DE', `-1.234,50${NBSP}€`],
    // CLDR en-US puts the minus sign before the symbol.
    ['-1234.5', 'USD', 'en-US', '-$1,234.50'],
    ['-0.01', 'USD', 'en-US', '-$0.01'],
  ])('%s %s in %s is %s', (amount, currency, locale, expected) => {
    expect(formatMoney(amount, currency, locale)).toBe(expected);
  });

  it.each([
    // Half away from zero, as roundToCurrency (common practice, no source).
    ['0.125', '$0.13'],
    ['-0.125', '-$0.13'],
    ['0.124', '$0.12'],
    // A negative amount that shows as zero carries no sign (common practice, no source).
    ['-0.004', '$0.00'],
    ['-0', '$0.00'],
  ])('rounds %s to %s', (amount, expected) => {
    expect(formatMoney(amount, 'USD', 'en-US')).toBe(expected);
  });

  it('takes a Decimal as exactly as a string', () => {
    expect(formatMoney(new Decimal('98765432109876543.21'), 'USD', 'en-US')).toBe('$98,765,432,109,876,543.21');
    expect(formatMoney(new Decimal('1e-7'), 'USD', 'en-US')).toBe('$0.00');
  });

  it.each([['abc'], [''], ['Infinity'], ['1,5']])('refuses %j as an amount', (amount) => {
    expect(() => formatMoney(amount, 'USD', 'en-US')).toThrow(DomainInputError);
  });

  it('refuses a float', () => {
    expect(() => formatMoney(12.5 as unknown as string, 'USD', 'en-US')).toThrow(DomainInputError);
  });

  it('refuses a currency without ISO 4217 minor units', () => {
    expect(() => formatMoney('1', 'XAU', 'en-US')).toThrow(DomainInputError);
  });
});
