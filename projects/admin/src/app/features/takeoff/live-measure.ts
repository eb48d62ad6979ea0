import { DomainInputError, dottedPath, measureSurface, type SurfaceMeasure, type SurfaceShape } from '@layerbook/domain';

export type LiveMeasure =
  | { readonly state: 'missing' }
  | { readonly state: 'measured'; readonly shape: SurfaceShape; readonly measure: SurfaceMeasure }
  /** `field` uses the API's path style (`shape.openings.0.width`) so it finds the same control. */
  | { readonly state: 'refused'; readonly shape: SurfaceShape; readonly field: string; readonly message: string };

/** The same engine the server saves with, run as the measurer types (the server's number is the one kept). */
export function measureLive(shape: SurfaceShape, settings: { readonly minDeductedOpeningArea: number }): LiveMeasure {
  try {
    return { state: 'measured', shape, measure: measureSurface(shape, settings) };
  } catch (error) {
    if (error instanceof DomainInputError) {
      return { state: 'refused', shape, field: dottedPath(error.field), message: error.message };
    }
    throw error;
  }
}
