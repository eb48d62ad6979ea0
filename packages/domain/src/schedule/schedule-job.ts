import { type IsoDate, fromDayNumber, toDayNumber } from '../calendar/local-date';
import { DomainInputError } from '../errors/domain-input-error';
import { requireInteger, requireNonNegative } from '../errors/input-checks';
import { StartQueue, insertSorted } from './start-queue';
import { type WorkCalendar, WorkingTime } from './work-calendar';

/** One surface's layers, in order; different surfaces interleave during each other's waits. */
export interface WorkChain {
  id: string;
  label: string;
  steps: ReadonlyArray<{ layerId: string; label: string; crewHours: number; waitHoursAfter: number }>;
}

export interface ScheduleInput {
  startDate: IsoDate;
  calendar: WorkCalendar;
  crewSize: number;
  setupHours: number;
  cleanupHours: number;
  chains: readonly WorkChain[];
}

/** A piece of one task on one working day; hours are hours of the day. */
export interface ScheduleStep {
  taskId: string;
  chainId: string | null;
  layerId: string | null;
  label: string;
  date: IsoDate;
  /** 1 for the first working day of the job */
  workingDay: number;
  startHour: number;
  endHour: number;
  crewHours: number;
}

export interface ScheduledTask {
  taskId: string;
  chainId: string | null;
  layerId: string | null;
  label: string;
  /** absolute hours (day number × 24 + hour) so waits can be checked across days */
  readyAt: number;
  start: number;
  end: number;
  endDate: IsoDate;
  endHour: number;
}

export interface Milestone {
  id: string;
  label: string;
  date: IsoDate;
  hour: number;
}

export interface ScheduleDay {
  date: IsoDate;
  workingDay: number;
  crewHours: number;
  capacity: number;
}

export interface JobSchedule {
  steps: ScheduleStep[];
  tasks: ScheduledTask[];
  days: ScheduleDay[];
  milestones: Milestone[];
  finishDate: IsoDate;
  workingDays: number;
}

const EPS = 1e-9;

/**
 * List scheduling of layers (DOMAIN.md §2.7 rule, common practice, no source): the whole crew
 * works one task at a time; a layer may start once its predecessor on the same surface has
 * ended and that layer's wait has passed on the clock (nights and weekends dry too), and only
 * with at least the minimum block left in the day. Among ready layers the earliest start
 * wins, ties going to the surface listed first. Setup comes first, clean-up last.
 */
