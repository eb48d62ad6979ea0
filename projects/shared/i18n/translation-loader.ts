import { HttpClient } from '@angular/common/http';
import { ApplicationRef, Injectable, InjectionToken, Injector, TransferState, inject, makeStateKey } from '@angular/core';
import { APP_BASE_HREF } from '@angular/common';
import {
  type MissingTranslationHandler,
  type MissingTranslationHandlerParams,
  type TranslateLoader,
  TranslateService,
  type TranslationObject,
} from '@ngx-translate/core';
import { Observable, from, of } from 'rxjs';

/**
 * Where the server reads an app's merged words (`dist/<app>/browser/i18n/<lang>.json`); provided by
 * the server config only. The browser fetches the same files under `<base>i18n/`.
 */
export const TRANSLATION_FILES = new InjectionToken<(language: string) => Promise<TranslationObject>>('TRANSLATION_FILES');

/** Where a page carries a language's words (the server puts the groups its render read there: server-words.ts). */
export const translationStateKey = (language: string) => makeStateKey<TranslationObject>(`lb-i18n-${language}`);

/**
 * Words for a language. On the server from disk, watched: the page's transfer state carries only the
 * groups the render read (used-words.ts). In the browser from that state when the page carried them
 * (no flash of other words), the whole file loaded once the app is idle, in their place; else over HTTP.
 */
@Injectable()
export class TransferTranslationLoader implements TranslateLoader {
  private readonly state = inject(TransferState);
  private readonly files = inject(TRANSLATION_FILES, { optional: true });
  private readonly http = inject(HttpClient);
  private readonly injector = inject(Injector);
  private readonly baseHref = inject(APP_BASE_HREF, { optional: true }) ?? '/';
  /** Languages started from a page's part of the words, whose whole files are not in yet. */
  private readonly partial = new Set<string>();
  private completing = false;

  getTranslation(language: string): Observable<TranslationObject> {
    // On the server: from disk, watched (server-words.ts).
    if (this.files) return from(this.files(language));
    const carried = this.state.get(translationStateKey(language), null);
    if (!carried) return this.whole(language);
    this.partial.add(language);
    void this.injector
      .get(ApplicationRef)
      .whenStable()
      .then(() => whenIdle(() => this.completeWords()));
    return of(carried);
  }

  /** True while some words of the page's languages may still be on their way. */
  get incomplete(): boolean {
    return this.partial.size > 0;
  }

  /** Loads the whole files of the languages the page carried a part of, in place of those parts (once). */
  completeWords(): void {
    if (this.completing || this.partial.size === 0) return;
    this.completing = true;
    const translate = this.injector.get(TranslateService);
    for (const language of this.partial) {
      this.whole(language).subscribe({
        next: (words) => {
          this.partial.delete(language);
          // The whole file holds every carried word: it replaces them (merging would deep-copy both).
          translate.setTranslation(language, words);
        },
        // Offline or failing: the page keeps its words; the next missing word tries again.
        error: () => (this.completing = false),
      });
    }
  }

  private whole(language: string): Observable<TranslationObject> {
    return this.http.get<TranslationObject>(`${this.baseHref}i18n/${language}.json`);
  }
}

/**
 * A word the page did not carry, asked for before the whole words came in: start loading them now
 * and show nothing until they are here (the translate pipe updates when they arrive), rather than
 * the key. Once all words are in, a missing word shows its key, as ngx-translate does.
 */
@Injectable()
export class WaitForWholeWords implements MissingTranslationHandler {
  private readonly loader = inject(TransferTranslationLoader);

  handle(params: MissingTranslationHandlerParams): string {
    if (!this.loader.incomplete) return params.key;
    this.loader.completeWords();
    return '';
  }
}

function whenIdle(run: () => void): void {
  if (typeof requestIdleCallback === 'function') requestIdleCallback(run, { timeout: 2000 });
  else setTimeout(run, 0);
}
