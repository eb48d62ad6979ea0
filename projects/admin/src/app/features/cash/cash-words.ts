const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;

/** "2026-11" → "Nov 2026"; anything else is shown as it came. */
export function monthLabel(month: string): string {
  const match = /^(\d{4})-(\d{2})$/.exec(month);
  const name = match ? MONTHS[Number(match[2]) - 1] : undefined;
  return match && name ? `${name} ${match[1]}` : month;
}

/** "2026-11-30" → "30 Nov": the first day of a forecast week, short enough for the chart's axis. */
export function weekLabel(weekStart: string): string {
  const match = /^\d{4}-(\d{2})-(\d{2})$/.exec(weekStart);
  const name = match ? MONTHS[Number(match[1]) - 1] : undefined;
  return match && name ? `${Number(match[2])} ${name}` : weekStart;
}

/** "12 days late", "1 day late", "Not yet due" (also for a due date still ahead). */
export function lateWords(daysPastDue: number): string {
  if (daysPastDue <= 0) return 'Not yet due';
  return daysPastDue === 1 ? '1 day late' : `${daysPastDue} days late`;
}

/** A percent from the API ("23.5") as words ("23.5%"); a dash when there is none. */
export function percentWords(percent: string | null): string {
  if (percent === null || !/^-?\d+(\.\d+)?$/.test(percent.trim())) return '—';
  return `${percent.trim()}%`;
}
