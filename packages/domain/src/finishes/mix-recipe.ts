import { DomainInputError } from '../errors/domain-input-error';
import { requireNonEmpty, requirePositive } from '../errors/input-checks';
import type { MixRecipe } from './finish-system';

export interface RecipeShare {
  productId: string;
  parts: number;
  /** parts / Σ parts */
  share: number;
  isBase: boolean;
}

export function validateRecipe(recipe: MixRecipe, field: string): void {
  if (recipe.by !== 'volume' && recipe.by !== 'weight') {
    throw new DomainInputError(`${field}.by`, 'Say whether the parts are by volume or by weight.');
  }
  requireNonEmpty(recipe.components, `${field}.components`, 'list of recipe components');
  recipe.components.forEach((c, i) => requirePositive(c.parts, `${field}.components[${i}].parts`, 'parts'));
  if (!recipe.components.some((c) => c.productId === recipe.baseProductId)) {
    throw new DomainInputError(`${field}.baseProductId`, 'The base must be one of the recipe components.');
  }
}

/** component_i = V · p_i / Σp: each component's share of the concentrate. */
export function recipeShares(recipe: MixRecipe, field = 'recipe'): RecipeShare[] {
  validateRecipe(recipe, field);
  const total = recipe.components.reduce((sum, c) => sum + c.parts, 0);
  return recipe.components.map((c) => ({
    productId: c.productId,
    parts: c.parts,
    share: c.parts / total,
    isBase: c.productId === recipe.baseProductId,
  }));
}
