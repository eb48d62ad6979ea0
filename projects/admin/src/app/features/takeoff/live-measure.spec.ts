import type { SurfaceShape } from '@layerbook/domain';
import { describe, expect, it } from 'vitest';
import { measureLive } from './live-measure';

const EVERY_OPENING = { minDeductedOpeningArea: 0 };

describe('measureLive', () => {
  it('measures with the engine the server saves with', () => {
    const live = measureLive({ kind: 'ceilingRect', length: 12, width: 10 }, EVERY_OPENING);
    expect(live.state).toBe('measured');
    expect(live.state === 'measured' && live.measure.quantity).toBe(120);
  });

  it('keeps openings smaller than the firm deducts in the area, as the estimate prices it', () => {
    // 40 ft × 10 ft = 400 ft² of wall with a 2 × 3 ft opening (6 ft²): deducted, 394 ft²; under a 10 ft² threshold, 400 ft²
    const wall: SurfaceShape = { kind: 'walls', perimeter: 40, height: 10, openings: [{ width: 2, height: 3 }] };
    const quantity = (min: number) => {
      const live = measureLive(wall, { minDeductedOpeningArea: min });
      return live.state === 'measured' ? live.measure.quantity : null;
    };
    expect(quantity(0)).toBe(394);
    expect(quantity(10)).toBe(400);
  });

  it('names a refused field in the API path style, so the form finds its control', () => {
    const live = measureLive({ kind: 'walls', perimeter: 4, height: 2, openings: [{ width: 3, height: 2, count: 2 }] }, EVERY_OPENING);
    expect(live).toMatchObject({
      state: 'refused',
      field: 'shape.openings',
      message: 'The openings add up to more than the surface itself.',
    });
    // the engine's `shape.openings[0].height` is the form's `shape.openings.0.height`
    expect(measureLive({ kind: 'walls', perimeter: 4, height: 2, openings: [{ width: 1, height: 5 }] }, EVERY_OPENING)).toMatchObject({
      state: 'refused',
      field: 'shape.openings.0.height',
      message: 'An opening cannot be taller than the wall.',
    });
  });
});
