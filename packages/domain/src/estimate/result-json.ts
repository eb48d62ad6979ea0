import type Decimal from 'decimal.js';
import type { EstimateResult } from './compute-estimate';

/** A value as it crosses JSON: Decimal#toJSON writes money and ratios as decimal strings. */
export type Jsonified<T> = T extends Decimal
  ? string
  : T extends ReadonlyArray<infer U>
    ? Jsonified<U>[]
    : T extends object
      ? { [K in keyof T]: Jsonified<T[K]> }
      : T;

/**
 * One option's numbers as the server stores and sends them, and as the browser shows its live
 * results: the same shape either way, with money as decimal strings (never floats).
 */
export type EstimateResultJson = Jsonified<EstimateResult>;

export function toResultJson(result: EstimateResult): EstimateResultJson {
  return JSON.parse(JSON.stringify(result)) as EstimateResultJson;
}
