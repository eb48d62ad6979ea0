import { AbstractControl, FormArray, FormControl, FormGroup, FormRecord, ValidationErrors, Validators } from '@angular/forms';
import {
  COST_LINE_KINDS,
  ESTIMATE_INPUT_LIMITS as L,
  type CostLineKind,
  type EstimateContext,
  type EstimateInputs,
} from '@layerbook/contracts/types';
import { amountText, toAmount } from '../../shared/forms/money-input';
import { DATE_YEAR_WORDS, dateYearInRange, fromIsoDate, toIsoDate } from '../../shared/forms/iso-date';
import { requiredText } from '../../shared/forms/text-validators';

export const MAX_OPTIONS = L.optionsMax;
export const NOTES_MAX = L.notesMax;
/** Add-ons and each kind of cost line have the same cap. */
export const MAX_LINES = Math.min(L.addOnsMax, L.costLinesMax);

const atMost = (max: number) => `Use at most ${max} characters.`;

/** Mirrors the contracts' schema (proposals/estimate.ts) so both sides say the same. */
export const WORDS = {
  title: { required: 'Give the estimate a title.', maxlength: atMost(L.titleMax) },
  notes: { maxlength: atMost(L.notesMax) },
  startDate: { required: 'Enter a date.', matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.', ...DATE_YEAR_WORDS },
  optionLabel: { required: 'Name this option.', maxlength: atMost(L.optionLabelMax) },
  addOnLabel: { required: 'Name this add-on.', maxlength: atMost(L.addOnLabelMax) },
  costLabel: { required: 'Name this cost.', maxlength: atMost(L.costLabelMax) },
  hours: { required: 'Enter hours.', hours: `Enter hours from 0 to ${L.addOnHoursMax}, like 6.5.` },
  amount: { required: 'Enter an amount, like 1250.00.', amount: 'Enter an amount with at most two decimals, like 1250.00.' },
  percent: { required: 'Enter a percentage.', percent: 'Enter more than 0 and at most 100.' },
  rate: { amount: 'Enter a price with at most two decimals, like 6.00.' },
  finish: {},
} as const;

function hoursText(control: AbstractControl<string>): ValidationErrors | null {
  const typed = (control.value ?? '').trim();
  if (typed === '') return null;
  const n = Number(typed);
  return Number.isFinite(n) && n >= 0 && n <= L.addOnHoursMax ? null : { hours: true };
}

function percentText(control: AbstractControl<string>): ValidationErrors | null {
  const typed = (control.value ?? '').trim();
  if (typed === '') return null;
  const n = Number(typed);
  return Number.isFinite(n) && n > 0 && n <= L.discountPercentMax ? null : { percent: true };
}

const text = (value: string, max: number) =>
  new FormControl(value, { nonNullable: true, validators: [requiredText, Validators.maxLength(max)] });
const notes = () => new FormControl('', { nonNullable: true, validators: [Validators.maxLength(L.notesMax)] });
const amount = (value: string) => new FormControl(value, { nonNullable: true, validators: [Validators.required, amountText] });

export type OptionGroup = FormGroup<{
  id: FormControl<string>;
  label: FormControl<string>;
  /** surface id → finish system id, '' for "not in this option" */
  finishes: FormRecord<FormControl<string>>;
}>;
export type AddOnGroup = FormGroup<{
  id: FormControl<string>;
  label: FormControl<string>;
  labourHours: FormControl<string>;
  materialsCost: FormControl<string>;
}>;
export type CostLineGroup = FormGroup<{ label: FormControl<string>; amount: FormControl<string> }>;
export type DiscountKind = 'none' | 'percent' | 'amount';
export type { CostLineKind };

export function optionGroup(context: EstimateContext, id: string, label: string, finishes: Readonly<Record<string, string>>): OptionGroup {
  const record = new FormRecord<FormControl<string>>({});
  for (const room of context.rooms) {
    for (const surface of room.surfaces) {
      record.addControl(surface.id, new FormControl(finishes[surface.id] ?? '', { nonNullable: true }));
    }
  }
  return new FormGroup({ id: new FormControl(id, { nonNullable: true }), label: text(label, L.optionLabelMax), finishes: record });
}

export function addOnGroup(id: string, label = '', labourHours = '', materialsCost = ''): AddOnGroup {
  return new FormGroup({
    id: new FormControl(id, { nonNullable: true }),
    label: text(label, L.addOnLabelMax),
    labourHours: new FormControl(labourHours, { nonNullable: true, validators: [Validators.required, hoursText] }),
    materialsCost: amount(materialsCost),
  });
}

export function costLineGroup(label = '', value = ''): CostLineGroup {
  return new FormGroup({ label: text(label, L.costLabelMax), amount: amount(value) });
}

export function estimateForm() {
  return new FormGroup({
    title: text('', L.titleMax),
    startDate: new FormControl<Date | null>(null, [Validators.required, dateYearInRange]),
    isOccupied: new FormControl(false, { nonNullable: true }),
    variants: new FormArray<OptionGroup>([]),
    addOns: new FormArray<AddOnGroup>([]),
    equipment: new FormArray<CostLineGroup>([]),
    subcontracts: new FormArray<CostLineGroup>([]),
    sundries: new FormArray<CostLineGroup>([]),
    discount: new FormGroup({
      kind: new FormControl<DiscountKind>('none', { nonNullable: true }),
      percent: new FormControl({ value: '', disabled: true }, { nonNullable: true, validators: [Validators.required, percentText] }),
      amount: new FormControl({ value: '', disabled: true }, { nonNullable: true, validators: [Validators.required, amountText] }),
    }),
    /** finish system id → price per unit²; blank = no comparison rate */
    perAreaRates: new FormRecord<FormControl<string>>({}),
    /** for the office only: never reaches the client */
    internalNotes: notes(),
    /** for the client: a new proposal's notes start from these */
    clientNotes: notes(),
  });
}
export type EstimateForm = ReturnType<typeof estimateForm>;

/** Only the chosen kind's field is live, so a hidden one never blocks saving. */
export function showDiscountKind(form: EstimateForm, kind: DiscountKind): void {
  const d = form.controls.discount.controls;
  if (kind === 'percent') d.percent.enable({ emitEvent: false });
  else d.percent.disable({ emitEvent: false });
  if (kind === 'amount') d.amount.enable({ emitEvent: false });
  else d.amount.disable({ emitEvent: false });
}

/** Puts stored inputs into the form, replacing every row. */
export function fillForm(form: EstimateForm, context: EstimateContext, inputs: EstimateInputs): void {
  const c = form.controls;
  c.variants.clear({ emitEvent: false });
  for (const v of inputs.variants) {
    c.variants.push(optionGroup(context, v.id, v.label, Object.fromEntries(v.surfaces.map((s) => [s.surfaceId, s.finishSystemId]))), {
      emitEvent: false,
    });
  }
  c.addOns.clear({ emitEvent: false });
  for (const a of inputs.addOns) c.addOns.push(addOnGroup(a.id, a.label, String(a.labourHours), a.materialsCost), { emitEvent: false });
  for (const kind of COST_LINE_KINDS) {
    c[kind].clear({ emitEvent: false });
    for (const line of inputs[kind]) c[kind].push(costLineGroup(line.label, line.amount), { emitEvent: false });
  }
  for (const key of Object.keys(c.perAreaRates.controls)) c.perAreaRates.removeControl(key, { emitEvent: false });
  for (const system of context.finishSystems) {
    c.perAreaRates.addControl(
      system.id,
      new FormControl(inputs.perAreaRates[system.id] ?? '', { nonNullable: true, validators: amountText }),
      { emitEvent: false },
    );
  }
  const discount = inputs.discount;
  const kind: DiscountKind = discount?.kind ?? 'none';
  showDiscountKind(form, kind);
  form.reset({
    title: inputs.title,
    startDate: fromIsoDate(inputs.startDate),
    isOccupied: inputs.isOccupied,
    internalNotes: inputs.internalNotes ?? '',
    clientNotes: inputs.clientNotes ?? '',
    discount: {
      kind,
      percent: discount?.kind === 'percent' ? String(discount.percent) : '',
      amount: discount?.kind === 'amount' ? discount.amount : '',
    },
  });
}

/**
 * The form as the API's EstimateInputs. Called on every change, so it never throws: a field
 * the validators reject still yields something, and the caller checks `form.valid` first.
 */
export function readInputs(form: EstimateForm, context: EstimateContext): EstimateInputs {
  const v = form.getRawValue();
  const surfaceOrder = context.rooms.flatMap((r) => r.surfaces.map((s) => s.id));
  const d = v.discount;
  return {
    title: v.title.trim(),
    startDate: toIsoDate(v.startDate) ?? '',
    isOccupied: v.isOccupied,
    variants: v.variants.map((o) => ({
      id: o.id,
      label: o.label.trim(),
      surfaces: surfaceOrder.filter((id) => (o.finishes[id] ?? '') !== '').map((id) => ({ surfaceId: id, finishSystemId: o.finishes[id] })),
    })),
    addOns: v.addOns.map((a) => ({
      id: a.id,
      label: a.label.trim(),
      labourHours: Number(a.labourHours.trim() || '0'),
      materialsCost: toAmount(a.materialsCost) ?? '0',
    })),
    equipment: v.equipment.map(costLine),
    subcontracts: v.subcontracts.map(costLine),
    sundries: v.sundries.map(costLine),
    discount:
      d.kind === 'percent'
        ? { kind: 'percent', percent: Number(d.percent.trim() || '0') }
        : d.kind === 'amount'
          ? { kind: 'amount', amount: toAmount(d.amount) ?? '0' }
          : null,
    perAreaRates: Object.fromEntries(
      Object.entries(v.perAreaRates)
        .map(([id, rate]) => [id, toAmount(rate)] as const)
        .filter((entry): entry is readonly [string, string] => entry[1] !== null),
    ),
    internalNotes: v.internalNotes.trim(),
    clientNotes: v.clientNotes.trim(),
  };
}

function costLine(line: { label: string; amount: string }): { label: string; amount: string } {
  return { label: line.label.trim(), amount: toAmount(line.amount) ?? '0' };
}

/** A short id the schema accepts, not used by any option yet: A, B, C… */
export function nextOptionId(used: readonly string[]): string {
  for (const letter of 'ABCDEFGHIJKLMNOPQRSTUVWXYZ') {
    if (!used.includes(letter)) return letter;
  }
  return `O${used.length + 1}`;
}

export function nextAddOnId(used: readonly string[]): string {
  let n = used.length + 1;
  while (used.includes(`addon-${n}`)) n++;
  return `addon-${n}`;
}
