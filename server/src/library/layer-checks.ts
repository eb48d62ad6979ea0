import type { FieldProblem, FinishLayerInput } from '@layerbook/contracts';
import { and, eq, inArray, products, TenantTx } from '@layerbook/db';
import { DomainInputError, dottedPath, layerHours, layerQuantity, type Product, type SurfaceAmount } from '@layerbook/domain';
import { badRequest } from '../http/problem';
import { containersOf, hazardsOf, type ProductRow } from './views';

/** A plain wall of 100 ft²: enough to make the engine walk every field of a layer. */
const TEST_SURFACE: SurfaceAmount = { quantity: 100, measure: 'area', unit: 'ft' };
const NO_CONDITIONS = { isCeiling: false, isCurved: false, topHeight: null, isOccupied: false, scaffoldHeight: 0 };

interface ProductRef {
  readonly id: string;
  readonly field: string;
}

function refsOf(layers: readonly FinishLayerInput[]): ProductRef[] {
  return layers.flatMap((l, i) => {
    if (l.recipe) {
      return [
        { id: l.recipe.baseProductId, field: `layers.${i}.recipe.baseProductId` },
        ...l.recipe.components.map((c, j) => ({ id: c.productId, field: `layers.${i}.recipe.components.${j}.productId` })),
      ];
    }
    return l.productId ? [{ id: l.productId, field: `layers.${i}.productId` }] : [];
  });
}

const toEngineProduct = (row: ProductRow): Product => ({
  id: row.id,
  name: row.name,
  unit: row.unit as Product['unit'],
  containers: containersOf(row),
  hazards: hazardsOf(row),
});

/**
 * A system is saved only if every product it names is a current product of this firm (another
 * firm's id is simply not found: RLS hides it) and the estimate engine itself can compute each
 * layer. Throws a 400 naming the exact layer field, so nothing half-right is stored.
 */
export async function checkLayers(tx: TenantTx, layers: readonly FinishLayerInput[]): Promise<void> {
  const refs = refsOf(layers);
  const ids = [...new Set(refs.map((r) => r.id))];
  const rows = ids.length
    ? await tx.db
        .select()
        .from(products)
        .where(and(eq(products.tenantId, tx.tenantId), inArray(products.id, ids)))
        // share-locked until the system is saved: an archive of one of them waits, then finds the system
        .for('share')
    : [];
  const byId = new Map(rows.map((r) => [r.id, r]));
  const problems: FieldProblem[] = [];
  for (const ref of refs) {
    const row = byId.get(ref.id);
    if (!row) problems.push({ field: ref.field, message: 'That product is not in your library.' });
    else if (row.archivedAt)
      problems.push({ field: ref.field, message: `"${row.name}" is archived; choose a current product or bring it back first.` });
  }
  if (problems.length) throw badRequest(problems);

  const engineProducts = new Map(rows.map((r) => [r.id, toEngineProduct(r)]));
  layers.forEach((layer, i) => {
    try {
      layerQuantity(TEST_SURFACE, layer, engineProducts, `layers.${i}`);
      layerHours(TEST_SURFACE, layer, NO_CONDITIONS, {}, `layers.${i}`);
    } catch (error) {
      if (!(error instanceof DomainInputError)) throw error;
      problems.push({ field: dottedPath(error.field), message: error.message });
    }
  });
  if (problems.length) throw badRequest(problems, 'Some layers cannot be worked out yet.');
}
