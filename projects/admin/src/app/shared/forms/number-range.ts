import { AbstractControl, ValidationErrors, ValidatorFn, Validators } from '@angular/forms';
import type { NumberRange } from '@layerbook/contracts/types';

/**
 * The validators for a number field with a contract range: inclusive `min`, or strictly `above`
 * (more than 0 hours, say), and `max`. Blank is left to Validators.required.
 */
export function inRange(range: NumberRange): ValidatorFn[] {
  const low = 'above' in range ? above(range.above) : Validators.min(range.min);
  return [low, Validators.max(range.max)];
}

function above(limit: number): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    const value: unknown = control.value;
    if (value === null || value === undefined || value === '') {
      return null;
    }
    return Number(value) > limit ? null : { min: { min: limit, actual: value } };
  };
}
