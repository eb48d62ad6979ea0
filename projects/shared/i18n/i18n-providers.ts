import { DOCUMENT, isPlatformServer } from '@angular/common';
import { type EnvironmentProviders, InjectionToken, PLATFORM_ID, type Provider, inject, provideAppInitializer } from '@angular/core';
import { TranslateLoader, provideMissingTranslationHandler, provideTranslateService } from '@ngx-translate/core';
import type { Language as LanguageCode } from '@layerbook/contracts/types';
import { Language, knownLanguage } from './language';
import { TransferTranslationLoader, WaitForWholeWords } from './translation-loader';
import { provideTranslatedTitles } from './translated-title';

/** Who the visitor is, as far as language goes: the signed-in person's language, or null (each app provides it). */
export const VISITOR_LANGUAGE = new InjectionToken<() => Promise<{ language: LanguageCode; country?: string } | null>>('VISITOR_LANGUAGE');

/** On the server, how the first language is chosen (`chooseLanguageOnServer`, given by shared/app/server-config.ts). */
export const SERVER_LANGUAGE_CHOICE = new InjectionToken<() => Promise<void>>('SERVER_LANGUAGE_CHOICE');

/**
 * ngx-translate for one app (route titles included): English as the fallback, words from the
 * transfer state (the page's part; the rest loaded when idle) or the app's `i18n/` files, and the
 * first language chosen before the first render — on the server by SERVER_LANGUAGE_CHOICE (the signed-in person, else
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
        const choose = inject(SERVER_LANGUAGE_CHOICE, { optional: true });
        return choose ? choose() : language.use('en');
      }
      language.setRegion(document.documentElement.getAttribute('data-region'));
      return language.use(knownLanguage(document.documentElement.lang) ?? 'en');
    }),
  ];
}
