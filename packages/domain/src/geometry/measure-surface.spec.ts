import fc from 'fast-check';
import { expectInputError } from '../errors/expect-input-error';
import { convertMeasure, measureSurface } from './measure-surface';
import type { SurfaceShape } from './surface-shape';

const area = (shape: SurfaceShape, minOpening = 0): number => measureSurface(shape, { minDeductedOpeningArea: minOpening }).quantity;

describe('textbook checks', () => {
  it('cone r 3, h 4: slant 5, lateral 15π ≈ 47.12', () => {
    // Pearson Geometry Common Core (2011) §11-3 Ex. 18 p. 713
    const m = measureSurface({ kind: 'cone', radius: 3, rise: 4 });
    expect(m.quantity).toBeCloseTo(15 * Math.PI, 12);
    expect(m.quantity).toBeCloseTo(47.12, 2);
  });

  it('hemisphere r 21 with π = 22/7: curved 2772, total 4158', () => {
    // NCERT Class IX Mathematics, Surface Areas and Volumes, Example 8
    const curved = area({ kind: 'hemisphere', radius: 21 });
    const base = area({ kind: 'ceilingCircle', radius: 21 });
    const textbookPi = (x: number): number => (x / Math.PI) * (22 / 7);
    expect(textbookPi(curved)).toBeCloseTo(2772, 9);
    expect(textbookPi(curved + base)).toBeCloseTo(4158, 9);
  });

  it('hemisphere r 10 with π = 3.14: total 942', () => {
    // NCERT Class IX Mathematics, Surface Areas and Volumes, Ex. 13.4 Q3
    const total = area({ kind: 'hemisphere', radius: 10 }) + area({ kind: 'ceilingCircle', radius: 10 });
    expect((total / Math.PI) * 3.14).toBeCloseTo(942, 9);
  });

  it('painting a hemispherical dome from its base circumference 17.6 m: r 2.8, 49.28 m²', () => {
    // NCERT Class IX Mathematics, Surface Areas and Volumes, Example 10 (π = 22/7)
    const r = 17.6 / (2 * (22 / 7));
    expect(r).toBeCloseTo(2.8, 12);
    expect((area({ kind: 'hemisphere', radius: r }) / Math.PI) * (22 / 7)).toBeCloseTo(49.28, 9);
  });

  it('a spherical zone is 2π·R·h wherever the slice sits; a cap from base radius agrees', () => {
    // Weisstein, MathWorld "Zone"
    const fromSphere = area({ kind: 'sphericalCapFromSphere', sphereRadius: 10, rise: 2 });
    const fromBase = area({ kind: 'sphericalCap', baseRadius: 6, rise: 2 });
    expect(fromSphere).toBeCloseTo(2 * Math.PI * 10 * 2, 12);
    expect(fromBase).toBeCloseTo(fromSphere, 12);
  });
});

