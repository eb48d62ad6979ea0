import type { MoneyInput } from '../money/money';
import type { LengthUnit } from '../units/length';
import type { QuantityUnit } from '../units/quantity-unit';

export type ApplicationMethod = 'roll' | 'brush' | 'spray' | 'trowel' | 'burnish' | 'glaze' | 'wax' | 'sand' | 'stencil' | 'other';

/**
 * How far a product goes, per coat. `lengthUnit` says which unit the surface is counted in:
 * unit² for area surfaces, unit for running items (crown, borders).
 * - spreadRate: surface per product unit, e.g. 400 ft² per gallon (paints, glazes)
 * - consumption: product per surface, e.g. 0.5 kg per m² (plasters; data sheets give kg/m²)
 */
export type Coverage =
  | { kind: 'spreadRate'; surfacePerUnit: number; unit: QuantityUnit; lengthUnit: LengthUnit }
  | { kind: 'consumption'; unitPerSurface: number; unit: QuantityUnit; lengthUnit: LengthUnit };

/**
 * "Diluted 10 %" is ambiguous, so the convention is stored with the share:
 * - ofConcentrate: water = share × concentrate, so concentrate = mix / (1 + share)
 * - ofMix: water = share × final mix, so concentrate = mix × (1 − share)
 */
export interface Dilution {
  share: number;
  convention: 'ofConcentrate' | 'ofMix';
}

/** Parts by volume or by weight; the base is the component the others are measured against. */
export interface MixRecipe {
  by: 'volume' | 'weight';
  baseProductId: string;
  components: ReadonlyArray<{ productId: string; parts: number }>;
}

export interface LabourMultipliers {
  ceiling?: number;
  /** work whose top is above the firm's scaffold height */
  height?: number;
  curvedWall?: number;
  /** domes, vaults, turrets */
  curvedCeiling?: number;
  /** occupied or furnished home */
  occupied?: number;
}

export interface ProductionRate {
  /** surface one worker finishes per hour, per coat */
  surfacePerHour: number;
  lengthUnit: LengthUnit;
}

export interface FinishLayer {
  id: string;
  name: string;
  method: ApplicationMethod;
  /** the product applied as is; omit when `recipe` names the components */
  productId?: string;
  recipe?: MixRecipe;
  /** coverage of what goes on the wall (the mix, when diluted or mixed) */
  coverage: Coverage;
  coats: number;
  /** per-coat coverage (first coats on porous substrates go less far); length must equal `coats` */
  coatCoverages?: Coverage[];
  /** share of the surface this layer covers, 0–1 (default 1) */
  coverageShare?: number;
  dilution?: Dilution;
  /** 0.10 for 10 % */
  waste: number;
  productionRate: ProductionRate;
  /** overrides of the firm's default multipliers for this layer */
  multipliers?: LabourMultipliers;
  /** calendar hours to wait after this layer before the next one on the same surface */
  waitHoursAfter: number;
}

export interface FinishSystem {
  id: string;
  name: string;
  layers: FinishLayer[];
}

export interface Container {
  label: string;
  size: number;
  unit: QuantityUnit;
  price: MoneyInput;
}

export interface ProductHazards {
  /** closed-cup flash point in °C, from the SDS */
  flashPointC?: number;
  /** initial boiling point in °C, from the SDS; splits flammable categories 1 and 2 (29 CFR 1910.106(a)(19)) */
  boilingPointC?: number;
  /** hydrated lime, lime putty, lime-based plasters and washes */
  isLime?: boolean;
  /** SDS section 3 lists crystalline silica */
  containsSilica?: boolean;
  /** drying oils (linseed, tung; oil glazes, waxes with drying oils): soaked rags self-heat */
  containsDryingOil?: boolean;
}

export interface Product {
  id: string;
  name: string;
  /** unit totals are reported in */
  unit: QuantityUnit;
  containers: Container[];
  hazards?: ProductHazards;
}
