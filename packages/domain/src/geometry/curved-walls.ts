import { DomainInputError } from '../errors/domain-input-error';
import { positiveAt } from './dimension-checks';
import { measureResult } from './measure-result';
import type { Opening, SurfaceMeasure } from './surface-shape';
import { openingDeductions, type OpeningDeduction } from './walls';

/** Full round-room wall: circumference × height, 2π·r·H. */
export function measureRoundWalls(
  s: { radius: number; height: number; openings?: Opening[] },
  openings: OpeningDeduction,
  field: string,
): SurfaceMeasure {
  const r = positiveAt(s.radius, field, 'radius', 'radius');
  const h = positiveAt(s.height, field, 'height', 'wall height');
  return measureResult(
    {
      gross: 2 * Math.PI * r * h,
      deductions: openingDeductions(
        s.openings,
        openings,
        { height: h, width: 2 * Math.PI * r, run: 'the whole way round the room' },
        field,
      ),
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
  openings: OpeningDeduction,
  field: string,
): SurfaceMeasure {
  const r = positiveAt(s.radius, field, 'radius', 'radius');
  const deg = positiveAt(s.angleDegrees, field, 'angleDegrees', 'angle');
  if (deg > 360) throw new DomainInputError(`${field}.angleDegrees`, 'The angle of a wall segment cannot exceed 360°.');
  const h = positiveAt(s.height, field, 'height', 'wall height');
  const theta = (deg * Math.PI) / 180;
  const arc = r * theta;
  return measureResult(
    {
      gross: arc * h,
      deductions: openingDeductions(s.openings, openings, { height: h, width: arc, run: 'the curved wall segment' }, field),
      formula: 'r·θ·H − openings',
      isCeiling: false,
      isCurved: true,
      topHeight: h,
    },
    field,
  );
}
