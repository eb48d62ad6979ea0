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
  /** per layer: its last-ending task so far and the label of the last step scheduled for it */
  private readonly byLayer = new Map<string, { task: ScheduledTask; label: string }>();
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

  /**
   * A task just placed; `layerLabel` is its layer's name, which names the layer's milestone
   * (the label of the last one scheduled wins). One map look-up per task.
   */
  addTask(task: ScheduledTask, layerLabel: string | null): void {
    if (!this.last || task.end >= this.last.end) this.last = task;
    if (task.layerId === null) return;
    const seen = this.byLayer.get(task.layerId);
    if (seen === undefined) {
      this.byLayer.set(task.layerId, { task, label: layerLabel ?? task.layerId });
      return;
    }
    if (layerLabel !== null) seen.label = layerLabel;
    if (task.end >= seen.task.end) seen.task = task;
  }

  /** A layer's milestone is reached when it is finished on every surface; the job at the last task's end. */
  milestones(): Milestone[] {
    const out: Array<Milestone & { at: number }> = [...this.byLayer.entries()].map(([layerId, { task, label }]) => ({
      id: `layer:${layerId}`,
      label,
      date: task.endDate,
      hour: task.endHour,
      at: task.end,
    }));
    const last = this.last;
    if (last) out.push({ id: 'job', label: 'Job complete', date: last.endDate, hour: last.endHour, at: last.end });
    return out.sort((a, b) => a.at - b.at).map(({ at: _at, ...m }) => m);
  }
}
