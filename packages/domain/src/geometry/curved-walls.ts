import { DomainInputError } from '../errors/domain-input-error';
import { positiveAt } from './dimension-checks';
import { measureResult } from './measure-result';
import type { Opening, SurfaceMeasure } from './surface-shape';
import { openingDeductions } from './walls';

/** Full round-room wall: circumference × height, 2π·r·H. */
export function measureRoundWalls(
  s: { radius: number; height: number; openings?: Opening[] },
  minOpening: number,
  field: string,
): SurfaceMeasure {
  const r = positiveAt(s.radius, field, 'radius', 'radius');
  const h = positiveAt(s.height, field, 'height', 'wall height');
  return measureResult(
    {
      gross: 2 * Math.PI * r * h,
      deductions: openingDeductions(s.openings, minOpening, field),
      formula: '2π·r·H − openings',
      isCeiling: false,
      isCurved: true,
      topHeight: h,
    },
    field,
  );
}

/** Curved wall segment: arc length r·θ times height. */
export function measureCurvedWall(
  s: { radius: number; angleDegrees: number; height: number; openings?: Opening[] },
  minOpening: number,
  field: string,
): SurfaceMeasure {
  const r = positiveAt(s.radius, field, 'radius', 'radius');
  const deg = positiveAt(s.angleDegrees, field, 'angleDegrees', 'angle');
  if (deg > 360) throw new DomainInputError(`${field}.angleDegrees`, 'The angle of a wall segment cannot exceed 360°.');
  const h = positiveAt(s.height, field, 'height', 'wall height');
  const theta = (deg * Math.PI) / 180;
  return measureResult(
    {
      gross: r * theta * h,
      deductions: openingDeductions(s.openings, minOpening, field),
      formula: 'r·θ·H − openings',
      isCeiling: false,
      isCurved: true,
      topHeight: h,
    },
    field,
  );
}
