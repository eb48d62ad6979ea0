import { requireInteger, requireNonNegative, requirePositive } from '../errors/input-checks';

/*
 * The input checks of the shared guards, with the field path (`${field}.${name}`) built only
 * when a value fails: every surface of every estimate recompute passes through these.
 */

export function positiveAt(value: number, field: string, name: string, label: string): number {
  return typeof value === 'number' && value > 0 && value < Infinity ? value : requirePositive(value, `${field}.${name}`, label);
}

export function nonNegativeAt(value: number, field: string, name: string, label: string): number {
  return typeof value === 'number' && value >= 0 && value < Infinity ? value : requireNonNegative(value, `${field}.${name}`, label);
}

export function integerAt(value: number, field: string, name: string, min: number, label: string): number {
  return Number.isInteger(value) && value >= min ? value : requireInteger(value, `${field}.${name}`, min, label);
}
