import { describe, expect, it } from 'vitest';
import { barHeight, CHART_COLOURS, seriesFill } from './chart-look';

describe('chart look', () => {
  it('turns API amounts into bar heights, and anything unreadable into no bar', () => {
    expect(barHeight('1200.50')).toBe(1200.5);
    expect(barHeight('-25.00')).toBe(-25);
    expect(barHeight('')).toBe(0);
    expect(barHeight('n/a')).toBe(0);
  });

  it('fills a solid series with its colour, and falls back to the colour where no canvas can draw a pattern', () => {
    expect(seriesFill(CHART_COLOURS.umber, 'solid')).toBe(CHART_COLOURS.umber);
    // the test browser has no 2D canvas: the pattern falls back to the plain colour instead of failing
    const striped = seriesFill(CHART_COLOURS.verdigris, 'stripes');
    expect(typeof striped === 'string' ? striped : 'pattern').toMatch(/^(#3f8f7f|pattern)$/);
  });
});
