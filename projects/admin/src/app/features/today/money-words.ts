import { daysBetween } from '@layerbook/contracts/engine';

/**
 * How late an invoice is, in words, counted in calendar days from its due date to the firm's
 * today ("1 day overdue", "12 days overdue"); null when either day is missing or not past due.
 */
export function overdueWords(dueOn: string | null, today: string | null): string | null {
  if (!dueOn || !today) return null;
  const days = daysBetween(dueOn, today);
  if (days <= 0) return null;
  return days === 1 ? '1 day overdue' : `${days} days overdue`;
}

/** A payment's day said against the firm's today: "today", "yesterday", or null for any other day (then shown as a date). */
export function receivedWords(receivedOn: string, today: string | null): 'today' | 'yesterday' | null {
  const days = today ? daysBetween(receivedOn, today) : null;
  if (days === 0) return 'today';
  if (days === 1) return 'yesterday';
  return null;
}
