import { AbstractControl, FormArray, FormControl, FormGroup, ValidationErrors, ValidatorFn } from '@angular/forms';
import type { SurfaceView, TakeoffLengthUnit } from '@layerbook/contracts';
import { convertArea, convertLength, type SurfaceKind, type SurfaceShape } from '@layerbook/domain';
import { readNumber } from './number-text';
import { DIM_KEYS, type DimField, type DimKey, type DimRule, shapeChoice } from './shape-catalog';

/** The API's upper bound on any size (contracts: takeoff/shape.ts). */
const MAX_SIZE = 100_000;

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

/** A rule's message, the same words as the API's schema. */
export function dimMessage(rule: DimRule, noun: string, value: number | null): string | null {
  if (typeof rule === 'object') {
    const [min, max] = rule.whole;
    return value !== null && Number.isInteger(value) && value >= min && value <= max ? null : `Enter the ${noun} as a whole number from ${min} to ${max}.`;
  }
  if (rule === 'depth0') {
    if (value === null || Number.isNaN(value) || value < 0) return `Enter the ${noun}, 0 or more.`;
  } else if (value === null || Number.isNaN(value) || value <= 0) {
    return `Enter the ${noun}, more than 0.`;
  }
  if (rule === 'angle' && value > 360) return 'Enter an angle of at most 360 degrees.';
  return value > MAX_SIZE ? `Enter the ${noun}, at most ${MAX_SIZE}.` : null;
}

const asErrors = (message: string | null): ValidationErrors | null => (message === null ? null : { rule: message });

/** Each dimension checks itself against the rule of the shape chosen now (a depth may be 0 for coffers, not beams). */
function dimValidator(key: DimKey, kindOf: () => SurfaceKind): ValidatorFn {
  return (control: AbstractControl<string>) => {
    const field = shapeChoice(kindOf()).fields.find((x) => x.key === key);
    return field ? asErrors(dimMessage(field.rule, field.noun, readNumber(control.value))) : null;
  };
}

const optionalNonNegative =
  (noun: string): ValidatorFn =>
  (control: AbstractControl<string>) => {
    const value = readNumber(control.value);
    if (value === null) return null;
    return asErrors(Number.isNaN(value) || value < 0 ? `Enter the ${noun}, 0 or more, or leave it empty.` : value > MAX_SIZE ? `Enter the ${noun}, at most ${MAX_SIZE}.` : null);
  };

const rule = (r: DimRule, noun: string): ValidatorFn => (control: AbstractControl<string>) => asErrors(dimMessage(r, noun, readNumber(control.value)));

const anyNumber: ValidatorFn = (control: AbstractControl<string>) => {
  const value = readNumber(control.value);
  return value === null || Number.isNaN(value) ? { rule: 'Enter a number, like 12 or -3.5.' } : null;
};

export function openingGroup(width = '', height = '', count = '1'): OpeningGroup {
  return new FormGroup({
    width: new FormControl(width, { nonNullable: true, validators: rule('length', 'opening width') }),
    height: new FormControl(height, { nonNullable: true, validators: rule('length', 'opening height') }),
    count: new FormControl(count, { nonNullable: true, validators: rule({ whole: [1, 100] }, 'number of alike openings') }),
  });
}

export function cornerArray(x = '', y = ''): CornerArray {
  return new FormArray([new FormControl(x, { nonNullable: true, validators: anyNumber }), new FormControl(y, { nonNullable: true, validators: anyNumber })]);
}

