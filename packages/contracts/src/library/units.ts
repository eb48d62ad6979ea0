import { z } from 'zod';
import { APPLICATION_METHODS, LENGTH_UNITS, QUANTITY_UNITS } from './library-types';

export const quantityUnit = z.enum(QUANTITY_UNITS, { error: 'Choose a unit from the list, like gallon, quart, L or kg.' });
export const lengthUnit = z.enum(LENGTH_UNITS, { error: 'Choose ft, in, yd, m, cm or mm.' });
export const applicationMethod = z.enum(APPLICATION_METHODS, { error: 'Choose how the layer goes on: roll, brush, trowel, glaze…' });

/** A finite number with one message for "missing or not a number" and one for the range. */
export const numberField = (missing: string) => z.number({ error: missing }).finite({ error: missing });
