import { fixedNumber } from '../units/number-text';
import type { SurfaceMeasure } from './surface-shape';

/** "504.49 ft²" for areas, "56.55 ft run" for crown, borders and beams counted by length. */
export function measureText(m: Pick<SurfaceMeasure, 'measure' | 'quantity'>, lengthUnit: string): string {
  return m.measure === 'area' ? `${fixedNumber(m.quantity)} ${lengthUnit}²` : `${fixedNumber(m.quantity)} ${lengthUnit} run`;
}

/** The working behind the number: "2π·r·H − openings: 565.49 − 61.00". */
export function workingText(m: Pick<SurfaceMeasure, 'formula' | 'gross' | 'deductions'>): string {
  return m.deductions > 0 ? `${m.formula}: ${fixedNumber(m.gross)} − ${fixedNumber(m.deductions)}` : m.formula;
}

/** "1,204.50 ft² of surface, 56.55 ft of running length" (the length only when there is some). */
export function totalsText(totals: { readonly area: number; readonly length: number }, lengthUnit: string): string {
  const parts = [`${fixedNumber(totals.area)} ${lengthUnit}² of surface`];
  if (totals.length > 0) parts.push(`${fixedNumber(totals.length)} ${lengthUnit} of running length`);
  return parts.join(', ');
}
