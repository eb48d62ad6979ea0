import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { requireFiniteNumber, toDecimal } from '../errors/input-checks';

/** US customary kitchen and trade volumes, cubic units, and metric volumes. */
export type VolumeUnit = 'mL' | 'L' | 'cm3' | 'm3' | 'in3' | 'ft3' | 'tsp' | 'tbsp' | 'floz' | 'cup' | 'pint' | 'quart' | 'gallon';

export type MassUnit = 'g' | 'kg' | 'oz' | 'lb';

/** What a product is measured and bought in. */
export type QuantityUnit = VolumeUnit | MassUnit;

export type Dimension = 'volume' | 'mass';

/**
 * Millilitres per unit, exact. 1 US gal = 231 in³ exactly and 1 in = 2.54 cm, so
 * 1 gal = 3785.411784 mL and every smaller US unit is an exact binary fraction of it
 * (NIST Handbook 44 App. C; NIST SP 811 App. B.8 lists the rounded factors).
 */
const MILLILITRES_PER: Readonly<Record<VolumeUnit, string>> = {
  mL: '1',
  L: '1000',
  cm3: '1',
  m3: '1000000',
  in3: '16.387064',
  ft3: '28316.846592',
  tsp: '4.92892159375',
  tbsp: '14.78676478125',
  floz: '29.5735295625',
  cup: '236.5882365',
  pint: '473.176473',
  quart: '946.352946',
  gallon: '3785.411784',
};

/** Grams per unit. The avoirdupois pound is 0.45359237 kg exactly (1959 agreement, from memory, unverified; NIST SP 811 App. B.8 lists 4.535 924 E−01). */
const GRAMS_PER: Readonly<Record<MassUnit, string>> = {
  g: '1',
  kg: '1000',
  oz: '28.349523125',
  lb: '453.59237',
};

const BASE_PER: Readonly<Record<QuantityUnit, string>> = { ...MILLILITRES_PER, ...GRAMS_PER };
const BASE_PER_NUMBER = Object.fromEntries(Object.entries(BASE_PER).map(([unit, factor]) => [unit, Number(factor)])) as Readonly<
  Record<QuantityUnit, number>
>;

export function isVolumeUnit(unit: string): unit is VolumeUnit {
  return Object.prototype.hasOwnProperty.call(MILLILITRES_PER, unit);
}

export function isMassUnit(unit: string): unit is MassUnit {
  return Object.prototype.hasOwnProperty.call(GRAMS_PER, unit);
}

export function dimensionOf(unit: QuantityUnit, field = 'unit'): Dimension {
  if (isVolumeUnit(unit)) return 'volume';
  if (isMassUnit(unit)) return 'mass';
  throw new DomainInputError(field, `"${String(unit)}" is not a volume or mass unit.`);
}

/** Base unit of each dimension: millilitres for volume, grams for mass. */
export function toBase(value: number, unit: QuantityUnit, field = 'unit'): number {
  requireFiniteNumber(value, 'value');
  dimensionOf(unit, field);
  return value * BASE_PER_NUMBER[unit];
}

export function fromBase(value: number, unit: QuantityUnit, field = 'unit'): number {
  requireFiniteNumber(value, 'value');
  dimensionOf(unit, field);
  return value / BASE_PER_NUMBER[unit];
}

function requireSameDimension(from: QuantityUnit, to: QuantityUnit): void {
  if (dimensionOf(from, 'from') !== dimensionOf(to, 'to')) {
    // Fluid ounces are volume and ounces are mass; crossing needs a density we do not have.
    throw new DomainInputError('to', `Cannot convert ${from} to ${to} without a density.`);
  }
}

export function convertQuantity(value: number, from: QuantityUnit, to: QuantityUnit): number {
  requireFiniteNumber(value, 'value');
  requireSameDimension(from, to);
  if (from === to) return value;
  return (value * BASE_PER_NUMBER[from]) / BASE_PER_NUMBER[to];
}

/** Exact decimal conversion, for recipes and audits. */
export function convertQuantityExact(value: Decimal.Value, from: QuantityUnit, to: QuantityUnit): Decimal {
  const exact = toDecimal(value, 'value', 'value');
  requireSameDimension(from, to);
  return exact.times(BASE_PER[from]).div(BASE_PER[to]);
}
