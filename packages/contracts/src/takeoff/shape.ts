import { z } from 'zod';
import type { SurfaceKind, SurfaceShape } from '@layerbook/domain';
import { DIM_WORDS, type DimKey, type DimRule, dimField, ELEVATION_NOUN, OPENING_FIELDS, SHAPE_LIMITS } from './shape-catalog';

/**
 * Request schemas for every takeoff shape the domain engine measures, built from the shape
 * catalogue's nouns and rules (the admin form checks with the same ones). They check each number
 * on its own (present, finite, in range); relations between numbers (a rise too big for its span,
 * openings larger than the wall) are left to `measureSurface`, which names the field it refuses,
 * so the same rule is never written twice.
 */

const MAX = SHAPE_LIMITS.sizeMax;

function numberFor(rule: DimRule, noun: string): z.ZodNumber {
  if (typeof rule === 'object') {
    const [min, max] = rule.whole;
    const message = DIM_WORDS.whole(noun, min, max);
    return z.number({ error: message }).int({ error: message }).min(min, { error: message }).max(max, { error: message });
  }
  if (rule === 'depth0') {
    const missing = DIM_WORDS.nonNegative(noun);
    return z
      .number({ error: missing })
      .min(0, { error: missing })
      .max(MAX, { error: DIM_WORDS.tooBig(noun) });
  }
  const missing = DIM_WORDS.positive(noun);
  const positive = z.number({ error: missing }).positive({ error: missing, abort: true });
  return rule === 'angle'
    ? positive.max(SHAPE_LIMITS.angleMaxDegrees, { error: DIM_WORDS.angleTooBig })
    : positive.min(SHAPE_LIMITS.sizeMin, { error: DIM_WORDS.tooSmall(noun) }).max(MAX, { error: DIM_WORDS.tooBig(noun) });
}

/** A shape's dimension, with the catalogue's rule and words. */
const dim = (kind: SurfaceKind, key: DimKey) => {
  const field = dimField(kind, key);
  return numberFor(field.rule, field.noun);
};

const elevation = numberFor('depth0', ELEVATION_NOUN).optional();

const [openingWidth, openingHeight, openingCount] = OPENING_FIELDS;
export const openingInput = z.strictObject({
  width: numberFor(openingWidth.rule, openingWidth.noun),
  height: numberFor(openingHeight.rule, openingHeight.noun),
  count: numberFor(openingCount.rule, openingCount.noun).optional(),
});

const openings = z
  .array(openingInput, { error: 'Openings must be a list.' })
  .max(SHAPE_LIMITS.openingRowsMax, { error: `Use at most ${SHAPE_LIMITS.openingRowsMax} opening rows.` })
  .optional();

/** A corner of a flat ceiling outline, [x, y] in the firm's length unit; any sign (it is a position). */
const corner = z.tuple(
  [
    z.number({ error: 'Enter the first number of the corner.' }).min(-MAX).max(MAX),
    z.number({ error: 'Enter the second number of the corner.' }).min(-MAX).max(MAX),
  ],
  { error: 'Give each corner as two numbers.' },
);

