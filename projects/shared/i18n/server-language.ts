import { DOCUMENT } from '@angular/common';
import { REQUEST, inject } from '@angular/core';
import { VISITOR_LANGUAGE } from './i18n-providers';
import { Language, languageFromAcceptHeader, languageFromUrl } from './language';

/**
 * The server's choice of the first language, before the first render (SERVER_LANGUAGE_CHOICE, given by
 * the server's app config so none of it is in the browser's first script): the signed-in person's,
 * else the address's `?lang=`, else Accept-Language, else English; written on the document (`lang`,
 * `data-region`) for the browser to start from.
 */
export function chooseLanguageOnServer(): () => Promise<void> {
  const language = inject(Language);
  const document = inject(DOCUMENT);
  const visitor = inject(VISITOR_LANGUAGE, { optional: true });
  const request = inject(REQUEST, { optional: true });
  // No request while the build extracts routes: asking the session then would render the app again.
  return () =>
    (visitor && request ? visitor() : Promise.resolve(null)).then(async (found) => {
      const chosen =
        found?.language ?? languageFromUrl(request?.url) ?? languageFromAcceptHeader(request?.headers.get('accept-language')) ?? 'en';
      language.setRegion(found?.country);
      await language.use(chosen);
      document.documentElement.lang = chosen;
      document.documentElement.setAttribute('data-region', found?.country ?? '');
    });
}
