import type { SurfaceKind } from '@layerbook/domain';

/*
 * Every takeoff shape in plain words, grouped as a measurer thinks of them, with the fields each
 * needs and the rule each field follows. The request schema (shape.ts) is built from these nouns,
 * rules and limits and the admin form checks with the same ones, so the browser's message and the
 * server's read the same. Zod-free: the apps import it through `@layerbook/contracts/types`.
 */

export const SHAPE_LIMITS = {
  /** Far beyond any room; stops typing slips like an extra three zeros from reaching the estimate. */
  sizeMax: 100_000,
  /**
   * The smallest length or area taken (a millimetre, a third of one in feet): nothing a painter
   * measures is smaller, and a rise of 1e-300 under a wide span is no number the engine can work with.
   */
  sizeMin: 0.001,
  angleMaxDegrees: 360,
  openingRowsMax: 100,
  openingCountMax: 100,
  cornersMin: 3,
  cornersMax: 100,
} as const;

export const DIM_KEYS = [
  'perimeter',
  'height',
  'base',
  'base1',
  'base2',
  'length',
  'width',
  'radius',
  'angleDegrees',
  'rise',
  'sides',
  'sideLength',
  'baseRadius',
  'sphereRadius',
  'span',
  'side',
  'count',
  'innerPerimeter',
  'depth',
  'panelArea',
] as const;
export type DimKey = (typeof DIM_KEYS)[number];

/** length and area carry the firm's unit; `depth0` is a length that may be 0 (a flush coffer). */
export type DimRule = 'length' | 'depth0' | 'area' | 'angle' | { readonly whole: readonly [min: number, max: number] };

export interface DimField {
  readonly key: DimKey;
  readonly label: string;
  /** the word inside messages: "Enter the rise, more than 0." */
  readonly noun: string;
  readonly rule: DimRule;
  readonly hint?: string;
}

export const SHAPE_GROUPS_IN_ORDER = ['Walls', 'Ceilings', 'Running length'] as const;
export type ShapeGroup = (typeof SHAPE_GROUPS_IN_ORDER)[number];

export interface ShapeChoice {
  readonly kind: SurfaceKind;
  readonly group: ShapeGroup;
  /** in the picker */
  readonly label: string;
  /** a name to start from when the surface has none yet */
  readonly defaultName: string;
  readonly fields: readonly DimField[];
  readonly hasOpenings: boolean;
  readonly hasElevation: boolean;
  readonly hasCorners: boolean;
  readonly hasMeasureBy: boolean;
}

/** The words of each rule, for the schema and the form alike. */
export const DIM_WORDS = {
  positive: (noun: string) => `Enter the ${noun}, more than 0.`,
  nonNegative: (noun: string) => `Enter the ${noun}, 0 or more.`,
  tooBig: (noun: string) => `Enter the ${noun}, at most ${SHAPE_LIMITS.sizeMax}.`,
  tooSmall: (noun: string) => `Enter the ${noun}, at least ${SHAPE_LIMITS.sizeMin}.`,
  whole: (noun: string, min: number, max: number) => `Enter the ${noun} as a whole number from ${min} to ${max}.`,
  angleTooBig: `Enter an angle of at most ${SHAPE_LIMITS.angleMaxDegrees} degrees.`,
  optionalNonNegative: (noun: string) => `Enter the ${noun}, 0 or more, or leave it empty.`,
  corner: 'Enter a number, like 12 or -3.5.',
} as const;

const f = (key: DimKey, label: string, noun: string, rule: DimRule = 'length', hint?: string): DimField => ({
  key,
  label,
  noun,
  rule,
  ...(hint ? { hint } : {}),
});
const RADIUS = f('radius', 'Radius', 'radius', 'length', 'Half the distance across.');
const WALL_HEIGHT = f('height', 'Wall height', 'wall height');
const RISE = f('rise', 'Rise', 'rise', 'length', 'From the springing line up to the highest point.');

/** An opening's fields (doors, windows and arches taken off a wall). */
export const OPENING_FIELDS = [
  f('width', 'Width', 'opening width'),
  f('height', 'Height', 'opening height'),
  f('count', 'How many alike', 'number of alike openings', { whole: [1, SHAPE_LIMITS.openingCountMax] }),
] as const satisfies readonly DimField[];

/** Height of the shape's lowest edge above the floor; optional because it only feeds access cautions. */
export const ELEVATION_NOUN = 'height above the floor';

/** Generic in the kind so the list's type names each kind it offers (checked at the end). */
function choice<K extends SurfaceKind>(
  kind: K,
  group: ShapeGroup,
  label: string,
  defaultName: string,
  fields: DimField[],
  extra: Partial<ShapeChoice> = {},
): ShapeChoice & { readonly kind: K } {
  return {
    group,
    label,
    defaultName,
    fields,
    hasOpenings: false,
    hasElevation: true,
    hasCorners: false,
    hasMeasureBy: false,
    ...extra,
    kind,
  };
}

const WALL_EXTRAS = { hasOpenings: true, hasElevation: false } as const;

