import { AbstractControl, FormControl, FormGroup, ValidationErrors, Validators } from '@angular/forms';
import {
  CHANGE_ORDER_LIMITS,
  SIGNED_MONEY_PATTERN,
  type ChangeOrderCreate,
  type ChangeOrderPricing,
  type ChangeOrderView,
  type Problem,
  type TakeoffView,
} from '@layerbook/contracts/types';
import { requiredText } from '../../../shared/forms/text-validators';

export type PricingKind = ChangeOrderPricing['kind'];

/** Mirrors packages/contracts/src/billing/change-orders.ts, so both sides say the same. */
export const CHANGE_ORDER_WORDS = {
  title: { required: 'Give the change order a title.', maxlength: `Use at most ${CHANGE_ORDER_LIMITS.titleMaxLength} characters.` },
  description: { maxlength: `Use at most ${CHANGE_ORDER_LIMITS.descriptionMaxLength} characters.` },
  price: {
    required: 'Enter an amount, like 1250.00 (or -250.00 to deduct).',
    amount: 'Enter an amount with at most two decimals, like 1250.00 (or -250.00 to deduct).',
    zero: 'Enter an amount other than zero.',
  },
  surfaceIds: {
    required: 'Choose at least one surface.',
    tooMany: `Choose at most ${CHANGE_ORDER_LIMITS.surfacesMax} surfaces.`,
  },
  finishSystemId: { required: 'Choose a finish system from the library.' },
} as const;

/** "1,250.00" → "1250.00", "−250" → "-250": what the office types, as the API reads it. */
export function toSignedAmount(typed: string): string {
  return typed.trim().replace(/[,\s]/g, '').replace(/^[−–]/, '-');
}

/** The API's signed amount: at most two decimals, and not zero (a change of nothing moves nothing). */
export function signedAmount(control: AbstractControl<string>): ValidationErrors | null {
  const amount = toSignedAmount(control.value ?? '');
  if (amount === '') return null;
  if (!SIGNED_MONEY_PATTERN.test(amount)) return { amount: true };
  return /^-?0*(\.0*)?$/.test(amount) ? { zero: true } : null;
}

function someSurfaces(control: AbstractControl<readonly string[]>): ValidationErrors | null {
  const chosen = control.value ?? [];
  if (chosen.length === 0) return { required: true };
  return chosen.length > CHANGE_ORDER_LIMITS.surfacesMax ? { tooMany: true } : null;
}

export function changeOrderForm() {
  return new FormGroup({
    title: new FormControl('', {
      nonNullable: true,
      validators: [requiredText, Validators.maxLength(CHANGE_ORDER_LIMITS.titleMaxLength)],
    }),
    description: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(CHANGE_ORDER_LIMITS.descriptionMaxLength)] }),
    pricing: new FormGroup({
      kind: new FormControl<PricingKind>('lumpSum', { nonNullable: true }),
      price: new FormControl('', { nonNullable: true, validators: [requiredText, signedAmount] }),
      surfaceIds: new FormControl<readonly string[]>({ value: [], disabled: true }, { nonNullable: true, validators: [someSurfaces] }),
      finishSystemId: new FormControl({ value: '', disabled: true }, { nonNullable: true, validators: [requiredText] }),
    }),
  });
}

export type ChangeOrderForm = ReturnType<typeof changeOrderForm>;

/** Only the chosen way of pricing is checked and sent: the other way's fields are switched off. */
export function applyPricingKind(form: ChangeOrderForm): void {
  const p = form.controls.pricing.controls;
  const isLump = p.kind.value === 'lumpSum';
  for (const control of [p.price]) {
    if (isLump) control.enable();
    else control.disable();
  }
  for (const control of [p.surfaceIds, p.finishSystemId]) {
    if (isLump) control.disable();
    else control.enable();
  }
}

export function readChangeOrder(form: ChangeOrderForm): ChangeOrderCreate {
  const v = form.getRawValue();
  const pricing: ChangeOrderPricing =
    v.pricing.kind === 'lumpSum'
      ? { kind: 'lumpSum', price: toSignedAmount(v.pricing.price) }
      : { kind: 'engine', surfaceIds: [...v.pricing.surfaceIds], finishSystemId: v.pricing.finishSystemId };
  return { title: v.title.trim(), description: v.description.trim(), pricing };
}

/** A draft's saved values back in the form, to change it. */
export function fillChangeOrder(form: ChangeOrderForm, view: ChangeOrderView): void {
  const pricing = view.pricing;
  form.setValue({
    title: view.title,
    description: view.description,
    pricing: {
      kind: pricing.kind,
      price: pricing.kind === 'lumpSum' ? pricing.price : '',
      surfaceIds: pricing.kind === 'engine' ? pricing.surfaceIds : [],
      finishSystemId: pricing.kind === 'engine' ? pricing.finishSystemId : '',
    },
  });
  applyPricingKind(form);
}

/** The server names a surface by its place in the list (`pricing.surfaceIds.2`); the form has one field for them all. */
export function placeSurfaceProblems(problem: Problem): Problem {
  if (!problem.errors) return problem;
  return {
    ...problem,
    errors: problem.errors.map((e) => ({ ...e, field: e.field.replace(/^pricing\.surfaceIds\.\d+$/, 'pricing.surfaceIds') })),
  };
}

export interface SurfaceGroup {
  readonly room: string;
  readonly surfaces: ReadonlyArray<{ readonly id: string; readonly name: string }>;
}

/** The site's measured surfaces by room, for the picker (rooms with none are left out). */
export function surfaceGroups(takeoff: Pick<TakeoffView, 'rooms'>): SurfaceGroup[] {
  return takeoff.rooms
    .filter((r) => r.surfaces.length > 0)
    .map((r) => ({ room: r.name, surfaces: r.surfaces.map((s) => ({ id: s.id, name: s.name })) }));
}
