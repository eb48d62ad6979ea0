import { requireInteger, requirePositive } from '../errors/input-checks';
import { measureResult, topFrom } from './measure-result';
import type { Opening, SurfaceMeasure } from './surface-shape';

/** Σ w·h·count of the openings at least `minArea` large; smaller ones stay in the area. */
export function openingDeductions(openings: readonly Opening[] | undefined, minArea: number, field: string): number {
  let total = 0;
  (openings ?? []).forEach((o, i) => {
    const at = `${field}.openings[${i}]`;
    const w = requirePositive(o.width, `${at}.width`, 'opening width');
    const h = requirePositive(o.height, `${at}.height`, 'opening height');
    const n = o.count === undefined ? 1 : requireInteger(o.count, `${at}.count`, 1, 'opening count');
    if (w * h >= minArea) total += w * h * n;
  });
  return total;
}

/** Straight walls: perimeter × height less openings (common practice, no source). */
export function measureWalls(
  s: { perimeter: number; height: number; openings?: Opening[] },
  minOpening: number,
  field: string,
): SurfaceMeasure {
  const p = requirePositive(s.perimeter, `${field}.perimeter`, 'perimeter');
  const h = requirePositive(s.height, `${field}.height`, 'wall height');
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
  const b = requirePositive(s.base, `${field}.base`, 'base');
  const h = requirePositive(s.height, `${field}.height`, 'height');
  return measureResult(
    { gross: 0.5 * b * h, formula: '½·b·h', isCeiling: false, isCurved: false, topHeight: topFrom(s.elevation, h, field) },
    field,
  );
}

export function measureTrapezoid(s: { base1: number; base2: number; height: number; elevation?: number }, field: string): SurfaceMeasure {
  const b1 = requirePositive(s.base1, `${field}.base1`, 'first base');
  const b2 = requirePositive(s.base2, `${field}.base2`, 'second base');
  const h = requirePositive(s.height, `${field}.height`, 'height');
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
