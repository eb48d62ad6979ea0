import { type LengthUnit, convertArea, convertLength } from '../units/length';
import type { SurfaceShape } from './surface-shape';

/** Dimensions that are not lengths: counts and angles stay as they are, areas scale by the square. */
const UNCHANGED = new Set(['kind', 'count', 'sides', 'angleDegrees', 'measureBy']);
const AREAS = new Set(['panelArea']);

/**
 * A shape measured in one unit, in another: lengths (and the elevation, openings and corners)
 * convert linearly, a coffer's panel area by the square, counts and angles not at all. A surface
 * saved in feet before the firm went metric is estimated and edited in metres this way.
 */
export function convertShape(shape: SurfaceShape, from: LengthUnit, to: LengthUnit): SurfaceShape {
  if (from === to) return shape;
  const length = (v: number) => convertLength(v, from, to);
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(shape)) {
    if (UNCHANGED.has(key)) out[key] = value;
    else if (AREAS.has(key)) out[key] = convertArea(value as number, from, to);
    else if (key === 'openings')
      out[key] = (value as { width: number; height: number; count?: number }[]).map((o) => ({
        ...o,
        width: length(o.width),
        height: length(o.height),
      }));
    else if (key === 'corners')
      out[key] = (value as ReadonlyArray<readonly [number, number]>).map(([x, y]) => [length(x), length(y)] as const);
    else out[key] = length(value as number);
  }
  return out as unknown as SurfaceShape;
}
