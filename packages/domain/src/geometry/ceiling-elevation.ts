import type { SurfaceShape } from './surface-shape';

/** Shapes that hang from or sit on the ceiling: flat and curved ceilings and what runs along them. */
const CEILING_KINDS: ReadonlySet<SurfaceShape['kind']> = new Set<SurfaceShape['kind']>([
  'ceilingRect',
  'ceilingCircle',
  'ceilingPolygon',
  'cone',
  'pyramid',
  'hemisphere',
  'sphericalCap',
  'sphericalCapFromSphere',
  'barrelVault',
  'segmentalVault',
  'groinVault',
  'cloisterVault',
  'coffers',
  'beams',
  'crownStraight',
  'crownCircular',
]);

/** The room's wall height: the tallest of its measured walls (straight, round or curved), or null. */
export function roomWallHeight(shapes: readonly SurfaceShape[]): number | null {
  let tallest: number | null = null;
  for (const s of shapes) {
    if ((s.kind === 'walls' || s.kind === 'roundWalls' || s.kind === 'curvedWall') && Number.isFinite(s.height) && s.height > 0) {
      tallest = tallest === null ? s.height : Math.max(tallest, s.height);
    }
  }
  return tallest;
}

/**
 * A ceiling measured without its elevation starts where the room's walls stop (common practice,
 * no source): without it the top of the work is unknown, and neither the height allowance nor
 * the fall-protection cautions (29 CFR 1926.501(b)(1) at 6 ft, 29 CFR 1926.451(g)(1) above 10 ft)
 * could apply. An elevation typed in always wins; a room with no walls measured stays unknown.
 */
export function withCeilingElevation(shape: SurfaceShape, wallHeight: number | null): SurfaceShape {
  const typed = (shape as { elevation?: number | null }).elevation;
  if (wallHeight === null || !CEILING_KINDS.has(shape.kind) || (typed !== undefined && typed !== null)) return shape;
  return { ...shape, elevation: wallHeight } as SurfaceShape;
}
