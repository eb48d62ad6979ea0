import { TransferState, inject } from '@angular/core';
import type { TranslationObject } from '@ngx-translate/core';
import { translationStateKey } from './translation-loader';
import { type UsedGroups, pickGroups, watchWordReads } from './used-words';

/**
 * On the server (TRANSLATION_FILES, given by shared/app/server-config.ts): a language's words read by
 * `read`, watched, so the page's transfer state carries only the groups its render read (used-words.ts).
 * Server-only, so none of it is in the browser's first script.
 */
export function watchedWords(
  read: (language: string) => Promise<TranslationObject>,
): () => (language: string) => Promise<TranslationObject> {
  return () => {
    const state = inject(TransferState);
    return (language) =>
      read(language).then((words) => {
        const used: UsedGroups = new Set();
        state.onSerialize(translationStateKey(language), () => pickGroups(words, used));
        return watchWordReads(words, used);
      });
  };
}
