import { convertLength, type LengthUnit } from './length';
import { cachedNumberFormat } from './intl-cache';

/**
 * Numbers and lengths as people type them into the takeoff form: "9.5", "9,5" where the locale
 * writes a decimal comma, and feet with inches ("6' 6\"", "6'6\"", "6'-6\"", "6 ft 6 in", "6' 6 1/2\"").
 * Blank is null; anything else that cannot be read is NaN, so each rule can say what is wrong.
 *
 * Grouping marks are never read ("1 000", "1,000", "1.000" are refused or read as decimals), and a
 * comma is a decimal mark only where the locale uses one: "1,5" could be one and a half or fifteen,
 * and a wrong guess would go straight into an estimate. A dot is read as a decimal mark everywhere
 * (phone keypads offer it in every locale), so a figure the form printed reads back the same.
 */

/** The mark a locale writes between whole and fraction. */
export type DecimalMark = '.' | ',';

/** The decimal mark of a BCP 47 locale ("de-DE" → ",", "en-US" → "."); unknown locales use the dot. */
export function decimalMarkOf(locale: string | null | undefined): DecimalMark {
  try {
    const part = cachedNumberFormat(locale ?? 'en-US')
      .formatToParts(1.5)
      .find((p) => p.type === 'decimal');
    return part?.value === ',' ? ',' : '.';
  } catch {
    return '.';
  }
}

/** Typographic and phone-keyboard quotes and primes read as the plain foot and inch marks. */
function plainMarks(text: string): string {
  return text
    .replace(/[\u2019\u2018\u2032\u02B9\u00B4`]/g, "'")
    .replace(/[\u201C\u201D\u2033\u02BA]/g, '"')
    .replace(/''/g, '"');
}

/** A decimal figure with at most one mark, no grouping: "9", "9.5", ".5", "12." (and "9,5" when the mark is a comma). */
function decimalFigure(text: string, mark: DecimalMark): number {
  const marks = mark === ',' ? '[.,]' : '\\.';
  if (!new RegExp(`^(\\d+${marks}?\\d*|${marks}\\d+)$`).test(text)) return Number.NaN;
  return Number(text.replace(',', '.'));
}

/** Inches as a figure, a fraction ("1/2") or both ("6 1/2"); NaN when the fraction is not a proper one. */
function inchFigure(text: string, mark: DecimalMark): number {
  const m = /^(?:(\S+)\s+)?(\d+)\/(\d+)$/.exec(text);
  if (!m) return decimalFigure(text, mark);
  const whole = m[1] === undefined ? 0 : decimalFigure(m[1], mark);
  const [num, den] = [Number(m[2]), Number(m[3])];
  if (den === 0 || num >= den || !Number.isInteger(whole)) return Number.NaN;
  return whole + num / den;
}

const FEET = String.raw`(?:'|ft\.?|feet|foot)`;
const INCHES = String.raw`(?:"|in\.?|inch(?:es)?)`;
const FIGURE = String.raw`[\d.,]+(?:\s+\d+/\d+)?|\d+/\d+`;
const FEET_AND_INCHES = new RegExp(String.raw`^(?:([\d.,]+)\s*${FEET})\s*(?:-?\s*(${FIGURE})\s*${INCHES}?)?$`, 'i');
const INCHES_ONLY = new RegExp(String.raw`^(${FIGURE})\s*${INCHES}$`, 'i');

/** A plain number as typed (counts, areas, angles): null when blank, NaN when it is not one number. */
export function readTypedNumber(typed: string | null | undefined, mark: DecimalMark = '.'): number | null {
  const plain = (typed ?? '').trim();
  if (plain === '') return null;
  const negative = plain.startsWith('-');
  const value = decimalFigure(negative ? plain.slice(1) : plain, mark);
  return negative ? -value : value;
}

/**
 * A length as typed, in `unit`: a plain number is already in the form's unit; feet and inches are
 * converted to it (6' 6" is 6.5 ft or 1.9812 m). Inches after feet stay under 12.
 */
export function readTypedLength(typed: string | null | undefined, unit: LengthUnit, mark: DecimalMark = '.'): number | null {
  const plain = plainMarks((typed ?? '').trim());
  if (plain === '') return null;
  const negative = plain.startsWith('-');
  const body = (negative ? plain.slice(1) : plain).trim();
  let inches: number;
  const both = FEET_AND_INCHES.exec(body);
  const only = both ? null : INCHES_ONLY.exec(body);
  if (both) {
    const feet = decimalFigure(both[1], mark);
    const extra = both[2] === undefined ? 0 : inchFigure(both[2].trim(), mark);
    if (extra >= 12) return Number.NaN;
    inches = feet * 12 + extra;
  } else if (only) {
    inches = inchFigure(only[1].trim(), mark);
  } else {
    const value = readTypedNumber(body, mark);
    return value === null ? Number.NaN : negative ? -value : value;
  }
  if (Number.isNaN(inches)) return Number.NaN;
  const value = unit === 'ft' ? inches / 12 : convertLength(inches, 'in', unit);
  return negative ? -value : value;
}
