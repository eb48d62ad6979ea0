import { FormControl } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { paymentAmountCheck } from './payment-input';

describe('paymentAmountCheck', () => {
  const check = paymentAmountCheck(
    () => '1250.30',
    () => 'USD',
  );
  it.each([
    ['1250.30', null],
    ['1,250.30', null],
    ['0.01', null],
    ['1250.31', { overDue: '1250.30' }],
    ['10000', { overDue: '1250.30' }],
    ['0', { zero: true }],
    ['0.00', { zero: true }],
    // left to the field's other checks
    ['', null],
    ['12.345', null],
  ])('an amount of "%s" gives %o', (typed, expected) => {
    expect(check(new FormControl(typed, { nonNullable: true }))).toEqual(expected);
  });

  it('compares exactly where floats would not (0.1 + 0.2 due)', () => {
    const due = paymentAmountCheck(
      () => '0.30',
      () => 'USD',
    );
    expect(due(new FormControl('0.30', { nonNullable: true }))).toBeNull();
    expect(due(new FormControl('0.31', { nonNullable: true }))).toEqual({ overDue: '0.30' });
  });
});
