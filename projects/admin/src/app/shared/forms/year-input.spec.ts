import { FormControl } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { toYear, yearText } from './year-input';

describe('yearText and toYear', () => {
  it.each([
    ['1925', 1925, null],
    [' 1600 ', 1600, null],
    ['2100', 2100, null],
    ['', null, null],
    ['1599', 1599, { year: true }],
    ['2101', 2101, { year: true }],
    ['1925.5', 1925.5, { year: true }],
    ['old', Number.NaN, { year: true }],
  ])('%j reads as %s and checks as %j', (typed, year, errors) => {
    expect(toYear(typed)).toEqual(year);
    expect(yearText(new FormControl(typed, { nonNullable: true }))).toEqual(errors);
  });
});
