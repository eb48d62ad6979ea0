import { localDate } from '../firms/local-date';
import type { StaffPrincipal } from '../http/principal';

export interface FirmClock {
  /** today in the firm's zone */
  today: string;
  currency: string;
  timeZone: string;
}

/** The firm's local date, currency and zone, from the signed-in person's re-check (which reads them: no round trip of its own). */
export function staffClock(staff: Pick<StaffPrincipal, 'timeZone' | 'currency'>, now: Date): FirmClock {
  return { today: localDate(staff.timeZone, now), currency: staff.currency, timeZone: staff.timeZone };
}
