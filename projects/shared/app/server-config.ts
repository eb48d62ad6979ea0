import { FetchBackend, HttpBackend } from '@angular/common/http';
import { ApplicationConfig, NgZone, REQUEST_CONTEXT, inject, mergeApplicationConfig } from '@angular/core';
import { RenderMode, ServerRoute, provideServerRendering, withRoutes } from '@angular/ssr';
import type { TranslationObject } from '@ngx-translate/core';
import { map } from 'rxjs';
import { readFile } from 'node:fs/promises';
import { transferable } from '../http/api-interceptor';
import { SERVER_LANGUAGE_CHOICE } from '../i18n/i18n-providers';
import { chooseLanguageOnServer } from '../i18n/server-language';
import { watchedWords } from '../i18n/server-words';
import { TRANSLATION_FILES } from '../i18n/translation-loader';
import { apiDispatchOf } from '../ssr/api-dispatch';
import { InProcessBackend } from '../ssr/in-process-backend';

/**
 * The app's merged words beside its browser files (`dist/<app>/browser/i18n/<lang>.json`; this code
 * runs from `dist/<app>/server/`), read once per process.
 */
const wordsByLanguage = new Map<string, Promise<TranslationObject>>();
function translationFiles(language: string): Promise<TranslationObject> {
  if (!/^[a-z]{2}$/.test(language)) return Promise.resolve({});
  let words = wordsByLanguage.get(language);
  if (!words) {
    words = readFile(new URL(`../browser/i18n/${language}.json`, import.meta.url), 'utf8').then(
      (text) => JSON.parse(text) as TranslationObject,
      // The build's route extraction runs the app away from dist/; a missing file shows keys, never a failed page.
      (error: unknown) => {
        console.error(`Words for "${language}" could not be read`, error);
        wordsByLanguage.delete(language);
        return {};
      },
    );
    wordsByLanguage.set(language, words);
  }
  return words;
}

/** Every page depends on who is signed in, so each is rendered per request. */
const SERVER_ROUTES: ServerRoute[] = [{ path: '**', renderMode: RenderMode.Server }];

/**
 * The server's HTTP backend, seen before Angular's transfer cache looks at an answer (the cache
 * sits between the interceptors and the backend): answers lose the API's no-store and set-cookie,
 * so the page carries them to the browser instead of the browser fetching them again.
 * When the host server gave a dispatcher (server/src/ssr/api-dispatch.ts), API calls go into its
 * Express app in the same process (ssr/in-process-backend.ts); else over HTTP with fetch (the
 * Angular CLI dev server, a bundle run on its own).
 */
function transferableBackend(): HttpBackend {
  const fetchBackend = inject(FetchBackend);
  const dispatch = apiDispatchOf(inject(REQUEST_CONTEXT, { optional: true }));
  const backend = dispatch ? new InProcessBackend(dispatch, fetchBackend, inject(NgZone)) : fetchBackend;
  return { handle: (req) => backend.handle(req).pipe(map(transferable)) };
}

/** An app's browser configuration plus server rendering of its routes. */
export function serverConfigFor(appConfig: ApplicationConfig): ApplicationConfig {
  return mergeApplicationConfig(appConfig, {
    providers: [
      provideServerRendering(withRoutes(SERVER_ROUTES)),
      FetchBackend,
      { provide: HttpBackend, useFactory: transferableBackend },
      { provide: TRANSLATION_FILES, useFactory: watchedWords(translationFiles) },
      { provide: SERVER_LANGUAGE_CHOICE, useFactory: chooseLanguageOnServer },
    ],
  });
}
