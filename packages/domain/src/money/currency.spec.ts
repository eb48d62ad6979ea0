import { data as isoCurrencies } from 'currency-codes';
import { DomainInputError } from '../errors/domain-input-error';
import { knownCurrencies, minorUnitDigits } from './currency';

/** Codes with no minor unit in ISO 4217 (metals, SDR, testing); the package lists them as 0. */
const NOT_MONEY = new Set(['XAG', 'XAU', 'XBA', 'XBB', 'XBC', 'XBD', 'XDR', 'XPD', 'XPT', 'XSU', 'XTS', 'XUA', 'XXX']);

describe('ISO 4217 minor units', () => {
  it.each([
    ['USD', 2],
    ['EUR', 2],
    ['GBP', 2],
    ['CAD', 2],
    ['JPY', 0],
    ['KWD', 3],
  ])('%s has %d decimals', (code, digits) => {
    // ISO 4217 (OPC UA Part 3 §8.61 example table for USD/EUR/GBP/JPY)
    expect(minorUnitDigits(code)).toBe(digits);
  });

  it('matches the reference library for every currency it lists', () => {
    // ISO 4217 via currency-codes package
    const reference = isoCurrencies.filter((c) => !NOT_MONEY.has(c.code));
    for (const c of reference) expect([c.code, minorUnitDigits(c.code)]).toEqual([c.code, c.digits]);
    expect(knownCurrencies().sort()).toEqual(reference.map((c) => c.code).sort());
  });

  it('refuses an unknown code', () => {
    expect(() => minorUnitDigits('ABC')).toThrow(DomainInputError);
  });
});
