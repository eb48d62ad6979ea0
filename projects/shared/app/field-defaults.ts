import type { Provider } from '@angular/core';
import { MAT_FORM_FIELD_DEFAULT_OPTIONS, type MatFormFieldDefaultOptions } from '@angular/material/form-field';

/** Every field is outlined; its error line takes room only while it shows. */
export const FIELD_DEFAULTS: MatFormFieldDefaultOptions = { appearance: 'outline', subscriptSizing: 'dynamic' };

/**
 * The field defaults, provided where fields live rather than at the root, so the first load does
 * not carry Material's form-field code: on each app's signed-in shell (routed pages inherit it
 * through the outlet), on the signed-out pages that have fields, and on every dialog with fields —
 * a dialog's content is created from the root injector, which no longer has them.
 */
export function provideFieldDefaults(): Provider {
  return { provide: MAT_FORM_FIELD_DEFAULT_OPTIONS, useValue: FIELD_DEFAULTS };
}