export function shapeGroup(): FormGroup<ShapeGroupControls> {
  const kind = new FormControl<SurfaceKind>('walls', { nonNullable: true });
  // Counts start at one: most beams and coffers are counted, but one is the usual first entry.
  const dims = Object.fromEntries(DIM_KEYS.map((key) => [key, new FormControl(key === 'count' ? '1' : '', { nonNullable: true, validators: dimValidator(key, () => kind.value) })])) as {
    [K in DimKey]: FormControl<string>;
  };
  return new FormGroup<ShapeGroupControls>({
    ...dims,
    kind,
    elevation: new FormControl('', { nonNullable: true, validators: optionalNonNegative('height above the floor') }),
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

export type ShapeReading = { readonly shape: SurfaceShape } | { readonly missing: true };

/**
 * The shape as the engine wants it, or `missing` while any field of the chosen shape is empty or
 * not yet a valid number. Geometry that does not fit together is left for the engine to judge.
 */
export function readShape(raw: ReturnType<FormGroup<ShapeGroupControls>['getRawValue']>): ShapeReading {
  const c = shapeChoice(raw.kind);
  const out: Record<string, unknown> = { kind: raw.kind };
  for (const field of c.fields) {
    const value = readNumber(raw[field.key]);
    if (dimMessage(field.rule, field.noun, value) !== null) return { missing: true };
    out[field.key] = value;
  }
  if (c.hasElevation) {
    const elevation = readNumber(raw.elevation);
    if (elevation !== null) {
      if (Number.isNaN(elevation) || elevation < 0) return { missing: true };
      out['elevation'] = elevation;
    }
  }
  if (c.hasOpenings) {
    const openings = [];
    for (const o of raw.openings) {
      const width = readNumber(o.width);
      const height = readNumber(o.height);
      const count = readNumber(o.count);
      if (dimMessage('length', '', width) || dimMessage('length', '', height) || dimMessage({ whole: [1, 100] }, '', count)) return { missing: true };
      openings.push({ width: width!, height: height!, count: count! });
    }
    out['openings'] = openings;
  }
  if (c.hasCorners) {
    const corners: [number, number][] = [];
    for (const [x, y] of raw.corners) {
      const nx = readNumber(x);
      const ny = readNumber(y);
      if (nx === null || ny === null || Number.isNaN(nx) || Number.isNaN(ny)) return { missing: true };
      corners.push([nx, ny]);
    }
    out['corners'] = corners;
  }
  if (c.hasMeasureBy) out['measureBy'] = raw.measureBy;
  return { shape: out as unknown as SurfaceShape };
}

/** How a field scales between units: lengths linearly, areas by the square, counts and angles not at all. */
function convertField(field: DimField, value: number, from: TakeoffLengthUnit, to: TakeoffLengthUnit): number {
  if (field.rule === 'length' || field.rule === 'depth0') return convertLength(value, from, to);
  if (field.rule === 'area') return convertArea(value, from, to);
  return value;
}

const text = (value: number | undefined) => (value === undefined ? '' : shortNumberFine(value));
/** Four decimals keep a converted 10 ft (3.048 m) exact enough to re-measure the same. */
const shortNumberFine = (value: number) => String(Number(value.toFixed(4)));

/**
 * Puts a saved surface into the form, in the unit the firm measures in now: a surface saved in
 * feet before the firm went metric is shown (and saved again) in metres.
 */
export function loadShape(group: FormGroup<ShapeGroupControls>, surface: SurfaceView, unit: TakeoffLengthUnit): void {
  const shape = surface.shape as SurfaceShape;
  const values = shape as unknown as Readonly<Record<string, unknown>>;
  const from = surface.lengthUnit;
  const c = shapeChoice(shape.kind);
  const len = (value: number) => convertLength(value, from, unit);
  group.controls.kind.setValue(shape.kind, { emitEvent: false });
  for (const field of c.fields) {
    const value = values[field.key];
    group.controls[field.key].setValue(typeof value === 'number' ? text(convertField(field, value, from, unit)) : field.key === 'count' ? '1' : '', { emitEvent: false });
  }
  const elevation = values['elevation'];
  group.controls.elevation.setValue(typeof elevation === 'number' ? text(len(elevation)) : '', { emitEvent: false });
  if (shape.kind === 'beams') group.controls.measureBy.setValue(shape.measureBy ?? 'faces', { emitEvent: false });
  group.controls.openings.clear({ emitEvent: false });
  if ((shape.kind === 'walls' || shape.kind === 'roundWalls' || shape.kind === 'curvedWall') && shape.openings) {
    for (const o of shape.openings) group.controls.openings.push(openingGroup(text(len(o.width)), text(len(o.height)), String(o.count ?? 1)), { emitEvent: false });
  }
  if (shape.kind === 'ceilingPolygon') {
    group.controls.corners.clear({ emitEvent: false });
    for (const [x, y] of shape.corners) group.controls.corners.push(cornerArray(text(len(x)), text(len(y))), { emitEvent: false });
  }
  enableFor(group);
}

