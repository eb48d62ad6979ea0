import { AbstractControl, ValidationErrors } from '@angular/forms';

/** Like Validators.required, but spaces alone do not count: the server trims before it checks. */
export function requiredText(control: AbstractControl<string>): ValidationErrors | null {
  return typeof control.value === 'string' && control.value.trim().length > 0 ? null : { required: true };
}
