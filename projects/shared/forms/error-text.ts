import { AbstractControl } from '@angular/forms';

/**
 * Words for each validator key a field may fail; the server's own message always wins. `{min}` and
 * `{max}` in the words are replaced by the bound the field failed (Validators.min / Validators.max).
 */
export type ErrorWords = Readonly<Record<string, string>>;

export function errorText(control: AbstractControl, words: ErrorWords): string {
  const errors = control.errors;
  if (!errors) {
    return '';
  }
  const server: unknown = errors['server'];
  if (typeof server === 'string') {
    return server;
  }
  const key = Object.keys(errors).find((name) => name in words);
  if (!key) {
    return 'Check this field.';
  }
  const detail: unknown = errors[key];
  return words[key].replace(/\{(min|max)\}/g, (whole, bound: string) => {
    const value: unknown = typeof detail === 'object' && detail !== null ? (detail as Record<string, unknown>)[bound] : undefined;
    return typeof value === 'number' ? String(value) : whole;
  });
}
