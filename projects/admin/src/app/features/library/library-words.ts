import type { FinishLayerInput, ProductKind, ProductView } from '@layerbook/contracts';

// Kept here rather than imported from the contracts package: see core/auth/roles.ts for why.
// The `satisfies` checks and the `Missing…` types fail the build if the API's choices change.

export type QuantityUnit = ProductView['unit'];
export type LengthUnit = FinishLayerInput['productionRate']['lengthUnit'];
export type ApplicationMethod = FinishLayerInput['method'];
export type CoverageKind = FinishLayerInput['coverage']['kind'];
export type DilutionConvention = NonNullable<FinishLayerInput['dilution']>['convention'];
export type RecipeBasis = NonNullable<FinishLayerInput['recipe']>['by'];
export type MultiplierName = keyof NonNullable<FinishLayerInput['multipliers']>;

export const PRODUCT_KIND_CHOICES = [
  { value: 'primer', label: 'Primer' },
  { value: 'paint', label: 'Paint' },
  { value: 'plaster', label: 'Plaster' },
  { value: 'lime', label: 'Lime (putty, wash)' },
  { value: 'glaze', label: 'Glaze' },
  { value: 'medium', label: 'Medium' },
  { value: 'colorant', label: 'Colorant' },
  { value: 'sealer', label: 'Sealer' },
  { value: 'wax', label: 'Wax' },
  { value: 'solvent', label: 'Solvent' },
  { value: 'other', label: 'Other' },
] as const satisfies readonly { value: ProductKind; label: string }[];

export const VOLUME_UNIT_CHOICES = [
  { value: 'gallon', label: 'gallon (gal)' },
  { value: 'quart', label: 'quart (qt)' },
  { value: 'pint', label: 'pint (pt)' },
  { value: 'cup', label: 'cup' },
  { value: 'floz', label: 'fluid ounce (fl oz)' },
  { value: 'tbsp', label: 'tablespoon (tbsp)' },
  { value: 'tsp', label: 'teaspoon (tsp)' },
  { value: 'L', label: 'litre (L)' },
  { value: 'mL', label: 'millilitre (mL)' },
  { value: 'm3', label: 'cubic metre (m³)' },
  { value: 'cm3', label: 'cubic centimetre (cm³)' },
  { value: 'ft3', label: 'cubic foot (ft³)' },
  { value: 'in3', label: 'cubic inch (in³)' },
] as const satisfies readonly { value: QuantityUnit; label: string }[];

export const MASS_UNIT_CHOICES = [
  { value: 'lb', label: 'pound (lb)' },
  { value: 'oz', label: 'ounce (oz)' },
  { value: 'kg', label: 'kilogram (kg)' },
  { value: 'g', label: 'gram (g)' },
] as const satisfies readonly { value: QuantityUnit; label: string }[];

export const UNIT_GROUPS = [
  { label: 'By volume', units: VOLUME_UNIT_CHOICES },
  { label: 'By weight', units: MASS_UNIT_CHOICES },
] as const;

/** Short forms for tables and sentences ("400 ft² per gal"). */
export const UNIT_SHORT: Readonly<Record<QuantityUnit, string>> = {
  gallon: 'gal', quart: 'qt', pint: 'pt', cup: 'cup', floz: 'fl oz', tbsp: 'tbsp', tsp: 'tsp',
  L: 'L', mL: 'mL', m3: 'm³', cm3: 'cm³', ft3: 'ft³', in3: 'in³', lb: 'lb', oz: 'oz', kg: 'kg', g: 'g',
};

/** Surfaces are counted in a length unit squared (running length for trim, but the unit is the same). */
export const AREA_UNIT_CHOICES = [
  { value: 'ft', label: 'ft²' },
  { value: 'm', label: 'm²' },
  { value: 'yd', label: 'yd²' },
  { value: 'in', label: 'in²' },
  { value: 'cm', label: 'cm²' },
  { value: 'mm', label: 'mm²' },
] as const satisfies readonly { value: LengthUnit; label: string }[];

export const AREA_SHORT: Readonly<Record<LengthUnit, string>> = { ft: 'ft²', m: 'm²', yd: 'yd²', in: 'in²', cm: 'cm²', mm: 'mm²' };

