import {
  type ContainerInput,
  type FinishLayerInput,
  type FinishSystemSummary,
  type FinishSystemView,
  type ProductHazardsInput,
  type ProductView,
  type UsedProduct,
} from '@layerbook/contracts';
import type { finishSystems, products } from '@layerbook/db';
import { flammableClass, outlineFinish } from '@layerbook/domain';

export type ProductRow = typeof products.$inferSelect;
export type SystemRow = typeof finishSystems.$inferSelect;

/** jsonb and text columns come back untyped; they were parsed by the contracts schemas on the way in. */
export const containersOf = (row: ProductRow) => row.containers as ContainerInput[];
export const hazardsOf = (row: ProductRow) => row.hazards as ProductHazardsInput;
export const layersOf = (row: SystemRow) => row.layers as FinishLayerInput[];

export function toProductView(row: ProductRow, showPrices: boolean): ProductView {
  const hazards = hazardsOf(row);
  const flammable = flammableClass(hazards.flashPointC, hazards.boilingPointC);
  return {
    id: row.id,
    name: row.name,
    kind: row.kind as ProductView['kind'],
    unit: row.unit as ProductView['unit'],
    containers: containersOf(row).map((c) => ({ ...c, price: showPrices ? c.price : null })),
    hazards,
    isFlammable: flammable !== null,
    flammableCategories: flammable?.categories ?? [],
    sdsUrl: row.sdsUrl,
    notes: row.notes,
    archivedAt: row.archivedAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** The library's summary of a system (the domain's outline), with the products' names resolved. */
export function toSystemSummary(row: SystemRow, byId: ReadonlyMap<string, ProductRow>): FinishSystemSummary {
  const outline = outlineFinish(layersOf(row));
  // A missing row cannot happen through the API (ids are checked on save); show it rather than hide it.
  const usesProducts = outline.productIds.map((id): UsedProduct => {
    const p = byId.get(id);
    return p
      ? { id, name: p.name, unit: p.unit as ProductView['unit'], isArchived: p.archivedAt !== null }
      : { id, name: 'Unknown product', unit: '', isArchived: true };
  });
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    layerCount: outline.layerCount,
    totalWaitHours: outline.totalWaitHours,
    usesProducts,
    archivedAt: row.archivedAt?.toISOString() ?? null,
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function toSystemView(row: SystemRow, byId: ReadonlyMap<string, ProductRow>): FinishSystemView {
  return { ...toSystemSummary(row, byId), layers: layersOf(row), createdAt: row.createdAt.toISOString() };
}
