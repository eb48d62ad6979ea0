import type {
  ApplicationMethod,
  Coverage,
  FlammableCategory,
  FinishLayer,
  LabourMultipliers,
  LengthUnit,
  MixRecipe,
  ProductHazards,
  QuantityUnit,
} from '@layerbook/domain';

/*
 * The library's vocabulary, limits and answers, free of zod so the apps can import them
 * (`@layerbook/contracts/types`). The library stores products and layers in exactly the shapes
 * @layerbook/domain computes with, so the lists below mirror the domain's union types; the
 * `satisfies` and `[Missing] extends [never]` checks fail the build if the two drift apart.
 * Lists are in the order a person picks from them.
 */

export const VOLUME_UNITS = ['gallon', 'quart', 'pint', 'cup', 'floz', 'tbsp', 'tsp', 'L', 'mL', 'm3', 'cm3', 'ft3', 'in3'] as const;
export const MASS_UNITS = ['lb', 'oz', 'kg', 'g'] as const;
export const QUANTITY_UNITS = [...VOLUME_UNITS, ...MASS_UNITS] as const satisfies readonly QuantityUnit[];
/** Units a coverage or production rate counts surface in (unit² for areas, unit for running length). */
export const LENGTH_UNITS = ['ft', 'm', 'yd', 'in', 'cm', 'mm'] as const satisfies readonly LengthUnit[];
export const APPLICATION_METHODS = [
  'roll',
  'brush',
  'spray',
  'trowel',
  'burnish',
  'glaze',
  'wax',
  'sand',
  'stencil',
  'other',
] as const satisfies readonly ApplicationMethod[];
export const PRODUCT_KINDS = [
  'primer',
  'paint',
  'plaster',
  'lime',
  'glaze',
  'medium',
  'colorant',
  'sealer',
  'wax',
  'solvent',
  'other',
] as const;
export type ProductKind = (typeof PRODUCT_KINDS)[number];
export const COVERAGE_KINDS = ['spreadRate', 'consumption'] as const satisfies readonly Coverage['kind'][];
export type CoverageKind = (typeof COVERAGE_KINDS)[number];
export const DILUTION_CONVENTIONS = ['ofConcentrate', 'ofMix'] as const satisfies readonly NonNullable<
  FinishLayer['dilution']
>['convention'][];
export type DilutionConvention = (typeof DILUTION_CONVENTIONS)[number];
export const RECIPE_BASES = ['volume', 'weight'] as const satisfies readonly MixRecipe['by'][];
export type RecipeBasis = (typeof RECIPE_BASES)[number];
export const MULTIPLIER_NAMES = [
  'ceiling',
  'height',
  'curvedWall',
  'curvedCeiling',
  'occupied',
] as const satisfies readonly (keyof LabourMultipliers)[];
export type MultiplierName = (typeof MULTIPLIER_NAMES)[number];
/** Which part of the library a list shows. */
export const ARCHIVED_FILTERS = ['exclude', 'include', 'only'] as const;
export type ArchivedFilter = (typeof ARCHIVED_FILTERS)[number];

type MissingQuantity = Exclude<QuantityUnit, (typeof QUANTITY_UNITS)[number]>;
type MissingLength = Exclude<LengthUnit, (typeof LENGTH_UNITS)[number]>;
type MissingMethod = Exclude<ApplicationMethod, (typeof APPLICATION_METHODS)[number]>;
type MissingCoverage = Exclude<Coverage['kind'], CoverageKind>;
type MissingMultiplier = Exclude<keyof LabourMultipliers, MultiplierName>;
// One tuple slot per check: in a union the `never`s would merge and hide which list fell behind.
export const ALL_LIBRARY_UNITS_LISTED: [MissingQuantity, MissingLength, MissingMethod, MissingCoverage, MissingMultiplier] extends [
  never,
  never,
  never,
  never,
  never,
]
  ? true
  : never = true;

