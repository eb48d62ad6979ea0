import { AbstractControl } from '@angular/forms';

/** Words for each validator key a field may fail; the server's own message always wins. */
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
  return key ? words[key] : 'Check this field.';
}
