import { DomainInputError } from '../errors/domain-input-error';
import { requireFraction, requireInteger, requireNonNegative, requirePositive } from '../errors/input-checks';
import { type LengthUnit, convertArea, convertLength } from '../units/length';
import { type Dimension, dimensionOf, toBase } from '../units/quantity-unit';
import { splitDilutedMix, validateDilution } from './dilution';
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
    throw new DomainInputError(at, `"${p.name}" is bought by ${dimensionOf(p.unit)} but this layer is measured by ${dimension}; converting needs a density.`);
  }
  return p;
}

function surfaceIn(s: SurfaceAmount, to: LengthUnit): number {
  return s.measure === 'area' ? convertArea(s.quantity, s.unit, to) : convertLength(s.quantity, s.unit, to);
}

function coatAmount(surface: SurfaceAmount, c: Coverage, field: string): number {
  const counted = surfaceIn(surface, c.lengthUnit);
  if (c.kind === 'spreadRate') {
    requirePositive(c.surfacePerUnit, `${field}.surfacePerUnit`, 'coverage');
    return toBase(counted / c.surfacePerUnit, c.unit, `${field}.unit`);
  }
  if (c.kind === 'consumption') {
    requirePositive(c.unitPerSurface, `${field}.unitPerSurface`, 'consumption');
    return toBase(counted * c.unitPerSurface, c.unit, `${field}.unit`);
  }
  const unknown: { kind?: unknown } = c;
  throw new DomainInputError(`${field}.kind`, `"${String(unknown.kind)}" is not a coverage kind.`);
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
  const coats = requireInteger(layer.coats, `${field}.coats`, 1, 'number of coats');
  const share = layer.coverageShare === undefined ? 1 : requireFraction(layer.coverageShare, `${field}.coverageShare`, 'coverage share');
  const waste = requireNonNegative(layer.waste, `${field}.waste`, 'waste');
  if (layer.coatCoverages && layer.coatCoverages.length !== coats) {
    throw new DomainInputError(`${field}.coatCoverages`, `Give one coverage per coat (${coats}).`);
  }
  const covered: SurfaceAmount = { quantity: surface.quantity * share, measure: surface.measure, unit: surface.unit };
  const dimension = dimensionOf(layer.coverage.unit, `${field}.coverage.unit`);
  const coatAmounts: number[] = [];
  for (let i = 0; i < coats; i++) {
    const c = layer.coatCoverages ? layer.coatCoverages[i] : layer.coverage;
    const at = layer.coatCoverages ? `${field}.coatCoverages[${i}]` : `${field}.coverage`;
    if (dimensionOf(c.unit, `${at}.unit`) !== dimension) {
      throw new DomainInputError(`${at}.unit`, 'Every coat must be measured the same way (all volume or all weight).');
    }
    coatAmounts.push(coatAmount(covered, c, at) * (1 + waste));
  }
  const mix = coatAmounts.reduce((a, b) => a + b, 0);
  if (layer.dilution) validateDilution(layer.dilution, `${field}.dilution`);
  const { concentrate, water } = splitDilutedMix(mix, layer.dilution, `${field}.dilution`);

  const productsOut: LayerQuantity['products'] = [];
  if (layer.recipe) {
    const recipeDimension: Dimension = layer.recipe.by === 'volume' ? 'volume' : 'mass';
    if (recipeDimension !== dimension) {
      throw new DomainInputError(`${field}.recipe.by`, `The recipe is by ${layer.recipe.by} but the coverage is by ${dimension}.`);
    }
    recipeShares(layer.recipe, `${field}.recipe`).forEach((c, i) => {
      requireProduct(products, c.productId, dimension, `${field}.recipe.components[${i}].productId`);
      productsOut.push({ productId: c.productId, amount: concentrate * c.share });
    });
  } else if (layer.productId !== undefined) {
    requireProduct(products, layer.productId, dimension, `${field}.productId`);
    productsOut.push({ productId: layer.productId, amount: concentrate });
  } else {
    throw new DomainInputError(`${field}.productId`, 'A layer needs a product or a recipe.');
  }
  return { layerId: layer.id, effectiveSurface: covered.quantity, dimension, coatAmounts, mix, water, concentrate, products: productsOut };
}
