import { FormControl } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { amountText, toAmount } from './money-input';

describe('toAmount', () => {
  it.each([
    ['12,500', '12500'],
    [' 1 250.50 ', '1250.50'],
    ['', null],
    ['   ', null],
    ['12.345', '12.345'],
    ['$50', '50'],
    ['$ 1,250.50', '1250.50'],
  ])('reads %j as %j', (typed, expected) => {
    expect(toAmount(typed)).toBe(expected);
  });
});

describe('amountText', () => {
  it.each([
    ['12,500', null],
    ['12500.00', null],
    ['', null],
    ['12.345', { amount: true }],
    ['-5', { amountNegative: true, amount: true }],
    ['1e3', { amount: true }],
    ['1234567890123', { amountTooLarge: true, amount: true }],
    ['99999999999999.00', { amountTooLarge: true, amount: true }],
    ['$50', null],
  ])('checks %j like the API', (typed, expected) => {
    expect(amountText(new FormControl(typed, { nonNullable: true }))).toEqual(expected);
  });
});
