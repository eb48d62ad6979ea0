import { FormControl } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { inRange } from './number-range';

const check = (value: number | null, range: Parameters<typeof inRange>[0]) => new FormControl<number | null>(value, inRange(range)).errors;

describe('inRange', () => {
  it.each([
    ['inside an inclusive range', 1, { min: 1, max: 3 }, null],
    ['at its top', 3, { min: 1, max: 3 }, null],
    ['below it', 0.5, { min: 1, max: 3 }, { min: { min: 1, actual: 0.5 } }],
    ['above it', 4, { min: 1, max: 3 }, { max: { max: 3, actual: 4 } }],
    ['above a strict floor', 0.5, { above: 0, max: 16 }, null],
    ['on a strict floor', 0, { above: 0, max: 16 }, { min: { min: 0, actual: 0 } }],
    ['blank, left to required', null, { above: 0, max: 16 }, null],
  ])('%s', (_case, value, range, expected) => {
    expect(check(value, range)).toEqual(expected);
  });
});
