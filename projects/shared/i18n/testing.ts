import { type EnvironmentProviders, type Provider } from '@angular/core';
import { TranslateLoader, type TranslationObject, provideTranslateLoader, provideTranslateService } from '@ngx-translate/core';
import { Observable, of } from 'rxjs';

let given: Record<string, TranslationObject> = {};

class GivenWords implements TranslateLoader {
  getTranslation(): Observable<TranslationObject> {
    return of(given);
  }
}

/**
 * For component specs: the translate pipe with the given areas' words, already in use. Import the
 * area files a spec renders (`import jobs from '../../../i18n/jobs/en.json'`) and pass them by area:
 * `provideTestI18n({ jobs })`.
 */
export function provideTestI18n(areas: Record<string, unknown>, language = 'en'): Array<Provider | EnvironmentProviders> {
  given = areas as Record<string, TranslationObject>;
  return [provideTranslateService({ fallbackLang: language, lang: language, loader: provideTranslateLoader(GivenWords) })];
}
