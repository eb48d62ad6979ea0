import type { FinishLayer } from './finish-system';

/** Every product a layer names: its own product, or the recipe's base and components (the base first). */
export function layerProductIds(layer: Pick<FinishLayer, 'productId' | 'recipe'>): string[] {
  if (layer.recipe) return [...new Set([layer.recipe.baseProductId, ...layer.recipe.components.map((c) => c.productId)])];
  return layer.productId ? [layer.productId] : [];
}

/** The products of a finish system, each once, in the order the layers first use them. */
export function finishProductIds(layers: readonly Pick<FinishLayer, 'productId' | 'recipe'>[]): string[] {
  return [...new Set(layers.flatMap(layerProductIds))];
}

/** Every wait of the system added up; the last layer's wait counts too, as the cure before use. */
export function totalWaitHours(layers: readonly Pick<FinishLayer, 'waitHoursAfter'>[]): number {
  return layers.reduce((sum, l) => sum + l.waitHoursAfter, 0);
}

/** How the library sums up a finish system, wherever one is shown. */
export interface FinishOutline {
  readonly layerCount: number;
  readonly totalWaitHours: number;
  readonly productIds: readonly string[];
}

export function outlineFinish(layers: readonly Pick<FinishLayer, 'productId' | 'recipe' | 'waitHoursAfter'>[]): FinishOutline {
  return { layerCount: layers.length, totalWaitHours: totalWaitHours(layers), productIds: finishProductIds(layers) };
}
