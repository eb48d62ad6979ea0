import type { TakeoffLengthUnit } from '@layerbook/contracts/types';
import { type DecimalMark, decimalMarkOf, readTypedLength, readTypedNumber } from '@layerbook/domain';

/**
 * The decimal mark of the person typing: their browser's language ("1,5" in a comma locale). The
 * server renders the empty form only, so it never reads a typed number and the dot is enough there.
 */
export function typedDecimalMark(): DecimalMark {
  return typeof navigator === 'undefined' ? '.' : decimalMarkOf(navigator.language);
}

/** Counts, areas and other plain numbers as typed: blank is null, anything else not a number NaN (see readTypedNumber). */
export function readNumber(typed: string | null | undefined, mark: DecimalMark = typedDecimalMark()): number | null {
  return readTypedNumber(typed, mark);
}

/** A length as typed, in the form's unit: "6' 6\"" and "6 ft 6 in" are read as well as "6.5" (see readTypedLength). */
export function readLength(
  typed: string | null | undefined,
  unit: TakeoffLengthUnit,
  mark: DecimalMark = typedDecimalMark(),
): number | null {
  return readTypedLength(typed, unit, mark);
}
