import type { ScheduleLineView, WorkItemView } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { fillScheduleForm, isLineLocked, layerChoices, readScheduleForm, scheduleForm, scheduleLineGroup } from './schedule-form';

function line(over: Partial<ScheduleLineView> & Pick<ScheduleLineView, 'id' | 'position'>): ScheduleLineView {
  return {
    label: 'Deposit',
    role: 'deposit',
    trigger: { kind: 'acceptance' },
    layerName: null,
    amount: '1000.00',
    expectedOn: null,
    status: 'draft',
    invoiceId: null,
    triggerProgress: '',
    ...over,
  };
}

const lines: ScheduleLineView[] = [
  line({ id: 'l3', position: 3, label: 'Final payment', role: 'final', trigger: { kind: 'walkthrough' }, amount: '4000.00' }),
  line({ id: 'l1', position: 1, status: 'invoiced' }),
  line({
    id: 'l2',
    position: 2,
    label: 'Base coat done',
    role: 'milestone',
    trigger: { kind: 'layerComplete', layerId: 'base' },
    layerName: 'Lime base coat',
    amount: '5000.00',
  }),
];

function item(id: string, layerId: string, layerName: string, layerOrder: number, position: number): WorkItemView {
  return {
    id,
    position,
    roomName: 'Dining room',
    surfaceId: 's1',
    surfaceName: 'Walls',
    layerId,
    layerName,
    layerOrder,
    doneOn: null,
    changeOrder: null,
  };
}

describe('schedule form ↔ BillingScheduleUpdate', () => {
  it('reads back what it was filled with, in schedule order, each line keeping its id', () => {
    const form = scheduleForm();
    fillScheduleForm(form, { method: 'schedule', lines });
    expect(readScheduleForm(form)).toEqual({
      method: 'schedule',
      lines: [
        { id: 'l1', label: 'Deposit', role: 'deposit', trigger: { kind: 'acceptance' }, amount: '1000.00' },
        { id: 'l2', label: 'Base coat done', role: 'milestone', trigger: { kind: 'layerComplete', layerId: 'base' }, amount: '5000.00' },
        { id: 'l3', label: 'Final payment', role: 'final', trigger: { kind: 'walkthrough' }, amount: '4000.00' },
      ],
    });
  });

  it('locks an invoiced line (disabled) yet still sends it unchanged', () => {
    const form = scheduleForm();
    fillScheduleForm(form, { method: 'schedule', lines });
    expect(form.controls.lines.at(0).disabled).toBe(true);
    expect(form.controls.lines.at(1).disabled).toBe(false);
    expect(readScheduleForm(form).lines[0]).toEqual({
      id: 'l1',
      label: 'Deposit',
      role: 'deposit',
      trigger: { kind: 'acceptance' },
      amount: '1000.00',
    });
  });

  it('sends a new line without an id, its label trimmed, its amount without separators and its date as a calendar day', () => {
    const form = scheduleForm();
    const added = scheduleLineGroup();
    added.setValue({
      id: null,
      label: '  Second stage ',
      role: 'milestone',
      trigger: { kind: 'date', date: new Date(2026, 11, 14), layerId: '' },
      amount: '2,500.50',
    });
    form.controls.lines.push(added);
    form.controls.method.setValue('progress');
    expect(readScheduleForm(form)).toEqual({
      method: 'progress',
      lines: [{ label: 'Second stage', role: 'milestone', trigger: { kind: 'date', date: '2026-12-14' }, amount: '2500.50' }],
    });
  });

  it('asks for a date only for a date trigger, and a layer only for a layer trigger', () => {
    const group = scheduleLineGroup();
    const { kind, date, layerId } = group.controls.trigger.controls;
    expect(date.valid && layerId.valid).toBe(true);
    kind.setValue('date');
    expect(date.hasError('required')).toBe(true);
    expect(layerId.valid).toBe(true);
    kind.setValue('layerComplete');
    expect(date.valid).toBe(true);
    expect(layerId.hasError('required')).toBe(true);
  });

  it('refuses an amount that is not one and a blank label, with the keys the words name', () => {
    const group = scheduleLineGroup();
    group.controls.amount.setValue('12.345');
    group.controls.label.setValue('   ');
    expect(group.controls.amount.hasError('amount')).toBe(true);
    expect(group.controls.label.hasError('required')).toBe(true);
  });

  it('locks ready and invoiced lines only', () => {
    expect(
      ['draft', 'scheduled', 'ready', 'invoiced'].map((status) => isLineLocked({ status: status as ScheduleLineView['status'] })),
    ).toEqual([false, false, true, true]);
  });
});

describe('layerChoices (what a line can wait for)', () => {
  it('lists each layer once, in the order the layers go on', () => {
    const items = [
      item('w3', 'glaze', 'Glaze', 3, 3),
      item('w1', 'base', 'Lime base coat', 1, 1),
      item('w2', 'base', 'Lime base coat', 1, 4),
    ];
    expect(layerChoices(items, [])).toEqual([
      { layerId: 'base', layerName: 'Lime base coat' },
      { layerId: 'glaze', layerName: 'Glaze' },
    ]);
  });

  it('keeps a layer a line names even when no work item has it', () => {
    expect(layerChoices([], lines)).toEqual([{ layerId: 'base', layerName: 'Lime base coat' }]);
  });
});

describe('fillScheduleForm keeps the lines when a reload changed nothing', () => {
  it('keeps the same line groups for the same schedule, and makes new ones when a line changed', () => {
    const form = scheduleForm();
    fillScheduleForm(form, { method: 'schedule', lines });
    const before = form.controls.lines.at(1);
    fillScheduleForm(form, { method: 'schedule', lines });
    expect(form.controls.lines.at(1)).toBe(before);
    fillScheduleForm(form, { method: 'schedule', lines: lines.map((l) => (l.id === 'l2' ? { ...l, status: 'ready' as const } : l)) });
    expect(form.controls.lines.at(1)).not.toBe(before);
    expect(form.controls.lines.at(1).disabled).toBe(true);
  });
});
