import { type IsoDate, fromDayNumber, toDayNumber } from '../calendar/local-date';
import { isNonNegativeNumber, requireInteger, requireNonNegative } from '../errors/input-checks';
import { ReadySet } from './ready-set';
import { ScheduleTally } from './schedule-tally';
import { StartQueue } from './start-queue';
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

/**
 * A layer drying before the next layer on the same surface may start: from the end of `taskId`
 * until the next layer's ready time, on the clock (nights and weekends count).
 */
export interface ScheduleWait {
  taskId: string;
  chainId: string;
  layerId: string;
  /** what is drying, e.g. "Dining room – Walls: Lime plaster, first coat" */
  label: string;
  /** the day the wait begins (the layer's last working day) */
  date: IsoDate;
  untilDate: IsoDate;
  /** hour of `untilDate`; may fall outside working hours */
  untilHour: number;
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
  /** in the order the waits begin; only waits before a following layer, and only those longer than zero */
  waits: ScheduleWait[];
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
  // Plain loops, no callbacks: this runs for every layer of every surface.
  const durations = new Array<number[]>(chainCount);
  for (let ci = 0; ci < chainCount; ci++) {
    const chainSteps = input.chains[ci].steps;
    const d = new Array<number>(chainSteps.length);
    for (let si = 0; si < chainSteps.length; si++) {
      const s = chainSteps[si];
      // The field path is only built for a bad value.
      if (!isNonNegativeNumber(s.crewHours)) requireNonNegative(s.crewHours, `chains[${ci}].steps[${si}].crewHours`, 'crew hours');
      if (!isNonNegativeNumber(s.waitHoursAfter)) requireNonNegative(s.waitHoursAfter, `chains[${ci}].steps[${si}].waitHoursAfter`, 'wait');
      d[si] = s.crewHours / crew;
    }
    durations[ci] = d;
  }

  const steps: ScheduleStep[] = [];
  const tasks: ScheduledTask[] = [];
  const waits: ScheduleWait[] = [];
  const tally = new ScheduleTally(crew * time.dayLength);
  // Per-day lookups in arrays indexed from the start day (work never comes before it): the
  // scheduler asks for every step, and arrays are much cheaper than maps keyed by day.
  const workingDayIndex: number[] = [];
  let workingDayCount = 0;
  const dayIndexOf = (day: number): number => {
    let n = workingDayIndex[day - startDay];
    if (n === undefined) {
      n = ++workingDayCount;
      workingDayIndex[day - startDay] = n;
    }
    return n;
  };
  let lastEndDay = time.nextWorkingDay(startDay);
  const dates: IsoDate[] = [];
  const dateOf = (day: number): IsoDate => {
    let d = dates[day - startDay];
    if (d === undefined) {
      d = fromDayNumber(day);
      dates[day - startDay] = d;
    }
    return d;
  };

  // Task fields come as arguments rather than an object: this runs once per task.
  const place = (
    taskId: string,
    chainId: string | null,
    layerId: string | null,
    label: string,
    layerLabel: string | null,
    readyAt: number,
    start: number,
    duration: number,
  ): number => {
    let cur = start;
    let remaining = duration;
    let day = Math.floor(cur / 24);
    while (remaining > EPS) {
      day = time.nextWorkingDay(Math.floor(cur / 24));
      const windowStart = time.windowStart(day);
      if (cur < windowStart) cur = windowStart;
      const take = Math.min(time.windowEnd(day) - cur, remaining);
      if (take <= EPS) {
        cur = time.windowStart(time.nextWorkingDay(day + 1));
        continue;
      }
      const date = dateOf(day);
      const workingDay = dayIndexOf(day);
      const crewHours = take * crew;
      steps.push({
        taskId,
        chainId,
        layerId,
        label,
        date,
        workingDay,
        startHour: cur - day * 24,
        endHour: cur + take - day * 24,
        crewHours,
      });
      tally.addStep(workingDay, date, crewHours);
      remaining -= take;
      cur += take;
    }
    lastEndDay = Math.max(lastEndDay, day);
    const task: ScheduledTask = {
      taskId,
      chainId,
      layerId,
      label,
      readyAt,
      start,
      end: cur,
      endDate: dateOf(day),
      endHour: cur - day * 24,
    };
    tasks.push(task);
    tally.addTask(task, layerLabel);
    return cur;
  };

