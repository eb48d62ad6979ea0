import { describe, expect, it } from 'vitest';
import { measureLive } from './live-measure';

describe('measureLive', () => {
  it('measures with the engine the server saves with', () => {
    const live = measureLive({ kind: 'ceilingRect', length: 12, width: 10 });
    expect(live.state).toBe('measured');
    expect(live.state === 'measured' && live.measure.quantity).toBe(120);
  });

  it('names a refused field in the API path style, so the form finds its control', () => {
    const live = measureLive({ kind: 'walls', perimeter: 4, height: 2, openings: [{ width: 5, height: 5 }] });
    expect(live).toMatchObject({
      state: 'refused',
      field: 'shape.openings',
      message: 'The openings add up to more than the surface itself.',
    });
  });
});
