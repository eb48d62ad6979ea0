import type { Language } from '@layerbook/contracts';
import cautionsEn from '../../../projects/shared/i18n/words/cautions/en.json';
import cautionsEs from '../../../projects/shared/i18n/words/cautions/es.json';
import serverEn from './words/en.json';
import serverEs from './words/es.json';

/** Words as the apps keep them: nested objects of strings with `{{param}}` placeholders (ngx-translate's syntax). */
export interface Words {
  readonly [key: string]: string | Words;
}

/**
 * The server's words per language: its own areas (mail, pdf) and the shared `cautions` area the
 * apps read too, so a caution reads the same on the sheet, the portal and the proposal PDF.
 */
export const CATALOG: Readonly<Record<Language, Words>> = {
  en: { ...serverEn, cautions: cautionsEn },
  es: { ...serverEs, cautions: cautionsEs },
};

/** The template at a dotted key ("mail.invoice.subject"), or undefined when it is not there. */
export function lookup(words: Words, key: string): string | undefined {
  let at: string | Words | undefined = words;
  for (const part of key.split('.')) {
    if (typeof at !== 'object') return undefined;
    at = at[part];
  }
  return typeof at === 'string' ? at : undefined;
}

/** `{{name}}` replaced by its param; a missing param leaves nothing (as ngx-translate does). */
export function interpolate(template: string, params: Readonly<Record<string, string | number>> = {}): string {
  return template.replace(/\{\{\s*(\w+)\s*\}\}/g, (_, name: string) => (params[name] === undefined ? '' : String(params[name])));
}

export type Translate = (key: string, params?: Readonly<Record<string, string | number>>) => string;

/**
 * `t(key, params)` in one language; a key missing there falls back to English, and a key missing in
 * English too is a programming error (thrown, so a spec catches it rather than a reader seeing a key).
 */
export function translator(language: Language): Translate {
  return (key, params) => {
    const template = lookup(CATALOG[language], key) ?? lookup(CATALOG.en, key);
    if (template === undefined) throw new Error(`no words for ${key}`);
    return interpolate(template, params);
  };
}

/**
 * The BCP 47 locale numbers, dates and money are formatted in: the reader's language with the firm's
 * country ("es-US", "en-CA"); just the language when Intl does not know the pair.
 */
export function localeOf(language: Language, country: string): string {
  try {
    return Intl.getCanonicalLocales(`${language}-${country}`)[0] ?? language;
  } catch {
    return language;
  }
}

/** The language of a stored locale ("es-MX" → "es"), English when it is neither of ours. */
export const languageOfLocale = (locale: string): Language => (locale.toLowerCase().startsWith('es') ? 'es' : 'en');
