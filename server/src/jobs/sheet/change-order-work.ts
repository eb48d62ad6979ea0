import type { EstimateContext } from '@layerbook/contracts';
import {
  convertArea,
  convertLength,
  type EstimateResultJson,
  type FinishLayer,
  finishProductIds,
  type LengthUnit,
  type Product,
} from '@layerbook/domain';
import type { SheetLibrary, SheetSource } from './load-sheet';
import type { StoredCaution } from './sheet-cautions';

type StoredSurface = EstimateResultJson['surfaces'][number];

/**
 * What an engine-priced change order keeps for the crew's job sheet, made when it is priced (the
 * surfaces as measured then, the finish and its products as the library held them): its surfaces
 * with their layers and material need, the cautions the engine raised for them, and the finish
 * system and products they name. No price or cost: products keep only name, unit and hazards.
 */
export interface ChangeOrderCrewPart {
  /** the unit the surfaces' sizes are in (the firm's when priced) */
  readonly lengthUnit: LengthUnit;
  readonly surfaces: readonly StoredSurface[];
  readonly cautions: readonly StoredCaution[];
  readonly finishSystems: ReadonlyArray<{ readonly id: string; readonly name: string; readonly layers: readonly FinishLayer[] }>;
  readonly products: ReadonlyArray<Pick<Product, 'id' | 'name' | 'unit' | 'hazards'>>;
}

/** The crew's part of a change order priced with the engine on `system`. Pure. */
export function crewPartOf(
  result: EstimateResultJson,
  context: Pick<EstimateContext, 'lengthUnit' | 'products'>,
  system: { readonly id: string; readonly name: string; readonly layers: readonly FinishLayer[] },
): ChangeOrderCrewPart {
  const used = new Set(finishProductIds(system.layers));
  for (const s of result.surfaces) for (const layer of s.layers) for (const p of layer.quantity.products) used.add(p.productId);
  return {
    lengthUnit: context.lengthUnit,
    surfaces: result.surfaces,
    cautions: result.cautions,
    finishSystems: [{ id: system.id, name: system.name, layers: system.layers }],
    products: context.products
      .filter((p) => used.has(p.id))
      .map((p) => ({ id: p.id, name: p.name, unit: p.unit, hazards: p.hazards ?? {} })),
  };
}

/** A surface added by an approved change order, in the sheet's unit. */
export interface AddedSurface {
  readonly changeOrder: number;
  readonly surface: StoredSurface;
}

/** A surface's sizes from one unit to another (the material need is in base units and stays). Pure. */
function surfaceIn(s: StoredSurface, from: LengthUnit, to: LengthUnit): StoredSurface {
  if (from === to) return s;
  const size = (v: number) => (s.measure.measure === 'area' ? convertArea(v, from, to) : convertLength(v, from, to));
  const m = s.measure;
  return {
    ...s,
    measure: {
      ...m,
      quantity: size(m.quantity),
      gross: size(m.gross),
      deductions: size(m.deductions),
      topHeight: m.topHeight === null ? null : convertLength(m.topHeight, from, to),
    },
  };
}

/**
 * The approved change orders' work merged into what was sold, for the sheet: their surfaces (each
 * marked with its change order, sizes in the sheet's unit), the finish systems and products they
 * name that the sold work does not, and their cautions — a kind the sold work raised keeps its lines
 * and gains the change order's others. Change orders priced before they kept a crew part add nothing. Pure.
 */
export function withChangeWork(
  sold: { readonly library: SheetLibrary; readonly cautions: readonly StoredCaution[] },
  changes: ReadonlyArray<{ readonly number: number; readonly crew: ChangeOrderCrewPart | null }>,
  lengthUnit: SheetSource['lengthUnit'],
): { added: AddedSurface[]; library: SheetLibrary; cautions: StoredCaution[] } {
  const systems = new Map(sold.library.finishSystems.map((f) => [f.id, f]));
  const products = new Map(sold.library.products.map((p) => [p.id, p]));
  const cautions = new Map<string, StoredCaution>(sold.cautions.map((c) => [c.id, c]));
  const added: AddedSurface[] = [];
  for (const { number, crew } of changes) {
    if (!crew) continue;
    for (const s of crew.surfaces) added.push({ changeOrder: number, surface: surfaceIn(s, crew.lengthUnit, lengthUnit) });
    for (const f of crew.finishSystems) if (!systems.has(f.id)) systems.set(f.id, f);
    for (const p of crew.products) if (!products.has(p.id)) products.set(p.id, p);
    for (const c of crew.cautions) {
      const had = cautions.get(c.id);
      cautions.set(c.id, had ? { ...had, bullets: [...had.bullets, ...c.bullets.filter((b) => !had.bullets.includes(b))] } : c);
    }
  }
  return {
    added,
    library: { finishSystems: [...systems.values()], products: [...products.values()] },
    cautions: [...cautions.values()],
  };
}
