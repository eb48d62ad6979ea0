import { describe, expect, it } from 'vitest';
import { languageFromAcceptHeader, languageFromUrl } from './language';

describe('the language a signed-out page is asked for in its address', () => {
  it.each([
    ['http://127.0.0.1:4310/portal/sign-in?lang=es', 'es'],
    ['/portal/sign-in/link?token=abc&next=%2Fportal%2Finvoices%2Fi-1&lang=en', 'en'],
    ['/portal/f/ochre-lane/inquiry?lang=fr', null],
    ['/portal/sign-in?lang=', null],
    ['/portal/sign-in', null],
    [null, null],
  ])('%s asks for %s', (url, language) => {
    expect(languageFromUrl(url)).toBe(language);
  });

  it('leaves the browser’s choice to the next step when the address names none', () => {
    expect(languageFromUrl('/portal/sign-in') ?? languageFromAcceptHeader('es-MX,es;q=0.9,en;q=0.5')).toBe('es');
  });
});