export const PRODUCT_KIND_LABELS: Readonly<Record<ProductKind, string>> = {
  primer: 'Primer',
  paint: 'Paint',
  plaster: 'Plaster',
  lime: 'Lime (putty, wash)',
  glaze: 'Glaze',
  medium: 'Medium',
  colorant: 'Colorant',
  sealer: 'Sealer',
  wax: 'Wax',
  solvent: 'Solvent',
  other: 'Other',
};

/** Short forms for tables and sentences ("400 ft² per gal", "3 × 1 gal"). */
export const QUANTITY_UNIT_SYMBOLS: Readonly<Record<QuantityUnit, string>> = {
  gallon: 'gal',
  quart: 'qt',
  pint: 'pt',
  cup: 'cup',
  floz: 'fl oz',
  tbsp: 'tbsp',
  tsp: 'tsp',
  L: 'L',
  mL: 'mL',
  m3: 'm³',
  cm3: 'cm³',
  ft3: 'ft³',
  in3: 'in³',
  lb: 'lb',
  oz: 'oz',
  kg: 'kg',
  g: 'g',
};

/** Names in pickers: "gallon (gal)". */
export const QUANTITY_UNIT_LABELS: Readonly<Record<QuantityUnit, string>> = {
  gallon: 'gallon (gal)',
  quart: 'quart (qt)',
  pint: 'pint (pt)',
  cup: 'cup',
  floz: 'fluid ounce (fl oz)',
  tbsp: 'tablespoon (tbsp)',
  tsp: 'teaspoon (tsp)',
  L: 'litre (L)',
  mL: 'millilitre (mL)',
  m3: 'cubic metre (m³)',
  cm3: 'cubic centimetre (cm³)',
  ft3: 'cubic foot (ft³)',
  in3: 'cubic inch (in³)',
  lb: 'pound (lb)',
  oz: 'ounce (oz)',
  kg: 'kilogram (kg)',
  g: 'gram (g)',
};

/** Surface counted in a length unit squared: "ft²". */
export const AREA_UNIT_SYMBOLS: Readonly<Record<LengthUnit, string>> = { ft: 'ft²', m: 'm²', yd: 'yd²', in: 'in²', cm: 'cm²', mm: 'mm²' };

export const APPLICATION_METHOD_LABELS: Readonly<Record<ApplicationMethod, string>> = {
  roll: 'Roll',
  brush: 'Brush',
  spray: 'Spray',
  trowel: 'Trowel',
  burnish: 'Burnish',
  glaze: 'Glaze and work (rag, sponge, strié)',
  wax: 'Wax and buff',
  sand: 'Sand',
  stencil: 'Stencil',
  other: 'Other',
};

export const DILUTION_CONVENTION_LABELS: Readonly<Record<DilutionConvention, { readonly label: string; readonly explain: string }>> = {
  ofConcentrate: { label: 'Share of the product', explain: '10 % means 1 part water to 10 parts product as bought.' },
  ofMix: { label: 'Share of the final mix', explain: '10 % means water is one tenth of the bucket once mixed.' },
};

/** What each labour multiplier is for, in the library's layer form and in the estimate's labour lines. */
export const MULTIPLIER_LABELS: Readonly<Record<MultiplierName, string>> = {
  ceiling: 'Ceiling',
  height: 'High work',
  curvedWall: 'Curved wall',
  curvedCeiling: 'Dome or vault',
  occupied: 'Occupied home',
};

/**
 * 29 CFR 1910.106(a)(19): a liquid with a flash point at or below 93 °C (199.4 °F) is flammable, in four
 * categories (below 23 °C: 1 or 2 by boiling point; 23–60 °C: 3; above 60 up to 93 °C: 4). The domain's
 * `flammableClass` decides the category; apps and server both call it.
 */
export { FLAMMABLE_FLASH_MAX_C } from '@layerbook/domain';
import { DILUTION_OF_CONCENTRATE_MAX, WASTE_MAX } from '@layerbook/domain';

