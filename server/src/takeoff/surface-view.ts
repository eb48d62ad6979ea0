import type { SurfaceShapeInput, SurfaceView, TakeoffLengthUnit } from '@layerbook/contracts';
import { convertArea, measureSurface } from '@layerbook/domain';
import type { surfaces } from '@layerbook/db';

export type SurfaceRow = typeof surfaces.$inferSelect;

/** The firm's smallest deducted opening (an estimating setting) and the unit it is in. */
export interface OpeningRule {
  readonly area: number;
  readonly unit: TakeoffLengthUnit;
}

/** The measuring settings for a surface stored in `unit`: the firm's smallest deducted opening in that unit. */
export const takeoffSettingsIn = (rule: OpeningRule, unit: TakeoffLengthUnit) => ({
  minDeductedOpeningArea: rule.unit === unit ? rule.area : convertArea(rule.area, rule.unit, unit),
});

/**
 * The stored shape passed the same checks when it was saved, so measuring it again cannot fail;
 * it is measured on every read rather than stored so a corrected formula reaches old takeoffs,
 * with the firm's smallest deducted opening, so the takeoff shows the area the estimate prices.
 * Openings are taken as saved: one saved taller or wider than its wall before that was refused
 * still reads (its page opens), and saving the surface again asks for it to be corrected.
 */
export function toSurfaceView(row: SurfaceRow, rule: OpeningRule): SurfaceView {
  const shape = row.shape as SurfaceShapeInput;
  return {
    id: row.id,
    roomId: row.roomId,
    name: row.name,
    position: row.position,
    shape,
    lengthUnit: row.lengthUnit as TakeoffLengthUnit,
    disturbedPaintedArea: row.disturbedPaintedArea === null ? null : Number(row.disturbedPaintedArea),
    notes: row.notes,
    measure: measureSurface(shape, { ...takeoffSettingsIn(rule, row.lengthUnit as TakeoffLengthUnit), openingsAsSaved: true }),
  };
}
