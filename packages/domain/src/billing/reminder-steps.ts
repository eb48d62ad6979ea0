import { DomainInputError } from '../errors/domain-input-error';
import { type IsoDate, fromDayNumber, toDayNumber } from '../calendar/local-date';

/**
 * A firm's reminder cadence for unpaid invoices: once `daysBefore` the due date (null: not), on the
 * due date, then every `everyDaysAfter` days (null: never) at most `maxAfter` times.
 */
export interface ReminderCadence {
  daysBefore: number | null;
  onDueDate: boolean;
  everyDaysAfter: number | null;
  maxAfter: number;
}

/**
 * One reminder step. Its key says its distance from the due date ("before:3", "due", "after:7",
 * "after:14"), so a step keeps its key when the cadence changes and is never sent twice.
 */
export interface ReminderStep {
  step: string;
  on: IsoDate;
}

export interface ReminderDue extends ReminderStep {
  /** earlier steps that were also pending (the worker was down): they are not sent, and never will be */
  skipped: string[];
}

export interface RemindersDueInput {
  cadence: ReminderCadence;
  dueOn: IsoDate;
  today: IsoDate;
  /** every step already sent for this invoice, under any cadence */
  sent: readonly { step: string }[];
}

const DAYS_MAX = 365;
const AFTER_MAX = 52;
const STEP_KEY = /^(?:before:([1-9]\d*)|due|after:([1-9]\d*))$/;

function checkDays(value: number | null, field: string): number | null {
  if (value === null) return null;
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 1 || value > DAYS_MAX) {
    throw new DomainInputError(field, `Reminder days are a whole number from 1 to ${DAYS_MAX}.`);
  }
  return value;
}

/** Days from the due date a step key stands for: before:3 → −3, due → 0, after:7 → 7. */
function stepOffset(step: string, field: string): number {
  const m = typeof step === 'string' ? STEP_KEY.exec(step) : null;
  if (!m) throw new DomainInputError(field, `"${String(step)}" is not a reminder step (before:N, due or after:N).`);
  if (m[1] !== undefined) return -Number(m[1]);
  if (m[2] !== undefined) return Number(m[2]);
  return 0;
}

/** The cadence's steps for one invoice, in date order. */
export function reminderSteps(cadence: ReminderCadence, dueOn: IsoDate, field = 'cadence'): ReminderStep[] {
  const before = checkDays(cadence.daysBefore, `${field}.daysBefore`);
  const every = checkDays(cadence.everyDaysAfter, `${field}.everyDaysAfter`);
  const maxAfter = cadence.maxAfter;
  if (typeof maxAfter !== 'number' || !Number.isInteger(maxAfter) || maxAfter < 0 || maxAfter > AFTER_MAX) {
    throw new DomainInputError(`${field}.maxAfter`, `The number of reminders after the due date is a whole number from 0 to ${AFTER_MAX}.`);
  }
  const due = toDayNumber(dueOn, 'dueOn');
  const steps: ReminderStep[] = [];
  if (before !== null) steps.push({ step: `before:${before}`, on: fromDayNumber(due - before) });
  if (cadence.onDueDate) steps.push({ step: 'due', on: dueOn });
  if (every !== null) {
    for (let k = 1; k <= maxAfter; k++) steps.push({ step: `after:${k * every}`, on: fromDayNumber(due + k * every) });
  }
  return steps;
}

/**
 * The one reminder to send today, or null. A step is sendable when its date has come, it was never
 * sent (by key), it lies later than every step already sent (so nothing goes out of order, and no
 * before- or due-date reminder follows an overdue one), and, for an after-due step, fewer than
 * `maxAfter` after-due steps were sent under any cadence; a before-due step only before the due
 * date and the due-date step only on it (a late "due today" would be wrong). When several are sendable (the worker
 * was down) only the latest goes; the others are reported as skipped and, being earlier than it,
 * never become sendable again (common practice, no source).
 */
export function remindersDue(input: RemindersDueInput): ReminderDue | null {
  const today = toDayNumber(input.today, 'today');
  const steps = reminderSteps(input.cadence, input.dueOn);
  const sentKeys = new Set<string>();
  let latestSent = Number.NEGATIVE_INFINITY;
  input.sent.forEach((s, i) => {
    const offset = stepOffset(s.step, `sent[${i}].step`);
    sentKeys.add(s.step);
    latestSent = Math.max(latestSent, offset);
  });
  const afterSent = [...sentKeys].filter((k) => k.startsWith('after:')).length;
  const due = toDayNumber(input.dueOn, 'dueOn');
  const pending = steps.filter((s) => {
    const offset = stepOffset(s.step, 'step');
    if (toDayNumber(s.on) > today || sentKeys.has(s.step) || offset <= latestSent) return false;
    // Its words say "due on …" and "due today": a before step is stale from the due date on, the due step after it.
    if ((offset < 0 && today >= due) || (offset === 0 && today !== due)) return false;
    return offset <= 0 || afterSent < input.cadence.maxAfter;
  });
  if (pending.length === 0) return null;
  const chosen = pending[pending.length - 1];
  return { step: chosen.step, on: chosen.on, skipped: pending.slice(0, -1).map((s) => s.step) };
}
