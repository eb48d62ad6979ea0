import type { SurfaceShapeInput, SurfaceView, TakeoffLengthUnit } from '@layerbook/contracts';
import { measureSurface } from '@layerbook/domain';
import type { surfaces } from '@layerbook/db';

export type SurfaceRow = typeof surfaces.$inferSelect;

/**
 * The stored shape passed the same checks when it was saved, so measuring it again cannot fail;
 * it is measured on every read rather than stored so a corrected formula reaches old takeoffs.
 */
export function toSurfaceView(row: SurfaceRow): SurfaceView {
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
    measure: measureSurface(shape),
  };
}
