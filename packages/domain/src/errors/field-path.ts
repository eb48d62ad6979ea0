/**
 * The engine names fields JavaScript-style (`rooms[0].surfaces[2].shape.rise`); forms, zod and
 * problem+json use dots throughout (`rooms.0.surfaces.2.shape.rise`).
 */
export function dottedPath(field: string): string {
  return field.replace(/\[(\d+)\]/g, '.$1');
}