describe('project checks (DOMAIN.md §3.7 [D], formulas as named)', () => {
  it.each<[string, SurfaceShape, number, number]>([
    // [name, shape, expected, decimals]
    ['turret cone r 8, h 6 → 80π (Pearson §11-3 lateral area)', { kind: 'cone', radius: 8, rise: 6 }, 80 * Math.PI, 10],
    ['hemisphere r 7 → 98π (NCERT 2πr²)', { kind: 'hemisphere', radius: 7 }, 98 * Math.PI, 10],
    ['cap a 6, h 2 → R 10, 40π (MathWorld "Zone")', { kind: 'sphericalCap', baseRadius: 6, rise: 2 }, 40 * Math.PI, 10],
    ['barrel vault r 6, L 20 → 120π (half cylinder)', { kind: 'barrelVault', radius: 6, length: 20 }, 120 * Math.PI, 10],
    ['segmental span 12, rise 3, L 20 → 278.19 (arc length R·θ)', { kind: 'segmentalVault', span: 12, rise: 3, length: 20 }, 278.19, 2],
    ['octagon pyramid side 4, rise 6 → 123.22', { kind: 'pyramid', sides: 8, sideLength: 4, rise: 6 }, 123.22, 2],
    ['groin vault side 10 → (π − 2)·100 (MathWorld "Vault")', { kind: 'groinVault', side: 10 }, (Math.PI - 2) * 100, 10],
    ['cloister vault side 10 → 200 (MathWorld "Vault")', { kind: 'cloisterVault', side: 10 }, 200, 10],
    ['round room r 9, H 10, no openings → 180π', { kind: 'roundWalls', radius: 9, height: 10 }, 180 * Math.PI, 10],
    [
      'curved wall r 9, 90°, H 10 → 45π (arc length r·θ)',
      { kind: 'curvedWall', radius: 9, angleDegrees: 90, height: 10 },
      45 * Math.PI,
      10,
    ],
    ['rect ceiling 12 × 14 (common practice, no source)', { kind: 'ceilingRect', length: 12, width: 14 }, 168, 12],
    ['gable b 20, h 8 (common practice, no source)', { kind: 'gable', base: 20, height: 8 }, 80, 12],
    ['trapezoid 10/6, h 4 (common practice, no source)', { kind: 'trapezoid', base1: 10, base2: 6, height: 4 }, 32, 12],
    [
      'beams 3 × 16 ft, 8 in × 10 in faces → 3·16·(w+2d)',
      { kind: 'beams', count: 3, length: 16, width: 8 / 12, depth: 10 / 12 },
      3 * 16 * (8 / 12 + 20 / 12),
      10,
    ],
    [
      'coffers 6 × (p 12, d 0.5, A 9) → 6·(6 + 9) = 90',
      { kind: 'coffers', count: 6, innerPerimeter: 12, depth: 0.5, panelArea: 9 },
      90,
      10,
    ],
  ])('%s', (_name, shape, expected, decimals) => {
    expect(area(shape)).toBeCloseTo(expected, decimals);
  });

  it('segmental vault: R 7.5 and θ 1.85459 rad', () => {
    const m = measureSurface({ kind: 'segmentalVault', span: 12, rise: 3, length: 1 });
    expect(m.quantity / 7.5).toBeCloseTo(1.85459, 5);
  });

  it('shoelace polygon: an L-shaped ceiling in either direction', () => {
    const corners = [
      [0, 0],
      [10, 0],
      [10, 4],
      [4, 4],
      [4, 8],
      [0, 8],
    ] as const;
    expect(area({ kind: 'ceilingPolygon', corners })).toBe(56);
    expect(area({ kind: 'ceilingPolygon', corners: [...corners].reverse() })).toBe(56);
  });

  it('refuses an outline that crosses itself, whose shoelace area would be wrong', () => {
    // a 10 × 10 ft square less a 5 × 5 ft corner is 75 ft²; with its 2nd and 3rd corners swapped the shoelace sum gives 37.5 (hand computation)
    const swapped = [
      [0, 0],
      [10, 5],
      [10, 0],
      [5, 5],
      [5, 10],
      [0, 10],
    ] as const;
    expectInputError(() => measureSurface({ kind: 'ceilingPolygon', corners: swapped }), 'shape.corners', /crosses itself/);
    // a bow tie: its two triangles cancel to no area at all
    const bowTie = [
      [0, 0],
      [4, 4],
      [4, 0],
      [0, 4],
    ] as const;
    expectInputError(() => measureSurface({ kind: 'ceilingPolygon', corners: bowTie }), 'shape.corners', /no area|crosses itself/);
    // a corner touching another edge counts as crossing too
    expectInputError(
      () =>
        measureSurface({
          kind: 'ceilingPolygon',
          corners: [
            [0, 0],
            [6, 0],
            [6, 6],
            [3, 0],
            [0, 6],
          ],
        }),
      'shape.corners',
      /crosses itself/,
    );
  });

  it('worked round dining room (DOMAIN.md §2.2 [D]): walls 504.49, dome 90π, crown 56.55 LF', () => {
    const walls = measureSurface({
      kind: 'roundWalls',
      radius: 9,
      height: 10,
      openings: [
        { width: 3, height: 7 },
        { width: 4, height: 5, count: 2 },
      ],
    });
    expect(walls.gross).toBeCloseTo(565.49, 2);
    expect(walls.deductions).toBe(61);
    expect(walls.quantity).toBeCloseTo(504.49, 2);
    expect(walls.isCurved).toBe(true);
    expect(walls.isCeiling).toBe(false);
    expect(walls.topHeight).toBe(10);
    const dome = measureSurface({ kind: 'sphericalCap', baseRadius: 9, rise: 3, elevation: 10 });
    expect(dome.quantity).toBeCloseTo(90 * Math.PI, 10);
    expect(dome.quantity).toBeCloseTo(282.74, 2);
    expect(dome.topHeight).toBe(13);
    const crown = measureSurface({ kind: 'crownCircular', radius: 9 });
    expect(crown.measure).toBe('length');
    expect(crown.quantity).toBeCloseTo(56.55, 2);
  });
});

