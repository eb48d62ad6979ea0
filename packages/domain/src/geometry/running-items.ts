import { positiveAt, nonNegativeAt, integerAt } from './dimension-checks';
import { measureResult, topFrom } from './measure-result';
import type { SurfaceMeasure } from './surface-shape';

export function measureCrownStraight(s: { length: number; elevation?: number }, field: string): SurfaceMeasure {
  const l = positiveAt(s.length, field, 'length', 'length');
  return measureResult(
    { measure: 'length', isCeiling: false, isCurved: false, gross: l, formula: 'L', topHeight: topFrom(s.elevation, 0, field) },
    field,
  );
}

/** Crown around a round room, measured at the wall line: 2π·r. */
export function measureCrownCircular(s: { radius: number; elevation?: number }, field: string): SurfaceMeasure {
  const r = positiveAt(s.radius, field, 'radius', 'radius');
  return measureResult(
    {
      measure: 'length',
      isCeiling: false,
      isCurved: true,
      gross: 2 * Math.PI * r,
      formula: '2π·r',
      topHeight: topFrom(s.elevation, 0, field),
    },
    field,
  );
}

export function measureBorder(s: { length: number; elevation?: number }, field: string): SurfaceMeasure {
  const l = positiveAt(s.length, field, 'length', 'length');
  return measureResult(
    { measure: 'length', isCeiling: false, isCurved: false, gross: l, formula: 'L', topHeight: topFrom(s.elevation, 0, field) },
    field,
  );
}

/** Faux beams with three exposed faces: n·L·(w + 2d) of area, or n·L of length. */
export function measureBeams(
  s: { count?: number; length: number; width: number; depth: number; measureBy?: 'faces' | 'length'; elevation?: number },
  field: string,
): SurfaceMeasure {
  const n = s.count === undefined ? 1 : integerAt(s.count, field, 'count', 1, 'beam count');
  const l = positiveAt(s.length, field, 'length', 'beam length');
  const w = positiveAt(s.width, field, 'width', 'beam width');
  const d = positiveAt(s.depth, field, 'depth', 'beam depth');
  const top = topFrom(s.elevation, 0, field);
  if (s.measureBy === 'length') {
    return measureResult({ measure: 'length', isCeiling: false, isCurved: false, gross: n * l, formula: 'n·L', topHeight: top }, field);
  }
  return measureResult(
    { measure: 'area', isCeiling: true, isCurved: false, gross: n * l * (w + 2 * d), formula: 'n·L·(w + 2d)', topHeight: top },
    field,
  );
}

/** Coffers: n·(p·d + A), inner sides plus the recessed panel; grid soffits are measured as beams. */
export function measureCoffers(
  s: { count: number; innerPerimeter: number; depth: number; panelArea: number; elevation?: number },
  field: string,
): SurfaceMeasure {
  const n = integerAt(s.count, field, 'count', 1, 'coffer count');
  const p = positiveAt(s.innerPerimeter, field, 'innerPerimeter', 'inner perimeter');
  const d = nonNegativeAt(s.depth, field, 'depth', 'depth');
  const a = positiveAt(s.panelArea, field, 'panelArea', 'panel area');
  return measureResult(
    {
      measure: 'area',
      isCeiling: true,
      isCurved: false,
      gross: n * (p * d + a),
      formula: 'n·(p·d + A)',
      topHeight: topFrom(s.elevation, d, field),
    },
    field,
  );
}