export const PRODUCT_LIMITS = {
  nameMax: 120,
  notesMax: 2000,
  sdsUrlMax: 500,
  containerLabelMax: 40,
  containersMax: 12,
  flashPointMinC: -100,
  flashPointMaxC: 400,
  boilingPointMinC: -100,
  boilingPointMaxC: 600,
} as const;

export const FINISH_SYSTEM_LIMITS = {
  nameMax: 120,
  descriptionMax: 2000,
  layersMax: 30,
  layerNameMax: 120,
  /** made by the browser; letters, digits, - and _ */
  layerIdMax: 64,
  coatsMax: 20,
  /** A waiting time longer than 90 days is not a layer wait; it is a second job. */
  waitHoursMax: 90 * 24,
  multiplierMin: 1,
  multiplierMax: 5,
  recipeProductsMin: 2,
  recipeProductsMax: 8,
  /** water as a share of the product: up to 10 parts to 1 (the domain's DILUTION_OF_CONCENTRATE_MAX) */
  dilutionOfConcentrateMax: DILUTION_OF_CONCENTRATE_MAX,
  /** the domain's WASTE_MAX: 100 % */
  wasteMax: WASTE_MAX,
} as const;

/* Request bodies, as the apps send them; the zod schemas in product.ts and finish-system.ts are checked against these. */

export interface ContainerInput {
  label: string;
  size: number;
  unit: QuantityUnit;
  /** a decimal string, like "45.00" */
  price: string;
}

export type ProductHazardsInput = ProductHazards;

export interface ProductInput {
  name: string;
  kind: ProductKind;
  unit: QuantityUnit;
  containers: ContainerInput[];
  hazards: ProductHazardsInput;
  /** https address of the safety data sheet, or '' */
  sdsUrl: string;
  notes: string;
}
/** A partial update changes only what it names. */
export type ProductUpdate = Partial<ProductInput>;

/** A layer is stored in exactly the engine's shape. */
export type FinishLayerInput = FinishLayer;
export type CoverageInput = Coverage;

export interface FinishSystemInput {
  name: string;
  description: string;
  layers: FinishLayerInput[];
}
export type FinishSystemUpdate = Partial<FinishSystemInput>;

/* Answers. */

/** Crew read the library on site but see no money figures (PRODUCT.md), so their prices come back null. */
export interface ContainerView {
  readonly label: string;
  readonly size: number;
  readonly unit: QuantityUnit;
  readonly price: string | null;
}

export interface ProductView {
  readonly id: string;
  readonly name: string;
  readonly kind: ProductKind;
  readonly unit: QuantityUnit;
  readonly containers: readonly ContainerView[];
  readonly hazards: ProductHazardsInput;
  /** derived from the flash point: at or below FLAMMABLE_FLASH_MAX_C (93 °C), 29 CFR 1910.106(a)(19) */
  readonly isFlammable: boolean;
  /** the flammable-liquid categories (one, or 1 and 2 when the boiling point is unknown); empty when not flammable */
  readonly flammableCategories: readonly FlammableCategory[];
  readonly sdsUrl: string;
  readonly notes: string;
  readonly archivedAt: string | null;
  readonly createdAt: string;
  readonly updatedAt: string;
}

/** A product a system uses, with its name resolved for display. */
export interface UsedProduct {
  readonly id: string;
  readonly name: string;
  /** '' when the product is no longer found */
  readonly unit: QuantityUnit | '';
  readonly isArchived: boolean;
}

export interface FinishSystemSummary {
  readonly id: string;
  readonly name: string;
  readonly description: string;
  readonly layerCount: number;
  /** sum of the waits between layers (the last layer's wait included: it is the cure before use) */
  readonly totalWaitHours: number;
  readonly usesProducts: readonly UsedProduct[];
  readonly archivedAt: string | null;
  readonly updatedAt: string;
}

export interface FinishSystemView extends FinishSystemSummary {
  readonly layers: readonly FinishLayerInput[];
  readonly createdAt: string;
}
