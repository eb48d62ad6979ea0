/** The calendar date at `now` in a firm's time zone, as YYYY-MM-DD (en-CA formats that way). */
export function localDate(timeZone: string, now: Date): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(now);
}

/** The hour (0–23) at `now` in a firm's time zone. */
export function localHour(timeZone: string, now: Date): number {
  return Number(new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', hourCycle: 'h23' }).format(now));
}
