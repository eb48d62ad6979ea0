import type { SurfaceShapeInput, TakeoffLengthUnit, TakeoffTotals } from '@layerbook/contracts';
import { DEFAULT_TAKEOFF_SETTINGS, DomainInputError, convertMeasure, dottedPath, measureSurface, type SurfaceMeasure } from '@layerbook/domain';
import { badRequest } from '../http/problem';

/**
 * Measures a shape as the request sent it. The engine's refusal (a rise too big for its radius,
 * openings larger than the wall) becomes a 400 naming the field, before anything is written.
 * The firm's smallest deducted opening is not a setting yet, so every opening is deducted.
 */
export function measureOrReject(shape: SurfaceShapeInput): SurfaceMeasure {
  try {
    return measureSurface(shape, DEFAULT_TAKEOFF_SETTINGS, 'shape');
  } catch (error) {
    if (error instanceof DomainInputError) {
      throw badRequest([{ field: dottedPath(error.field), message: error.message }], 'The sizes do not make a shape we can measure.');
    }
    throw error;
  }
}

/** Adds measures saved in any unit into `unit`: areas and running lengths apart. */
export function sumMeasures(items: readonly { measure: SurfaceMeasure; lengthUnit: TakeoffLengthUnit }[], unit: TakeoffLengthUnit): TakeoffTotals {
  let area = 0;
  let length = 0;
  for (const item of items) {
    const m = convertMeasure(item.measure, item.lengthUnit, unit);
    if (m.measure === 'area') area += m.quantity;
    else length += m.quantity;
  }
  return { area, length };
}

export const unitOfSystem = (units: 'imperial' | 'metric'): TakeoffLengthUnit => (units === 'metric' ? 'm' : 'ft');
