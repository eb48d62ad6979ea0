import { describe, expect, it } from 'vitest';
import { DIM_KEYS } from '@layerbook/contracts/types';
import { bannerAfterEdit, dimMessage, optionalNonNegativeMessage, readShape, shapeFormValue, type ShapeFormValue } from './shape-reading';

const blank = (over: Partial<ShapeFormValue>): ShapeFormValue => ({
  ...(Object.fromEntries(DIM_KEYS.map((k) => [k, ''])) as { [K in (typeof DIM_KEYS)[number]]: string }),
  kind: 'walls',
  elevation: '',
  measureBy: 'faces',
  openings: [],
  corners: [],
  ...over,
});

describe('shape reading', () => {
  // The same words as the API's schema (contracts takeoff/shape.ts builds them from DIM_WORDS).
  it.each([
    ['length', 'radius', null, 'Enter the radius, more than 0.'],
    ['length', 'radius', 0, 'Enter the radius, more than 0.'],
    ['length', 'radius', 9, null],
    ['length', 'radius', 100_001, 'Enter the radius, at most 100000.'],
    // a rise of 1e-300 under a wide span once saved a surface the engine measured as NaN
    ['length', 'rise', 1e-300, 'Enter the rise, at least 0.001.'],
    ['length', 'rise', 0.001, null],
    ['area', 'panel area', 0.0005, 'Enter the panel area, at least 0.001.'],
    ['depth0', 'depth', 0.0005, null],
    ['depth0', 'depth', 0, null],
    ['depth0', 'depth', -1, 'Enter the depth, 0 or more.'],
    ['angle', 'angle in degrees', 361, 'Enter an angle of at most 360 degrees.'],
    [{ whole: [3, 64] }, 'number of sides', 2.5, 'Enter the number of sides as a whole number from 3 to 64.'],
    [{ whole: [3, 64] }, 'number of sides', 8, null],
  ] as const)('dimMessage(%j, %s, %s)', (rule, noun, value, message) => expect(dimMessage(rule, noun, value)).toBe(message));

  it.each([
    [null, null],
    [0, null],
    [Number.NaN, 'Enter the height above the floor, 0 or more, or leave it empty.'],
  ])('optionalNonNegativeMessage(%s)', (value, message) =>
    expect(optionalNonNegativeMessage('height above the floor', value)).toBe(message),
  );

  it("reads only the chosen shape's fields, with its openings", () => {
    const reading = readShape(
      blank({ kind: 'walls', perimeter: '40', height: '9', radius: 'junk', openings: [{ width: '3', height: '7', count: '2' }] }),
      'ft',
    );
    expect(reading).toEqual({ shape: { kind: 'walls', perimeter: 40, height: 9, openings: [{ width: 3, height: 7, count: 2 }] } });
  });

  it.each([
    ['an empty field', blank({ kind: 'cone', radius: '8' })],
    ['a negative elevation', blank({ kind: 'cone', radius: '8', rise: '6', elevation: '-1' })],
    [
      'a corner not yet a number',
      blank({
        kind: 'ceilingPolygon',
        corners: [
          ['0', '0'],
          ['4', ''],
          ['4', '3'],
        ],
      }),
    ],
  ])('waits while there is %s', (_what, raw) => expect(readShape(raw, 'ft')).toEqual({ missing: true }));

  it('puts a surface saved in feet into a metric form, exactly enough to measure the same', () => {
    const value = shapeFormValue({ kind: 'walls', perimeter: 10, height: 8, openings: [{ width: 3, height: 7 }] }, 'ft', 'm');
    expect(value).toEqual({
      kind: 'walls',
      perimeter: '3.048',
      height: '2.4384',
      elevation: '',
      openings: [{ width: '0.9144', height: '2.1336', count: '1' }],
    });
  });

  it('starts a beam count at one when none was saved', () => {
    expect(shapeFormValue({ kind: 'beams', length: 12, width: 1, depth: 1 }, 'ft', 'ft')).toMatchObject({ count: '1', measureBy: 'faces' });
  });

  it("reads lengths typed in feet and inches in the form's unit, counts as plain numbers", () => {
    const raw = blank({ kind: 'walls', perimeter: '40\' 6"', height: '9 ft', openings: [{ width: "3'", height: '6\' 8"', count: '2' }] });
    expect(readShape(raw, 'ft')).toEqual({
      shape: { kind: 'walls', perimeter: 40.5, height: 9, openings: [{ width: 3, height: 6 + 8 / 12, count: 2 }] },
    });
    expect(
      readShape(blank({ kind: 'walls', perimeter: '40', height: '9', openings: [{ width: '3', height: '7', count: "2'" }] }), 'ft'),
    ).toEqual({
      missing: true,
    });
  });

  it.each([
    [
      'clears the banner once the form is corrected',
      'Some sizes are missing',
      true,
      { shape: { kind: 'gable', base: 8, height: 4 } },
      null,
    ],
    [
      'keeps it while a field is still in error',
      'Some sizes are missing',
      false,
      { shape: { kind: 'gable', base: 8, height: 4 } },
      'Some sizes are missing',
    ],
    ['keeps it while a size is missing', 'Some sizes are missing', true, { missing: true }, 'Some sizes are missing'],
    ['shows nothing when there was nothing', null, true, { missing: true }, null],
  ] as const)('bannerAfterEdit %s', (_what, banner, isValid, reading, after) =>
    expect(bannerAfterEdit(banner, isValid, reading as Parameters<typeof bannerAfterEdit>[2])).toBe(after),
  );
});
