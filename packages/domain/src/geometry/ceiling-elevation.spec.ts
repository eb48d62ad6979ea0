import { roomWallHeight, withCeilingElevation } from './ceiling-elevation';
import type { SurfaceShape } from './surface-shape';

const walls = (height: number): SurfaceShape => ({ kind: 'walls', perimeter: 40, height });

describe('roomWallHeight (common practice, no source)', () => {
  it.each<[string, SurfaceShape[], number | null]>([
    ['one straight wall run', [walls(9)], 9],
    [
      'the tallest of several walls',
      [walls(9), { kind: 'roundWalls', radius: 6, height: 17 }, { kind: 'curvedWall', radius: 5, angleDegrees: 90, height: 11 }],
      17,
    ],
    ['no walls measured', [{ kind: 'ceilingRect', length: 10, width: 12 }], null],
    ['a gable is not the wall height', [{ kind: 'gable', base: 12, height: 6 }], null],
  ])('%s', (_case, shapes, height) => {
    expect(roomWallHeight(shapes)).toBe(height);
  });
});

describe('withCeilingElevation', () => {
  it.each<[string, SurfaceShape, number | null, SurfaceShape]>([
    // the ceiling starts where the walls stop, so its top of work is known (29 CFR 1926.501(b)(1), 1926.451(g)(1) need it)
    ['a flat ceiling', { kind: 'ceilingRect', length: 10, width: 12 }, 17, { kind: 'ceilingRect', length: 10, width: 12, elevation: 17 }],
    ['a dome springs from the wall top', { kind: 'hemisphere', radius: 6 }, 10, { kind: 'hemisphere', radius: 6, elevation: 10 }],
    ['a vault', { kind: 'barrelVault', radius: 4, length: 20 }, 9, { kind: 'barrelVault', radius: 4, length: 20, elevation: 9 }],
    [
      'crown moulding runs at the ceiling line',
      { kind: 'crownStraight', length: 40 },
      9,
      { kind: 'crownStraight', length: 40, elevation: 9 },
    ],
    [
      'an elevation typed in wins',
      { kind: 'ceilingRect', length: 10, width: 12, elevation: 8 },
      17,
      { kind: 'ceilingRect', length: 10, width: 12, elevation: 8 },
    ],
    [
      'an elevation of 0 is an elevation',
      { kind: 'ceilingCircle', radius: 4, elevation: 0 },
      17,
      { kind: 'ceilingCircle', radius: 4, elevation: 0 },
    ],
    [
      'no walls measured: still unknown',
      { kind: 'ceilingRect', length: 10, width: 12 },
      null,
      { kind: 'ceilingRect', length: 10, width: 12 },
    ],
    ['a gable is a wall, not a ceiling', { kind: 'gable', base: 12, height: 6 }, 17, { kind: 'gable', base: 12, height: 6 }],
    ['a stencilled border may run anywhere', { kind: 'border', length: 30 }, 17, { kind: 'border', length: 30 }],
  ])('%s', (_case, shape, wallHeight, expected) => {
    expect(withCeilingElevation(shape, wallHeight)).toEqual(expected);
  });
});