describe('openings and settings', () => {
  it('deducts only openings at least the firm minimum', () => {
    const shape: SurfaceShape = {
      kind: 'walls',
      perimeter: 40,
      height: 8,
      openings: [
        { width: 3, height: 7 },
        { width: 1, height: 1.5 },
      ],
    };
    expect(area(shape, 0)).toBe(320 - 21 - 1.5);
    expect(area(shape, 2)).toBe(320 - 21);
  });

  it('converts a measure between units', () => {
    const m = measureSurface({ kind: 'ceilingRect', length: 10, width: 10, elevation: 9 });
    const metric = convertMeasure(m, 'ft', 'm');
    expect(metric.quantity).toBeCloseTo(9.290304, 12); // NIST SP 811 App. B.8
    expect(metric.topHeight).toBeCloseTo(2.7432, 12);
  });
});

describe('areas grow with their dimensions (property)', () => {
  const dim = fc.double({ min: 0.1, max: 100, noNaN: true });
  const grow = fc.double({ min: 1.01, max: 3, noNaN: true });
  const makers: Array<[string, (x: number) => SurfaceShape]> = [
    ['walls', (x) => ({ kind: 'walls', perimeter: x, height: 8 })],
    ['cone', (x) => ({ kind: 'cone', radius: x, rise: 3 })],
    ['pyramid', (x) => ({ kind: 'pyramid', sides: 8, sideLength: x, rise: 3 })],
    ['hemisphere', (x) => ({ kind: 'hemisphere', radius: x })],
    ['cap rise', (x) => ({ kind: 'sphericalCap', baseRadius: 400, rise: x })],
    ['barrel', (x) => ({ kind: 'barrelVault', radius: x, length: 10 })],
    ['segmental rise', (x) => ({ kind: 'segmentalVault', span: 700, rise: x, length: 10 })],
    ['groin', (x) => ({ kind: 'groinVault', side: x })],
  ];
  it.each(makers)('%s', (_name, make) => {
    fc.assert(fc.property(dim, grow, (x, k) => area(make(x * k)) > area(make(x))));
  });
});

describe('bad inputs name their field', () => {
  it.each<[SurfaceShape, string, RegExp]>([
    [{ kind: 'walls', perimeter: -40, height: 8 }, 'shape.perimeter', /cannot|greater than zero/],
    [{ kind: 'walls', perimeter: 10, height: 8, openings: [{ width: 6, height: 8, count: 2 }] }, 'shape.openings', /more than the surface/],
    [{ kind: 'walls', perimeter: 10, height: 8, openings: [{ width: 0, height: 9 }] }, 'shape.openings[0].width', /greater than zero/],
    [{ kind: 'sphericalCap', baseRadius: 6, rise: 7 }, 'shape.rise', /more than the base radius/],
    [{ kind: 'sphericalCapFromSphere', sphereRadius: 6, rise: 7 }, 'shape.rise', /more than the sphere radius/],
    [{ kind: 'segmentalVault', span: 12, rise: 7, length: 20 }, 'shape.rise', /half its span/],
    [{ kind: 'pyramid', sides: 2, sideLength: 4, rise: 6 }, 'shape.sides', /at least 3/],
    [{ kind: 'curvedWall', radius: 9, angleDegrees: 400, height: 10 }, 'shape.angleDegrees', /360/],
    [
      {
        kind: 'ceilingPolygon',
        corners: [
          [0, 0],
          [1, 1],
        ],
      },
      'shape.corners',
      /three corners/,
    ],
    [
      {
        kind: 'ceilingPolygon',
        corners: [
          [0, 0],
          [1, 1],
          [2, 2],
        ],
      },
      'shape.corners',
      /no area/,
    ],
    [{ kind: 'cone', radius: Number.NaN, rise: 3 }, 'shape.radius', /finite/],
    [{ kind: 'gable', base: 4, height: 3, elevation: -1 }, 'shape.elevation', /negative/],
    [{ kind: 'dodecahedron' } as unknown as SurfaceShape, 'shape.kind', /not a shape/],
  ])('%j', (shape, field, message) => {
    expectInputError(() => measureSurface(shape), field, message);
  });

  it('uses the caller path', () => {
    expectInputError(() => measureSurface({ kind: 'hemisphere', radius: 0 }, undefined, 'surfaces[2]'), 'surfaces[2].radius');
  });
});

