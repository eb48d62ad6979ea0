import { AbstractControl, FormArray, FormControl, FormGroup, ValidationErrors, Validators } from '@angular/forms';
import type {
  BillingMethod,
  BillingScheduleUpdate,
  BillingTrigger,
  BillingTriggerKind,
  JobBillingView,
  ScheduleLineView,
  WorkItemView,
} from '@layerbook/contracts/types';
import { dateYearInRange, fromIsoDate, toIsoDate } from '../../../shared/forms/iso-date';
import { amountText, toAmount } from '../../../shared/forms/money-input';
import { requiredText } from '../../../shared/forms/text-validators';
import type { ScheduleLineRole } from './billing-words';

/** A line's name as the client reads it on the invoice (kept short enough for a printed line). */
export const LINE_LABEL_MAX_LENGTH = 160;

/** Required only while the line's trigger is of `kind` (a date for a date, a layer for a layer). */
function requiredFor(kind: BillingTriggerKind) {
  return (control: AbstractControl): ValidationErrors | null => {
    const chosen: unknown = control.parent?.get('kind')?.value;
    if (chosen !== kind) return null;
    const value: unknown = control.value;
    return value === null || value === '' ? { required: true } : null;
  };
}

/** One schedule line; group names follow the API's field paths (`lines.2.trigger.date`). */
export function scheduleLineGroup() {
  const kind = new FormControl<BillingTriggerKind>('acceptance', { nonNullable: true });
  const date = new FormControl<Date | null>(null, [requiredFor('date'), dateYearInRange]);
  const layerId = new FormControl<string>('', { nonNullable: true, validators: requiredFor('layerComplete') });
  const group = new FormGroup({
    id: new FormControl<string | null>(null),
    label: new FormControl('', { nonNullable: true, validators: [requiredText, Validators.maxLength(LINE_LABEL_MAX_LENGTH)] }),
    role: new FormControl<ScheduleLineRole>('milestone', { nonNullable: true }),
    trigger: new FormGroup({ kind, date, layerId }),
    amount: new FormControl('', { nonNullable: true, validators: [Validators.required, amountText] }),
  });
  kind.valueChanges.subscribe(() => {
    // Disabling a locked line emits here too; re-checking then would re-enable its group's status.
    if (kind.disabled) return;
    date.updateValueAndValidity({ emitEvent: false });
    layerId.updateValueAndValidity({ emitEvent: false });
  });
  return group;
}

export type ScheduleLineGroup = ReturnType<typeof scheduleLineGroup>;

export function scheduleForm() {
  return new FormGroup({
    method: new FormControl<BillingMethod>('schedule', { nonNullable: true }),
    lines: new FormArray<ScheduleLineGroup>([]),
  });
}

export type ScheduleFormGroup = ReturnType<typeof scheduleForm>;

/** Lines billed already (a draft or an issued invoice) never change: the rules and re-spreads keep them. */
export function isLineLocked(line: Pick<ScheduleLineView, 'status'>): boolean {
  return line.status === 'ready' || line.status === 'invoiced';
}

function lineGroupFrom(line: ScheduleLineView): ScheduleLineGroup {
  const group = scheduleLineGroup();
  const t = line.trigger;
  group.reset({
    id: line.id,
    label: line.label,
    role: line.role,
    trigger: {
      kind: t.kind,
      date: t.kind === 'date' ? fromIsoDate(t.date) : null,
      layerId: t.kind === 'layerComplete' ? t.layerId : '',
    },
    amount: line.amount,
  });
  return group;
}

/** What the editor holds, with which lines are locked: two forms alike show the same schedule. */
function formKey(form: ScheduleFormGroup): string {
  return JSON.stringify([readScheduleForm(form), form.controls.lines.controls.map((line) => line.disabled)]);
}

/**
 * Puts the job's schedule into the editor, in schedule order; billed lines come in locked. The
 * lines are made again only when the schedule differs, so a reload that changed nothing keeps them.
 */
export function fillScheduleForm(form: ScheduleFormGroup, view: Pick<JobBillingView, 'method' | 'lines'>): void {
  const fresh = scheduleForm();
  fillLines(fresh, view);
  if (formKey(fresh) === formKey(form)) {
    form.markAsPristine();
    return;
  }
  fillLines(form, view);
}

function fillLines(form: ScheduleFormGroup, view: Pick<JobBillingView, 'method' | 'lines'>): void {
  form.controls.method.setValue(view.method);
  form.controls.lines.clear();
  for (const line of [...view.lines].sort((a, b) => a.position - b.position)) {
    const group = lineGroupFrom(line);
    form.controls.lines.push(group);
    // After joining the array: a control pushed disabled takes its new parent's state.
    if (isLineLocked(line)) group.disable();
  }
  form.markAsPristine();
}

function triggerOf(value: ReturnType<ScheduleLineGroup['getRawValue']>['trigger']): BillingTrigger {
  switch (value.kind) {
    case 'date':
      return { kind: 'date', date: toIsoDate(value.date) ?? '' };
    case 'layerComplete':
      return { kind: 'layerComplete', layerId: value.layerId };
    default:
      return { kind: value.kind };
  }
}

/** The editor as the API's whole-schedule update: new lines go without an id; amounts as typed, without separators. */
export function readScheduleForm(form: ScheduleFormGroup): BillingScheduleUpdate {
  const value = form.getRawValue();
  return {
    method: value.method,
    lines: value.lines.map((line) => ({
      ...(line.id ? { id: line.id } : {}),
      label: line.label.trim(),
      role: line.role,
      trigger: triggerOf(line.trigger),
      amount: toAmount(line.amount) ?? '',
    })),
  };
}

export interface LayerChoice {
  readonly layerId: string;
  readonly layerName: string;
}

/**
 * The layers a line can wait for, in the order they go on: those of the job's work items, plus a
 * layer a line already names that no work item has any more (so the choice still shows).
 */
export function layerChoices(workItems: readonly WorkItemView[], lines: readonly ScheduleLineView[]): LayerChoice[] {
  const first = new Map<string, { layerName: string; order: number; position: number }>();
  for (const item of workItems) {
    const known = first.get(item.layerId);
    const rank = { layerName: item.layerName, order: item.layerOrder, position: item.position };
    if (!known || rank.order < known.order || (rank.order === known.order && rank.position < known.position)) first.set(item.layerId, rank);
  }
  const choices = [...first.entries()]
    .sort(([, a], [, b]) => a.order - b.order || a.position - b.position)
    .map(([layerId, { layerName }]) => ({ layerId, layerName }));
  for (const line of lines) {
    if (line.trigger.kind === 'layerComplete' && !first.has(line.trigger.layerId)) {
      choices.push({ layerId: line.trigger.layerId, layerName: line.layerName ?? 'A layer no longer in the work' });
      first.set(line.trigger.layerId, { layerName: '', order: 0, position: 0 });
    }
  }
  return choices;
}
