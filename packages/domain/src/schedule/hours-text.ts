import { roundedNumber } from '../units/number-text';

/** "6.5 h", "1,204 h". */
export function hoursText(hours: number): string {
  return `${roundedNumber(hours, 2)} h`;
}

/** A layer's wait: "no wait", "16 h", "72 h (3 days)", "100 h (4 days 4 h)". Days are spelled out from 48 h on. */
export function waitText(hours: number): string {
  if (hours === 0) return 'no wait';
  const h = hoursText(hours);
  if (hours < 48) return h;
  const days = Math.floor(hours / 24);
  const rest = Number((hours - days * 24).toFixed(2));
  return `${h} (${days} days${rest ? ` ${rest} h` : ''})`;
}
