import { describe, expect, it } from 'vitest';
import { SHAPE_CHOICES } from '@layerbook/contracts/types';
import type { SurfaceShape } from '@layerbook/domain';
import takeoff from '../../../i18n/takeoff/en.json';
import { sketchShape } from './sketch';

/** The area's English words for the drawing, as the translate service gives them. */
const say = (key: string, params: { count: number }): string => {
  const words: Record<string, string> = takeoff.shapeSketch;
  return words[key.replace('takeoff.shapeSketch.', '')].replace('{{count}}', String(params.count));
};

describe('sketchShape', () => {
  it.each<[SurfaceShape, string, boolean]>([
    [
      { kind: 'walls', perimeter: 40, height: 9, openings: [{ width: 3, height: 7, count: 2 }] },
      'Walls laid out flat: perimeter 40 ft, height 9 ft, 2 openings.',
      false,
    ],
    [{ kind: 'gable', base: 12.5, height: 4 }, 'Triangle wall, base 12.5 ft, height 4 ft.', true],
    [{ kind: 'ceilingRect', length: 12, width: 10.25 }, 'Flat ceiling seen from below, 12 ft by 10.25 ft.', true],
    [
      {
        kind: 'ceilingPolygon',
        corners: [
          [0, 0],
          [4, 0],
          [4, 3.333],
        ],
      },
      'Flat ceiling outline through 3 corners: (0, 0), (4, 0), (4, 3.33) ft.',
      true,
    ],
  ])('describes %j in words for people who cannot see the drawing', (shape, description, isToScale) => {
    const sketch = sketchShape(shape, 'ft', say);
    expect(sketch.description).toBe(description);
    expect(sketch.isToScale).toBe(isToScale);
    expect(sketch.lines.length).toBeGreaterThan(0);
  });

  it.each<[SurfaceShape, string]>([
    [{ kind: 'walls', perimeter: 40, height: 9 }, 'no openings'],
    // one door once read "1 openings"
    [{ kind: 'walls', perimeter: 40, height: 9, openings: [{ width: 3, height: 7 }] }, '1 opening'],
    [{ kind: 'roundWalls', radius: 9, height: 10, openings: [{ width: 3, height: 7, count: 1 }] }, '1 opening'],
    [
      {
        kind: 'curvedWall',
        radius: 9,
        angleDegrees: 90,
        height: 10,
        openings: [
          { width: 3, height: 7 },
          { width: 4, height: 5, count: 2 },
        ],
      },
      '3 openings',
    ],
  ])('counts the openings of %j in plain words: "%s"', (shape, words) => {
    const sketch = sketchShape(shape, 'ft', say);
    expect(sketch.description).toMatch(new RegExp(`, ${words}\\.$`));
    expect(sketch.labels.map((l) => l.text)).toContain(words);
  });

  it('draws a cone in section with both slopes up to the peak, the span between the eaves as a guide', () => {
    const sketch = sketchShape({ kind: 'cone', radius: 8, rise: 6 }, 'ft', say);
    const points = [...sketch.lines[0].matchAll(/(-?[\d.]+) (-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
    expect(points).toHaveLength(3);
    const [left, peak, right] = points;
    expect(peak[1]).toBeLessThan(left[1]);
    expect(left[1]).toBe(right[1]);
    expect(left[0]).toBeLessThan(peak[0]);
    expect(right[0]).toBeGreaterThan(peak[0]);
  });

  it('draws a half-sphere dome in section: a half circle on its springing line, rise equal to the radius', () => {
    const sketch = sketchShape({ kind: 'hemisphere', radius: 9 }, 'ft', say);
    expect(sketch.description).toBe('Half-sphere dome in section: r 9 ft, rise 9 ft.');
    expect(sketch.isToScale).toBe(true);
    expect(sketch.lines[0]).toMatch(/ A /);
    expect(sketch.guides).toHaveLength(2);
  });

  it('draws every shape the catalogue offers', () => {
    const sizes = {
      perimeter: 40,
      height: 9,
      base: 8,
      base1: 8,
      base2: 4,
      length: 12,
      width: 1,
      radius: 9,
      angleDegrees: 90,
      rise: 3,
      sides: 8,
      sideLength: 4,
      baseRadius: 9,
      sphereRadius: 15,
      span: 12,
      side: 10,
      count: 2,
      innerPerimeter: 12,
      depth: 1,
      panelArea: 6,
    };
    for (const choice of SHAPE_CHOICES) {
      const shape = {
        kind: choice.kind,
        ...Object.fromEntries(choice.fields.map((f) => [f.key, sizes[f.key]])),
        ...(choice.hasCorners
          ? {
              corners: [
                [0, 0],
                [4, 0],
                [4, 3],
              ],
            }
          : {}),
      } as SurfaceShape;
      const sketch = sketchShape(shape, 'm', say);
      expect(sketch.description, choice.kind).not.toBe('');
      expect(
        sketch.labels.every((l) => Number.isFinite(l.x) && Number.isFinite(l.y)),
        choice.kind,
      ).toBe(true);
    }
  });
});
