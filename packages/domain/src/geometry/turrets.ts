import { positiveAt, integerAt } from './dimension-checks';
import { measureResult, topFrom } from './measure-result';
import type { SurfaceMeasure } from './surface-shape';

/** Conical ceiling: lateral area π·r·s with slant s = √(r² + h²). */
export function measureCone(s: { radius: number; rise: number; elevation?: number }, field: string): SurfaceMeasure {
  const r = positiveAt(s.radius, field, 'radius', 'radius');
  const h = positiveAt(s.rise, field, 'rise', 'rise');
  return measureResult(
    {
      gross: Math.PI * r * Math.hypot(r, h),
      formula: 'π·r·√(r²+h²)',
      isCeiling: true,
      isCurved: true,
      topHeight: topFrom(s.elevation, h, field),
    },
    field,
  );
}

/**
 * Regular n-gon pyramid ceiling (octagonal turret): n·b·s/2, slant height to the middle of a
 * side s = √(a² + h²), apothem a = b / (2·tan(π/n)). Flat faces, so not curved.
 */
export function measurePyramid(s: { sides: number; sideLength: number; rise: number; elevation?: number }, field: string): SurfaceMeasure {
  const n = integerAt(s.sides, field, 'sides', 3, 'number of sides');
  const b = positiveAt(s.sideLength, field, 'sideLength', 'side length');
  const h = positiveAt(s.rise, field, 'rise', 'rise');
  const apothem = b / (2 * Math.tan(Math.PI / n));
  return measureResult(
    {
      gross: (n * b * Math.hypot(apothem, h)) / 2,
      formula: 'n·b·√(a²+h²)/2, a = b/(2·tan(π/n))',
      isCeiling: true,
      isCurved: false,
      topHeight: topFrom(s.elevation, h, field),
    },
    field,
  );
}