export function scheduleJob(input: ScheduleInput): JobSchedule {
  const time = new WorkingTime(input.calendar);
  const crew = requireInteger(input.crewSize, 'crewSize', 1, 'crew size');
  requireNonNegative(input.setupHours, 'setupHours', 'setup hours');
  requireNonNegative(input.cleanupHours, 'cleanupHours', 'clean-up hours');
  const startDay = toDayNumber(input.startDate, 'startDate');
  const chainCount = input.chains.length;
  const durations: number[][] = input.chains.map((c, ci) =>
    c.steps.map((s, si) => {
      requireNonNegative(s.crewHours, `chains[${ci}].steps[${si}].crewHours`, 'crew hours');
      requireNonNegative(s.waitHoursAfter, `chains[${ci}].steps[${si}].waitHoursAfter`, 'wait');
      return s.crewHours / crew;
    }),
  );

  const steps: ScheduleStep[] = [];
  const tasks: ScheduledTask[] = [];
  const workingDayIndex = new Map<number, number>();
  const dayIndexOf = (day: number): number => {
    let n = workingDayIndex.get(day);
    if (n === undefined) {
      n = workingDayIndex.size + 1;
      workingDayIndex.set(day, n);
    }
    return n;
  };
  let lastEndDay = time.nextWorkingDay(startDay);
  const dates = new Map<number, IsoDate>();
  const dateOf = (day: number): IsoDate => {
    let d = dates.get(day);
    if (d === undefined) {
      d = fromDayNumber(day);
      dates.set(day, d);
    }
    return d;
  };

  const place = (
    task: { taskId: string; chainId: string | null; layerId: string | null; label: string },
    readyAt: number,
    start: number,
    duration: number,
  ): number => {
    const { taskId, chainId, layerId, label } = task;
    let cur = start;
    let remaining = duration;
    let day = Math.floor(cur / 24);
    while (remaining > EPS) {
      day = time.nextWorkingDay(Math.floor(cur / 24));
      const w = time.windowOf(day);
      if (cur < w.start) cur = w.start;
      const take = Math.min(w.end - cur, remaining);
      if (take <= EPS) {
        cur = time.windowOf(time.nextWorkingDay(day + 1)).start;
        continue;
      }
      steps.push({
        taskId,
        chainId,
        layerId,
        label,
        date: dateOf(day),
        workingDay: dayIndexOf(day),
        startHour: cur - day * 24,
        endHour: cur + take - day * 24,
        crewHours: take * crew,
      });
      remaining -= take;
      cur += take;
    }
    lastEndDay = Math.max(lastEndDay, day);
    tasks.push({
      taskId,
      chainId,
      layerId,
      label,
      readyAt,
      start,
      end: cur,
      endDate: dateOf(day),
      endHour: cur - day * 24,
    });
    return cur;
  };

  let t = startDay * 24;
  const setupDuration = input.setupHours / crew;
  if (input.setupHours > 0) {
    const setup = { taskId: 'setup', chainId: null, layerId: null, label: 'Setup, masking and protection' };
    t = place(setup, t, time.earliestStart(t, setupDuration), setupDuration);
  }
  const next = new Array<number>(chainCount).fill(0);
  const readyAt = new Array<number>(chainCount).fill(t);
  // Earliest start of each chain's next layer, computed when the chain's wait begins. While it
  // lies ahead of the clock it stays exact (a layer that cannot start at its ready time cannot
  // start at any later moment before then either), so only chains whose start has come round
  // need looking at again; they move to `ready`, kept in chain order.
  const startWhenReady = new Array<number>(chainCount).fill(0);
  const waiting = new StartQueue(startWhenReady);
  const ready: number[] = [];
  for (let c = 0; c < chainCount; c++) {
    if (durations[c].length === 0) continue;
    startWhenReady[c] = time.earliestStart(t, durations[c][0]);
    waiting.push(c);
  }
  const layerLabels = new Map<string, string>();
  while (waiting.size > 0 || ready.length > 0) {
    const now = time.earliestStart(t, 0);
    while (waiting.size > 0 && startWhenReady[waiting.peek()] <= now + EPS) insertSorted(ready, waiting.pop());
    const nowDay = time.nextWorkingDay(Math.floor(now / 24));
    const left = time.windowOf(nowDay).end - now;
    let chosen = -1;
    let start = now;
    if (left >= time.minimumBlock - EPS && left > EPS && ready.length > 0) {
      chosen = 0; // every ready layer fits: the first listed wins
    } else if (left > EPS) {
      for (let k = 0; k < ready.length; k++) {
        const d = durations[ready[k]][next[ready[k]]];
        if (Math.min(time.minimumBlock, d) <= left + EPS) {
          chosen = k;
          break;
        }
      }
    }
    let bestChain: number;
    if (chosen >= 0) {
      bestChain = ready[chosen];
      ready.splice(chosen, 1);
    } else {
      // Nothing fits today: ready layers start at the next day's start, unless a waiting one starts sooner.
      const nextDayStart = time.windowOf(time.nextWorkingDay(nowDay + 1)).start;
      const top = waiting.peek();
      const waitingWins =
        top >= 0 &&
        (ready.length === 0 || startWhenReady[top] < nextDayStart - EPS || (Math.abs(startWhenReady[top] - nextDayStart) <= EPS && top < ready[0]));
      if (waitingWins) {
        bestChain = waiting.pop();
        start = startWhenReady[bestChain];
      } else {
        bestChain = ready.shift() as number;
        start = nextDayStart;
      }
    }
    const chain = input.chains[bestChain];
    const i = next[bestChain];
    const step = chain.steps[i];
    const task = { taskId: `${chain.id}:${i}`, chainId: chain.id, layerId: step.layerId, label: `${chain.label}: ${step.label}` };
    layerLabels.set(step.layerId, step.label);
    t = place(task, readyAt[bestChain], start, durations[bestChain][i]);
    readyAt[bestChain] = t + step.waitHoursAfter;
    next[bestChain] = i + 1;
    if (next[bestChain] < durations[bestChain].length) {
      startWhenReady[bestChain] = time.earliestStart(readyAt[bestChain], durations[bestChain][i + 1]);
      waiting.push(bestChain);
    }
  }
  if (input.cleanupHours > 0) {
    const d = input.cleanupHours / crew;
    const cleanup = { taskId: 'cleanup', chainId: null, layerId: null, label: 'Demasking and clean-up' };
    t = place(cleanup, t, time.earliestStart(t, d), d);
  }

  return {
    steps,
    tasks,
    days: summariseDays(steps, crew * time.dayLength),
    milestones: milestones(tasks, layerLabels),
    finishDate: fromDayNumber(lastEndDay),
    workingDays: workingDayIndex.size,
  };
}

function summariseDays(steps: readonly ScheduleStep[], capacity: number): ScheduleDay[] {
  const byDate = new Map<string, ScheduleDay>();
  for (const s of steps) {
    const d = byDate.get(s.date) ?? { date: s.date, workingDay: s.workingDay, crewHours: 0, capacity };
    d.crewHours += s.crewHours;
    byDate.set(s.date, d);
  }
  return [...byDate.values()];
}

/** A layer's milestone is reached when it is finished on every surface; the job at the last task's end. */
function milestones(tasks: readonly ScheduledTask[], labels: ReadonlyMap<string, string>): Milestone[] {
  const lastByLayer = new Map<string, ScheduledTask>();
  let last: ScheduledTask | null = null;
  for (const task of tasks) {
    if (!last || task.end >= last.end) last = task;
    if (task.layerId === null) continue;
    const prev = lastByLayer.get(task.layerId);
    if (!prev || task.end >= prev.end) lastByLayer.set(task.layerId, task);
  }
  const out: Array<Milestone & { at: number }> = [...lastByLayer.entries()].map(([layerId, task]) => ({
    id: `layer:${layerId}`,
    label: labels.get(layerId) ?? layerId,
    date: task.endDate,
    hour: task.endHour,
    at: task.end,
  }));
  if (last) out.push({ id: 'job', label: 'Job complete', date: last.endDate, hour: last.endHour, at: last.end });
  return out.sort((a, b) => a.at - b.at).map(({ at: _at, ...m }) => m);
}
