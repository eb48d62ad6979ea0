import type { ValueLineView } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { progressGroup, progressMarks, readValueLines, valueLineGroup, valueLinesForm } from './value-lines-form';

function line(
  id: string,
  position: number,
  label: string,
  scheduledValue: string,
  percentComplete = '0',
  storedMaterials = '0.00',
): ValueLineView {
  return { id, position, label, scheduledValue, changeOrderId: null, percentComplete, storedMaterials, billedWork: '0.00' };
}

describe('schedule of values form ↔ ValueLinesUpdate', () => {
  it('reads back the lines in order with their ids, and a new line without one', () => {
    // DOMAIN.md §2.10 worked example lines.
    const form = valueLinesForm([
      line('v2', 2, 'Venetian plaster, walls', '22000.00'),
      line('v1', 1, 'Mobilization, protection, prep', '6000.00'),
    ]);
    const added = valueLineGroup();
    added.setValue({ id: null, label: ' Stenciled frieze ', scheduledValue: '6,000' });
    form.controls.lines.push(added);
    expect(readValueLines(form)).toEqual({
      lines: [
        { id: 'v1', label: 'Mobilization, protection, prep', scheduledValue: '6000.00' },
        { id: 'v2', label: 'Venetian plaster, walls', scheduledValue: '22000.00' },
        { label: 'Stenciled frieze', scheduledValue: '6000' },
      ],
    });
  });
});

describe('progressMarks (only what changed, each with its own key)', () => {
  let n = 0;
  const key = () => `k${++n}`;

  it('marks a new percent and a new stored amount, dated', () => {
    n = 0;
    const v = line('v4', 4, 'Stenciled frieze', '6000.00', '0', '0.00');
    const reading = progressGroup(v);
    reading.setValue({ percentComplete: 25, storedMaterials: '1,500' });
    expect(progressMarks(v, reading.getRawValue(), '2026-12-10', 'USD', key)).toEqual([
      { kind: 'valuePercent', valueLineId: 'v4', percentComplete: 25, on: '2026-12-10', clientKey: 'k1' },
      { kind: 'storedMaterials', valueLineId: 'v4', amount: '1500', on: '2026-12-10', clientKey: 'k2' },
    ]);
  });

  it('marks nothing when the reading is what the line says (1500 is 1500.00)', () => {
    const v = line('v2', 2, 'Venetian plaster, walls', '22000.00', '80', '1500.00');
    expect(progressMarks(v, { percentComplete: 80, storedMaterials: '1500' }, '2026-12-10', 'USD', key)).toEqual([]);
  });

  it('refuses a percent over 100, below 0 or with more than two decimals, as the API does', () => {
    const reading = progressGroup(line('v1', 1, 'Prep', '6000.00'));
    reading.controls.percentComplete.setValue(101);
    expect(reading.controls.percentComplete.hasError('max')).toBe(true);
    reading.controls.percentComplete.setValue(-1);
    expect(reading.controls.percentComplete.hasError('min')).toBe(true);
    reading.controls.percentComplete.setValue(40.125);
    expect(reading.controls.percentComplete.hasError('decimals')).toBe(true);
    reading.controls.percentComplete.setValue(40.25);
    expect(reading.controls.percentComplete.valid).toBe(true);
  });
});
