import { FormControl } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { REFUND_PROCESSOR_PROBLEMS } from '@layerbook/contracts/types';
import { defaultRefundMethod, isRefusedForGood, refundAmountCheck, refundMethods } from './refund-input';

describe('refund choices', () => {
  it('offers the card first for a card payment, and only by hand for the others', () => {
    expect(refundMethods({ method: 'card' })).toEqual(['card', 'transfer', 'cheque', 'cash']);
    expect(refundMethods({ method: 'cheque' })).toEqual(['transfer', 'cheque', 'cash']);
    expect(defaultRefundMethod({ method: 'card' })).toBe('card');
    expect(defaultRefundMethod({ method: 'cash' })).toBe('cash');
  });
});

describe('refundAmountCheck', () => {
  const check = refundAmountCheck(
    () => '450.00',
    () => 'USD',
  );
  it.each([
    ['450.00', null],
    ['450', null],
    ['0.01', null],
    ['450.01', { overRefundable: '450.00' }],
    ['1,000', { overRefundable: '450.00' }],
    ['0', { zero: true }],
    ['0.00', { zero: true }],
    // left to the field's other checks
    ['', null],
    ['12.345', null],
  ])('an amount of "%s" gives %o', (typed, expected) => {
    expect(check(new FormControl(typed, { nonNullable: true }))).toEqual(expected);
  });

  it('compares exactly where floats would not (0.1 + 0.2 refundable)', () => {
    const small = refundAmountCheck(
      () => '0.30',
      () => 'USD',
    );
    expect(small(new FormControl('0.30', { nonNullable: true }))).toBeNull();
    expect(small(new FormControl('0.31', { nonNullable: true }))).toEqual({ overRefundable: '0.30' });
  });
});

describe('isRefusedForGood', () => {
  it.each([
    [400, 'The request has invalid fields', true],
    [409, 'Conflict', true],
    [401, 'Not signed in', true],
    [502, REFUND_PROCESSOR_PROBLEMS.refused, true],
    // the outcome is unknown: the same refund (and key) goes again
    [502, REFUND_PROCESSOR_PROBLEMS.noAnswer, false],
    [500, 'Internal Server Error', false],
    [503, 'Service Unavailable', false],
    [0, 'Layerbook could not be reached. Check your connection and try again.', false],
  ])('a %i “%s” is refused for good: %s', (status, title, expected) => {
    expect(isRefusedForGood({ status, title })).toBe(expected);
  });
});
