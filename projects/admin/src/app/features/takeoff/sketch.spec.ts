import { describe, expect, it } from 'vitest';
import { SHAPE_CHOICES } from '@layerbook/contracts/types';
import type { SurfaceShape } from '@layerbook/domain';
import { sketchShape } from './sketch';

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
    const sketch = sketchShape(shape, 'ft');
    expect(sketch.description).toBe(description);
    expect(sketch.isToScale).toBe(isToScale);
    expect(sketch.lines.length).toBeGreaterThan(0);
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
      const sketch = sketchShape(shape, 'm');
      expect(sketch.description, choice.kind).not.toBe('');
      expect(
        sketch.labels.every((l) => Number.isFinite(l.x) && Number.isFinite(l.y)),
        choice.kind,
      ).toBe(true);
    }
  });
});
