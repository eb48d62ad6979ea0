import { DomainInputError } from '../errors/domain-input-error';
import { requireNonNegative } from '../errors/input-checks';
import { type LengthUnit, convertArea, convertLength } from '../units/length';
import { measureCeilingCircle, measureCeilingPolygon, measureCeilingRect } from './ceilings';
import { measureCurvedWall, measureRoundWalls } from './curved-walls';
import { measureHemisphere, measureSphericalCap, measureSphericalCapFromSphere } from './domes';
import { measureBeams, measureBorder, measureCoffers, measureCrownCircular, measureCrownStraight } from './running-items';
import type { SurfaceMeasure, SurfaceShape, TakeoffSettings } from './surface-shape';
import { measureCone, measurePyramid } from './turrets';
import { measureBarrelVault, measureCloisterVault, measureGroinVault, measureSegmentalVault } from './vaults';
import { measureGable, measureTrapezoid, measureWalls } from './walls';

export const DEFAULT_TAKEOFF_SETTINGS: TakeoffSettings = { minDeductedOpeningArea: 0 };

/**
 * Measures one takeoff shape. All dimensions and results are in the caller's length unit
 * (areas in that unit squared); `field` prefixes error paths, e.g. `rooms[0].surfaces[2].shape`.
 */
export function measureSurface(shape: SurfaceShape, settings: TakeoffSettings = DEFAULT_TAKEOFF_SETTINGS, field = 'shape'): SurfaceMeasure {
  const minOpening = requireNonNegative(settings.minDeductedOpeningArea, 'settings.minDeductedOpeningArea', 'smallest deducted opening');
  const openings = { minArea: minOpening, asSaved: settings.openingsAsSaved === true };
  switch (shape.kind) {
    case 'walls':
      return measureWalls(shape, openings, field);
    case 'gable':
      return measureGable(shape, field);
    case 'trapezoid':
      return measureTrapezoid(shape, field);
    case 'ceilingRect':
      return measureCeilingRect(shape, field);
    case 'ceilingCircle':
      return measureCeilingCircle(shape, field);
    case 'ceilingPolygon':
      return measureCeilingPolygon(shape, field);
    case 'roundWalls':
      return measureRoundWalls(shape, openings, field);
    case 'curvedWall':
      return measureCurvedWall(shape, openings, field);
    case 'cone':
      return measureCone(shape, field);
    case 'pyramid':
      return measurePyramid(shape, field);
    case 'hemisphere':
      return measureHemisphere(shape, field);
    case 'sphericalCap':
      return measureSphericalCap(shape, field);
    case 'sphericalCapFromSphere':
      return measureSphericalCapFromSphere(shape, field);
    case 'barrelVault':
      return measureBarrelVault(shape, field);
    case 'segmentalVault':
      return measureSegmentalVault(shape, field);
    case 'groinVault':
      return measureGroinVault(shape, field);
    case 'cloisterVault':
      return measureCloisterVault(shape, field);
    case 'coffers':
      return measureCoffers(shape, field);
    case 'crownStraight':
      return measureCrownStraight(shape, field);
    case 'crownCircular':
      return measureCrownCircular(shape, field);
    case 'beams':
      return measureBeams(shape, field);
    case 'border':
      return measureBorder(shape, field);
    default: {
      const unknown: { kind?: unknown } = shape;
      throw new DomainInputError(`${field}.kind`, `"${String(unknown.kind)}" is not a shape we can measure.`);
    }
  }
}

/** Re-expresses a measure in another length unit (areas scale by the square). */
export function convertMeasure(m: SurfaceMeasure, from: LengthUnit, to: LengthUnit): SurfaceMeasure {
  const convert = m.measure === 'area' ? convertArea : convertLength;
  return {
    ...m,
    quantity: convert(m.quantity, from, to),
    gross: convert(m.gross, from, to),
    deductions: convert(m.deductions, from, to),
    topHeight: m.topHeight === null ? null : convertLength(m.topHeight, from, to),
  };
}
