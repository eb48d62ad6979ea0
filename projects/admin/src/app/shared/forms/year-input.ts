import { AbstractControl, ValidationErrors } from '@angular/forms';

/** "1925" → 1925; blank → null (not known). Mirrors the API's yearBuilt (1600–2100). */
export function toYear(typed: string): number | null {
  const plain = typed.trim();
  return plain === '' ? null : Number(plain);
}

export function yearText(control: AbstractControl<string>): ValidationErrors | null {
  const year = toYear(control.value ?? '');
  if (year === null) {
    return null;
  }
  return Number.isInteger(year) && year >= 1600 && year <= 2100 ? null : { year: true };
}

export const YEAR_WORDS = { year: 'Enter a whole year between 1600 and 2100, like 1925.' } as const;
