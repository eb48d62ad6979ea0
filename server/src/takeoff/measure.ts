import type { RoomView, SurfaceShapeInput, TakeoffLengthUnit, TakeoffTotals } from '@layerbook/contracts';
import {
  type Caution,
  DomainInputError,
  convertArea,
  convertMeasure,
  dottedPath,
  leadRuleYear,
  leadStatus,
  measureSurface,
  safetyCautions,
  type SurfaceMeasure,
  type TakeoffSettings,
  treatedAsTargetHousing,
} from '@layerbook/domain';
import { badRequest } from '../http/problem';

/**
 * Measures a shape as the request sent it. The engine's refusal (a rise too big for its radius,
 * openings larger than the wall) becomes a 400 naming the field, before anything is written.
 * Openings smaller than the firm's smallest deducted one (`settings`, in the shape's unit) stay in the area.
 */
export function measureOrReject(shape: SurfaceShapeInput, settings: TakeoffSettings): SurfaceMeasure {
  try {
    return measureSurface(shape, settings, 'shape');
  } catch (error) {
    if (error instanceof DomainInputError) {
      throw badRequest([{ field: dottedPath(error.field), message: error.message }], 'The sizes do not make a shape we can measure.');
    }
    throw error;
  }
}

/** Adds measures saved in any unit into `unit`: areas, running lengths and disturbed paint apart. */
export function sumMeasures(
  items: readonly { measure: SurfaceMeasure; lengthUnit: TakeoffLengthUnit; disturbedPaintedArea: number | null }[],
  unit: TakeoffLengthUnit,
): TakeoffTotals {
  let area = 0;
  let length = 0;
  let disturbedPaintedArea = 0;
  for (const item of items) {
    const m = convertMeasure(item.measure, item.lengthUnit, unit);
    if (m.measure === 'area') area += m.quantity;
    else length += m.quantity;
    if (item.disturbedPaintedArea !== null) disturbedPaintedArea += convertArea(item.disturbedPaintedArea, item.lengthUnit, unit);
  }
  return { area, length, disturbedPaintedArea };
}

export const unitOfSystem = (units: 'imperial' | 'metric'): TakeoffLengthUnit => (units === 'metric' ? 'm' : 'ft');

/**
 * The lead-safe reminder for the takeoff: the domain's safety rules (40 CFR 745.83 thresholds,
 * target housing before 1978) over the disturbed painted areas measured so far, in `unit`; it says
 * whose rule it is for the firm's country. A home whose year is not recorded counts as built before
 * 1978 while paint is disturbed, as the estimate decides it (`leadStatus`), and the reminder then
 * asks for the year first (`treatedAsTargetHousing`): the measurer is told where the areas are typed.
 */
export function leadCaution(
  rooms: readonly RoomView[],
  yearBuilt: number | null,
  unit: TakeoffLengthUnit,
  firmCountry?: string,
): Caution | null {
  const disturbedPaint = rooms.flatMap((room) =>
    room.surfaces
      .filter((s) => s.disturbedPaintedArea !== null && s.disturbedPaintedArea > 0)
      .map((s) => ({ roomId: room.id, isExterior: room.isExterior, area: convertArea(s.disturbedPaintedArea ?? 0, s.lengthUnit, unit) })),
  );
  const status = leadStatus(yearBuilt, disturbedPaint.length > 0);
  if (status === 'year-unknown') return null;
  const cautions = safetyCautions({
    lengthUnit: unit,
    // the estimate's rule year: not recorded, with paint disturbed, is a year before 1978
    yearBuilt: leadRuleYear(yearBuilt, disturbedPaint.length > 0),
    disturbedPaint,
    workingLevel: 0,
    products: [],
    sandsPlaster: false,
    ...(firmCountry !== undefined ? { firmCountry } : {}),
  });
  const lead = cautions.find((c) => c.id === 'lead-safe-work') ?? null;
  return lead && status === 'assumed-target-housing' ? treatedAsTargetHousing(lead) : lead;
}