export const METHOD_CHOICES = [
  { value: 'roll', label: 'Roll' },
  { value: 'brush', label: 'Brush' },
  { value: 'spray', label: 'Spray' },
  { value: 'trowel', label: 'Trowel' },
  { value: 'burnish', label: 'Burnish' },
  { value: 'glaze', label: 'Glaze and work (rag, sponge, strié)' },
  { value: 'wax', label: 'Wax and buff' },
  { value: 'sand', label: 'Sand' },
  { value: 'stencil', label: 'Stencil' },
  { value: 'other', label: 'Other' },
] as const satisfies readonly { value: ApplicationMethod; label: string }[];

export const DILUTION_CHOICES = [
  { value: 'ofConcentrate', label: 'Share of the product', explain: '10 % means 1 part water to 10 parts product as bought.' },
  { value: 'ofMix', label: 'Share of the final mix', explain: '10 % means water is one tenth of the bucket once mixed.' },
] as const satisfies readonly { value: DilutionConvention; label: string; explain: string }[];

export const MULTIPLIER_CHOICES = [
  { value: 'ceiling', label: 'Ceiling' },
  { value: 'height', label: 'High work' },
  { value: 'curvedWall', label: 'Curved wall' },
  { value: 'curvedCeiling', label: 'Dome or vault' },
  { value: 'occupied', label: 'Occupied home' },
] as const satisfies readonly { value: MultiplierName; label: string }[];

/** Waits the trade names most often (DOMAIN.md §2.7): set, recoat, overnight, a day, a short cure. */
export const WAIT_PICKS = [
  { hours: 1, label: '1 h' },
  { hours: 4, label: '4 h' },
  { hours: 16, label: 'overnight (16 h)' },
  { hours: 24, label: '24 h' },
  { hours: 72, label: '3 days' },
] as const;

/** 29 CFR 1910.106(a)(19): flash point below 73.4 °F (23 °C) is a flammable liquid (mirrors FLAMMABLE_BELOW_C). */
export const FLAMMABLE_BELOW_C = 23;

type Missing<T, L extends readonly { value: unknown }[]> = Exclude<T, L[number]['value']>;
export const ALL_LIBRARY_CHOICES_LISTED: [
  | Missing<ProductKind, typeof PRODUCT_KIND_CHOICES>
  | Missing<QuantityUnit, [...typeof VOLUME_UNIT_CHOICES, ...typeof MASS_UNIT_CHOICES]>
  | Missing<LengthUnit, typeof AREA_UNIT_CHOICES>
  | Missing<ApplicationMethod, typeof METHOD_CHOICES>
  | Missing<DilutionConvention, typeof DILUTION_CHOICES>
  | Missing<MultiplierName, typeof MULTIPLIER_CHOICES>,
] extends [never]
  ? true
  : never = true;

export const kindLabel = (kind: ProductKind) => PRODUCT_KIND_CHOICES.find((k) => k.value === kind)?.label ?? kind;
export const methodLabel = (m: ApplicationMethod) => METHOD_CHOICES.find((c) => c.value === m)?.label ?? m;
export const isMassUnit = (unit: QuantityUnit) => MASS_UNIT_CHOICES.some((u) => u.value === unit);

/** "16 h", "72 h (3 days)". */
export function waitText(hours: number): string {
  if (hours === 0) return 'no wait';
  const h = `${Number(hours.toFixed(2))} h`;
  if (hours < 48) return h;
  const days = Math.floor(hours / 24);
  const rest = Number((hours - days * 24).toFixed(2));
  return `${h} (${days} days${rest ? ` ${rest} h` : ''})`;
}

export interface HazardWord {
  readonly icon: string;
  readonly text: string;
}

/** Hazard flags in words with an icon (never colour alone). */
export function hazardWords(h: { flashPointC?: number; isLime?: boolean; containsSilica?: boolean }): HazardWord[] {
  const words: HazardWord[] = [];
  if (h.flashPointC !== undefined && h.flashPointC < FLAMMABLE_BELOW_C) {
    words.push({ icon: 'local_fire_department', text: `Flammable (flash point ${h.flashPointC} °C)` });
  }
  if (h.isLime) words.push({ icon: 'science', text: 'Caustic (lime)' });
  if (h.containsSilica) words.push({ icon: 'masks', text: 'Contains silica' });
  return words;
}
