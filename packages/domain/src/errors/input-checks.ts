import Decimal from 'decimal.js';
import { DomainInputError } from './domain-input-error';

/** Guards shared by every feature so each bad input fails the same way, naming its field. */

export function requireFiniteNumber(value: number, field: string, label = 'value'): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new DomainInputError(field, `The ${label} must be a finite number.`);
  }
  return value;
}

export function requirePositive(value: number, field: string, label = 'value'): number {
  requireFiniteNumber(value, field, label);
  if (value <= 0) throw new DomainInputError(field, `The ${label} must be greater than zero.`);
  return value;
}

/** True exactly when `requireNonNegative` passes; hot loops build the field path only on failure. */
export function isNonNegativeNumber(value: unknown): boolean {
  return typeof value === 'number' && Number.isFinite(value) && value >= 0;
}

export function requireNonNegative(value: number, field: string, label = 'value'): number {
  requireFiniteNumber(value, field, label);
  if (value < 0) throw new DomainInputError(field, `The ${label} cannot be negative.`);
  return value;
}

export function requireInteger(value: number, field: string, min: number, label = 'value'): number {
  requireFiniteNumber(value, field, label);
  if (!Number.isInteger(value) || value < min) {
    throw new DomainInputError(field, `The ${label} must be a whole number of at least ${min}.`);
  }
  return value;
}

/** A share of something, 0 to 1 inclusive (0.3 means 30 %). */
export function requireFraction(value: number, field: string, label = 'share'): number {
  requireFiniteNumber(value, field, label);
  if (value < 0 || value > 1) {
    throw new DomainInputError(field, `The ${label} must be between 0 and 1 (0 % to 100 %).`);
  }
  return value;
}

/** `Array.isArray` without its narrowing, which turns a readonly array's type into `any[]`. */
export function isArray(value: unknown): boolean {
  return Array.isArray(value);
}

export function requireNonEmpty<T>(list: readonly T[], field: string, label = 'list'): readonly T[] {
  if (!isArray(list) || list.length === 0) {
    throw new DomainInputError(field, `The ${label} cannot be empty.`);
  }
  return list;
}

/** Parses a decimal input; money is never accepted as a JS float, ratios may be. */
export function toDecimal(value: Decimal.Value, field: string, label = 'amount'): Decimal {
  let parsed: Decimal;
  try {
    parsed = new Decimal(value);
  } catch {
    throw new DomainInputError(field, `The ${label} is not a number.`);
  }
  if (!parsed.isFinite()) throw new DomainInputError(field, `The ${label} must be finite.`);
  return parsed;
}

export function toMoney(value: string | Decimal, field: string, label = 'amount'): Decimal {
  if (typeof value === 'number') {
    throw new DomainInputError(field, `The ${label} must be a decimal string, not a float.`);
  }
  return toDecimal(value, field, label);
}

export function toNonNegativeMoney(value: string | Decimal, field: string, label = 'amount'): Decimal {
  const parsed = toMoney(value, field, label);
  if (parsed.isNegative()) throw new DomainInputError(field, `The ${label} cannot be negative.`);
  return parsed;
}
