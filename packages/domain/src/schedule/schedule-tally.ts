import type { IsoDate } from '../calendar/local-date';
import type { Milestone, ScheduleDay, ScheduledTask } from './schedule-job';

/**
 * Day totals and milestones, kept up as each step and task is placed. Walking the finished
 * lists again afterwards costs more than the sums: by then a big job's objects have left the
 * CPU cache. Additions happen in the same order as a second pass would make them.
 */
export class ScheduleTally {
  /** by working-day number − 1; days are numbered in the order they are first worked */
  readonly days: ScheduleDay[] = [];
  private readonly labels = new Map<string, string>();
  private readonly lastByLayer = new Map<string, ScheduledTask>();
  private last: ScheduledTask | null = null;

  constructor(private readonly capacity: number) {}

  addStep(workingDay: number, date: IsoDate, crewHours: number): void {
    let d = this.days[workingDay - 1];
    if (d === undefined) {
      d = { date, workingDay, crewHours: 0, capacity: this.capacity };
      this.days[workingDay - 1] = d;
    }
    d.crewHours += crewHours;
  }

  /** The layer's name for its milestone: the label of the last step scheduled for it. */
  labelLayer(layerId: string, label: string): void {
    this.labels.set(layerId, label);
  }

  addTask(task: ScheduledTask): void {
    if (!this.last || task.end >= this.last.end) this.last = task;
    if (task.layerId === null) return;
    const prev = this.lastByLayer.get(task.layerId);
    if (!prev || task.end >= prev.end) this.lastByLayer.set(task.layerId, task);
  }

  /** A layer's milestone is reached when it is finished on every surface; the job at the last task's end. */
  milestones(): Milestone[] {
    const out: Array<Milestone & { at: number }> = [...this.lastByLayer.entries()].map(([layerId, task]) => ({
      id: `layer:${layerId}`,
      label: this.labels.get(layerId) ?? layerId,
      date: task.endDate,
      hour: task.endHour,
      at: task.end,
    }));
    const last = this.last;
    if (last) out.push({ id: 'job', label: 'Job complete', date: last.endDate, hour: last.endHour, at: last.end });
    return out.sort((a, b) => a.at - b.at).map(({ at: _at, ...m }) => m);
  }
}
