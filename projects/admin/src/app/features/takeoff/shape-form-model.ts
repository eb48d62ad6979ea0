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
import { readLength } from './number-text';
import { dimMessage, optionalNonNegativeMessage, readDim, shapeFormValue } from './shape-reading';

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
function dimValidator(key: DimKey, kindOf: () => SurfaceKind, unitOf: () => TakeoffLengthUnit): ValidatorFn {
  return (control: AbstractControl<string>) => {
    const field = shapeChoice(kindOf()).fields.find((x) => x.key === key);
    return field ? asErrors(dimMessage(field.rule, field.noun, readDim(field.rule, control.value, unitOf()))) : null;
  };
}

const rule =
  (r: DimRule, noun: string, unitOf: () => TakeoffLengthUnit): ValidatorFn =>
  (control: AbstractControl<string>) =>
    asErrors(dimMessage(r, noun, readDim(r, control.value, unitOf())));

const anyLength =
  (unitOf: () => TakeoffLengthUnit): ValidatorFn =>
  (control: AbstractControl<string>) => {
    const value = readLength(control.value, unitOf());
    return value === null || Number.isNaN(value) ? { rule: DIM_WORDS.corner } : null;
  };

const [WIDTH, HEIGHT, COUNT] = OPENING_FIELDS;

/** The form's unit, read when a field is checked (the firm may change it while the form is open). */
type UnitOf = () => TakeoffLengthUnit;

export function openingGroup(unitOf: UnitOf, width = '', height = '', count = '1'): OpeningGroup {
  return new FormGroup({
    width: new FormControl(width, { nonNullable: true, validators: rule(WIDTH.rule, WIDTH.noun, unitOf) }),
    height: new FormControl(height, { nonNullable: true, validators: rule(HEIGHT.rule, HEIGHT.noun, unitOf) }),
    count: new FormControl(count, { nonNullable: true, validators: rule(COUNT.rule, COUNT.noun, unitOf) }),
  });
}

export function cornerArray(unitOf: UnitOf, x = '', y = ''): CornerArray {
  return new FormArray([
    new FormControl(x, { nonNullable: true, validators: anyLength(unitOf) }),
    new FormControl(y, { nonNullable: true, validators: anyLength(unitOf) }),
  ]);
}

export function shapeGroup(unitOf: UnitOf): FormGroup<ShapeGroupControls> {
  const kind = new FormControl<SurfaceKind>('walls', { nonNullable: true });
  // Counts start at one: most beams and coffers are counted, but one is the usual first entry.
  const dims = Object.fromEntries(
    DIM_KEYS.map((key) => [
      key,
      new FormControl(key === 'count' ? '1' : '', { nonNullable: true, validators: dimValidator(key, () => kind.value, unitOf) }),
    ]),
  ) as {
    [K in DimKey]: FormControl<string>;
  };
  return new FormGroup<ShapeGroupControls>({
    ...dims,
    kind,
    elevation: new FormControl('', {
      nonNullable: true,
      validators: (c: AbstractControl<string>) => asErrors(optionalNonNegativeMessage(ELEVATION_NOUN, readLength(c.value, unitOf()))),
    }),
    measureBy: new FormControl<'faces' | 'length'>('faces', { nonNullable: true }),
    openings: new FormArray<OpeningGroup>([]),
    // A rectangle's four corners to start from: most odd ceilings are a rectangle with a corner cut.
    corners: new FormArray([cornerArray(unitOf, '0', '0'), cornerArray(unitOf), cornerArray(unitOf), cornerArray(unitOf)]),
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
  for (const o of value.openings ?? [])
    c.openings.push(
      openingGroup(() => unit, o.width, o.height, o.count),
      { emitEvent: false },
    );
  if (value.corners) {
    c.corners.clear({ emitEvent: false });
    for (const [x, y] of value.corners)
      c.corners.push(
        cornerArray(() => unit, x, y),
        { emitEvent: false },
      );
  }
  enableFor(group);
}
