/**
 * Intl formatters kept per locale and options. Building one costs far more than using it (tens of
 * microseconds to milliseconds: the locale data is resolved each time), and a page formats hundreds
 * of figures with a handful of distinct settings. A formatter is immutable once built, so sharing it
 * is safe; the cache is bounded so odd inputs (an unknown locale per call) cannot grow it forever.
 */
const LIMIT = 500;
const numberFormats = new Map<string, Intl.NumberFormat>();

function keyOf(locale: string | undefined, options: object | undefined): string {
  return `${locale ?? ''}\u0000${options ? JSON.stringify(options) : ''}`;
}

/** `new Intl.NumberFormat(locale, options)`, built once per distinct pair (it throws as the constructor does). */
export function cachedNumberFormat(locale: string | undefined, options?: Intl.NumberFormatOptions): Intl.NumberFormat {
  const key = keyOf(locale, options);
  let format = numberFormats.get(key);
  if (!format) {
    format = new Intl.NumberFormat(locale, options);
    if (numberFormats.size >= LIMIT) numberFormats.clear();
    numberFormats.set(key, format);
  }
  return format;
}
