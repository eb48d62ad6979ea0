import { plainNumber as shortNumber, type SurfaceShape } from '@layerbook/domain';

/**
 * Simple line drawings of each shape with its numbers, so a mistyped size shows at a glance.
 * Sections and plans whose proportions tell something (a rise against its span, a gable's pitch)
 * are drawn to scale; the rest are diagrams, and say so.
 */
export interface SketchLabel {
  readonly x: number;
  readonly y: number;
  readonly text: string;
  readonly anchor: 'start' | 'middle' | 'end';
}

export interface Sketch {
  /** solid outlines */
  readonly lines: readonly string[];
  /** dimension and construction lines */
  readonly guides: readonly string[];
  readonly labels: readonly SketchLabel[];
  readonly isToScale: boolean;
  /** what the drawing shows, for people who cannot see it */
  readonly description: string;
}

/** The area's words the drawing uses (`takeoff.shapeSketch.*`): a key and its params in, the text out. */
export type SketchWords = (key: string, params: { readonly count: number }) => string;

/** "no openings", "1 opening", "3 openings": alike openings counted one by one. */
function openingsText(openings: readonly { count?: number }[] | undefined, say: SketchWords): string {
  const count = (openings ?? []).reduce((n, o) => n + (o.count ?? 1), 0);
  const key =
    count === 0
      ? 'takeoff.shapeSketch.openingCountNone'
      : count === 1
        ? 'takeoff.shapeSketch.openingCountOne'
        : 'takeoff.shapeSketch.openingCount';
  return say(key, { count });
}

export const SKETCH_WIDTH = 240;
export const SKETCH_HEIGHT = 150;
const PAD = 28;

type Pt = readonly [number, number];

/** Maps shape coordinates (y up) into the drawing box (y down), keeping proportions. */
function frame(points: readonly Pt[]) {
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const w = Math.max(maxX - minX, 1e-9);
  const h = Math.max(maxY - minY, 1e-9);
  const scale = Math.min((SKETCH_WIDTH - 2 * PAD) / w, (SKETCH_HEIGHT - 2 * PAD) / h);
  const ox = (SKETCH_WIDTH - w * scale) / 2;
  const oy = (SKETCH_HEIGHT + h * scale) / 2;
  const at = (p: Pt): Pt => [round(ox + (p[0] - minX) * scale), round(oy - (p[1] - minY) * scale)];
  return { at, scale };
}

const round = (n: number) => Math.round(n * 10) / 10;
const poly = (pts: readonly Pt[], close = true) => `M ${pts.map((p) => `${p[0]} ${p[1]}`).join(' L ')}${close ? ' Z' : ''}`;
const line = (a: Pt, b: Pt) => `M ${a[0]} ${a[1]} L ${b[0]} ${b[1]}`;
const label = (p: Pt, text: string, anchor: SketchLabel['anchor'] = 'middle', dx = 0, dy = 0): SketchLabel => ({
  x: round(p[0] + dx),
  y: round(p[1] + dy),
  text,
  anchor,
});
const mid = (a: Pt, b: Pt): Pt => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];

/** An arc through a chord from `a` to `b` bulging up by `rise` (drawing units), as a path segment. */
function arcPath(a: Pt, b: Pt, chord: number, rise: number): string {
  const r = (chord * chord) / 4 / (2 * rise) + rise / 2;
  const large = rise > chord / 2 ? 1 : 0;
  return `M ${a[0]} ${a[1]} A ${round(r)} ${round(r)} 0 ${large} 1 ${b[0]} ${b[1]}`;
}

