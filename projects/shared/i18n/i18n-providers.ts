import { DOCUMENT, isPlatformServer } from '@angular/common';
import {
  type EnvironmentProviders,
  InjectionToken,
  PLATFORM_ID,
  REQUEST,
  type Provider,
  inject,
  provideAppInitializer,
} from '@angular/core';
import { TranslateLoader, provideMissingTranslationHandler, provideTranslateService } from '@ngx-translate/core';
import type { Language as LanguageCode } from '@layerbook/contracts/types';
import { Language, knownLanguage, languageFromAcceptHeader, languageFromUrl } from './language';
import { TransferTranslationLoader, WaitForWholeWords } from './translation-loader';
import { provideTranslatedTitles } from './translated-title';

/** Who the visitor is, as far as language goes: the signed-in person's language, or null (each app provides it). */
export const VISITOR_LANGUAGE = new InjectionToken<() => Promise<{ language: LanguageCode; country?: string } | null>>('VISITOR_LANGUAGE');

/**
 * ngx-translate for one app (route titles included): English as the fallback, words from the
 * transfer state (the page's part; the rest loaded when idle) or the app's `i18n/` files, and the
 * first language chosen before the first render — on the server from the signed-in person (else
 * the address's `?lang=`, else Accept-Language), in the browser from the `lang` the server wrote.
 */
export function provideI18n(): Array<Provider | EnvironmentProviders> {
  return [
    TransferTranslationLoader,
    provideTranslateService({
      fallbackLang: 'en',
      loader: { provide: TranslateLoader, useExisting: TransferTranslationLoader },
      missingTranslationHandler: provideMissingTranslationHandler(WaitForWholeWords),
    }),
    // Route `title:`s are keys too, shown in the current language.
    ...provideTranslatedTitles(),
    provideAppInitializer(() => {
      const language = inject(Language);
      const document = inject(DOCUMENT);
      if (isPlatformServer(inject(PLATFORM_ID))) {
        const visitor = inject(VISITOR_LANGUAGE, { optional: true });
        const request = inject(REQUEST, { optional: true });
        // No request while the build extracts routes: asking the session then would render the app again.
        return (visitor && request ? visitor() : Promise.resolve(null)).then(async (found) => {
          const chosen =
            found?.language ?? languageFromUrl(request?.url) ?? languageFromAcceptHeader(request?.headers.get('accept-language')) ?? 'en';
          language.setRegion(found?.country);
          await language.use(chosen);
          document.documentElement.lang = chosen;
          document.documentElement.setAttribute('data-region', found?.country ?? '');
        });
      }
      language.setRegion(document.documentElement.getAttribute('data-region'));
      return language.use(knownLanguage(document.documentElement.lang) ?? 'en');
    }),
  ];
}
