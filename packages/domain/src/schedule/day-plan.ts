import type { IsoDate } from '../calendar/local-date';
import type { ScheduleDay, ScheduleStep, ScheduleWait } from './schedule-job';

export interface PlanStep {
  /** unique within the plan: a task may run over several days */
  readonly key: string;
  readonly label: string;
  readonly startHour: number;
  readonly endHour: number;
  readonly crewHours: number;
}

export interface PlanWait {
  readonly key: string;
  /** what is drying, e.g. "Dining room – Walls: Lime plaster, first coat" */
  readonly label: string;
  readonly untilDate: IsoDate;
  readonly untilHour: number;
}

export interface PlanDay {
  readonly date: IsoDate;
  readonly workingDay: number;
  readonly crewHours: number;
  readonly capacity: number;
  readonly steps: readonly PlanStep[];
  /** waits that begin when work ends on this day */
  readonly waits: readonly PlanWait[];
}

/** What the plan reads from a schedule; stored results saved before waits were listed have none. */
export interface PlannedSchedule {
  readonly days: readonly ScheduleDay[];
  readonly steps: readonly ScheduleStep[];
  readonly waits?: readonly ScheduleWait[];
}

/**
 * The schedule as a day-by-day plan: each working day's work in order, then what is left drying
 * from that day and until when (DOMAIN.md §2.7; common practice, no source).
 */
export function planDays(schedule: PlannedSchedule): PlanDay[] {
  const stepsByDate = new Map<IsoDate, PlanStep[]>();
  for (const s of schedule.steps) {
    const list = stepsByDate.get(s.date) ?? [];
    list.push({ key: `${s.taskId}#${list.length}`, label: s.label, startHour: s.startHour, endHour: s.endHour, crewHours: s.crewHours });
    stepsByDate.set(s.date, list);
  }
  const waitsByDate = new Map<IsoDate, PlanWait[]>();
  for (const w of schedule.waits ?? []) {
    const list = waitsByDate.get(w.date) ?? [];
    list.push({ key: w.taskId, label: w.label, untilDate: w.untilDate, untilHour: w.untilHour });
    waitsByDate.set(w.date, list);
  }
  return schedule.days.map((d) => ({
    date: d.date,
    workingDay: d.workingDay,
    crewHours: d.crewHours,
    capacity: d.capacity,
    steps: stepsByDate.get(d.date) ?? [],
    waits: waitsByDate.get(d.date) ?? [],
  }));
}
