import { DomainInputError } from '../errors/domain-input-error';
import { requireFraction, requireInteger, requireNonNegative, requirePositive } from '../errors/input-checks';
import { type LengthUnit, type UnitScale, scaleArea, scaleLength, unitScale } from '../units/length';
import { type Dimension, dimensionOf, toBase } from '../units/quantity-unit';
import { concentrateShare, validateDilution } from './dilution';
import type { Coverage, FinishLayer, Product } from './finish-system';
import { recipeShares } from './mix-recipe';

export interface SurfaceAmount {
  quantity: number;
  measure: 'area' | 'length';
  /** unit the quantity is in (unit² for areas) */
  unit: LengthUnit;
}

export interface LayerQuantity {
  layerId: string;
  /** surface × coverage share */
  effectiveSurface: number;
  dimension: Dimension;
  /** amounts in base units: millilitres for volume, grams for mass */
  coatAmounts: number[];
  mix: number;
  water: number;
  concentrate: number;
  products: Array<{ productId: string; amount: number }>;
}

function requireProduct(products: ReadonlyMap<string, Product>, id: string, dimension: Dimension, at: string): Product {
  const p = products.get(id);
  if (!p) throw new DomainInputError(at, `No product with id "${id}".`);
  if (dimensionOf(p.unit, at) !== dimension) {
    throw new DomainInputError(
      at,
      `"${p.name}" is bought by ${dimensionOf(p.unit)} but this layer is measured by ${dimension}; converting needs a density.`,
    );
  }
  return p;
}

/** One coat's coverage with its units looked up: the surface-independent half of the formula. */
interface PreparedCoat {
  scale: UnitScale;
  isSpreadRate: boolean;
  /** surface per unit (spread rate) or unit per surface (consumption) */
  rate: number;
  /** base units (mL or g) per coverage unit */
  base: number;
}

/**
 * A layer's quantity inputs, checked and looked up once. An estimate applies the same layer to
 * every surface of its finish system, so it prepares each layer once and then only multiplies.
 */
export interface PreparedLayerQuantity {
  layerId: string;
  share: number;
  /** 1 + waste */
  wasteFactor: number;
  dimension: Dimension;
  coats: PreparedCoat[];
  concentrateShare: number;
  /** each product's share of the concentrate; null for a single product taken as is */
  products: Array<{ productId: string; share: number | null }>;
}

function prepareCoat(surfaceUnit: LengthUnit, c: Coverage, field: string): PreparedCoat {
  const scale = unitScale(surfaceUnit, c.lengthUnit);
  if (c.kind === 'spreadRate') {
    const rate = requirePositive(c.surfacePerUnit, `${field}.surfacePerUnit`, 'coverage');
    return { scale, isSpreadRate: true, rate, base: toBase(1, c.unit, `${field}.unit`) };
  }
  if (c.kind === 'consumption') {
    const rate = requirePositive(c.unitPerSurface, `${field}.unitPerSurface`, 'consumption');
    return { scale, isSpreadRate: false, rate, base: toBase(1, c.unit, `${field}.unit`) };
  }
  const unknown: { kind?: unknown } = c;
  throw new DomainInputError(`${field}.kind`, `"${String(unknown.kind)}" is not a coverage kind.`);
}

/** Waste is at most 100 % of what goes on the surface (common practice, no source). */
export const WASTE_MAX = 1;