export function sketchShape(shape: SurfaceShape, unit: string, say: SketchWords): Sketch {
  const u = (n: number) => `${shortNumber(n)} ${unit}`;
  switch (shape.kind) {
    case 'walls':
    case 'roundWalls':
    case 'curvedWall': {
      // Walls unrolled flat: the run along the bottom, the height up the side, openings as boxes.
      const box: Pt[] = [
        [PAD, 30],
        [SKETCH_WIDTH - PAD, 30],
        [SKETCH_WIDTH - PAD, 112],
        [PAD, 112],
      ];
      const openings = (shape.openings ?? []).flatMap((o) => Array.from({ length: Math.min(o.count ?? 1, 6) }, () => o));
      const shown = openings.slice(0, 6);
      const slot = (SKETCH_WIDTH - 2 * PAD) / (shown.length + 1);
      const boxes = shown.map((o, i) => {
        const w = Math.min(slot * 0.6, 18 + o.width);
        const h = Math.min(60, (o.height / shape.height) * 82);
        const x = PAD + slot * (i + 1) - w / 2;
        return poly(
          [
            [x, 112],
            [x, 112 - h],
            [x + w, 112 - h],
            [x + w, 112],
          ].map((p) => [round(p[0]), round(p[1])] as Pt),
          false,
        );
      });
      const runWords =
        shape.kind === 'walls'
          ? `perimeter ${u(shape.perimeter)}`
          : shape.kind === 'roundWalls'
            ? `round, radius ${u(shape.radius)}`
            : `radius ${u(shape.radius)}, ${shortNumber(shape.angleDegrees)}°`;
      const count = openingsText(shape.openings, say);
      return {
        lines: [poly(box), ...boxes],
        guides: [],
        labels: [
          label([SKETCH_WIDTH / 2, 112], runWords, 'middle', 0, 16),
          label([PAD, 71], `H ${u(shape.height)}`, 'start', 4, 4),
          label([SKETCH_WIDTH / 2, 30], count, 'middle', 0, -8),
        ],
        isToScale: false,
        description: `Walls laid out flat: ${runWords}, height ${u(shape.height)}, ${count}.`,
      };
    }
    case 'gable':
    case 'trapezoid': {
      const b1 = shape.kind === 'gable' ? shape.base : shape.base1;
      const b2 = shape.kind === 'gable' ? 0 : shape.base2;
      const pts: Pt[] = [
        [0, 0],
        [b1, 0],
        [(b1 + b2) / 2, shape.height],
        [(b1 - b2) / 2, shape.height],
      ];
      const { at } = frame(pts);
      const d = pts.map(at);
      const foot = at([b1 / 2, 0]);
      const top = at([b1 / 2, shape.height]);
      const labels = [
        label(mid(d[0], d[1]), `${shape.kind === 'gable' ? 'base' : 'bottom'} ${u(b1)}`, 'middle', 0, 14),
        label(mid(foot, top), `h ${u(shape.height)}`, 'start', 4, 0),
      ];
      if (shape.kind === 'trapezoid') labels.push(label(mid(d[2], d[3]), `top ${u(b2)}`, 'middle', 0, -6));
      return {
        lines: [poly(shape.kind === 'gable' ? [d[0], d[1], d[2]] : d)],
        guides: [line(foot, top)],
        labels,
        isToScale: true,
        description:
          shape.kind === 'gable'
            ? `Triangle wall, base ${u(b1)}, height ${u(shape.height)}.`
            : `Trapezoid wall, bottom ${u(b1)}, top ${u(b2)}, height ${u(shape.height)}.`,
      };
    }
    case 'ceilingRect': {
      const { at } = frame([
        [0, 0],
        [shape.length, shape.width],
      ]);
      const d = (
        [
          [0, 0],
          [shape.length, 0],
          [shape.length, shape.width],
          [0, shape.width],
        ] as Pt[]
      ).map(at);
      return {
        lines: [poly(d)],
        guides: [],
        labels: [
          label(mid(d[0], d[1]), `L ${u(shape.length)}`, 'middle', 0, 14),
          label(mid(d[1], d[2]), `W ${u(shape.width)}`, 'start', 4, 0),
        ],
        isToScale: true,
        description: `Flat ceiling seen from below, ${u(shape.length)} by ${u(shape.width)}.`,
      };
    }
    case 'ceilingPolygon': {
      const { at } = frame(shape.corners);
      const d = shape.corners.map((p) => at(p));
      return {
        lines: [poly(d)],
        guides: [],
        labels: d.map((p, i) => label(p, String(i + 1), 'middle', 0, -5)),
        isToScale: true,
        description: `Flat ceiling outline through ${shape.corners.length} corners: ${shape.corners.map(([x, y]) => `(${shortNumber(x)}, ${shortNumber(y)})`).join(', ')} ${unit}.`,
      };
    }
    case 'ceilingCircle':
    case 'crownCircular': {
      // Plan of a circle with its radius drawn in.
      const c: Pt = [SKETCH_WIDTH / 2, SKETCH_HEIGHT / 2];
      const r = SKETCH_HEIGHT / 2 - 18;
      const what = shape.kind === 'ceilingCircle' ? 'Round flat ceiling' : 'Crown running around a round room';
      return {
        lines: [`M ${c[0] - r} ${c[1]} A ${r} ${r} 0 1 1 ${c[0] + r} ${c[1]} A ${r} ${r} 0 1 1 ${c[0] - r} ${c[1]}`],
        guides: [line(c, [c[0] + r, c[1]])],
        labels: [label([c[0] + r / 2, c[1]], `r ${u(shape.radius)}`, 'middle', 0, -6)],
        isToScale: false,
        description: `${what}, radius ${u(shape.radius)}.`,
      };
    }
    case 'cone':
    case 'pyramid': {
      // Section through the peak: the rise against the half-width shows the pitch.
      const half = shape.kind === 'cone' ? shape.radius : shape.sideLength / (2 * Math.tan(Math.PI / shape.sides));
      const pts: Pt[] = [
        [-half, 0],
        [half, 0],
        [0, shape.rise],
      ];
      const { at } = frame(pts);
      const d = pts.map(at);
      const base = at([0, 0]);
      const labels = [
        label(
          mid(base, d[1]),
          shape.kind === 'cone' ? `r ${u(shape.radius)}` : `${shape.sides} sides of ${u(shape.sideLength)}`,
          'middle',
          0,
          14,
        ),
        label(mid(base, d[2]), `rise ${u(shape.rise)}`, 'start', 4, 0),
      ];
      // Both slopes from the eaves up to the peak; the span between the eaves is a guide.
      return {
        lines: [poly([d[0], d[2], d[1]], false)],
        guides: [line(base, d[2]), line(d[0], d[1])],
        labels,
        isToScale: true,
        description:
          shape.kind === 'cone'
            ? `Cone ceiling in section: radius ${u(shape.radius)}, rise ${u(shape.rise)}, slant ${u(Math.hypot(shape.radius, shape.rise))}.`
            : `Turret ceiling with ${shape.sides} flat sides of ${u(shape.sideLength)}, rise ${u(shape.rise)}, in section.`,
      };
    }
    case 'hemisphere':
    case 'sphericalCap':
    case 'sphericalCapFromSphere':
    case 'barrelVault':
    case 'segmentalVault': {
      // Section across the arc: chord along the springing line, rise to the crown.
      const half =
        shape.kind === 'hemisphere'
          ? shape.radius
          : shape.kind === 'sphericalCap'
            ? shape.baseRadius
            : shape.kind === 'sphericalCapFromSphere'
              ? Math.sqrt(Math.max(0, 2 * shape.sphereRadius * shape.rise - shape.rise ** 2))
              : shape.kind === 'barrelVault'
                ? shape.radius
                : shape.span / 2;
      const rise = shape.kind === 'barrelVault' || shape.kind === 'hemisphere' ? shape.radius : shape.rise;
      const { at, scale } = frame([
        [-half, 0],
        [half, 0],
        [0, rise],
      ]);
      const a = at([-half, 0]);
      const b = at([half, 0]);
      const crown = at([0, rise]);
      const base = at([0, 0]);
      const chordWords =
        shape.kind === 'segmentalVault'
          ? `span ${u(shape.span)}`
          : shape.kind === 'barrelVault' || shape.kind === 'hemisphere'
            ? `r ${u(shape.radius)}`
            : `base radius ${u(half)}`;
      const labels = [label(mid(a, b), chordWords, 'middle', 0, 14), label(mid(base, crown), `rise ${u(rise)}`, 'start', 4, 0)];
      if (shape.kind === 'barrelVault' || shape.kind === 'segmentalVault')
        labels.push(label(crown, `length ${u(shape.length)}`, 'middle', 0, -8));
      const noun =
        shape.kind === 'hemisphere'
          ? 'Half-sphere dome'
          : shape.kind === 'barrelVault'
            ? 'Half-round barrel vault'
            : shape.kind === 'segmentalVault'
              ? 'Segmental vault'
              : 'Shallow dome';
      return {
        lines: [arcPath(a, b, 2 * half * scale, rise * scale)],
        guides: [line(a, b), line(base, crown)],
        labels,
        isToScale: true,
        description: `${noun} in section: ${chordWords}, rise ${u(rise)}${'length' in shape ? `, length ${u(shape.length)}` : ''}.`,
      };
    }
    case 'groinVault':
    case 'cloisterVault': {
      const { at } = frame([
        [0, 0],
        [shape.side, shape.side],
      ]);
      const d = (
        [
          [0, 0],
          [shape.side, 0],
          [shape.side, shape.side],
          [0, shape.side],
        ] as Pt[]
      ).map(at);
      const noun = shape.kind === 'groinVault' ? 'Groin vault' : 'Cloister vault';
      return {
        lines: [poly(d)],
        guides: [line(d[0], d[2]), line(d[1], d[3])],
        labels: [label(mid(d[0], d[1]), `side ${u(shape.side)}`, 'middle', 0, 14)],
        isToScale: true,
        description: `${noun} over a square bay seen from below, side ${u(shape.side)}, with the creases on the diagonals.`,
      };
    }
    case 'coffers': {
      const cells: string[] = [];
      for (let row = 0; row < 2; row++) {
        for (let col = 0; col < 3; col++) {
          const x = 60 + col * 42;
          const y = 30 + row * 42;
          cells.push(
            poly([
              [x, y],
              [x + 34, y],
              [x + 34, y + 34],
              [x, y + 34],
            ]),
          );
        }
      }
      return {
        lines: cells,
        guides: [],
        labels: [label([SKETCH_WIDTH / 2, 118], `${shape.count} coffers, ${u(shape.depth)} deep`, 'middle', 0, 12)],
        isToScale: false,
        description: `${shape.count} coffers, each ${u(shape.innerPerimeter)} around inside, ${u(shape.depth)} deep, panel ${shortNumber(shape.panelArea)} ${unit}².`,
      };
    }
    case 'beams': {
      // One beam in section: the two sides and the bottom are finished.
      const { at } = frame([
        [0, 0],
        [shape.width, shape.depth],
        [-shape.width, 0],
        [2 * shape.width, 0],
      ]);
      const d = (
        [
          [0, shape.depth],
          [0, 0],
          [shape.width, 0],
          [shape.width, shape.depth],
        ] as Pt[]
      ).map(at);
      const n = shape.count ?? 1;
      return {
        lines: [poly(d, false)],
        guides: [line(at([-shape.width, shape.depth]), at([2 * shape.width, shape.depth]))],
        labels: [
          label(mid(d[1], d[2]), `w ${u(shape.width)}`, 'middle', 0, 14),
          label(mid(d[2], d[3]), `d ${u(shape.depth)}`, 'start', 4, 0),
          label(at([shape.width / 2, shape.depth]), `${n} × ${u(shape.length)} long`, 'middle', 0, -6),
        ],
        isToScale: true,
        description: `${n} beam${n === 1 ? '' : 's'} ${u(shape.length)} long, ${u(shape.width)} wide, ${u(shape.depth)} deep, in section.`,
      };
    }
    case 'crownStraight':
    case 'border': {
      const a: Pt = [PAD, 80];
      const b: Pt = [SKETCH_WIDTH - PAD, 80];
      const noun = shape.kind === 'border' ? 'Border' : 'Crown';
      return {
        lines: [line(a, b)],
        guides: [line([a[0], 72], [a[0], 88]), line([b[0], 72], [b[0], 88])],
        labels: [label(mid(a, b), u(shape.length), 'middle', 0, -10)],
        isToScale: false,
        description: `${noun} in a straight run of ${u(shape.length)}.`,
      };
    }
  }
}
