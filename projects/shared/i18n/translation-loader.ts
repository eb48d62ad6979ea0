import { HttpClient } from '@angular/common/http';
import { Injectable, InjectionToken, TransferState, inject, makeStateKey } from '@angular/core';
import { APP_BASE_HREF } from '@angular/common';
import { type TranslateLoader, type TranslationObject } from '@ngx-translate/core';
import { Observable, from, of, tap } from 'rxjs';

/**
 * Where the server reads an app's merged words (`dist/<app>/browser/i18n/<lang>.json`); provided by
 * the server config only. The browser fetches the same files under `<base>i18n/`.
 */
export const TRANSLATION_FILES = new InjectionToken<(language: string) => Promise<TranslationObject>>('TRANSLATION_FILES');

const stateKey = (language: string) => makeStateKey<TranslationObject>(`lb-i18n-${language}`);

/**
 * Words for a language: on the server from disk, put in the page's transfer state; in the browser
 * from that state when the page carried them (no flash of other words), else over HTTP.
 */
@Injectable()
export class TransferTranslationLoader implements TranslateLoader {
  private readonly state = inject(TransferState);
  private readonly files = inject(TRANSLATION_FILES, { optional: true });
  private readonly http = inject(HttpClient);
  private readonly baseHref = inject(APP_BASE_HREF, { optional: true }) ?? '/';

  getTranslation(language: string): Observable<TranslationObject> {
    const key = stateKey(language);
    if (this.files) {
      return from(this.files(language)).pipe(tap((words) => this.state.set(key, words)));
    }
    const carried = this.state.get(key, null);
    if (carried) return of(carried);
    return this.http.get<TranslationObject>(`${this.baseHref}i18n/${language}.json`);
  }
}
