import type { TranslationObject } from '@ngx-translate/core';

/**
 * A page carries only the words its render read, not the app's whole dictionary (83 kB for the
 * admin app in English, most of a page's HTML): the server watches which groups the render reads
 * and puts those in the transfer state; the browser starts from them and loads the rest when idle.
 *
 * The unit is a group — a key's first two parts (`today.money`), or a top-level word — so the words a
 * component shows later (its errors, its dialog) usually come with the ones it rendered.
 */
export type UsedGroups = Set<string>;

const isGroup = (value: unknown): value is TranslationObject => typeof value === 'object' && value !== null && !Array.isArray(value);

/**
 * The same words, noting in `used` each group a read goes through. ngx-translate resolves
 * `a.b.c` by reading `words.a`, then `.b`, then `.c`; reading `.b` of `a` notes `a.b`.
 */
export function watchWordReads(words: TranslationObject, used: UsedGroups): TranslationObject {
  const areas = new Map<string, TranslationObject>();
  return new Proxy(words, {
    get(target, area, receiver) {
      const value: unknown = Reflect.get(target, area, receiver);
      if (typeof area !== 'string') return value;
      if (!isGroup(value)) {
        if (value !== undefined) used.add(area);
        return value;
      }
      let watched = areas.get(area);
      if (!watched) {
        watched = new Proxy(value, {
          get(group, name, inner) {
            const word: unknown = Reflect.get(group, name, inner);
            if (typeof name === 'string' && word !== undefined) used.add(`${area}.${name}`);
            return word;
          },
        });
        areas.set(area, watched);
      }
      return watched;
    },
  });
}

/** The groups of `words` named in `used`, nothing else. */
export function pickGroups(words: TranslationObject, used: UsedGroups): TranslationObject {
  const picked: Record<string, TranslationObject | string> = {};
  for (const path of [...used].sort()) {
    const [area, name] = path.split('.', 2) as [string, string | undefined];
    const value = words[area];
    if (name === undefined) {
      picked[area] = value as TranslationObject | string;
    } else if (isGroup(value) && value[name] !== undefined) {
      const group = (picked[area] ??= {}) as Record<string, unknown>;
      group[name] = value[name];
    }
  }
  return picked;
}
