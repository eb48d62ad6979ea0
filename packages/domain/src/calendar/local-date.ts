import { DomainInputError } from '../errors/domain-input-error';

/**
 * Local calendar dates as 'YYYY-MM-DD' and whole day numbers (days since 1970-01-01).
 * No Date objects: the caller has already resolved the firm's time zone, and plain integer
 * arithmetic (H. Hinnant's civil-from-days algorithm) behaves the same in browser and server.
 */
export type IsoDate = string;

const PATTERN = /^(\d{4})-(\d{2})-(\d{2})$/;

function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const doy = Math.floor((153 * (month + (month > 2 ? -3 : 9)) + 2) / 5) + day - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

function civilFromDays(days: number): [number, number, number] {
  const z = days + 719468;
  const era = Math.floor(z / 146097);
  const doe = z - era * 146097;
  const yoe = Math.floor((doe - Math.floor(doe / 1460) + Math.floor(doe / 36524) - Math.floor(doe / 146096)) / 365);
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  const day = doy - Math.floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return [month <= 2 ? yoe + era * 400 + 1 : yoe + era * 400, month, day];
}

export function toDayNumber(date: IsoDate, field = 'date'): number {
  const m = typeof date === 'string' ? PATTERN.exec(date) : null;
  if (!m) throw new DomainInputError(field, `"${String(date)}" is not a date in the form YYYY-MM-DD.`);
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const n = daysFromCivil(y, mo, d);
  const [y2, mo2, d2] = civilFromDays(n);
  if (y2 !== y || mo2 !== mo || d2 !== d) throw new DomainInputError(field, `"${date}" is not a real calendar date.`);
  return n;
}

/**
 * Dates already written, by day number: an estimate recomputed on every keystroke writes the same
 * few hundred dates each time. Bounded; strings never change, so sharing them is safe.
 */
const written = new Map<number, IsoDate>();
const WRITTEN_LIMIT = 8192;

export function fromDayNumber(days: number): IsoDate {
  let date = written.get(days);
  if (date === undefined) {
    const [y, m, d] = civilFromDays(days);
    date = `${String(y).padStart(4, '0')}-${String(m).padStart(2, '0')}-${String(d).padStart(2, '0')}`;
    if (written.size >= WRITTEN_LIMIT) written.clear();
    written.set(days, date);
  }
  return date;
}

/** ISO weekday: 1 = Monday … 7 = Sunday (1970-01-01 was a Thursday). */
export function isoWeekday(days: number): number {
  return ((((days + 3) % 7) + 7) % 7) + 1;
}

export function addDays(date: IsoDate, n: number): IsoDate {
  return fromDayNumber(toDayNumber(date) + n);
}

/** The same day a year earlier; 29 February goes to 28 February. */
export function yearBefore(date: IsoDate): IsoDate {
  toDayNumber(date);
  const md = date.slice(5) === '02-29' ? '02-28' : date.slice(5);
  return `${String(Number(date.slice(0, 4)) - 1).padStart(4, '0')}-${md}`;
}

export function daysBetween(from: IsoDate, to: IsoDate): number {
  return toDayNumber(to, 'to') - toDayNumber(from, 'from');
}

/** Monday of the ISO week containing `days`. */
export function mondayOf(days: number): number {
  return days - (isoWeekday(days) - 1);
}

/** ISO 8601 week label, e.g. '2025-W23' (week 1 holds the year's first Thursday). */
export function isoWeekLabel(days: number): string {
  const thursday = mondayOf(days) + 3;
  const [year] = civilFromDays(thursday);
  const week = Math.floor((thursday - daysFromCivil(year, 1, 1)) / 7) + 1;
  return `${year}-W${String(week).padStart(2, '0')}`;
}
