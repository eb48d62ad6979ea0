import type Decimal from 'decimal.js';
import type { EstimateResult } from '@layerbook/domain';

/** A value as it crosses JSON: Decimal#toJSON writes money and ratios as decimal strings. */
export type Jsonified<T> = T extends Decimal
  ? string
  : T extends ReadonlyArray<infer U>
    ? Jsonified<U>[]
    : T extends object
      ? { [K in keyof T]: Jsonified<T[K]> }
      : T;

/**
 * One option's numbers in the shape the server stores them. The builder turns its live
 * results into the same shape, so one set of sections shows both and money stays a string.
 */
export type ResultJson = Jsonified<EstimateResult>;

export function toResultJson(result: EstimateResult): ResultJson {
  return JSON.parse(JSON.stringify(result)) as ResultJson;
}
