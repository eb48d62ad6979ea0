import { Pipe, type PipeTransform, inject } from '@angular/core';
import { TranslateService } from '@ngx-translate/core';

/**
 * The English sentences `toProblem` falls back to, by their words key: `problemMessage` keeps
 * answering English for callers that show it as is; `lbSay` shows them in the reader's language.
 */
export const PROBLEM_KEYS: Readonly<Record<string, string>> = {
  'Layerbook could not be reached. Check your connection and try again.': 'common.problems.unreachable',
  'Something went wrong. Please try again.': 'common.problems.generic',
  'Please sign in again.': 'common.problems.signInAgain',
  'Your role does not allow this.': 'common.problems.roleRefused',
  'We could not find that.': 'common.problems.notFound',
  'Too many tries. Wait a minute and try again.': 'common.problems.tooMany',
  'Something went wrong on our side. Please try again.': 'common.problems.serverSide',
};

/** A message for the reader: one of our own fallback sentences or a words key, translated; the server's words as sent. */
export function sayIn(translate: TranslateService | null, message: string | null | undefined): string {
  if (!message) return '';
  if (!translate) return message;
  const key = PROBLEM_KEYS[message] ?? (/^[a-z][\w-]*(\.[\w-]+)+$/.test(message) ? message : null);
  return key ? (translate.instant(key) as string) : message;
}

/** `{{ message | lbSay }}` — see sayIn. Impure: follows a language switch. Without translations (a spec) the message as is. */
@Pipe({ name: 'lbSay', pure: false })
export class SayPipe implements PipeTransform {
  private readonly translate = inject(TranslateService, { optional: true });

  transform(message: string | null | undefined): string {
    return sayIn(this.translate, message);
  }
}
