import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { requireFiniteNumber, toDecimal } from '../errors/input-checks';

export type LengthUnit = 'mm' | 'cm' | 'm' | 'in' | 'ft' | 'yd';

/**
 * Metres per unit, as exact decimal strings: the inch is defined as 25.4 mm, so every
 * customary length here is an exact decimal (NIST Handbook 44 App. C; NIST SP 811 App. B.8).
 */
const METRES_PER: Readonly<Record<LengthUnit, string>> = {
  mm: '0.001',
  cm: '0.01',
  m: '1',
  in: '0.0254',
  ft: '0.3048',
  yd: '0.9144',
};

const METRES_PER_NUMBER: Readonly<Record<LengthUnit, number>> = mapToNumbers(METRES_PER);

function mapToNumbers<K extends string>(table: Readonly<Record<K, string>>): Record<K, number> {
  const out = {} as Record<K, number>;
  for (const key of Object.keys(table) as K[]) out[key] = Number(table[key]);
  return out;
}

export function isLengthUnit(unit: string): unit is LengthUnit {
  return Object.prototype.hasOwnProperty.call(METRES_PER, unit);
}

function requireLengthUnit(unit: string, field: string): LengthUnit {
  if (!isLengthUnit(unit)) throw new DomainInputError(field, `"${unit}" is not a length unit.`);
  return unit;
}

/**
 * The factors for converting between two units, checked once. Estimates convert every surface
 * of a finish system with the same units, so they look the units up once and reuse this.
 */
export interface UnitScale {
  same: boolean;
  /** metres per `from` unit over metres per `to` unit */
  ratio: number;
  fromMetres: number;
  toMetres: number;
}

export function unitScale(from: LengthUnit, to: LengthUnit): UnitScale {
  requireLengthUnit(from, 'from');
  requireLengthUnit(to, 'to');
  const fromMetres = METRES_PER_NUMBER[from];
  const toMetres = METRES_PER_NUMBER[to];
  return { same: from === to, ratio: fromMetres / toMetres, fromMetres, toMetres };
}

/** The one length formula; `convertLength` and the estimate's hot loop both use it. */
export function scaleLength(value: number, s: UnitScale): number {
  return s.same ? value : (value * s.fromMetres) / s.toMetres;
}

/** The one area formula (kept as value × ratio × ratio so results do not move by an ulp). */
export function scaleArea(value: number, s: UnitScale): number {
  return s.same ? value : value * s.ratio * s.ratio;
}

/** Fast path for geometry: plain numbers are fine for measured dimensions. */
export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  requireFiniteNumber(value, 'value');
  return scaleLength(value, unitScale(from, to));
}

/** Area in `from`² to `to`²; areas are always kept in a length unit squared. */
export function convertArea(value: number, from: LengthUnit, to: LengthUnit): number {
  requireFiniteNumber(value, 'value');
  return scaleArea(value, unitScale(from, to));
}

/** Exact path, for audits and tests: the factors are exact decimals. */
export function convertLengthExact(value: Decimal.Value, from: LengthUnit, to: LengthUnit): Decimal {
  requireLengthUnit(from, 'from');
  requireLengthUnit(to, 'to');
  return toDecimal(value, 'value', 'value').times(METRES_PER[from]).div(METRES_PER[to]);
}

export function convertAreaExact(value: Decimal.Value, from: LengthUnit, to: LengthUnit): Decimal {
  requireLengthUnit(from, 'from');
  requireLengthUnit(to, 'to');
  const ratio = new Decimal(METRES_PER[from]).div(METRES_PER[to]);
  return toDecimal(value, 'value', 'value').times(ratio).times(ratio);
}
