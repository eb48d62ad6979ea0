import { FormControl } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { requiredText } from './text-validators';

describe('requiredText', () => {
  it.each([
    ['words', null],
    ['  a ', null],
    ['', { required: true }],
    ['   ', { required: true }],
  ])('checks %j', (typed, expected) => {
    expect(requiredText(new FormControl(typed, { nonNullable: true }))).toEqual(expected);
  });
});
