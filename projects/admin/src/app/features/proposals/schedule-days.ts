import { fromDayNumber, type IsoDate, type JobSchedule } from '@layerbook/domain';

export interface PlanStep {
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

const EPS = 1e-9;

/**
 * The engine's schedule as a day-by-day plan: the work of each day, then what is left drying
 * and until when. A wait is the gap between a layer's end and the moment the next layer on the
 * same surface may start (`readyAt`, absolute hours = day number × 24 + hour), so nights and
 * weekends count toward drying.
 */
export function planDays(schedule: JobSchedule): PlanDay[] {
  const nextInChain = new Map(schedule.tasks.map((t) => [t.taskId, t]));
  const waitsByDate = new Map<IsoDate, PlanWait[]>();
  for (const task of schedule.tasks) {
    if (task.chainId === null) continue;
    const index = Number(task.taskId.slice(task.taskId.lastIndexOf(':') + 1));
    const next = nextInChain.get(`${task.chainId}:${index + 1}`);
    if (!next || next.readyAt <= task.end + EPS) continue;
    const day = Math.floor(next.readyAt / 24);
    const list = waitsByDate.get(task.endDate) ?? [];
    list.push({ key: task.taskId, label: task.label, untilDate: fromDayNumber(day), untilHour: next.readyAt - day * 24 });
    waitsByDate.set(task.endDate, list);
  }
  return schedule.days.map((d) => ({
    date: d.date,
    workingDay: d.workingDay,
    crewHours: d.crewHours,
    capacity: d.capacity,
    steps: schedule.steps
      .filter((s) => s.date === d.date)
      .map((s, i) => ({ key: `${s.taskId}#${i}`, label: s.label, startHour: s.startHour, endHour: s.endHour, crewHours: s.crewHours })),
    waits: waitsByDate.get(d.date) ?? [],
  }));
}
