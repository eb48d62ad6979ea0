import { DOCUMENT } from '@angular/common';
import { Injectable, type Signal, computed, inject, signal } from '@angular/core';
import { TranslateService } from '@ngx-translate/core';
import { type Language as LanguageCode, LANGUAGES } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';

/** A language code we have words for, or null. */
export function knownLanguage(value: unknown): LanguageCode | null {
  return typeof value === 'string' && (LANGUAGES as readonly string[]).includes(value) ? (value as LanguageCode) : null;
}

/**
 * The language a signed-out page was asked for in its address (`?lang=es`: the portal's language
 * switch, links in e-mails), else null. Takes an absolute URL or a path.
 */
export function languageFromUrl(url: string | null | undefined): LanguageCode | null {
  if (!url) return null;
  try {
    return knownLanguage(new URL(url, 'http://page.invalid').searchParams.get('lang'));
  } catch {
    return null;
  }
}

/**
 * The first of the visitor's Accept-Language choices we have words for (q-values respected), else null.
 * RFC 9110 §12.5.4.
 */
export function languageFromAcceptHeader(header: string | null | undefined): LanguageCode | null {
  if (!header) return null;
  const ranked = header
    .split(',')
    .map((part, index) => {
      const [tag, ...params] = part.trim().split(';');
      const q = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
      return { tag: (tag ?? '').trim().toLowerCase(), q: q ? Number(q.slice(2)) : 1, index };
    })
    .filter((c) => c.tag.length > 0 && Number.isFinite(c.q) && c.q > 0)
    .sort((a, b) => b.q - a.q || a.index - b.index);
  for (const choice of ranked) {
    const found = knownLanguage(choice.tag.split('-')[0]);
    if (found) return found;
  }
  return null;
}

/**
 * The language the app shows, for the translate pipe and for formatting numbers, dates and money
 * (Intl with `locale()`). One per app; the server picks it for the visitor and the browser starts
 * from the `lang` the server wrote on <html>, so both render the same words.
 */
@Injectable({ providedIn: 'root' })
export class Language {
  private readonly translate = inject(TranslateService);
  private readonly document = inject(DOCUMENT);
  private readonly code = signal<LanguageCode>('en');
  private readonly region = signal<string>('US');

  readonly current = this.code.asReadonly();
  /** BCP 47 tag for Intl: the language in the firm's country (es-US, en-GB…) */
  readonly locale = computed(() => `${this.code()}-${this.region()}`);

  /** Switches the words; resolves once they are loaded (at once when the page carried them). */
  async use(language: LanguageCode): Promise<void> {
    await firstValueFrom(this.translate.use(language));
    this.code.set(language);
    // Screen readers pick their voice from it; the server wrote the first one, a switch changes it here.
    this.document.documentElement.lang = language;
  }

  /**
   * Whether the words or number formats changed since now (the page being drawn): a part of a page
   * left dehydrated (`@defer (hydrate when …)`) wakes up on it to redraw itself.
   */
  changedSinceNow(): Signal<boolean> {
    const drawn = this.locale();
    return computed(() => this.locale() !== drawn);
  }

  /** The firm's country (ISO 3166-1 alpha-2) for number and date conventions. */
  setRegion(country: string | null | undefined): void {
    if (country && /^[A-Za-z]{2}$/.test(country)) this.region.set(country.toUpperCase());
  }
}
