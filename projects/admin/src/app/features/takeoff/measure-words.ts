import type { SurfaceMeasure } from '@layerbook/domain';
import { amount } from './number-text';

/** "504.49 ft²" for areas, "56.55 ft run" for crown, borders and beams counted by length. */
export function quantityText(measure: Pick<SurfaceMeasure, 'measure' | 'quantity'>, unit: string): string {
  return measure.measure === 'area' ? `${amount(measure.quantity)} ${unit}²` : `${amount(measure.quantity)} ${unit} run`;
}

/** The working behind the number: "2π·r·H − openings: 565.49 − 61.00". */
export function workingText(m: SurfaceMeasure): string {
  return m.deductions > 0 ? `${m.formula}: ${amount(m.gross)} − ${amount(m.deductions)}` : m.formula;
}

export function totalsText(totals: { area: number; length: number }, unit: string): string {
  const parts = [`${amount(totals.area)} ${unit}² of surface`];
  if (totals.length > 0) parts.push(`${amount(totals.length)} ${unit} of running length`);
  return parts.join(', ');
}
