import { dimensionOf, mixBatch } from '@layerbook/contracts/engine';
import type { SheetLayer, SheetProduct, UnitSystem } from '@layerbook/contracts/types';
import { numberFormat } from '../../../../../../shared/i18n/format/intl-cache';

type MixRecipe = NonNullable<SheetLayer['recipe']>;

/** What a crew measures a batch in: kitchen and can sizes or metric for volume, grams or kilograms for weight. */
export const VOLUME_BATCH_UNITS = ['cup', 'quart', 'gallon', 'mL', 'L'] as const;
export const WEIGHT_BATCH_UNITS = ['g', 'kg'] as const;
export type BatchUnit = (typeof VOLUME_BATCH_UNITS)[number] | (typeof WEIGHT_BATCH_UNITS)[number];

export interface Batch {
  readonly amount: number;
  readonly unit: BatchUnit;
}

/** One component of the scaled batch, ready for words: kitchen measure (volume only) and metric, always both. */
export interface MixLine {
  /** product id, or 'water' */
  readonly component: string;
  /** the product's name; null for water */
  readonly name: string | null;
  readonly isBase: boolean;
  readonly isWater: boolean;
  /** "1½" and "cup"/"cups" for the words; null for weight recipes (spoons measure volume) */
  readonly kitchen: { readonly isApproximate: boolean; readonly number: string; readonly unit: string; readonly isPlural: boolean } | null;
  readonly metric: { readonly value: number; readonly digits: number; readonly unit: 'mL' | 'L' | 'g' | 'kg' };
  /** exact amount, mL or g */
  readonly amount: number;
}

/** What the crew mixes for a layer: its recipe, or the one product applied as is (a recipe of one part). */
export function layerRecipe(layer: SheetLayer, products: readonly SheetProduct[]): MixRecipe | null {
  if (layer.recipe) return layer.recipe;
  const product = products.find((p) => p.id === layer.productId);
  if (!product) return null;
  return {
    by: dimensionOf(product.unit) === 'volume' ? 'volume' : 'weight',
    baseProductId: product.id,
    components: [{ productId: product.id, parts: 1 }],
  };
}

export function batchUnits(by: MixRecipe['by']): readonly BatchUnit[] {
  return by === 'volume' ? VOLUME_BATCH_UNITS : WEIGHT_BATCH_UNITS;
}

/** A bucket the crew often mixes: a quart (imperial) or a litre (metric); a kilogram by weight (common practice, no source). */
export function defaultBatch(by: MixRecipe['by'], units: UnitSystem): Batch {
  if (by === 'weight') return { amount: 1, unit: 'kg' };
  return units === 'metric' ? { amount: 1, unit: 'L' } : { amount: 1, unit: 'quart' };
}

/** Metric as the domain writes it (2 decimals below 10 and from 1000 up, in L or kg; else 1), kept as a number for the locale. */
function metricOf(amount: number, byVolume: boolean): MixLine['metric'] {
  if (amount >= 1000) return { value: amount / 1000, digits: 2, unit: byVolume ? 'L' : 'kg' };
  return { value: amount, digits: amount < 10 ? 2 : 1, unit: byVolume ? 'mL' : 'g' };
}

/** The kitchen text "≈ 11⅓ tbsp" split into its number and unit, so the unit can be said in the reader's language. */
function kitchenOf(kitchen: { text: string; isApproximate: boolean; unit: string; shown: number }): NonNullable<MixLine['kitchen']> {
  const text = kitchen.text.replace(/^≈\s*/, '');
  const space = text.lastIndexOf(' ');
  return {
    isApproximate: kitchen.isApproximate,
    number: space > 0 ? text.slice(0, space) : text,
    unit: kitchen.unit,
    isPlural: kitchen.shown > 1,
  };
}

/**
 * The layer's recipe scaled to the batch the crew typed, through the engine's `mixBatch` (water by the
 * layer's dilution convention). Throws the engine's DomainInputError for a batch it refuses.
 */
export function scaleMix(layer: SheetLayer, recipe: MixRecipe, batch: Batch, products: readonly SheetProduct[]): MixLine[] {
  const byVolume = recipe.by === 'volume';
  return mixBatch(recipe, batch, layer.dilution ?? undefined).map((line) => ({
    component: line.component,
    name: line.component === 'water' ? null : (products.find((p) => p.id === line.component)?.name ?? line.component),
    isBase: line.isBase,
    isWater: line.component === 'water',
    kitchen: line.kitchen ? kitchenOf(line.kitchen) : null,
    metric: metricOf(line.amount, byVolume),
    amount: line.amount,
  }));
}

/** "1.42 L", "177.4 mL" in the reader's number format. */
export function formatMetric(metric: MixLine['metric'], locale: string): string {
  const number = numberFormat(locale, { minimumFractionDigits: metric.digits, maximumFractionDigits: metric.digits }).format(metric.value);
  return `${number} ${metric.unit}`;
}
