import { FLAMMABLE_BELOW_C, type FinishLayerInput, type FinishSystemSummary, type FinishSystemView, type ProductHazardsInput, type ProductView, type UsedProduct, type ContainerInput } from '@layerbook/contracts';
import type { finishSystems, products } from '@layerbook/db';

export type ProductRow = typeof products.$inferSelect;
export type SystemRow = typeof finishSystems.$inferSelect;

/** jsonb columns come back untyped; they were parsed by the contracts schemas on the way in. */
export const containersOf = (row: ProductRow) => row.containers as ContainerInput[];
export const hazardsOf = (row: ProductRow) => row.hazards as ProductHazardsInput;
export const layersOf = (row: SystemRow) => row.layers as FinishLayerInput[];

export function toProductView(row: ProductRow, showPrices: boolean): ProductView {
  const hazards = hazardsOf(row);
  return {
    id: row.id,
    name: row.name,
    kind: row.kind as ProductView['kind'],
    unit: row.unit as ProductView['unit'],
    containers: containersOf(row).map((c) => ({ ...c, price: showPrices ? c.price : null })),
    hazards,
    isFlammable: hazards.flashPointC !== undefined && hazards.flashPointC < FLAMMABLE_BELOW_C,
    sdsUrl: row.sdsUrl,
    notes: row.notes,
    archivedAt: row.archivedAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** Every product id a layer names: its own product, or the recipe's base and components. */
export function productIdsOfLayer(layer: FinishLayerInput): string[] {
  if (layer.recipe) return [layer.recipe.baseProductId, ...layer.recipe.components.map((c) => c.productId)];
  return layer.productId ? [layer.productId] : [];
}

export function productIdsOf(layers: readonly FinishLayerInput[]): Set<string> {
  return new Set(layers.flatMap(productIdsOfLayer));
}

export function toSystemSummary(row: SystemRow, byId: ReadonlyMap<string, ProductRow>): FinishSystemSummary {
  const layers = layersOf(row);
  const usesProducts: UsedProduct[] = [];
  for (const id of productIdsOf(layers)) {
    const p = byId.get(id);
    // A missing row cannot happen through the API (ids are checked on save); show it rather than hide it.
    usesProducts.push(p ? { id, name: p.name, unit: p.unit, isArchived: p.archivedAt !== null } : { id, name: 'Unknown product', unit: '', isArchived: true });
  }
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    layerCount: layers.length,
    totalWaitHours: layers.reduce((sum, l) => sum + l.waitHoursAfter, 0),
    usesProducts,
    archivedAt: row.archivedAt?.toISOString() ?? null,
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function toSystemView(row: SystemRow, byId: ReadonlyMap<string, ProductRow>): FinishSystemView {
  return { ...toSystemSummary(row, byId), layers: layersOf(row), createdAt: row.createdAt.toISOString() };
}
