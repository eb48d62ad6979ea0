/**
 * The colours and fills of the cash charts, from the Layerbook palette. Each series of a stacked
 * chart also has its own fill pattern (solid, stripes, dots) and its name in the legend and in the
 * table beside the chart, so nothing is told by colour alone.
 */
export const CHART_COLOURS = {
  umber: '#6b4a2f',
  verdigris: '#3f8f7f',
  ochre: '#c8962e',
  rust: '#9a3b24',
  slate: '#4f5d6b',
} as const;

export type FillPattern = 'solid' | 'stripes' | 'dots';

/**
 * A canvas fill for a series: the colour itself, or the colour with light stripes or dots over it.
 * Outside a browser (server rendering, unit tests without a canvas) the plain colour is returned.
 */
export function seriesFill(colour: string, pattern: FillPattern): string | CanvasPattern {
  if (pattern === 'solid' || typeof document === 'undefined') return colour;
  const tile = document.createElement('canvas');
  tile.width = 10;
  tile.height = 10;
  const context = tile.getContext('2d');
  if (!context) return colour;
  context.fillStyle = colour;
  context.fillRect(0, 0, 10, 10);
  context.fillStyle = 'rgba(255, 255, 255, 0.55)';
  context.strokeStyle = 'rgba(255, 255, 255, 0.55)';
  if (pattern === 'stripes') {
    context.lineWidth = 2;
    context.beginPath();
    context.moveTo(0, 10);
    context.lineTo(10, 0);
    context.moveTo(-5, 5);
    context.lineTo(5, -5);
    context.moveTo(5, 15);
    context.lineTo(15, 5);
    context.stroke();
  } else {
    context.beginPath();
    context.arc(5, 5, 1.8, 0, 2 * Math.PI);
    context.fill();
  }
  return context.createPattern(tile, 'repeat') ?? colour;
}

/**
 * An API amount as a bar height. Only the drawing uses a float; every figure a person reads comes
 * from the table beside the chart, printed from the API's decimal text.
 */
export function barHeight(amount: string): number {
  const value = Number(amount);
  return Number.isFinite(value) ? value : 0;
}
