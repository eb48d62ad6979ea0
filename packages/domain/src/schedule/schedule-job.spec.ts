import fc from 'fast-check';
import { toDayNumber } from '../calendar/local-date';
import { expectInputError } from '../errors/expect-input-error';
import { type ScheduleInput, scheduleJob } from './schedule-job';
import { type WorkCalendar, WorkingTime } from './work-calendar';

const WEEKDAYS: WorkCalendar = { workingWeekdays: [1, 2, 3, 4, 5], dayStartHour: 8, productiveHoursPerDay: 7, minimumBlockHours: 3 };

/**
 * DOMAIN.md §2.7 [D]. Rule: list-schedule layers per surface in order; start when the wait has
 * passed on the clock, the crew is free and a minimum block is left (common practice, no source).
 */
const DINING_ROOM: ScheduleInput = {
  startDate: '2025-06-05', // a Thursday
  calendar: WEEKDAYS,
  crewSize: 2,
  setupHours: 4,
  cleanupHours: 2,
  chains: [
    {
      id: 'walls',
      label: 'Dining room walls',
      steps: [
        { layerId: 'primer', label: 'Primer', crewHours: 2.32, waitHoursAfter: 4 },
        { layerId: 'coat1', label: 'Plaster coat 1', crewHours: 9.67, waitHoursAfter: 16 },
        { layerId: 'coat2', label: 'Plaster coat 2 and burnish', crewHours: 14.5, waitHoursAfter: 24 },
        { layerId: 'wax', label: 'Wax and buff', crewHours: 7.25, waitHoursAfter: 0 },
      ],
    },
    {
      id: 'dome',
      label: 'Dining room dome',
      steps: [
        { layerId: 'domeBase', label: 'Dome base coat', crewHours: 2.65, waitHoursAfter: 4 },
        { layerId: 'glaze', label: 'Antiquing glaze', crewHours: 1.59, waitHoursAfter: 0 },
      ],
    },
  ],
};

