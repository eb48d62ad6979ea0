import { AbstractControl } from '@angular/forms';
import type { Problem } from '@layerbook/contracts/types';

/**
 * Puts each field error from the server beside its field (as the `server` error, which the
 * field's mat-error shows), and returns what is left to say at the top of the form, if anything.
 */
export function applyProblem(form: AbstractControl, problem: Problem): string | null {
  const unplaced: string[] = [];
  for (const { field, message } of problem.errors ?? []) {
    // Dotted paths (`lines.2.amount`, as zod names them) or the engine's (`lines[2].amount`): the same field.
    const control = field ? form.get(field.replace(/\[(\d+)\]/g, '.$1')) : null;
    if (control && control !== form) {
      control.setErrors({ ...control.errors, server: message });
      control.markAsTouched();
    } else {
      unplaced.push(message);
    }
  }
  const placedAny = (problem.errors?.length ?? 0) > unplaced.length;
  if (unplaced.length > 0) {
    return unplaced.join(' ');
  }
  return placedAny ? null : (problem.detail ?? problem.title);
}
