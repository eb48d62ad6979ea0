import { planDays, type PlannedSchedule } from './day-plan';
import type { ScheduleStep, ScheduleWait } from './schedule-job';

// A day-by-day plan only regroups what the scheduler decided (DOMAIN.md §2.7; common practice, no source).
const step = (taskId: string, date: string, startHour: number, endHour: number): ScheduleStep => ({
  taskId,
  chainId: taskId.includes(':') ? taskId.split(':')[0] : null,
  layerId: null,
  label: `Task ${taskId}`,
  date,
  workingDay: 0,
  startHour,
  endHour,
  crewHours: (endHour - startHour) * 2,
});
const wait = (taskId: string, date: string, untilDate: string, untilHour: number): ScheduleWait => ({
  taskId,
  chainId: taskId.split(':')[0],
  layerId: 'l',
  label: `Drying ${taskId}`,
  date,
  untilDate,
  untilHour,
});
const day = (date: string, workingDay: number) => ({ date, workingDay, crewHours: 7, capacity: 14 });

describe('planDays', () => {
  const schedule: PlannedSchedule = {
    days: [day('2025-06-05', 1), day('2025-06-06', 2)],
    steps: [
      step('setup', '2025-06-05', 8, 10),
      step('walls:0', '2025-06-05', 10, 15),
      step('walls:0', '2025-06-06', 8, 9),
      step('walls:1', '2025-06-06', 9, 12),
    ],
    waits: [wait('walls:0', '2025-06-06', '2025-06-06', 13), wait('walls:1', '2025-06-06', '2025-06-07', 4.5)],
  };
  const plan = planDays(schedule);

  it.each([
    ['2025-06-05', ['setup#0', 'walls:0#1'], []],
    ['2025-06-06', ['walls:0#0', 'walls:1#1'], ['walls:0', 'walls:1']],
  ])('groups %s: steps %j, waits beginning that day %j', (date, stepKeys, waitKeys) => {
    const d = plan.find((p) => p.date === date)!;
    expect(d.steps.map((s) => s.key)).toEqual(stepKeys);
    expect(d.waits.map((w) => w.key)).toEqual(waitKeys);
  });

  it('keeps the day totals and each wait until its clock time', () => {
    expect(plan.map((d) => [d.workingDay, d.crewHours, d.capacity])).toEqual([
      [1, 7, 14],
      [2, 7, 14],
    ]);
    expect(plan[1].waits[1]).toEqual({ key: 'walls:1', label: 'Drying walls:1', untilDate: '2025-06-07', untilHour: 4.5 });
  });

  it('shows no waits for a result saved before waits were part of the schedule', () => {
    const { waits: _waits, ...older } = schedule;
    expect(planDays(older).flatMap((d) => d.waits)).toEqual([]);
  });
});
