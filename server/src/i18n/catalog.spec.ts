import { CATALOG, interpolate, localeOf, lookup, translator, type Words } from './catalog';

function leaves(words: Words, prefix = ''): Record<string, string> {
  return Object.fromEntries(
    Object.entries(words).flatMap(([k, v]) =>
      typeof v === 'string' ? [[`${prefix}${k}`, v]] : Object.entries(leaves(v, `${prefix}${k}.`)),
    ),
  );
}
const placeholders = (template: string) => [...template.matchAll(/\{\{(\w+)\}\}/g)].map((m) => m[1]).sort();

describe('the server catalog', () => {
  it('has the same keys in English and Spanish, each with the same placeholders and some words', () => {
    const en = leaves(CATALOG.en);
    const es = leaves(CATALOG.es);
    expect(Object.keys(es).sort()).toEqual(Object.keys(en).sort());
    for (const key of Object.keys(en)) {
      expect([key, placeholders(es[key])]).toEqual([key, placeholders(en[key])]);
      expect([key, es[key].trim().length > 0]).toEqual([key, true]);
    }
  });

  it('fills {{params}} as ngx-translate does, falls back to English, and refuses a key with no words at all', () => {
    expect(interpolate('Hello {{name}}, {{ n }} left{{missing}}.', { name: 'Ana', n: 3 })).toBe('Hello Ana, 3 left.');
    expect(lookup(CATALOG.en, 'mail.hello')).toBe('Hello {{name}},');
    expect(lookup(CATALOG.en, 'mail')).toBeUndefined();
    expect(translator('es')('mail.hello', { name: 'Ana' })).toBe('Hola, Ana:');
    expect(() => translator('es')('mail.nothing.here')).toThrow('no words for mail.nothing.here');
  });

  it('formats for the reader’s language with the firm’s country', () => {
    // BCP 47 (RFC 5646) language-region tags, canonicalised by Intl.getCanonicalLocales.
    expect(localeOf('es', 'US')).toBe('es-US');
    expect(localeOf('en', 'CA')).toBe('en-CA');
    expect(localeOf('es', 'not a region')).toBe('es');
  });
});
