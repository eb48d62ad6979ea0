import { z } from 'zod';
import type { SurfaceShape } from '@layerbook/domain';

/**
 * Request schemas for every takeoff shape the domain engine measures. They check each number on
 * its own (present, finite, in range); relations between numbers (a rise too big for its span,
 * openings larger than the wall) are left to `measureSurface`, which names the field it refuses,
 * so the same rule is never written twice.
 */

/** Far beyond any room; stops typing slips like an extra three zeros from reaching the estimate. */
const MAX_SIZE = 100_000;

const positive = (label: string) => {
  const missing = `Enter the ${label}, more than 0.`;
  return z
    .number({ error: missing })
    .positive({ error: missing })
    .max(MAX_SIZE, { error: `Enter the ${label}, at most ${MAX_SIZE}.` });
};

const nonNegative = (label: string) => {
  const missing = `Enter the ${label}, 0 or more.`;
  return z.number({ error: missing }).min(0, { error: missing }).max(MAX_SIZE, { error: `Enter the ${label}, at most ${MAX_SIZE}.` });
};

const wholeNumber = (label: string, min: number, max: number) => {
  const message = `Enter the ${label} as a whole number from ${min} to ${max}.`;
  return z.number({ error: message }).int({ error: message }).min(min, { error: message }).max(max, { error: message });
};

/** Height of the shape's lowest edge above the floor; optional because it only feeds access cautions. */
const elevation = nonNegative('height above the floor').optional();

export const openingInput = z.strictObject({
  width: positive('opening width'),
  height: positive('opening height'),
  count: wholeNumber('number of alike openings', 1, 100).optional(),
});

const openings = z.array(openingInput, { error: 'Openings must be a list.' }).max(100, { error: 'Use at most 100 opening rows.' }).optional();

/** A corner of a flat ceiling outline, [x, y] in the firm's length unit; any sign (it is a position). */
const corner = z.tuple(
  [
    z.number({ error: 'Enter the first number of the corner.' }).min(-MAX_SIZE).max(MAX_SIZE),
    z.number({ error: 'Enter the second number of the corner.' }).min(-MAX_SIZE).max(MAX_SIZE),
  ],
  { error: 'Give each corner as two numbers.' },
);

export const surfaceShape = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('walls'), perimeter: positive('perimeter'), height: positive('wall height'), openings }),
    z.strictObject({ kind: z.literal('gable'), base: positive('base width'), height: positive('height'), elevation }),
    z.strictObject({ kind: z.literal('trapezoid'), base1: positive('bottom width'), base2: positive('top width'), height: positive('height'), elevation }),
    z.strictObject({ kind: z.literal('ceilingRect'), length: positive('length'), width: positive('width'), elevation }),
    z.strictObject({ kind: z.literal('ceilingCircle'), radius: positive('radius'), elevation }),
    z.strictObject({
      kind: z.literal('ceilingPolygon'),
      corners: z.array(corner).min(3, { error: 'Give at least three corners.' }).max(100, { error: 'Use at most 100 corners.' }),
      elevation,
    }),
    z.strictObject({ kind: z.literal('roundWalls'), radius: positive('radius'), height: positive('wall height'), openings }),
    z.strictObject({
      kind: z.literal('curvedWall'),
      radius: positive('radius'),
      angleDegrees: positive('angle in degrees').max(360, { error: 'Enter an angle of at most 360 degrees.' }),
      height: positive('wall height'),
      openings,
    }),
    z.strictObject({ kind: z.literal('cone'), radius: positive('radius'), rise: positive('rise'), elevation }),
    z.strictObject({ kind: z.literal('pyramid'), sides: wholeNumber('number of sides', 3, 64), sideLength: positive('side length'), rise: positive('rise'), elevation }),
    z.strictObject({ kind: z.literal('hemisphere'), radius: positive('radius'), elevation }),
    z.strictObject({ kind: z.literal('sphericalCap'), baseRadius: positive('base radius'), rise: positive('rise'), elevation }),
    z.strictObject({ kind: z.literal('sphericalCapFromSphere'), sphereRadius: positive('sphere radius'), rise: positive('rise'), elevation }),
    z.strictObject({ kind: z.literal('barrelVault'), radius: positive('radius'), length: positive('length'), elevation }),
    z.strictObject({ kind: z.literal('segmentalVault'), span: positive('span'), rise: positive('rise'), length: positive('length'), elevation }),
    z.strictObject({ kind: z.literal('groinVault'), side: positive('bay side'), elevation }),
    z.strictObject({ kind: z.literal('cloisterVault'), side: positive('bay side'), elevation }),
    z.strictObject({
      kind: z.literal('coffers'),
      count: wholeNumber('number of coffers', 1, 10_000),
      innerPerimeter: positive('inner perimeter'),
      depth: nonNegative('depth'),
      panelArea: positive('panel area'),
      elevation,
    }),
    z.strictObject({ kind: z.literal('crownStraight'), length: positive('length'), elevation }),
    z.strictObject({ kind: z.literal('crownCircular'), radius: positive('radius'), elevation }),
    z.strictObject({
      kind: z.literal('beams'),
      count: wholeNumber('number of beams', 1, 1000).optional(),
      length: positive('beam length'),
      width: positive('beam width'),
      depth: positive('beam depth'),
      measureBy: z.enum(['faces', 'length'], { error: 'Measure beams by their faces or by length.' }).optional(),
      elevation,
    }),
    z.strictObject({ kind: z.literal('border'), length: positive('length'), elevation }),
  ],
  { error: 'Choose a shape from the list.' },
);

export type SurfaceShapeInput = z.infer<typeof surfaceShape>;
export type SurfaceKindInput = SurfaceShapeInput['kind'];

// Compile-time checks both ways: the schema accepts exactly the shapes the engine measures,
// so a new kind in @layerbook/domain fails the build here until it has a schema.
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
export const SHAPE_SCHEMA_MATCHES_ENGINE: Same<SurfaceShapeInput['kind'], SurfaceShape['kind']> = true;
export const SHAPE_SCHEMA_IS_ENGINE_SHAPE: [SurfaceShapeInput] extends [SurfaceShape] ? true : false = true;
