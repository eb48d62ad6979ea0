import { Pipe, type PipeTransform, inject } from '@angular/core';
import { type AbstractControl } from '@angular/forms';
import { TranslateService } from '@ngx-translate/core';
import { sayIn } from '../errors/say-pipe';

/** A words key, with its params when the sentence names a number. */
export interface KeyedWord {
  readonly key: string;
  readonly params?: Readonly<Record<string, unknown>>;
}

/** Words for each validator key a field may fail: a words key (or text shown as is), or a key with params. */
export type FieldErrorWords = Readonly<Record<string, string | KeyedWord>>;

/**
 * `<mat-error>{{ form.controls.email | lbFieldError: emailErrors }}</mat-error>` — the first failed
 * validator's words in the reader's language; the server's own message always wins. Impure: it
 * follows the control's errors and a language switch.
 */
@Pipe({ name: 'lbFieldError', pure: false })
export class FieldErrorPipe implements PipeTransform {
  private readonly translate = inject(TranslateService, { optional: true });

  transform(control: AbstractControl | null | undefined, words: FieldErrorWords): string {
    const errors = control?.errors;
    if (!errors) return '';
    const server: unknown = errors['server'];
    if (typeof server === 'string') return sayIn(this.translate, server);
    const name = Object.keys(errors).find((key) => key in words);
    const word = name ? words[name] : 'common.fieldErrors.checkField';
    if (typeof word === 'string') return sayIn(this.translate, word);
    return this.translate ? (this.translate.instant(word.key, word.params) as string) : word.key;
  }
}
