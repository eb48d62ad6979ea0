import { DomainInputError } from '../errors/domain-input-error';
import { requireNonEmpty, requirePositive } from '../errors/input-checks';
import { type KitchenVolume, formatKitchenVolume, formatMetricMass, formatMetricVolume } from '../units/kitchen-display';
import { type QuantityUnit, dimensionOf, toBase } from '../units/quantity-unit';
import { splitDilutedMix } from './dilution';
import type { Dilution, MixRecipe } from './finish-system';
import { recipeShares } from './mix-recipe';

export interface BatchLine {
  /** product id, or 'water' */
  component: string;
  isBase: boolean;
  /** base units: mL for volume recipes, g for weight recipes */
  amount: number;
  /** kitchen units (volume recipes only) */
  kitchen: KitchenVolume | null;
  /** metric text always shown */
  metric: string;
}

function line(component: string, isBase: boolean, amount: number, byVolume: boolean): BatchLine {
  return byVolume
    ? { component, isBase, amount, kitchen: formatKitchenVolume(amount), metric: formatMetricVolume(amount) }
    : { component, isBase, amount, kitchen: null, metric: formatMetricMass(amount) };
}

/**
 * A crew's batch: `batch` of final mix split into water (by the dilution convention) and
 * recipe components (V · pᵢ / Σp). Weight recipes are shown in grams: spoons measure volume.
 */
export function mixBatch(
  recipe: MixRecipe,
  batch: { amount: number; unit: QuantityUnit },
  dilution?: Dilution,
  field = 'batch',
): BatchLine[] {
  requirePositive(batch.amount, `${field}.amount`, 'batch size');
  const byVolume = recipe.by === 'volume';
  if ((dimensionOf(batch.unit, `${field}.unit`) === 'volume') !== byVolume) {
    throw new DomainInputError(`${field}.unit`, `The recipe is by ${recipe.by}; give the batch by ${recipe.by} too.`);
  }
  const { concentrate, water } = splitDilutedMix(toBase(batch.amount, batch.unit), dilution, 'dilution');
  const lines = recipeShares(recipe).map((c) => line(c.productId, c.isBase, concentrate * c.share, byVolume));
  if (water > 0) lines.push(line('water', false, water, byVolume));
  return lines;
}

export interface PerBaseRecipe {
  base: { name: string; amount: number; unit: QuantityUnit };
  additions: ReadonlyArray<{ name: string; amount: number; unit: QuantityUnit }>;
}

/**
 * Scales a "per base unit" recipe (2 tbsp colorant per quart of medium) to a target amount
 * of the base: factor = target base / recipe base, every addition × factor.
 */
export function scaleRecipeToBase(
  recipe: PerBaseRecipe,
  target: { amount: number; unit: QuantityUnit },
  field = 'target',
): { factor: number; lines: BatchLine[] } {
  requirePositive(recipe.base.amount, 'recipe.base.amount', 'base amount');
  requirePositive(target.amount, `${field}.amount`, 'target amount');
  requireNonEmpty(recipe.additions, 'recipe.additions', 'list of additions');
  if (dimensionOf(target.unit, `${field}.unit`) !== dimensionOf(recipe.base.unit, 'recipe.base.unit')) {
    throw new DomainInputError(`${field}.unit`, 'Give the target in the same kind of unit as the recipe base.');
  }
  const factor = toBase(target.amount, target.unit) / toBase(recipe.base.amount, recipe.base.unit);
  const lines = [
    line(recipe.base.name, true, toBase(target.amount, target.unit), dimensionOf(target.unit) === 'volume'),
    ...recipe.additions.map((a, i) => {
      requirePositive(a.amount, `recipe.additions[${i}].amount`, 'amount');
      return line(a.name, false, toBase(a.amount, a.unit) * factor, dimensionOf(a.unit, `recipe.additions[${i}].unit`) === 'volume');
    }),
  ];
  return { factor, lines };
}
