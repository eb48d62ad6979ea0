import { describe, expect, it } from 'vitest';
import { readLength, readNumber } from './number-text';

describe('readNumber', () => {
  it.each([
    ['9', 9],
    [' 9.5 ', 9.5],
    ['.5', 0.5],
    ['12.', 12],
    ['-2', -2],
    ['', null],
    ['   ', null],
    [null, null],
  ])('reads %j as %s', (typed, value) => expect(readNumber(typed, '.')).toBe(value));

  // Where the dot is the mark, "1,5" could be one and a half or fifteen.
  it.each(['1,5', '1 000', '3ft', '--2', '.', 'e3'])('refuses %j as NaN', (typed) => expect(readNumber(typed, '.')).toBeNaN());

  it('reads a decimal comma where the locale writes one', () => expect(readNumber('1,5', ',')).toBe(1.5));
});

describe('readLength', () => {
  it.each([
    ['6\' 6"', 'ft', 6.5],
    ['6 ft 6 in', 'ft', 6.5],
    ['6\'6"', 'ft', 6.5],
    ['9.5', 'ft', 9.5],
  ] as const)('reads %j in %s as %s', (typed, unit, value) => expect(readLength(typed, unit, '.')).toBe(value));

  it('converts feet and inches typed into a metric form', () => expect(readLength('12"', 'm', '.')).toBeCloseTo(0.3048, 10));
});
