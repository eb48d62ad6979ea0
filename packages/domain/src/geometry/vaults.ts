import { DomainInputError } from '../errors/domain-input-error';
import { positiveAt } from './dimension-checks';
import { measureResult, topFrom } from './measure-result';
import type { SurfaceMeasure } from './surface-shape';

/** Semicircular barrel vault: half a cylinder, π·r·L. */
export function measureBarrelVault(s: { radius: number; length: number; elevation?: number }, field: string): SurfaceMeasure {
  const r = positiveAt(s.radius, field, 'radius', 'radius');
  const l = positiveAt(s.length, field, 'length', 'length');
  return measureResult(
    { isCeiling: true, isCurved: true, gross: Math.PI * r * l, formula: 'π·r·L', topHeight: topFrom(s.elevation, r, field) },
    field,
  );
}

/**
 * Segmental barrel vault from span c and rise h: R = (c²/4 + h²)/(2h), θ = 2·asin(c/(2R)),
 * area R·θ·L. A rise over half the span is no longer a segment of a circle above its chord.
 */
export function measureSegmentalVault(
  s: { span: number; rise: number; length: number; elevation?: number },
  field: string,
): SurfaceMeasure {
  const c = positiveAt(s.span, field, 'span', 'span');
  const h = positiveAt(s.rise, field, 'rise', 'rise');
  const l = positiveAt(s.length, field, 'length', 'length');
  if (h > c / 2) {
    throw new DomainInputError(`${field}.rise`, 'The rise of a segmental vault cannot exceed half its span.');
  }
  const R = ((c * c) / 4 + h * h) / (2 * h);
  // A rise tiny next to its span (1e-300 under 100000) overflows R, and R·θ would be ∞·0 = NaN.
  if (!Number.isFinite(R)) {
    throw new DomainInputError(`${field}.rise`, 'The rise is too small next to the span to measure. Check it for a typing slip.');
  }
  const theta = 2 * Math.asin(Math.min(1, c / (2 * R)));
  return measureResult(
    {
      isCeiling: true,
      isCurved: true,
      gross: R * theta * l,
      formula: 'R·θ·L, R = (c²/4+h²)/(2h), θ = 2·asin(c/2R)',
      topHeight: topFrom(s.elevation, h, field),
    },
    field,
  );
}

/** Two semicircular barrels crossing over a square bay of side s: (π − 2)·s². */
export function measureGroinVault(s: { side: number; elevation?: number }, field: string): SurfaceMeasure {
  const side = positiveAt(s.side, field, 'side', 'bay side');
  return measureResult(
    {
      isCeiling: true,
      isCurved: true,
      gross: (Math.PI - 2) * side * side,
      formula: '(π − 2)·s²',
      topHeight: topFrom(s.elevation, side / 2, field),
    },
    field,
  );
}

/** Cloister (domical) vault over a square bay of side s: 2·s². */
export function measureCloisterVault(s: { side: number; elevation?: number }, field: string): SurfaceMeasure {
  const side = positiveAt(s.side, field, 'side', 'bay side');
  return measureResult(
    { isCeiling: true, isCurved: true, gross: 2 * side * side, formula: '2·s²', topHeight: topFrom(s.elevation, side / 2, field) },
    field,
  );
}
