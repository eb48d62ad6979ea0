import { and, eq, finishSystems, inArray, products, TenantTx } from '@layerbook/db';
import { clientFinishSteps, finishProductIds, type FinishLayer } from '@layerbook/domain';
import { badRequest } from '../http/problem';
import type { FinishSnapshot, SnapshotLayer } from '@layerbook/contracts';

/**
 * Copies the finish system as it is today into the board's record: the layers in order (the
 * engine's own shape, for reproducing the board) with the product names resolved, so that later
 * edits to the library — a renamed product, a changed coat count — do not rewrite what was shown.
 */
export async function snapshotFinish(tx: TenantTx, finishSystemId: string, now: Date): Promise<FinishSnapshot> {
  const system = (
    await tx.db
      .select()
      .from(finishSystems)
      .where(and(eq(finishSystems.tenantId, tx.tenantId), eq(finishSystems.id, finishSystemId)))
  )[0];
  if (!system) throw badRequest([{ field: 'finishSystemId', message: 'Choose a finish system from your library.' }]);
  const layers = system.layers as FinishLayer[];
  const ids = finishProductIds(layers);
  const named = ids.length
    ? await tx.db
        .select({ id: products.id, name: products.name })
        .from(products)
        .where(and(eq(products.tenantId, tx.tenantId), inArray(products.id, ids)))
    : [];
  const nameOf = new Map(named.map((p) => [p.id, p.name]));
  const productName = (id: string) => nameOf.get(id) ?? 'a product no longer in the library';
  return {
    systemId: system.id,
    systemName: system.name,
    description: system.description,
    takenAt: now.toISOString(),
    layers: layers.map((l, i): SnapshotLayer => ({
      position: i + 1,
      name: l.name,
      method: l.method,
      coats: l.coats,
      products: l.recipe
        ? l.recipe.components.map((c) => ({ id: c.productId, name: productName(c.productId), parts: c.parts }))
        : l.productId
          ? [{ id: l.productId, name: productName(l.productId) }]
          : [],
      ...(l.recipe ? { mixBy: l.recipe.by } : {}),
      ...(l.coverageShare !== undefined ? { coverageShare: l.coverageShare } : {}),
      ...(l.dilution ? { dilution: { share: l.dilution.share, convention: l.dilution.convention } } : {}),
      waitHoursAfter: l.waitHoursAfter,
      layer: { ...l },
    })),
  };
}

/** The finish in words a client reads, one line per layer in the order it goes on (no rates or prices). */
export const describeFinish = (snapshot: FinishSnapshot | null): string[] => (snapshot ? clientFinishSteps(snapshot.layers) : []);
