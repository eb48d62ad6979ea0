import { AbstractControl, FormArray, FormControl, FormGroup, ValidationErrors, ValidatorFn } from '@angular/forms';
import {
  DIM_KEYS,
  DIM_WORDS,
  ELEVATION_NOUN,
  OPENING_FIELDS,
  shapeChoice,
  type DimKey,
  type DimRule,
  type SurfaceView,
  type TakeoffLengthUnit,
} from '@layerbook/contracts/types';
import type { SurfaceKind } from '@layerbook/domain';
import { readNumber } from './number-text';
import { dimMessage, optionalNonNegativeMessage, shapeFormValue } from './shape-reading';

export type OpeningGroup = FormGroup<{ width: FormControl<string>; height: FormControl<string>; count: FormControl<string> }>;
/** [x, y] as a two-control array, so the API's `shape.corners.1.0` finds its control. */
export type CornerArray = FormArray<FormControl<string>>;
export type ShapeGroupControls = { [K in DimKey]: FormControl<string> } & {
  kind: FormControl<SurfaceKind>;
  elevation: FormControl<string>;
  measureBy: FormControl<'faces' | 'length'>;
  openings: FormArray<OpeningGroup>;
  corners: FormArray<CornerArray>;
};

const asErrors = (message: string | null): ValidationErrors | null => (message === null ? null : { rule: message });

/** Each dimension checks itself against the rule of the shape chosen now (a depth may be 0 for coffers, not beams). */
function dimValidator(key: DimKey, kindOf: () => SurfaceKind): ValidatorFn {
  return (control: AbstractControl<string>) => {
    const field = shapeChoice(kindOf()).fields.find((x) => x.key === key);
    return field ? asErrors(dimMessage(field.rule, field.noun, readNumber(control.value))) : null;
  };
}

const rule =
  (r: DimRule, noun: string): ValidatorFn =>
  (control: AbstractControl<string>) =>
    asErrors(dimMessage(r, noun, readNumber(control.value)));

const anyNumber: ValidatorFn = (control: AbstractControl<string>) => {
  const value = readNumber(control.value);
  return value === null || Number.isNaN(value) ? { rule: DIM_WORDS.corner } : null;
};

const [WIDTH, HEIGHT, COUNT] = OPENING_FIELDS;

export function openingGroup(width = '', height = '', count = '1'): OpeningGroup {
  return new FormGroup({
    width: new FormControl(width, { nonNullable: true, validators: rule(WIDTH.rule, WIDTH.noun) }),
    height: new FormControl(height, { nonNullable: true, validators: rule(HEIGHT.rule, HEIGHT.noun) }),
    count: new FormControl(count, { nonNullable: true, validators: rule(COUNT.rule, COUNT.noun) }),
  });
}

export function cornerArray(x = '', y = ''): CornerArray {
  return new FormArray([
    new FormControl(x, { nonNullable: true, validators: anyNumber }),
    new FormControl(y, { nonNullable: true, validators: anyNumber }),
  ]);
}

export function shapeGroup(): FormGroup<ShapeGroupControls> {
  const kind = new FormControl<SurfaceKind>('walls', { nonNullable: true });
  // Counts start at one: most beams and coffers are counted, but one is the usual first entry.
  const dims = Object.fromEntries(
    DIM_KEYS.map((key) => [
      key,
      new FormControl(key === 'count' ? '1' : '', { nonNullable: true, validators: dimValidator(key, () => kind.value) }),
    ]),
  ) as {
    [K in DimKey]: FormControl<string>;
  };
  return new FormGroup<ShapeGroupControls>({
    ...dims,
    kind,
    elevation: new FormControl('', {
      nonNullable: true,
      validators: (c: AbstractControl<string>) => asErrors(optionalNonNegativeMessage(ELEVATION_NOUN, readNumber(c.value))),
    }),
    measureBy: new FormControl<'faces' | 'length'>('faces', { nonNullable: true }),
    openings: new FormArray<OpeningGroup>([]),
    // A rectangle's four corners to start from: most odd ceilings are a rectangle with a corner cut.
    corners: new FormArray([cornerArray('0', '0'), cornerArray(), cornerArray(), cornerArray()]),
  });
}

/** Only the chosen shape's controls count towards validity and are sent. */
export function enableFor(group: FormGroup<ShapeGroupControls>): void {
  const c = shapeChoice(group.controls.kind.value);
  const wanted = new Set<string>(c.fields.map((x) => x.key));
  for (const key of DIM_KEYS) toggle(group.controls[key], wanted.has(key));
  toggle(group.controls.elevation, c.hasElevation);
  toggle(group.controls.openings, c.hasOpenings);
  toggle(group.controls.corners, c.hasCorners);
  toggle(group.controls.measureBy, c.hasMeasureBy);
}

function toggle(control: AbstractControl, on: boolean): void {
  if (on && control.disabled) control.enable({ emitEvent: false });
  if (!on && control.enabled) control.disable({ emitEvent: false });
  if (on) control.updateValueAndValidity({ emitEvent: false });
}

/** Puts a saved surface into the form, in the unit the firm measures in now (see shapeFormValue). */
export function loadShape(group: FormGroup<ShapeGroupControls>, surface: SurfaceView, unit: TakeoffLengthUnit): void {
  const value = shapeFormValue(surface.shape, surface.lengthUnit, unit);
  const c = group.controls;
  c.kind.setValue(value.kind, { emitEvent: false });
  for (const field of shapeChoice(value.kind).fields) c[field.key].setValue(value[field.key] ?? '', { emitEvent: false });
  c.elevation.setValue(value.elevation ?? '', { emitEvent: false });
  if (value.measureBy) c.measureBy.setValue(value.measureBy, { emitEvent: false });
  c.openings.clear({ emitEvent: false });
  for (const o of value.openings ?? []) c.openings.push(openingGroup(o.width, o.height, o.count), { emitEvent: false });
  if (value.corners) {
    c.corners.clear({ emitEvent: false });
    for (const [x, y] of value.corners) c.corners.push(cornerArray(x, y), { emitEvent: false });
  }
  enableFor(group);
}