describe('each opening fits its wall', () => {
  it.each<[string, SurfaceShape, string, RegExp]>([
    // a door typed 80 (inches meant) on an 8 ft wall would take 240 ft² off instead of 20 ft²
    [
      'a door taller than its wall',
      { kind: 'walls', perimeter: 40, height: 8, openings: [{ width: 3, height: 80 }] },
      'shape.openings[0].height',
      /taller than the wall/,
    ],
    [
      'an opening wider than the whole perimeter',
      { kind: 'walls', perimeter: 10, height: 8, openings: [{ width: 11, height: 2 }] },
      'shape.openings[0].width',
      /wider than the whole perimeter/,
    ],
    [
      'an opening wider than the way round a round room',
      { kind: 'roundWalls', radius: 1, height: 8, openings: [{ width: 7, height: 2 }] },
      'shape.openings[0].width',
      /wider than the whole way round the room/,
    ],
    [
      'a 5 m window in a 3.14 m curved segment',
      { kind: 'curvedWall', radius: 2, angleDegrees: 90, height: 8, openings: [{ width: 5, height: 1 }] },
      'shape.openings[0].width',
      /wider than the curved wall segment/,
    ],
    [
      'an arch taller than its curved wall',
      { kind: 'curvedWall', radius: 9, angleDegrees: 90, height: 8, openings: [{ width: 3, height: 9 }] },
      'shape.openings[0].height',
      /taller than the wall/,
    ],
  ])('refuses %s, naming the opening', (_what, shape, field, message) => {
    expectInputError(() => measureSurface(shape), field, message);
  });

  it('takes a surface saved before openings were held to their wall as saved, when reading it', () => {
    // common practice, no source: 40 × 8 − 3 × 80 = 80, what the surface read when it was saved
    const saved: SurfaceShape = { kind: 'walls', perimeter: 40, height: 8, openings: [{ width: 3, height: 80 }] };
    expect(measureSurface(saved, { minDeductedOpeningArea: 0, openingsAsSaved: true }).quantity).toBe(80);
  });

  it('takes off an opening as tall as the wall and as wide as its run', () => {
    // common practice, no source: 40 × 8 − 6 × 8 = 272; 10 × 8 − 10 × 1 = 70
    expect(area({ kind: 'walls', perimeter: 40, height: 8, openings: [{ width: 6, height: 8 }] })).toBe(272);
    expect(area({ kind: 'walls', perimeter: 10, height: 8, openings: [{ width: 10, height: 1 }] })).toBe(70);
  });
});

describe('sizes whose result is not a number', () => {
  it('refuses a segmental vault with a rise tiny next to its span, naming the rise', () => {
    // R = (c²/4 + h²)/(2h) overflows, and R·θ would be ∞·0 = NaN (IEEE 754 arithmetic)
    expectInputError(
      () => measureSurface({ kind: 'segmentalVault', span: 100000, rise: 1e-300, length: 10 }),
      'shape.rise',
      /too small next to the span/,
    );
  });

  it('refuses any shape whose area overflows, naming the shape', () => {
    expectInputError(() => measureSurface({ kind: 'walls', perimeter: 1e200, height: 1e200 }), 'shape', /no area we can work with/);
    expectInputError(
      () => measureSurface({ kind: 'beams', count: 2, length: 1e308, width: 1, depth: 1, measureBy: 'length' }),
      'shape',
      /no length we can work with/,
    );
  });
});

describe('a ceiling corner typed twice', () => {
  it.each<[string, ReadonlyArray<readonly [number, number]>, RegExp]>([
    [
      'twice in a row',
      [
        [0, 0],
        [0, 0],
        [10, 0],
        [10, 10],
        [0, 10],
      ],
      /^Corner 2 is the same as corner 1\./,
    ],
    [
      'the first corner typed again at the end',
      [
        [0, 0],
        [10, 0],
        [10, 10],
        [0, 10],
        [0, 0],
      ],
      /^The last corner \(corner 5\) is the same as corner 1\./,
    ],
  ])('says so (%s) rather than that the outline crosses itself', (_what, corners, message) => {
    expectInputError(() => measureSurface({ kind: 'ceilingPolygon', corners }), 'shape.corners', message);
  });
});
