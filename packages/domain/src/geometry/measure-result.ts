import { nonNegativeAt } from './dimension-checks';
import { DomainInputError } from '../errors/domain-input-error';
import type { SurfaceMeasure } from './surface-shape';

export interface MeasureParts {
  measure?: 'area' | 'length';
  gross: number;
  deductions?: number;
  formula: string;
  isCeiling: boolean;
  isCurved: boolean;
  topHeight: number | null;
}

/**
 * Builds the result and refuses openings that add up to more than the surface, and sizes whose
 * result is not a finite number (it would be saved as NaN and every later read would fail on it).
 */
export function measureResult(parts: MeasureParts, field: string): SurfaceMeasure {
  if (!Number.isFinite(parts.gross)) {
    const what = parts.measure === 'length' ? 'length' : 'area';
    throw new DomainInputError(field, `These sizes give no ${what} we can work with. Check them for a typing slip.`);
  }
  const deductions = parts.deductions ?? 0;
  if (deductions > parts.gross) {
    throw new DomainInputError(`${field}.openings`, 'The openings add up to more than the surface itself.');
  }
  return {
    measure: parts.measure ?? 'area',
    quantity: parts.gross - deductions,
    gross: parts.gross,
    deductions,
    formula: parts.formula,
    isCeiling: parts.isCeiling,
    isCurved: parts.isCurved,
    topHeight: parts.topHeight,
  };
}

/** Top of a shape whose lowest edge sits at `elevation` (unknown when not given). */
export function topFrom(elevation: number | undefined, rise: number, field: string): number | null {
  if (elevation === undefined) return null;
  return nonNegativeAt(elevation, field, 'elevation', 'elevation') + rise;
}