/** Every check `layerQuantity` makes that does not depend on the surface, in the same order. */
export function prepareLayerQuantity(
  layer: FinishLayer,
  products: ReadonlyMap<string, Product>,
  surfaceUnit: LengthUnit,
  field = 'layer',
): PreparedLayerQuantity {
  const coats = requireInteger(layer.coats, `${field}.coats`, 1, 'number of coats');
  const share = layer.coverageShare === undefined ? 1 : requireFraction(layer.coverageShare, `${field}.coverageShare`, 'coverage share');
  const waste = requireNonNegative(layer.waste, `${field}.waste`, 'waste');
  // common practice, no source: waste is a share of what goes on the wall; more than 100 % is a typo
  if (waste > WASTE_MAX)
    throw new DomainInputError(`${field}.waste`, 'Waste above 100 % is refused: enter it as a share, like 0.1 for 10 %.');
  if (layer.coatCoverages && layer.coatCoverages.length !== coats) {
    throw new DomainInputError(`${field}.coatCoverages`, `Give one coverage per coat (${coats}).`);
  }
  const dimension = dimensionOf(layer.coverage.unit, `${field}.coverage.unit`);
  const prepared: PreparedCoat[] = [];
  for (let i = 0; i < coats; i++) {
    const c = layer.coatCoverages ? layer.coatCoverages[i] : layer.coverage;
    const at = layer.coatCoverages ? `${field}.coatCoverages[${i}]` : `${field}.coverage`;
    if (dimensionOf(c.unit, `${at}.unit`) !== dimension) {
      throw new DomainInputError(`${at}.unit`, 'Every coat must be measured the same way (all volume or all weight).');
    }
    prepared.push(prepareCoat(surfaceUnit, c, at));
  }
  if (layer.dilution) validateDilution(layer.dilution, `${field}.dilution`);
  const concentrate = concentrateShare(layer.dilution, `${field}.dilution`);

  const productsOut: PreparedLayerQuantity['products'] = [];
  if (layer.recipe) {
    const recipeDimension: Dimension = layer.recipe.by === 'volume' ? 'volume' : 'mass';
    if (recipeDimension !== dimension) {
      throw new DomainInputError(`${field}.recipe.by`, `The recipe is by ${layer.recipe.by} but the coverage is by ${dimension}.`);
    }
    recipeShares(layer.recipe, `${field}.recipe`).forEach((c, i) => {
      requireProduct(products, c.productId, dimension, `${field}.recipe.components[${i}].productId`);
      productsOut.push({ productId: c.productId, share: c.share });
    });
  } else if (layer.productId !== undefined) {
    requireProduct(products, layer.productId, dimension, `${field}.productId`);
    productsOut.push({ productId: layer.productId, share: null });
  } else {
    throw new DomainInputError(`${field}.productId`, 'A layer needs a product or a recipe.');
  }
  return {
    layerId: layer.id,
    share,
    wasteFactor: 1 + waste,
    dimension,
    coats: prepared,
    concentrateShare: concentrate,
    products: productsOut,
  };
}

/**
 * The quantity of a prepared layer on one surface, in the surface's unit (the one it was
 * prepared for). `quantity` must already be checked as a non-negative number.
 */
export function applyLayerQuantity(p: PreparedLayerQuantity, quantity: number, measure: SurfaceAmount['measure']): LayerQuantity {
  const covered = quantity * p.share;
  // Arrays sized up front: this runs for every layer of every surface, and `push` on an empty
  // array reserves room for 17, which on a big job is most of what an estimate allocates.
  const coatAmounts = new Array<number>(p.coats.length);
  let mix = 0;
  for (let i = 0; i < p.coats.length; i++) {
    const c = p.coats[i];
    const counted = measure === 'area' ? scaleArea(covered, c.scale) : scaleLength(covered, c.scale);
    // Same operation order as the plain formula, so every figure matches to the last bit.
    const amount = (c.isSpreadRate ? (counted / c.rate) * c.base : counted * c.rate * c.base) * p.wasteFactor;
    coatAmounts[i] = amount;
    mix += amount;
  }
  const concentrate = mix * p.concentrateShare;
  const products = new Array<LayerQuantity['products'][number]>(p.products.length);
  for (let i = 0; i < p.products.length; i++) {
    const x = p.products[i];
    products[i] = { productId: x.productId, amount: x.share === null ? concentrate : concentrate * x.share };
  }
  return {
    layerId: p.layerId,
    effectiveSurface: covered,
    dimension: p.dimension,
    coatAmounts,
    mix,
    water: mix - concentrate,
    concentrate,
    products,
  };
}

/**
 * product_qty = surface × share × coats / coverage × (1 + waste), coat by coat, then split
 * into water and concentrate by the dilution convention and into components by the recipe.
 */
export function layerQuantity(
  surface: SurfaceAmount,
  layer: FinishLayer,
  products: ReadonlyMap<string, Product>,
  field = 'layer',
): LayerQuantity {
  requireNonNegative(surface.quantity, 'surface.quantity', 'surface');
  return applyLayerQuantity(prepareLayerQuantity(layer, products, surface.unit, field), surface.quantity, surface.measure);
}