describe('dry-time-aware schedule', () => {
  const result = scheduleJob(DINING_ROOM);

  it('reproduces the worked example day by day', () => {
    expect(result.days.map((d) => [d.date, Number(d.crewHours.toFixed(2)), d.capacity])).toEqual([
      ['2025-06-05', 8.97, 14], // Thu: setup, primer walls, dome base; too late for plaster
      ['2025-06-06', 11.26, 14], // Fri: coat 1 walls, dome glaze
      ['2025-06-09', 14, 14], // Mon: coat 2 + burnish, 14.0 of 14.5 (the weekend dried coat 1)
      ['2025-06-10', 0.5, 14], // Tue: coat 2 remainder, then 24 h before wax
      ['2025-06-11', 9.25, 14], // Wed: wax and buff, clean-up
    ]);
    expect(result.workingDays).toBe(5);
    expect(result.finishDate).toBe('2025-06-11');
  });

  it('orders the work within each day', () => {
    const day1 = result.steps.filter((s) => s.date === '2025-06-05').map((s) => s.taskId);
    expect(day1).toEqual(['setup', 'walls:0', 'dome:0']);
    const day5 = result.steps.filter((s) => s.date === '2025-06-11');
    expect(day5.map((s) => s.taskId)).toEqual(['walls:3', 'cleanup']);
    expect(day5[0].startHour).toBeCloseTo(8.25, 9); // 24 h after coat 2 ended Tue 8:15
  });

  it('lists each drying wait before a following layer, from the day it begins until the clock time it ends', () => {
    // DOMAIN.md §2.7: waits run on the clock, nights and weekends included; the last layer's wait
    // (wax) has no following layer on its surface, and a zero wait is no wait.
    const rows = result.waits.map((w) => [w.taskId, w.label, w.date, w.untilDate, Number(w.untilHour.toFixed(3))]);
    expect(rows).toEqual([
      ['walls:0', 'Dining room walls: Primer', '2025-06-05', '2025-06-05', 15.16], // primer ends 11:09.6, +4 h
      ['dome:0', 'Dining room dome: Dome base coat', '2025-06-05', '2025-06-05', 16.485], // ends 12:29.1, +4 h
      ['walls:1', 'Dining room walls: Plaster coat 1', '2025-06-06', '2025-06-07', 4.835], // Fri 12:50 + 16 h = Sat 4:50
      ['walls:2', 'Dining room walls: Plaster coat 2 and burnish', '2025-06-10', '2025-06-11', 8.25], // Tue 8:15 + 24 h
    ]);
  });

  it('reports when each layer is finished everywhere, and the job', () => {
    expect(result.milestones.map((m) => [m.id, m.date])).toEqual([
      ['layer:primer', '2025-06-05'],
      ['layer:domeBase', '2025-06-05'],
      ['layer:coat1', '2025-06-06'],
      ['layer:glaze', '2025-06-06'],
      ['layer:coat2', '2025-06-10'],
      ['layer:wax', '2025-06-11'],
      ['job', '2025-06-11'],
    ]);
    expect(result.milestones[result.milestones.length - 1].hour).toBeCloseTo(12.875, 9);
  });

  it('skips holidays and keeps the minimum block', () => {
    const r = scheduleJob({
      ...DINING_ROOM,
      calendar: { ...WEEKDAYS, holidays: ['2025-06-09'] },
    });
    expect(r.days.map((d) => d.date)).toEqual(['2025-06-05', '2025-06-06', '2025-06-10', '2025-06-11', '2025-06-12']);
    const late = scheduleJob({
      startDate: '2025-06-05',
      calendar: WEEKDAYS,
      crewSize: 1,
      setupHours: 5,
      cleanupHours: 0,
      chains: [{ id: 'a', label: 'A', steps: [{ layerId: 'x', label: 'X', crewHours: 4, waitHoursAfter: 0 }] }],
    });
    // 2 h left after setup is under the 3 h block, so the layer waits for Friday
    expect(late.tasks[1].start).toBe(toDayNumber('2025-06-06') * 24 + 8);
  });

  const chainArb = fc.array(
    fc.record({
      crewHours: fc.double({ min: 0.1, max: 30, noNaN: true }),
      waitHoursAfter: fc.double({ min: 0, max: 72, noNaN: true }),
    }),
    { minLength: 1, maxLength: 5 },
  );
  const inputArb = fc.record({
    chains: fc.array(chainArb, { minLength: 1, maxLength: 6 }),
    crewSize: fc.integer({ min: 1, max: 4 }),
    hours: fc.integer({ min: 4, max: 10 }),
    block: fc.double({ min: 0, max: 4, noNaN: true }),
    setup: fc.double({ min: 0, max: 8, noNaN: true }),
  });
  type Generated = typeof inputArb extends fc.Arbitrary<infer T> ? T : never;
  const build = (x: Generated): ScheduleInput => ({
    startDate: '2025-06-05',
    calendar: { workingWeekdays: [1, 2, 3, 4, 5], dayStartHour: 7, productiveHoursPerDay: x.hours, minimumBlockHours: x.block },
    crewSize: x.crewSize,
    setupHours: x.setup,
    cleanupHours: 1,
    chains: x.chains.map((steps, c) => ({
      id: `s${c}`,
      label: `Surface ${c}`,
      steps: steps.map((s, i) => ({ layerId: `l${i}`, label: `Layer ${i}`, ...s })),
    })),
  });

  it('no layer starts before its predecessor ended and its wait passed (property)', () => {
    fc.assert(
      fc.property(inputArb, (x) => {
        const input = build(x);
        const r = scheduleJob(input);
        for (const chain of input.chains) {
          const tasks = r.tasks.filter((t) => t.chainId === chain.id);
          expect(tasks).toHaveLength(chain.steps.length);
          for (let i = 1; i < tasks.length; i++) {
            expect(tasks[i].start).toBeGreaterThanOrEqual(tasks[i - 1].end + chain.steps[i - 1].waitHoursAfter - 1e-9);
          }
        }
      }),
    );
  });

  it('never exceeds crew capacity on any day and works only inside the day (property)', () => {
    fc.assert(
      fc.property(inputArb, (x) => {
        const input = build(x);
        const r = scheduleJob(input);
        for (const d of r.days) expect(d.crewHours).toBeLessThanOrEqual(x.crewSize * x.hours + 1e-9);
        for (const s of r.steps) {
          expect(s.startHour).toBeGreaterThanOrEqual(7 - 1e-9);
          expect(s.endHour).toBeLessThanOrEqual(7 + x.hours + 1e-9);
        }
        // the crew does one thing at a time
        const sorted = [...r.tasks].sort((a, b) => a.start - b.start);
        for (let i = 1; i < sorted.length; i++) expect(sorted[i].start).toBeGreaterThanOrEqual(sorted[i - 1].end - 1e-9);
        const planned = input.chains.reduce((a, c) => a + c.steps.reduce((b, s) => b + s.crewHours, 0), 0) + x.setup + 1;
        expect(r.steps.reduce((a, s) => a + s.crewHours, 0)).toBeCloseTo(planned, 6);
      }),
    );
  });

  /** The rule stated plainly: scan every surface, take the earliest start, ties to the first listed. */
  function referenceStarts(input: ScheduleInput): number[] {
    const time = new WorkingTime(input.calendar);
    const crew = input.crewSize;
    let t = toDayNumber(input.startDate) * 24;
    const run = (from: number, hours: number): number => {
      let cur = from;
      let left = hours / crew;
      while (left > 1e-9) {
        const w = time.windowOf(time.nextWorkingDay(Math.floor(cur / 24)));
        cur = Math.max(cur, w.start);
        const take = Math.min(w.end - cur, left);
        if (take <= 1e-9) {
          cur = time.windowOf(time.nextWorkingDay(Math.floor(cur / 24) + 1)).start;
          continue;
        }
        left -= take;
        cur += take;
      }
      return cur;
    };
    if (input.setupHours > 0) t = run(time.earliestStart(t, input.setupHours / crew), input.setupHours);
    const next = input.chains.map(() => 0);
    const readyAt = input.chains.map(() => t);
    const starts: number[] = [];
    for (;;) {
      let best = -1;
      let bestStart = Infinity;
      input.chains.forEach((c, i) => {
        if (next[i] >= c.steps.length) return;
        const s = time.earliestStart(Math.max(t, readyAt[i]), c.steps[next[i]].crewHours / crew);
        if (s < bestStart - 1e-9) {
          bestStart = s;
          best = i;
        }
      });
      if (best < 0) return starts;
      const step = input.chains[best].steps[next[best]];
      starts.push(bestStart);
      t = run(bestStart, step.crewHours);
      readyAt[best] = t + step.waitHoursAfter;
      next[best]++;
    }
  }

  it('matches the plainly stated rule on random jobs (property)', () => {
    fc.assert(
      fc.property(inputArb, (x) => {
        const input = build(x);
        const layerStarts = scheduleJob(input)
          .tasks.filter((task) => task.chainId !== null)
          .map((task) => task.start);
        const expected = referenceStarts(input);
        expect(layerStarts).toHaveLength(expected.length);
        layerStarts.forEach((s, i) => expect(s).toBeCloseTo(expected[i], 6));
      }),
      { numRuns: 300 },
    );
  });

  it.each([
    [{ ...DINING_ROOM, crewSize: 0 }, 'crewSize'],
    [{ ...DINING_ROOM, startDate: '2025-13-01' }, 'startDate'],
    [{ ...DINING_ROOM, calendar: { ...WEEKDAYS, workingWeekdays: [] } }, 'calendar.workingWeekdays'],
    [{ ...DINING_ROOM, calendar: { ...WEEKDAYS, workingWeekdays: [8] } }, 'calendar.workingWeekdays[0]'],
    [{ ...DINING_ROOM, calendar: { ...WEEKDAYS, dayStartHour: 20 } }, 'calendar.productiveHoursPerDay'],
    [{ ...DINING_ROOM, calendar: { ...WEEKDAYS, holidays: ['soon'] } }, 'calendar.holidays[0]'],
    [
      { ...DINING_ROOM, chains: [{ id: 'a', label: 'A', steps: [{ layerId: 'x', label: 'X', crewHours: -1, waitHoursAfter: 0 }] }] },
      'chains[0].steps[0].crewHours',
    ],
  ])('bad input %# names its field', (input, field) => {
    expectInputError(() => scheduleJob(input), field);
  });
});
