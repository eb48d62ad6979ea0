/*
 * Numbers as the estimate and the takeoff print them, the same in the browser, the server and
 * the PDF. Figures are grouped the US way ("1,204.5"): the firm's language setting does not
 * reach number formats yet.
 */
import { cachedNumberFormat } from './intl-cache';

/** At most `digits` decimals, no trailing zeros, no grouping: "9", "4.5", "282.74". For labels, sketches and form fields. */
export function plainNumber(value: number, digits = 2): string {
  return String(Number(value.toFixed(digits)));
}

/** Grouped, at most `digits` decimals: "1,204.5". For hours, days and quantities to buy. */
export function roundedNumber(value: number, digits = 2): string {
  return cachedNumberFormat('en-US', { maximumFractionDigits: digits }).format(value);
}

/** Grouped, exactly `digits` decimals: "1,204.50". For measured areas and lengths. */
export function fixedNumber(value: number, digits = 2): string {
  return cachedNumberFormat('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits }).format(value);
}
