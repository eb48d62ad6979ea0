import { DomainInputError } from '../errors/domain-input-error';
import { isArray, requireFiniteNumber } from '../errors/input-checks';
import { positiveAt } from './dimension-checks';
import { measureResult, topFrom } from './measure-result';
import type { SurfaceMeasure } from './surface-shape';

export function measureCeilingRect(s: { length: number; width: number; elevation?: number }, field: string): SurfaceMeasure {
  const l = positiveAt(s.length, field, 'length', 'length');
  const w = positiveAt(s.width, field, 'width', 'width');
  return measureResult(
    { isCeiling: true, isCurved: false, gross: l * w, formula: 'L·W', topHeight: topFrom(s.elevation, 0, field) },
    field,
  );
}

export function measureCeilingCircle(s: { radius: number; elevation?: number }, field: string): SurfaceMeasure {
  const r = positiveAt(s.radius, field, 'radius', 'radius');
  return measureResult(
    { isCeiling: true, isCurved: false, gross: Math.PI * r * r, formula: 'π·r²', topHeight: topFrom(s.elevation, 0, field) },
    field,
  );
}

/** Shoelace formula over the corners in order (either direction); the outline must not cross itself. */
export function shoelaceArea(corners: ReadonlyArray<readonly [number, number]>, field: string): number {
  if (!isArray(corners) || corners.length < 3) {
    throw new DomainInputError(`${field}.corners`, 'A polygon needs at least three corners.');
  }
  let twice = 0;
  for (let i = 0; i < corners.length; i++) {
    const [x1, y1] = corners[i];
    const [x2, y2] = corners[(i + 1) % corners.length];
    requireFiniteNumber(x1, `${field}.corners[${i}][0]`, 'corner x');
    requireFiniteNumber(y1, `${field}.corners[${i}][1]`, 'corner y');
    twice += x1 * y2 - x2 * y1;
  }
  const area = Math.abs(twice) / 2;
  if (area === 0) throw new DomainInputError(`${field}.corners`, 'The corners enclose no area (they lie on one line).');
  return area;
}

export function measureCeilingPolygon(
  s: { corners: ReadonlyArray<readonly [number, number]>; elevation?: number },
  field: string,
): SurfaceMeasure {
  return measureResult(
    {
      isCeiling: true,
      isCurved: false,
      gross: shoelaceArea(s.corners, field),
      formula: '½·|Σ(xᵢ·yᵢ₊₁ − xᵢ₊₁·yᵢ)|',
      topHeight: topFrom(s.elevation, 0, field),
    },
    field,
  );
}
