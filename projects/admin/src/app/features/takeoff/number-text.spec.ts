import { describe, expect, it } from 'vitest';
import { readNumber } from './number-text';

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
  ])('reads %j as %s', (typed, value) => expect(readNumber(typed)).toBe(value));

  // Only the dot is a decimal mark: "1,5" could be one and a half or fifteen.
  it.each(['1,5', '1 000', '3ft', '--2', '.', 'e3'])('refuses %j as NaN', (typed) => expect(readNumber(typed)).toBeNaN());
});
