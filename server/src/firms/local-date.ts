// Intl formatters are costly to build (a noticeable share of a list request), so keep one per zone.
const dateFormats = new Map<string, Intl.DateTimeFormat>();
const hourFormats = new Map<string, Intl.DateTimeFormat>();

function cached(map: Map<string, Intl.DateTimeFormat>, timeZone: string, make: () => Intl.DateTimeFormat): Intl.DateTimeFormat {
  let format = map.get(timeZone);
  if (!format) {
    format = make();
    map.set(timeZone, format);
  }
  return format;
}

/** The calendar date at `now` in a firm's time zone, as YYYY-MM-DD (en-CA formats that way). */
export function localDate(timeZone: string, now: Date): string {
  return cached(
    dateFormats,
    timeZone,
    () => new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }),
  ).format(now);
}

/** The hour (0–23) at `now` in a firm's time zone. */
export function localHour(timeZone: string, now: Date): number {
  return Number(
    cached(hourFormats, timeZone, () => new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', hourCycle: 'h23' })).format(now),
  );
}
