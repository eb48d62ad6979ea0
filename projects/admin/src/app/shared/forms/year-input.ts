import { AbstractControl, ValidationErrors } from '@angular/forms';
import { YEAR_BUILT_MAX, YEAR_BUILT_MIN } from '@layerbook/contracts/types';

/** "1925" → 1925; blank → null (not known). */
export function toYear(typed: string): number | null {
  const plain = typed.trim();
  return plain === '' ? null : Number(plain);
}

/** A whole year within the API's yearBuilt range, or blank. */
export function yearText(control: AbstractControl<string>): ValidationErrors | null {
  const year = toYear(control.value ?? '');
  if (year === null) {
    return null;
  }
  return Number.isInteger(year) && year >= YEAR_BUILT_MIN && year <= YEAR_BUILT_MAX ? null : { year: true };
}

export const YEAR_WORDS = {
  year: `Enter a whole year between ${YEAR_BUILT_MIN} and ${YEAR_BUILT_MAX}, like 1925.`,
} as const;
