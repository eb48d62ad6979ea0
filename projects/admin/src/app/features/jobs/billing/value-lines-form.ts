import { AbstractControl, FormArray, FormControl, FormGroup, ValidationErrors, Validators } from '@angular/forms';
import type { ProgressMark, ValueLineView, ValueLinesUpdate } from '@layerbook/contracts/types';
import { toMinorUnits } from '@layerbook/domain';
import { amountText, toAmount } from '../../../shared/forms/money-input';
import { requiredText } from '../../../shared/forms/text-validators';
import { LINE_LABEL_MAX_LENGTH } from './schedule-form';

/** The API takes a percent complete with at most two decimals (40.25). */
function twoDecimals(control: AbstractControl): ValidationErrors | null {
  const value: unknown = control.value;
  if (typeof value !== 'number' && typeof value !== 'string') return null;
  if (value === '') return null;
  return /^\d+(\.\d{1,2})?$/.test(String(value)) ? null : { decimals: true };
}

/** One schedule-of-values line being edited; names follow the API's paths (`lines.1.scheduledValue`). */
export function valueLineGroup(line?: Pick<ValueLineView, 'id' | 'label' | 'scheduledValue'>) {
  return new FormGroup({
    id: new FormControl<string | null>(line?.id ?? null),
    label: new FormControl(line?.label ?? '', {
      nonNullable: true,
      validators: [requiredText, Validators.maxLength(LINE_LABEL_MAX_LENGTH)],
    }),
    scheduledValue: new FormControl(line?.scheduledValue ?? '', { nonNullable: true, validators: [Validators.required, amountText] }),
  });
}

export type ValueLineGroup = ReturnType<typeof valueLineGroup>;

export function valueLinesForm(lines: readonly ValueLineView[]) {
  return new FormGroup({
    lines: new FormArray<ValueLineGroup>([...lines].sort((a, b) => a.position - b.position).map((line) => valueLineGroup(line))),
  });
}

export type ValueLinesFormGroup = ReturnType<typeof valueLinesForm>;

export function readValueLines(form: ValueLinesFormGroup): ValueLinesUpdate {
  return {
    lines: form.getRawValue().lines.map((line) => ({
      ...(line.id ? { id: line.id } : {}),
      label: line.label.trim(),
      scheduledValue: toAmount(line.scheduledValue) ?? '',
    })),
  };
}

/** A line's reading from the site: how far the work is, to date, and what is stored on site. */
export function progressGroup(line: Pick<ValueLineView, 'percentComplete' | 'storedMaterials'>) {
  return new FormGroup({
    percentComplete: new FormControl<number | null>(Number(line.percentComplete), [
      Validators.required,
      Validators.min(0),
      Validators.max(100),
      twoDecimals,
    ]),
    storedMaterials: new FormControl(line.storedMaterials, { nonNullable: true, validators: [Validators.required, amountText] }),
  });
}

export type ProgressGroup = ReturnType<typeof progressGroup>;

/**
 * The marks a line's reading makes: only what changed from the line as last read, dated `on`,
 * each with its own key so a repeated click is recorded once. The reading has passed its validators.
 */
export function progressMarks(
  line: Pick<ValueLineView, 'id' | 'percentComplete' | 'storedMaterials'>,
  reading: ReturnType<ProgressGroup['getRawValue']>,
  on: string,
  currency: string,
  newKey: () => string,
): ProgressMark[] {
  const marks: ProgressMark[] = [];
  const percent = reading.percentComplete;
  if (percent !== null && percent !== Number(line.percentComplete)) {
    marks.push({ kind: 'valuePercent', valueLineId: line.id, percentComplete: percent, on, clientKey: newKey() });
  }
  const stored = toAmount(reading.storedMaterials) ?? '0';
  if (toMinorUnits(stored, currency) !== toMinorUnits(line.storedMaterials, currency)) {
    marks.push({ kind: 'storedMaterials', valueLineId: line.id, amount: stored, on, clientKey: newKey() });
  }
  return marks;
}
