import { DomainInputError } from '../errors/domain-input-error';
import { requireFiniteNumber, requireNonNegative, requirePositive } from '../errors/input-checks';
import { type IsoDate, isoWeekday, toDayNumber } from '../calendar/local-date';

/** The firm's working calendar, in local dates and hours of the day. */
export interface WorkCalendar {
  /** ISO weekdays worked: 1 = Monday … 7 = Sunday */
  workingWeekdays: number[];
  /** hour of day work starts, e.g. 8 */
  dayStartHour: number;
  /** productive hours per worker per day (breaks and travel already taken out) */
  productiveHoursPerDay: number;
  holidays?: IsoDate[];
  /** a layer is not started with less than this left in the day (no cold joint mid-wall) */
  minimumBlockHours: number;
}

const EPS = 1e-9;
/** No firm works a calendar whose next working day is more than ten years away. */
const SEARCH_LIMIT_DAYS = 3660;

/** Working-time arithmetic on absolute hours (day number × 24 + hour of day). */
export class WorkingTime {
  /** bit d set when ISO weekday d is worked: a bit test rather than a set look-up per day */
  private readonly weekdayBits: number;
  private readonly holidays: ReadonlySet<number>;
  /**
   * Next working day on or after a day, memoised: the scheduler asks the same days many times.
   * Days from the first one asked are kept in an array (a job moves forward a few days at a
   * time, so it stays dense and is far cheaper than a map); any other day goes in the map.
   */
  private nextBase: number | undefined;
  private readonly nextByOffset: Array<number | undefined> = [];
  private readonly nextCache = new Map<number, number>();
  readonly dayStart: number;
  readonly dayLength: number;
  readonly minimumBlock: number;

  constructor(calendar: WorkCalendar, field = 'calendar') {
    if (!Array.isArray(calendar.workingWeekdays) || calendar.workingWeekdays.length === 0) {
      throw new DomainInputError(`${field}.workingWeekdays`, 'At least one working weekday is needed.');
    }
    calendar.workingWeekdays.forEach((d, i) => {
      if (!Number.isInteger(d) || d < 1 || d > 7) {
        throw new DomainInputError(`${field}.workingWeekdays[${i}]`, 'Weekdays are numbered 1 (Monday) to 7 (Sunday).');
      }
    });
    this.weekdayBits = calendar.workingWeekdays.reduce((bits, d) => bits | (1 << d), 0);
    this.holidays = new Set((calendar.holidays ?? []).map((h, i) => toDayNumber(h, `${field}.holidays[${i}]`)));
    this.dayStart = requireNonNegative(calendar.dayStartHour, `${field}.dayStartHour`, 'day start hour');
    this.dayLength = requirePositive(calendar.productiveHoursPerDay, `${field}.productiveHoursPerDay`, 'productive hours per day');
    if (this.dayStart + this.dayLength > 24) {
      throw new DomainInputError(`${field}.productiveHoursPerDay`, 'The working day runs past midnight.');
    }
    requireNonNegative(calendar.minimumBlockHours, `${field}.minimumBlockHours`, 'minimum block');
    requireFiniteNumber(calendar.minimumBlockHours, `${field}.minimumBlockHours`);
    // A block longer than the day could never be met; the whole day is the most anyone can ask.
    this.minimumBlock = Math.min(calendar.minimumBlockHours, this.dayLength);
  }

  isWorkingDay(day: number): boolean {
    return (this.weekdayBits & (1 << isoWeekday(day))) !== 0 && (this.holidays.size === 0 || !this.holidays.has(day));
  }

  nextWorkingDay(day: number): number {
    if (this.nextBase === undefined) this.nextBase = day;
    const offset = day - this.nextBase;
    const inArray = offset >= 0 && offset < this.nextByOffset.length + 64 && Number.isInteger(offset);
    const cached = inArray ? this.nextByOffset[offset] : this.nextCache.get(day);
    if (cached !== undefined) return cached;
    for (let d = day, i = 0; i < SEARCH_LIMIT_DAYS; d++, i++) {
      if (this.isWorkingDay(d)) {
        if (inArray) this.nextByOffset[offset] = d;
        else this.nextCache.set(day, d);
        return d;
      }
    }
    throw new DomainInputError('calendar.holidays', 'No working day found within ten years.');
  }

  windowOf(day: number): { start: number; end: number } {
    return { start: this.windowStart(day), end: this.windowEnd(day) };
  }

  /** Start of a day's working window, without allocating a window (hot loops). */
  windowStart(day: number): number {
    return day * 24 + this.dayStart;
  }

  windowEnd(day: number): number {
    return day * 24 + this.dayStart + this.dayLength;
  }

  /**
   * Earliest moment at or after `t` when work of `duration` clock hours may start: inside a
   * working window, with at least the minimum block (or the whole task, if shorter) left.
   */
  earliestStart(t: number, duration: number): number {
    const need = Math.min(this.minimumBlock, duration);
    let day = this.nextWorkingDay(Math.floor(t / 24));
    for (let i = 0; i < SEARCH_LIMIT_DAYS; i++) {
      const start = this.windowStart(day);
      const end = this.windowEnd(day);
      const s = Math.max(t, start);
      if (s < end - EPS && end - s >= need - EPS) return s;
      if (duration === 0 && s <= end + EPS && s >= start) return s;
      day = this.nextWorkingDay(day + 1);
    }
    throw new DomainInputError('calendar', 'No working time found within ten years.');
  }
}
