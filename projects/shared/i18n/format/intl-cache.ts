/**
 * Intl formatters kept per locale and options, for the apps (the domain keeps its own for money and
 * figures). Building a formatter resolves the locale's data each time and costs far more than using
 * it; a page formats hundreds of values with a handful of distinct settings, and server rendering
 * does it for every request. Formatters are immutable, so one is shared by every caller; the maps are
 * bounded so unusual inputs cannot grow them forever. A constructor that throws (an unknown time
 * zone) throws here too and nothing is kept.
 */
const LIMIT = 500;

function cacheOf<F, O extends object>(build: (locale: string | undefined, options?: O) => F) {
  const kept = new Map<string, F>();
  return (locale: string | undefined, options?: O): F => {
    const key = `${locale ?? ''}\u0000${options ? JSON.stringify(options) : ''}`;
    let format = kept.get(key);
    if (format === undefined) {
      format = build(locale, options);
      if (kept.size >= LIMIT) kept.clear();
      kept.set(key, format);
    }
    return format;
  };
}

/** `new Intl.NumberFormat(locale, options)`, built once per distinct pair. */
export const numberFormat = cacheOf((locale, options?: Intl.NumberFormatOptions) => new Intl.NumberFormat(locale, options));

/** `new Intl.DateTimeFormat(locale, options)`, built once per distinct pair. */
export const dateTimeFormat = cacheOf((locale, options?: Intl.DateTimeFormatOptions) => new Intl.DateTimeFormat(locale, options));

/** `new Intl.ListFormat(locale, options)`, built once per distinct pair. */
export const listFormat = cacheOf((locale, options?: Intl.ListFormatOptions) => new Intl.ListFormat(locale, options));
