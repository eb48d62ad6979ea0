import { DomainInputError } from '../errors/domain-input-error';
import { expectInputError } from '../errors/expect-input-error';
import { convertArea, convertAreaExact, convertLength, convertLengthExact } from './length';
import { convertQuantity, convertQuantityExact, fromBase, toBase } from './quantity-unit';

describe('volume and mass conversion', () => {
  it.each([
    // US gallon = 231 in³ exactly: NIST Handbook 44 App. C; SP 811 App. B.8 lists 3.785 412 E−03 m³
    ['1', 'gallon', 'L', '3.785411784'],
    ['1', 'gallon', 'in3', '231'],
    // NIST SP 811 App. B.8: fluid ounce 2.957 353 E−05 m³
    ['1', 'floz', 'mL', '29.5735295625'],
    // NIST SP 811 App. B.8: tablespoon 1.478 676 E−05 m³
    ['1', 'tbsp', 'mL', '14.78676478125'],
    // NIST SP 811 App. B.8: teaspoon 4.928 922 E−06 m³
    ['1', 'tsp', 'mL', '4.92892159375'],
    // NIST SP 811 App. B.8: cup 2.365 882 E−04 m³
    ['1', 'cup', 'mL', '236.5882365'],
    // NIST SP 811 App. B.8: quart (liquid) 9.463 529 E−04 m³
    ['1', 'quart', 'mL', '946.352946'],
    // NIST Handbook 44 App. C: 1 gal = 4 qt = 8 pt = 16 cups = 128 fl oz
    ['1', 'gallon', 'quart', '4'],
    ['1', 'gallon', 'pint', '8'],
    ['1', 'gallon', 'cup', '16'],
    ['1', 'gallon', 'floz', '128'],
    ['1', 'gallon', 'tbsp', '256'],
    ['1', 'gallon', 'tsp', '768'],
    // avoirdupois pound 0.45359237 kg (from memory, unverified; SP 811 B.8 lists 4.535 924 E−01)
    ['1', 'lb', 'kg', '0.45359237'],
    ['16', 'oz', 'lb', '1'],
  ] as const)('%s %s = %s %s exactly', (value, from, to, expected) => {
    expect(convertQuantityExact(value, from, to).toString()).toBe(expected);
  });

  it('fast number path agrees with the exact path', () => {
    expect(convertQuantity(1.5855, 'gallon', 'quart')).toBeCloseTo(6.342, 12);
    expect(convertQuantity(3, 'tsp', 'tbsp')).toBeCloseTo(1, 12);
  });

  it('will not turn fluid ounces into ounces without a density', () => {
    expect(() => convertQuantity(1, 'floz', 'oz')).toThrow(DomainInputError);
  });
});

describe('conversions refuse what is not a number with DomainInputError', () => {
  const bad = [Number.NaN, Number.POSITIVE_INFINITY, 'abc', undefined, {}] as unknown as number[];
  it.each(bad)('%p', (value) => {
    expectInputError(() => convertQuantity(value, 'gallon', 'L'), 'value');
    expectInputError(() => convertQuantityExact(value, 'gallon', 'L'), 'value');
    expectInputError(() => toBase(value, 'gallon'), 'value');
    expectInputError(() => fromBase(value, 'gallon'), 'value');
    expectInputError(() => convertLength(value, 'ft', 'm'), 'value');
    expectInputError(() => convertArea(value, 'ft', 'm'), 'value');
    expectInputError(() => convertLengthExact(value, 'ft', 'm'), 'value');
    expectInputError(() => convertAreaExact(value, 'ft', 'm'), 'value');
  });
});