export const SHAPE_CHOICES = [
  choice(
    'walls',
    'Walls',
    'Straight walls, by perimeter',
    'Walls',
    [f('perimeter', 'Perimeter', 'perimeter', 'length', 'All the wall lengths added together.'), WALL_HEIGHT],
    WALL_EXTRAS,
  ),
  choice('gable', 'Walls', 'Gable wall (triangle)', 'Gable wall', [
    f('base', 'Base width', 'base width'),
    f('height', 'Height', 'height', 'length', 'From the base up to the peak.'),
  ]),
  choice('trapezoid', 'Walls', 'Trapezoid wall (stair side, clipped gable)', 'Stair wall', [
    f('base1', 'Bottom width', 'bottom width'),
    f('base2', 'Top width', 'top width'),
    f('height', 'Height', 'height'),
  ]),
  choice('roundWalls', 'Walls', 'Round room walls (all the way round)', 'Round walls', [RADIUS, WALL_HEIGHT], WALL_EXTRAS),
  choice(
    'curvedWall',
    'Walls',
    'Curved wall segment',
    'Curved wall',
    [RADIUS, f('angleDegrees', 'Angle the wall turns through', 'angle in degrees', 'angle', 'A quarter circle is 90°.'), WALL_HEIGHT],
    WALL_EXTRAS,
  ),
  choice('ceilingRect', 'Ceilings', 'Flat ceiling, rectangle', 'Ceiling', [f('length', 'Length', 'length'), f('width', 'Width', 'width')]),
  choice('ceilingCircle', 'Ceilings', 'Flat ceiling, circle', 'Round ceiling', [RADIUS]),
  choice('ceilingPolygon', 'Ceilings', 'Flat ceiling, by its corners', 'Ceiling', [], { hasCorners: true }),
  choice('cone', 'Ceilings', 'Turret ceiling, cone', 'Turret ceiling', [f('radius', 'Radius at the base', 'radius'), RISE]),
  choice('pyramid', 'Ceilings', 'Turret ceiling with flat sides (n sides)', 'Turret ceiling', [
    f('sides', 'Number of sides', 'number of sides', { whole: [3, 64] }),
    f('sideLength', 'Side length', 'side length', 'length', 'One side, measured at the base.'),
    RISE,
  ]),
  choice('hemisphere', 'Ceilings', 'Dome (half sphere)', 'Dome', [RADIUS]),
  choice('sphericalCap', 'Ceilings', 'Shallow dome (base radius and rise)', 'Shallow dome', [
    f('baseRadius', 'Base radius', 'base radius', 'length', 'Half the width across the base of the dome.'),
    RISE,
  ]),
  choice('sphericalCapFromSphere', 'Ceilings', 'Shallow dome (sphere radius and rise)', 'Shallow dome', [
    f('sphereRadius', 'Sphere radius', 'sphere radius', 'length', 'From a drawing: the radius of the whole sphere.'),
    RISE,
  ]),
  choice('barrelVault', 'Ceilings', 'Barrel vault (half round)', 'Barrel vault', [RADIUS, f('length', 'Length of the vault', 'length')]),
  choice('segmentalVault', 'Ceilings', 'Segmental vault (flatter arc)', 'Segmental vault', [
    f('span', 'Span', 'span', 'length', 'Wall to wall, across the arc.'),
    RISE,
    f('length', 'Length of the vault', 'length'),
  ]),
  choice('groinVault', 'Ceilings', 'Groin vault over a square bay', 'Groin vault', [f('side', 'Bay side', 'bay side')]),
  choice('cloisterVault', 'Ceilings', 'Cloister vault over a square bay', 'Cloister vault', [f('side', 'Bay side', 'bay side')]),
  choice('coffers', 'Ceilings', 'Coffers (recessed panels)', 'Coffers', [
    f('count', 'Number of coffers', 'number of coffers', { whole: [1, 10_000] }),
    f('innerPerimeter', 'Inner perimeter of one coffer', 'inner perimeter'),
    f('depth', 'Depth', 'depth', 'depth0'),
    f('panelArea', 'Panel area of one coffer', 'panel area', 'area'),
  ]),
  choice('crownStraight', 'Running length', 'Crown along a straight run', 'Crown', [f('length', 'Length', 'length')]),
  choice('crownCircular', 'Running length', 'Crown around a round room', 'Crown', [
    f('radius', 'Room radius', 'radius', 'length', 'Measured at the wall line.'),
  ]),
  choice(
    'beams',
    'Running length',
    'Beams (three faces showing)',
    'Beams',
    [
      f('count', 'Number of beams', 'number of beams', { whole: [1, 1000] }),
      f('length', 'Beam length', 'beam length'),
      f('width', 'Beam width', 'beam width'),
      f('depth', 'Beam depth', 'beam depth', 'length', 'How far it hangs below the ceiling.'),
    ],
    { hasMeasureBy: true },
  ),
  choice('border', 'Running length', 'Border or band', 'Border', [f('length', 'Length', 'length')]),
] as const;

export const SHAPE_GROUPS: readonly { readonly group: ShapeGroup; readonly choices: readonly ShapeChoice[] }[] = SHAPE_GROUPS_IN_ORDER.map(
  (group) => ({
    group,
    choices: SHAPE_CHOICES.filter((c) => c.group === group),
  }),
);

const BY_KIND = new Map<SurfaceKind, ShapeChoice>(SHAPE_CHOICES.map((c) => [c.kind, c]));

export function shapeChoice(kind: SurfaceKind): ShapeChoice {
  const found = BY_KIND.get(kind);
  if (!found) throw new Error(`No shape choice for ${kind}`);
  return found;
}

/** The field of a shape, for building its schema; a missing one is a programming slip, caught when the module loads. */
export function dimField(kind: SurfaceKind, key: DimKey): DimField {
  const found = shapeChoice(kind).fields.find((x) => x.key === key);
  if (!found) throw new Error(`No field ${key} on shape ${kind}`);
  return found;
}

type Listed = (typeof SHAPE_CHOICES)[number]['kind'];
type MissingKind = Exclude<SurfaceKind, Listed>;
export const ALL_SHAPES_LISTED: [MissingKind] extends [never] ? true : never = true;
