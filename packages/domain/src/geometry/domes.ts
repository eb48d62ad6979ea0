import { DomainInputError } from '../errors/domain-input-error';
import { positiveAt } from './dimension-checks';
import { measureResult, topFrom } from './measure-result';
import type { SurfaceMeasure } from './surface-shape';

/** Curved surface of a hemisphere, 2π·r². */
export function measureHemisphere(s: { radius: number; elevation?: number }, field: string): SurfaceMeasure {
  const r = positiveAt(s.radius, field, 'radius', 'radius');
  return measureResult(
    { isCeiling: true, isCurved: true, gross: 2 * Math.PI * r * r, formula: '2π·r²', topHeight: topFrom(s.elevation, r, field) },
    field,
  );
}

/**
 * Shallow dome from what can be measured on site: base radius a and rise h. The sphere
 * radius is R = (a² + h²)/(2h) and the zone area 2π·R·h simplifies to π·(a² + h²).
 * A rise above the base radius would be more than a hemisphere (an overhang), which a
 * ceiling springing from a wall cannot be.
 */
export function measureSphericalCap(s: { baseRadius: number; rise: number; elevation?: number }, field: string): SurfaceMeasure {
  const a = positiveAt(s.baseRadius, field, 'baseRadius', 'base radius');
  const h = positiveAt(s.rise, field, 'rise', 'rise');
  if (h > a) {
    throw new DomainInputError(`${field}.rise`, 'The rise cannot be more than the base radius (that would be more than a hemisphere).');
  }
  return measureResult(
    {
      isCeiling: true,
      isCurved: true,
      gross: Math.PI * (a * a + h * h),
      formula: 'π·(a²+h²) = 2π·R·h',
      topHeight: topFrom(s.elevation, h, field),
    },
    field,
  );
}

/** Spherical cap from the sphere radius R and rise h: 2π·R·h (the zone formula). */
export function measureSphericalCapFromSphere(
  s: { sphereRadius: number; rise: number; elevation?: number },
  field: string,
): SurfaceMeasure {
  const R = positiveAt(s.sphereRadius, field, 'sphereRadius', 'sphere radius');
  const h = positiveAt(s.rise, field, 'rise', 'rise');
  if (h > R) {
    throw new DomainInputError(`${field}.rise`, 'The rise cannot be more than the sphere radius (that would be more than a hemisphere).');
  }
  return measureResult(
    { isCeiling: true, isCurved: true, gross: 2 * Math.PI * R * h, formula: '2π·R·h', topHeight: topFrom(s.elevation, h, field) },
    field,
  );
}
