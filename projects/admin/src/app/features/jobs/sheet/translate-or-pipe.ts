import { Pipe, type PipeTransform } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';

/**
 * The translate pipe with a fallback: words the server sends in English with a key beside them
 * (cautions) show translated when the key has words, else the English as sent — never nothing.
 */
@Pipe({ name: 'translateOr', pure: false })
export class TranslateOrPipe extends TranslatePipe implements PipeTransform {
  override transform(
    key: string | null | undefined,
    params: Readonly<Record<string, unknown>> | null | undefined,
    fallback: string,
  ): string {
    if (!key) return fallback;
    const words: unknown = super.transform(key, params ?? {});
    return typeof words === 'string' && words !== '' && words !== key ? words : fallback;
  }
}
