import { DomainInputError } from '../errors/domain-input-error';
import { requireInteger, requirePositive } from '../errors/input-checks';
import { positiveAt } from './dimension-checks';
import { measureResult, topFrom } from './measure-result';
import type { Opening, SurfaceMeasure } from './surface-shape';

function checkOpening(o: Opening, at: string): void {
  requirePositive(o.width, `${at}.width`, 'opening width');
  requirePositive(o.height, `${at}.height`, 'opening height');
  if (o.count !== undefined) requireInteger(o.count, `${at}.count`, 1, 'opening count');
}

/** How a wall takes its openings: the smallest deducted, and whether each is held to the wall (see TakeoffSettings). */
export interface OpeningDeduction {
  readonly minArea: number;
  readonly asSaved: boolean;
}

/**
 * How big one opening can be in its wall: no taller than the wall, no wider than the wall's whole
 * run. A door typed as 80 (inches meant) on an 8 ft wall would otherwise take 240 ft² off it.
 */
export interface OpeningRoom {
  readonly height: number;
  readonly width: number;
  /** the run in a message: "An opening cannot be wider than ${run}." */
  readonly run: string;
}

/** Σ w·h·count of the openings at least `rule.minArea` large; smaller ones stay in the area. */
export function openingDeductions(
  openings: readonly Opening[] | undefined,
  rule: OpeningDeduction,
  room: OpeningRoom,
  field: string,
): number {
  let total = 0;
  const list = openings ?? [];
  for (let i = 0; i < list.length; i++) {
    const o = list[i];
    const w = o.width;
    const h = o.height;
    const n = o.count === undefined ? 1 : o.count;
    // The field path is only built for a bad opening, and then every check runs in its usual order.
    if (!(
      typeof w === 'number' &&
      w > 0 &&
      w < Infinity &&
      typeof h === 'number' &&
      h > 0 &&
      h < Infinity &&
      Number.isInteger(n) &&
      n >= 1
    ))
      checkOpening(o, `${field}.openings[${i}]`);
    if (!rule.asSaved) {
      if (h > room.height) throw new DomainInputError(`${field}.openings[${i}].height`, 'An opening cannot be taller than the wall.');
      if (w > room.width) throw new DomainInputError(`${field}.openings[${i}].width`, `An opening cannot be wider than ${room.run}.`);
    }
    if (w * h >= rule.minArea) total += w * h * n;
  }
  return total;
}

/** Straight walls: perimeter × height less openings (common practice, no source). */
export function measureWalls(
  s: { perimeter: number; height: number; openings?: Opening[] },
  openings: OpeningDeduction,
  field: string,
): SurfaceMeasure {
  const p = positiveAt(s.perimeter, field, 'perimeter', 'perimeter');
  const h = positiveAt(s.height, field, 'height', 'wall height');
  return measureResult(
    {
      gross: p * h,
      deductions: openingDeductions(s.openings, openings, { height: h, width: p, run: 'the whole perimeter' }, field),
      formula: 'P·H − openings',
      isCeiling: false,
      isCurved: false,
      topHeight: h,
    },
    field,
  );
}

/** Gable or stair-side triangle, ½·b·h (common practice, no source). */
export function measureGable(s: { base: number; height: number; elevation?: number }, field: string): SurfaceMeasure {
  const b = positiveAt(s.base, field, 'base', 'base');
  const h = positiveAt(s.height, field, 'height', 'height');
  return measureResult(
    { gross: 0.5 * b * h, formula: '½·b·h', isCeiling: false, isCurved: false, topHeight: topFrom(s.elevation, h, field) },
    field,
  );
}

export function measureTrapezoid(s: { base1: number; base2: number; height: number; elevation?: number }, field: string): SurfaceMeasure {
  const b1 = positiveAt(s.base1, field, 'base1', 'first base');
  const b2 = positiveAt(s.base2, field, 'base2', 'second base');
  const h = positiveAt(s.height, field, 'height', 'height');
  return measureResult(
    {
      gross: 0.5 * (b1 + b2) * h,
      formula: '½·(b1+b2)·h',
      isCeiling: false,
      isCurved: false,
      topHeight: topFrom(s.elevation, h, field),
    },
    field,
  );
}