export const surfaceShape = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('walls'), perimeter: dim('walls', 'perimeter'), height: dim('walls', 'height'), openings }),
    z.strictObject({ kind: z.literal('gable'), base: dim('gable', 'base'), height: dim('gable', 'height'), elevation }),
    z.strictObject({
      kind: z.literal('trapezoid'),
      base1: dim('trapezoid', 'base1'),
      base2: dim('trapezoid', 'base2'),
      height: dim('trapezoid', 'height'),
      elevation,
    }),
    z.strictObject({ kind: z.literal('ceilingRect'), length: dim('ceilingRect', 'length'), width: dim('ceilingRect', 'width'), elevation }),
    z.strictObject({ kind: z.literal('ceilingCircle'), radius: dim('ceilingCircle', 'radius'), elevation }),
    z.strictObject({
      kind: z.literal('ceilingPolygon'),
      corners: z
        .array(corner)
        .min(SHAPE_LIMITS.cornersMin, { error: 'Give at least three corners.' })
        .max(SHAPE_LIMITS.cornersMax, { error: `Use at most ${SHAPE_LIMITS.cornersMax} corners.` }),
      elevation,
    }),
    z.strictObject({ kind: z.literal('roundWalls'), radius: dim('roundWalls', 'radius'), height: dim('roundWalls', 'height'), openings }),
    z.strictObject({
      kind: z.literal('curvedWall'),
      radius: dim('curvedWall', 'radius'),
      angleDegrees: dim('curvedWall', 'angleDegrees'),
      height: dim('curvedWall', 'height'),
      openings,
    }),
    z.strictObject({ kind: z.literal('cone'), radius: dim('cone', 'radius'), rise: dim('cone', 'rise'), elevation }),
    z.strictObject({
      kind: z.literal('pyramid'),
      sides: dim('pyramid', 'sides'),
      sideLength: dim('pyramid', 'sideLength'),
      rise: dim('pyramid', 'rise'),
      elevation,
    }),
    z.strictObject({ kind: z.literal('hemisphere'), radius: dim('hemisphere', 'radius'), elevation }),
    z.strictObject({
      kind: z.literal('sphericalCap'),
      baseRadius: dim('sphericalCap', 'baseRadius'),
      rise: dim('sphericalCap', 'rise'),
      elevation,
    }),
    z.strictObject({
      kind: z.literal('sphericalCapFromSphere'),
      sphereRadius: dim('sphericalCapFromSphere', 'sphereRadius'),
      rise: dim('sphericalCapFromSphere', 'rise'),
      elevation,
    }),
    z.strictObject({
      kind: z.literal('barrelVault'),
      radius: dim('barrelVault', 'radius'),
      length: dim('barrelVault', 'length'),
      elevation,
    }),
    z.strictObject({
      kind: z.literal('segmentalVault'),
      span: dim('segmentalVault', 'span'),
      rise: dim('segmentalVault', 'rise'),
      length: dim('segmentalVault', 'length'),
      elevation,
    }),
    z.strictObject({ kind: z.literal('groinVault'), side: dim('groinVault', 'side'), elevation }),
    z.strictObject({ kind: z.literal('cloisterVault'), side: dim('cloisterVault', 'side'), elevation }),
    z.strictObject({
      kind: z.literal('coffers'),
      count: dim('coffers', 'count'),
      innerPerimeter: dim('coffers', 'innerPerimeter'),
      depth: dim('coffers', 'depth'),
      panelArea: dim('coffers', 'panelArea'),
      elevation,
    }),
    z.strictObject({ kind: z.literal('crownStraight'), length: dim('crownStraight', 'length'), elevation }),
    z.strictObject({ kind: z.literal('crownCircular'), radius: dim('crownCircular', 'radius'), elevation }),
    z.strictObject({
      kind: z.literal('beams'),
      count: dim('beams', 'count').optional(),
      length: dim('beams', 'length'),
      width: dim('beams', 'width'),
      depth: dim('beams', 'depth'),
      measureBy: z.enum(['faces', 'length'], { error: 'Measure beams by their faces or by length.' }).optional(),
      elevation,
    }),
    z.strictObject({ kind: z.literal('border'), length: dim('border', 'length'), elevation }),
  ],
  { error: 'Choose a shape from the list.' },
);

// Compile-time checks both ways: the schema accepts exactly the shapes the engine measures,
// so a new kind in @layerbook/domain fails the build here until it has a schema.
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
type ParsedShape = z.infer<typeof surfaceShape>;
export const SHAPE_SCHEMA_MATCHES_ENGINE: Same<ParsedShape['kind'], SurfaceShape['kind']> = true;
export const SHAPE_SCHEMA_IS_ENGINE_SHAPE: [ParsedShape] extends [SurfaceShape] ? true : false = true;