  let t = startDay * 24;
  const setupDuration = input.setupHours / crew;
  if (input.setupHours > 0) {
    t = place('setup', null, null, 'Setup, masking and protection', null, t, time.earliestStart(t, setupDuration), setupDuration);
  }
  const next = new Array<number>(chainCount).fill(0);
  const taskPrefix = new Array<string | undefined>(chainCount);
  const labelPrefix = new Array<string>(chainCount);
  const readyAt = new Array<number>(chainCount).fill(t);
  // Earliest start of each chain's next layer, computed when the chain's wait begins. While it
  // lies ahead of the clock it stays exact (a layer that cannot start at its ready time cannot
  // start at any later moment before then either), so only chains whose start has come round
  // need looking at again; they move to `ready`, which finds the first-listed one that fits.
  const startWhenReady = new Array<number>(chainCount).fill(0);
  const waiting = new StartQueue(startWhenReady);
  const ready = new ReadySet(chainCount);
  for (let c = 0; c < chainCount; c++) {
    if (durations[c].length === 0) continue;
    startWhenReady[c] = time.earliestStart(t, durations[c][0]);
    waiting.push(c);
  }
  while (waiting.size > 0 || ready.size > 0) {
    const now = time.earliestStart(t, 0);
    while (waiting.size > 0 && startWhenReady[waiting.peek()] <= now + EPS) {
      const c = waiting.pop();
      ready.add(c, durations[c][next[c]]);
    }
    const nowDay = time.nextWorkingDay(Math.floor(now / 24));
    const left = time.windowEnd(nowDay) - now;
    let bestChain = -1;
    let start = now;
    if (left >= time.minimumBlock - EPS && left > EPS && ready.size > 0) {
      bestChain = ready.first(); // every ready layer fits: the first listed wins
    } else if (left > EPS) {
      // A layer fits when min(minimum block, its duration) <= left + EPS, i.e. when the block
      // fits (then every ready layer does) or the whole layer does.
      const limit = left + EPS;
      bestChain = time.minimumBlock <= limit ? ready.first() : ready.firstAtMost(limit);
    }
    if (bestChain >= 0) {
      ready.remove(bestChain);
    } else {
      // Nothing fits today: ready layers start at the next day's start, unless a waiting one starts sooner.
      const nextDayStart = time.windowStart(time.nextWorkingDay(nowDay + 1));
      const top = waiting.peek();
      const firstReady = ready.first();
      const waitingWins =
        top >= 0 &&
        (firstReady < 0 ||
          startWhenReady[top] < nextDayStart - EPS ||
          (Math.abs(startWhenReady[top] - nextDayStart) <= EPS && top < firstReady));
      if (waitingWins) {
        bestChain = waiting.pop();
        start = startWhenReady[bestChain];
      } else {
        bestChain = firstReady;
        ready.remove(firstReady);
        start = nextDayStart;
      }
    }
    const chain = input.chains[bestChain];
    const i = next[bestChain];
    const step = chain.steps[i];
    // Each chain's two prefixes are built once, not once per layer (strings are immutable; same text).
    let prefix = taskPrefix[bestChain];
    if (prefix === undefined) {
      prefix = taskPrefix[bestChain] = `${chain.id}:`;
      labelPrefix[bestChain] = `${chain.label}: `;
    }
    const taskId = prefix + String(i);
    const label = labelPrefix[bestChain] + step.label;
    t = place(taskId, chain.id, step.layerId, label, step.label, readyAt[bestChain], start, durations[bestChain][i]);
    readyAt[bestChain] = t + step.waitHoursAfter;
    next[bestChain] = i + 1;
    if (next[bestChain] < durations[bestChain].length) {
      startWhenReady[bestChain] = time.earliestStart(readyAt[bestChain], durations[bestChain][i + 1]);
      waiting.push(bestChain);
      if (step.waitHoursAfter > EPS) {
        const until = readyAt[bestChain];
        const untilDay = Math.floor(until / 24);
        const date = tasks[tasks.length - 1].endDate;
        waits.push({
          taskId,
          chainId: chain.id,
          layerId: step.layerId,
          label,
          date,
          untilDate: dateOf(untilDay),
          untilHour: until - untilDay * 24,
        });
      }
    }
  }
  if (input.cleanupHours > 0) {
    const d = input.cleanupHours / crew;
    t = place('cleanup', null, null, 'Demasking and clean-up', null, t, time.earliestStart(t, d), d);
  }

  return {
    steps,
    tasks,
    waits,
    days: tally.days,
    milestones: tally.milestones(),
    finishDate: fromDayNumber(lastEndDay),
    workingDays: workingDayCount,
  };
}
