import { requireInteger, requirePositive } from '../errors/input-checks';
import { positiveAt } from './dimension-checks';
import { measureResult, topFrom } from './measure-result';
import type { Opening, SurfaceMeasure } from './surface-shape';

function checkOpening(o: Opening, at: string): void {
  requirePositive(o.width, `${at}.width`, 'opening width');
  requirePositive(o.height, `${at}.height`, 'opening height');
  if (o.count !== undefined) requireInteger(o.count, `${at}.count`, 1, 'opening count');
}

/** Σ w·h·count of the openings at least `minArea` large; smaller ones stay in the area. */
export function openingDeductions(openings: readonly Opening[] | undefined, minArea: number, field: string): number {
  let total = 0;
  const list = openings ?? [];
  for (let i = 0; i < list.length; i++) {
    const o = list[i];
    const w = o.width;
    const h = o.height;
    const n = o.count === undefined ? 1 : o.count;
    // The field path is only built for a bad opening, and then every check runs in its usual order.
    if (!(
      typeof w === 'number' &&
      w > 0 &&
      w < Infinity &&
      typeof h === 'number' &&
      h > 0 &&
      h < Infinity &&
      Number.isInteger(n) &&
      n >= 1
    ))
      checkOpening(o, `${field}.openings[${i}]`);
    if (w * h >= minArea) total += w * h * n;
  }
  return total;
}

/** Straight walls: perimeter × height less openings (common practice, no source). */
export function measureWalls(
  s: { perimeter: number; height: number; openings?: Opening[] },
  minOpening: number,
  field: string,
): SurfaceMeasure {
  const p = positiveAt(s.perimeter, field, 'perimeter', 'perimeter');
  const h = positiveAt(s.height, field, 'height', 'wall height');
  return measureResult(
    {
      gross: p * h,
      deductions: openingDeductions(s.openings, minOpening, field),
      formula: 'P·H − openings',
      isCeiling: false,
      isCurved: false,
      topHeight: h,
    },
    field,
  );
}

/** Gable or stair-side triangle, ½·b·h (common practice, no source). */
export function measureGable(s: { base: number; height: number; elevation?: number }, field: string): SurfaceMeasure {
  const b = positiveAt(s.base, field, 'base', 'base');
  const h = positiveAt(s.height, field, 'height', 'height');
  return measureResult(
    { gross: 0.5 * b * h, formula: '½·b·h', isCeiling: false, isCurved: false, topHeight: topFrom(s.elevation, h, field) },
    field,
  );
}

export function measureTrapezoid(s: { base1: number; base2: number; height: number; elevation?: number }, field: string): SurfaceMeasure {
  const b1 = positiveAt(s.base1, field, 'base1', 'first base');
  const b2 = positiveAt(s.base2, field, 'base2', 'second base');
  const h = positiveAt(s.height, field, 'height', 'height');
  return measureResult(
    {
      gross: 0.5 * (b1 + b2) * h,
      formula: '½·(b1+b2)·h',
      isCeiling: false,
      isCurved: false,
      topHeight: topFrom(s.elevation, h, field),
    },
    field,
  );
}
