import type { ApplicationMethod, LengthUnit, QuantityUnit } from '@layerbook/domain';
import { z } from 'zod';

/*
 * The library stores layers and products in exactly the shapes @layerbook/domain computes with,
 * so the lists below mirror the domain's union types; the `satisfies` and `[Missing] extends
 * [never]` checks fail the build if the two drift apart (only types cross the package line).
 */

export const VOLUME_UNITS = ['mL', 'L', 'cm3', 'm3', 'in3', 'ft3', 'tsp', 'tbsp', 'floz', 'cup', 'pint', 'quart', 'gallon'] as const;
export const MASS_UNITS = ['g', 'kg', 'oz', 'lb'] as const;
export const QUANTITY_UNITS = [...VOLUME_UNITS, ...MASS_UNITS] as const satisfies readonly QuantityUnit[];
export const LENGTH_UNITS = ['ft', 'in', 'yd', 'm', 'cm', 'mm'] as const satisfies readonly LengthUnit[];
export const APPLICATION_METHODS = ['roll', 'brush', 'spray', 'trowel', 'burnish', 'glaze', 'wax', 'sand', 'stencil', 'other'] as const satisfies readonly ApplicationMethod[];

type MissingQuantity = Exclude<QuantityUnit, (typeof QUANTITY_UNITS)[number]>;
type MissingLength = Exclude<LengthUnit, (typeof LENGTH_UNITS)[number]>;
type MissingMethod = Exclude<ApplicationMethod, (typeof APPLICATION_METHODS)[number]>;
export const ALL_LIBRARY_UNITS_LISTED: [MissingQuantity | MissingLength | MissingMethod] extends [never] ? true : never = true;

export const quantityUnit = z.enum(QUANTITY_UNITS, { error: 'Choose a unit from the list, like gallon, quart, L or kg.' });
export const lengthUnit = z.enum(LENGTH_UNITS, { error: 'Choose ft, in, yd, m, cm or mm.' });
export const applicationMethod = z.enum(APPLICATION_METHODS, { error: 'Choose how the layer goes on: roll, brush, trowel, glaze…' });

/** Buying by weight and spreading by volume needs a density, which the library does not hold. */
export function isMassUnit(unit: QuantityUnit): boolean {
  return (MASS_UNITS as readonly string[]).includes(unit);
}

/** A finite number with one message for "missing or not a number" and one for the range. */
export const numberField = (missing: string) => z.number({ error: missing }).finite({ error: missing });
