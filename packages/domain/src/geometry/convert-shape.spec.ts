import { convertShape } from './convert-shape';
import { measureSurface } from './measure-surface';
import type { SurfaceShape } from './surface-shape';
import { convertArea } from '../units/length';

// 1 ft = 0.3048 m exactly (NIST SP 811 App. B.8); areas by the square of the factor.
describe('convertShape', () => {
  it.each<[string, SurfaceShape, SurfaceShape]>([
    [
      'walls with openings: every length, not the count',
      { kind: 'walls', perimeter: 10, height: 8, openings: [{ width: 3, height: 7, count: 2 }] },
      { kind: 'walls', perimeter: 3.048, height: 2.4384, openings: [{ width: 0.9144, height: 2.1336, count: 2 }] },
    ],
    [
      'a curved wall keeps its angle',
      { kind: 'curvedWall', radius: 10, angleDegrees: 90, height: 10 },
      { kind: 'curvedWall', radius: 3.048, angleDegrees: 90, height: 3.048 },
    ],
    [
      'a pyramid keeps its number of sides',
      { kind: 'pyramid', sides: 8, sideLength: 5, rise: 10, elevation: 10 },
      { kind: 'pyramid', sides: 8, sideLength: 1.524, rise: 3.048, elevation: 3.048 },
    ],
    [
      'coffers: panel area by the square, depth as a length',
      { kind: 'coffers', count: 4, innerPerimeter: 10, depth: 0, panelArea: 100 },
      { kind: 'coffers', count: 4, innerPerimeter: 3.048, depth: 0, panelArea: 9.290304 },
    ],
    [
      'beams keep how they are counted',
      { kind: 'beams', length: 10, width: 1, depth: 1, measureBy: 'length' },
      { kind: 'beams', length: 3.048, width: 0.3048, depth: 0.3048, measureBy: 'length' },
    ],
    [
      'polygon corners',
      {
        kind: 'ceilingPolygon',
        corners: [
          [0, 0],
          [10, 0],
          [10, 5],
        ],
      },
      {
        kind: 'ceilingPolygon',
        corners: [
          [0, 0],
          [3.048, 0],
          [3.048, 1.524],
        ],
      },
    ],
  ])('ft → m: %s', (_what, feet, metres) => {
    const got = convertShape(feet, 'ft', 'm') as unknown as Record<string, unknown>;
    for (const [key, value] of Object.entries(metres)) {
      if (typeof value === 'number') expect(got[key]).toBeCloseTo(value, 9);
      else
        expect(JSON.parse(JSON.stringify(got[key]), (_k, v: unknown) => (typeof v === 'number' ? Number(v.toFixed(9)) : v))).toEqual(value);
    }
  });

  it('measures the same surface either way (area converts by the square)', () => {
    const dome: SurfaceShape = { kind: 'hemisphere', radius: 9 };
    expect(measureSurface(convertShape(dome, 'ft', 'm')).quantity).toBeCloseTo(convertArea(measureSurface(dome).quantity, 'ft', 'm'), 9);
  });

  it('returns the same shape when the units agree', () => {
    const shape: SurfaceShape = { kind: 'border', length: 12 };
    expect(convertShape(shape, 'm', 'm')).toBe(shape);
  });
});
