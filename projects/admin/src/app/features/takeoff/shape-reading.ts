import { DIM_WORDS, type DimKey, type DimRule, SHAPE_LIMITS, type TakeoffLengthUnit, shapeChoice } from '@layerbook/contracts/types';
import { convertShape, plainNumber, type SurfaceKind, type SurfaceShape } from '@layerbook/domain';
import { readLength, readNumber } from './number-text';

/** The shape form's raw value: every dimension as typed, whatever the chosen shape uses. */
export type ShapeFormValue = { [K in DimKey]: string } & {
  kind: SurfaceKind;
  elevation: string;
  measureBy: 'faces' | 'length';
  openings: { width: string; height: string; count: string }[];
  corners: string[][];
};

/** A dimension's message under its rule, the same words as the API's schema (null: fine). */
export function dimMessage(rule: DimRule, noun: string, value: number | null): string | null {
  if (typeof rule === 'object') {
    const [min, max] = rule.whole;
    return value !== null && Number.isInteger(value) && value >= min && value <= max ? null : DIM_WORDS.whole(noun, min, max);
  }
  if (rule === 'depth0') {
    if (value === null || Number.isNaN(value) || value < 0) return DIM_WORDS.nonNegative(noun);
  } else if (value === null || Number.isNaN(value) || value <= 0) {
    return DIM_WORDS.positive(noun);
  }
  if (rule === 'angle') return value > SHAPE_LIMITS.angleMaxDegrees ? DIM_WORDS.angleTooBig : null;
  if (rule !== 'depth0' && value < SHAPE_LIMITS.sizeMin) return DIM_WORDS.tooSmall(noun);
  return value > SHAPE_LIMITS.sizeMax ? DIM_WORDS.tooBig(noun) : null;
}

/** An optional size that may be 0, such as the height above the floor (null: fine). */
export function optionalNonNegativeMessage(noun: string, value: number | null): string | null {
  if (value === null) return null;
  if (Number.isNaN(value) || value < 0) return DIM_WORDS.optionalNonNegative(noun);
  return value > SHAPE_LIMITS.sizeMax ? DIM_WORDS.tooBig(noun) : null;
}

export type ShapeReading = { readonly shape: SurfaceShape } | { readonly missing: true };

/** A field as typed: lengths may be feet and inches ("6' 6\""), counts, areas and angles are plain numbers. */
export function readDim(rule: DimRule, typed: string, unit: TakeoffLengthUnit): number | null {
  return rule === 'length' || rule === 'depth0' ? readLength(typed, unit) : readNumber(typed);
}

/**
 * The shape as the engine wants it, or `missing` while any field of the chosen shape is empty or
 * not yet a valid number. Geometry that does not fit together is left for the engine to judge.
 * Lengths are read in `unit`, the unit the form measures in.
 */
export function readShape(raw: ShapeFormValue, unit: TakeoffLengthUnit): ShapeReading {
  const c = shapeChoice(raw.kind);
  const out: Record<string, unknown> = { kind: raw.kind };
  for (const field of c.fields) {
    const value = readDim(field.rule, raw[field.key], unit);
    if (dimMessage(field.rule, field.noun, value) !== null) return { missing: true };
    out[field.key] = value;
  }
  if (c.hasElevation) {
    const elevation = readLength(raw.elevation, unit);
    if (elevation !== null) {
      if (Number.isNaN(elevation) || elevation < 0) return { missing: true };
      out['elevation'] = elevation;
    }
  }
  if (c.hasOpenings) {
    const openings = [];
    for (const o of raw.openings) {
      const width = readLength(o.width, unit);
      const height = readLength(o.height, unit);
      const count = readNumber(o.count);
      if (
        dimMessage('length', '', width) ||
        dimMessage('length', '', height) ||
        dimMessage({ whole: [1, SHAPE_LIMITS.openingCountMax] }, '', count)
      )
        return { missing: true };
      openings.push({ width: width!, height: height!, count: count! });
    }
    out['openings'] = openings;
  }
  if (c.hasCorners) {
    const corners: [number, number][] = [];
    for (const [x, y] of raw.corners) {
      const nx = readLength(x, unit);
      const ny = readLength(y, unit);
      if (nx === null || ny === null || Number.isNaN(nx) || Number.isNaN(ny)) return { missing: true };
      corners.push([nx, ny]);
    }
    out['corners'] = corners;
  }
  if (c.hasMeasureBy) out['measureBy'] = raw.measureBy;
  return { shape: out as unknown as SurfaceShape };
}

/**
 * The form's banner after an edit: once every field reads and none is in error the banner has
 * said its piece and goes; while something is still wrong it stays.
 */
export function bannerAfterEdit(banner: string | null, isFormValid: boolean, reading: ShapeReading): string | null {
  return banner !== null && isFormValid && !('missing' in reading) ? null : banner;
}

/** Four decimals keep a converted 10 ft (3.048 m) exact enough to measure the same again. */
const typed = (value: number | undefined) => (value === undefined ? '' : plainNumber(value, 4));

/**
 * A saved shape as the form types it, in the unit the firm measures in now: a surface saved in
 * feet before the firm went metric is shown (and saved again) in metres.
 */
export function shapeFormValue(
  saved: SurfaceShape,
  from: TakeoffLengthUnit,
  to: TakeoffLengthUnit,
): Partial<ShapeFormValue> & { kind: SurfaceKind } {
  const shape = convertShape(saved, from, to);
  const values = shape as unknown as Readonly<Record<string, unknown>>;
  const out: Partial<ShapeFormValue> & { kind: SurfaceKind } = { kind: shape.kind };
  for (const field of shapeChoice(shape.kind).fields) {
    const value = values[field.key];
    // Counts start at one: most beams and coffers are counted, but one is the usual first entry.
    out[field.key] = typeof value === 'number' ? typed(value) : field.key === 'count' ? '1' : '';
  }
  const elevation = values['elevation'];
  out.elevation = typeof elevation === 'number' ? typed(elevation) : '';
  if (shape.kind === 'beams') out.measureBy = shape.measureBy ?? 'faces';
  if ((shape.kind === 'walls' || shape.kind === 'roundWalls' || shape.kind === 'curvedWall') && shape.openings) {
    out.openings = shape.openings.map((o) => ({ width: typed(o.width), height: typed(o.height), count: String(o.count ?? 1) }));
  }
  if (shape.kind === 'ceilingPolygon') out.corners = shape.corners.map(([x, y]) => [typed(x), typed(y)]);
  return out;
}
