import { DomainInputError } from '../errors/domain-input-error';
import { isArray, requireFiniteNumber } from '../errors/input-checks';
import { positiveAt } from './dimension-checks';
import { measureResult, topFrom } from './measure-result';
import type { SurfaceMeasure } from './surface-shape';

export function measureCeilingRect(s: { length: number; width: number; elevation?: number }, field: string): SurfaceMeasure {
  const l = positiveAt(s.length, field, 'length', 'length');
  const w = positiveAt(s.width, field, 'width', 'width');
  return measureResult(
    { isCeiling: true, isCurved: false, gross: l * w, formula: 'L·W', topHeight: topFrom(s.elevation, 0, field) },
    field,
  );
}

export function measureCeilingCircle(s: { radius: number; elevation?: number }, field: string): SurfaceMeasure {
  const r = positiveAt(s.radius, field, 'radius', 'radius');
  return measureResult(
    { isCeiling: true, isCurved: false, gross: Math.PI * r * r, formula: 'π·r²', topHeight: topFrom(s.elevation, 0, field) },
    field,
  );
}

type Point = readonly [number, number];

/** Which side of the line a→b the point c is on: the sign of the cross product (0 on the line). */
const side = (a: Point, b: Point, c: Point) => Math.sign((b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]));

/** c on the segment a–b, given it is on the line through them. */
const within = (a: Point, b: Point, c: Point) =>
  Math.min(a[0], b[0]) <= c[0] && c[0] <= Math.max(a[0], b[0]) && Math.min(a[1], b[1]) <= c[1] && c[1] <= Math.max(a[1], b[1]);

/** Whether segments p1–p2 and q1–q2 meet (crossing, or touching end to side). The textbook orientation test. */
function segmentsMeet(p1: Point, p2: Point, q1: Point, q2: Point): boolean {
  const d1 = side(q1, q2, p1);
  const d2 = side(q1, q2, p2);
  const d3 = side(p1, p2, q1);
  const d4 = side(p1, p2, q2);
  if (d1 * d2 < 0 && d3 * d4 < 0) return true;
  return (
    (d1 === 0 && within(q1, q2, p1)) ||
    (d2 === 0 && within(q1, q2, p2)) ||
    (d3 === 0 && within(p1, p2, q1)) ||
    (d4 === 0 && within(p1, p2, q2))
  );
}

/**
 * The first two edges of the outline that meet though they are not neighbours (a bow tie, corners
 * typed out of order), as corner numbers from 1; null for a simple outline. At most 100 corners,
 * so checking every pair is cheap.
 */
function crossingEdges(corners: ReadonlyArray<Point>): [number, number] | null {
  const n = corners.length;
  for (let i = 0; i < n; i++) {
    for (let j = i + 2; j < n; j++) {
      if (i === 0 && j === n - 1) continue; // the last edge closes onto the first: neighbours
      if (segmentsMeet(corners[i], corners[(i + 1) % n], corners[j], corners[(j + 1) % n])) return [i + 1, j + 1];
    }
  }
  return null;
}

/**
 * The number (from 1) of the first corner the next one repeats, the last corner when it repeats
 * the first; null when none does. The zero-length edge of a corner typed twice would otherwise
 * read as the outline crossing itself.
 */
function repeatedCorner(corners: ReadonlyArray<Point>): number | null {
  const n = corners.length;
  for (let i = 0; i < n; i++) {
    const next = corners[(i + 1) % n];
    if (corners[i][0] === next[0] && corners[i][1] === next[1]) return i + 1;
  }
  return null;
}

/** Shoelace formula over the corners in order (either direction); an outline that crosses itself is refused. */
export function shoelaceArea(corners: ReadonlyArray<readonly [number, number]>, field: string): number {
  if (!isArray(corners) || corners.length < 3) {
    throw new DomainInputError(`${field}.corners`, 'A polygon needs at least three corners.');
  }
  let twice = 0;
  for (let i = 0; i < corners.length; i++) {
    const [x1, y1] = corners[i];
    const [x2, y2] = corners[(i + 1) % corners.length];
    requireFiniteNumber(x1, `${field}.corners[${i}][0]`, 'corner x');
    requireFiniteNumber(y1, `${field}.corners[${i}][1]`, 'corner y');
    twice += x1 * y2 - x2 * y1;
  }
  const repeated = repeatedCorner(corners);
  if (repeated !== null) {
    throw new DomainInputError(
      `${field}.corners`,
      repeated === corners.length
        ? `The last corner (corner ${repeated}) is the same as corner 1. The outline closes by itself: leave the last one out.`
        : `Corner ${repeated + 1} is the same as corner ${repeated}. Take out the one typed twice.`,
    );
  }
  const area = Math.abs(twice) / 2;
  if (area === 0) throw new DomainInputError(`${field}.corners`, 'The corners enclose no area (they lie on one line).');
  // The formula gives a wrong area for an outline that crosses itself (an L with two corners swapped reads half its size).
  const crossing = crossingEdges(corners);
  if (crossing)
    throw new DomainInputError(
      `${field}.corners`,
      `The outline crosses itself (the edge from corner ${crossing[0]} meets the edge from corner ${crossing[1]}). List the corners in order around the ceiling.`,
    );
  return area;
}

export function measureCeilingPolygon(
  s: { corners: ReadonlyArray<readonly [number, number]>; elevation?: number },
  field: string,
): SurfaceMeasure {
  return measureResult(
    {
      isCeiling: true,
      isCurved: false,
      gross: shoelaceArea(s.corners, field),
      formula: '½·|Σ(xᵢ·yᵢ₊₁ − xᵢ₊₁·yᵢ)|',
      topHeight: topFrom(s.elevation, 0, field),
    },
    field,
  );
}
