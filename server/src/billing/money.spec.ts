import { decimalsMessage, fitsCurrency, moneyOut } from './money';

// ISO 4217 minor units: USD 2, JPY 0, KWD 3 (ISO 4217 list one); money columns keep two decimals.
describe('amounts typed for a currency', () => {
  it.each([
    ['10.50', 'USD', true],
    ['10.505', 'USD', false],
    ['10', 'JPY', true],
    ['10.50', 'JPY', false],
    ['10.00', 'JPY', true],
    ['10.25', 'KWD', true],
    // a third decimal of a three-decimal currency would be rounded away by numeric(14,2): refused
    ['10.005', 'KWD', false],
  ])('%s %s fits: %s', (amount, currency, fits) => expect(fitsCurrency(amount, currency)).toBe(fits));

  it('says what it refuses in words, and prints amounts at the minor units', () => {
    expect(decimalsMessage('JPY')).toBe('Use whole amounts in JPY.');
    expect(decimalsMessage('USD')).toBe('Use at most 2 decimals in USD.');
    expect(decimalsMessage('KWD')).toBe('Use at most 2 decimals in KWD.');
    expect(moneyOut('1250.00', 'JPY')).toBe('1250');
    expect(moneyOut('12.5', 'USD')).toBe('12.50');
  });
});
