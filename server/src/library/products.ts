import {
  type ArchivedFilter,
  type ItemList,
  type ProductInput,
  type ProductUpdate,
  type ProductView,
  productInput,
} from '@layerbook/contracts';
import { and, asc, eq, finishSystems, isNotNull, isNull, products, TenantTx } from '@layerbook/db';
import { finishProductIds, isMassUnit } from '@layerbook/domain';
import { recordAudit } from '../audit/record';
import { type Actor, canSeeMoney } from '../http/actor';
import { conflict, notFound } from '../http/problem';
import { parse } from '../http/validate';
import { checkContainerPrices, withLimeFlag } from './product-rules';
import { layersOf, type ProductRow, toProductView } from './views';

/** A small firm's library holds tens of products, and the layer editor needs all of them to pick from: one capped list, no pages. */
const LIST_CAP = 1000;

/** Each change names who made it in the firm's audit log. */
export const auditedBy = (actor: Actor) => ({ actorUserId: actor.userId, actorKind: actor.kind });

export async function listProducts(tx: TenantTx, actor: Actor, archived: ArchivedFilter): Promise<ItemList<ProductView>> {
  const scope = archived === 'exclude' ? isNull(products.archivedAt) : archived === 'only' ? isNotNull(products.archivedAt) : undefined;
  const rows = await tx.db
    .select()
    .from(products)
    .where(and(eq(products.tenantId, tx.tenantId), scope))
    .orderBy(asc(products.name), asc(products.id))
    .limit(LIST_CAP);
  return { items: rows.map((r) => toProductView(r, canSeeMoney(actor))) };
}

async function loadProduct(tx: TenantTx, id: string, lock = false): Promise<ProductRow> {
  const query = tx.db
    .select()
    .from(products)
    .where(and(eq(products.tenantId, tx.tenantId), eq(products.id, id)));
  const row = (await (lock ? query.for('update') : query))[0];
  if (!row) throw notFound('product');
  return row;
}

export async function getProduct(tx: TenantTx, actor: Actor, id: string): Promise<ProductView> {
  return toProductView(await loadProduct(tx, id), canSeeMoney(actor));
}

export async function createProduct(tx: TenantTx, actor: Actor, body: ProductInput): Promise<ProductView> {
  const input = withLimeFlag(body);
  await checkContainerPrices(tx, input.containers);
  const [row] = await tx.db
    .insert(products)
    .values({ ...input, tenantId: tx.tenantId })
    .returning();
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'product.created',
    entity: 'product',
    entityId: row.id,
    data: { name: input.name },
  });
  return toProductView(row, canSeeMoney(actor));
}

export async function updateProduct(tx: TenantTx, actor: Actor, id: string, patch: ProductUpdate, now: Date): Promise<ProductView> {
  // Locked before the finish systems using it are read: a system being saved with this product
  // share-locks it (checkLayers), so a unit change waits for that save and then finds the system.
  const current = await loadProduct(tx, id, true);
  // The partial names only what changes; the merged product must still pass every whole-product rule
  // (a new unit with the old containers, say), reported against the same field names.
  const parsed = parse(productInput, {
    name: current.name,
    kind: current.kind,
    unit: current.unit,
    containers: current.containers,
    hazards: current.hazards,
    sdsUrl: current.sdsUrl,
    notes: current.notes,
    ...patch,
  });
  const merged = withLimeFlag(parsed);
  await checkContainerPrices(tx, merged.containers);
  if (merged.unit !== current.unit) await refuseUnitChangeInUse(tx, current, merged.unit);
  const [row] = await tx.db
    .update(products)
    .set({ ...merged, updatedAt: now })
    .where(and(eq(products.tenantId, tx.tenantId), eq(products.id, id)))
    .returning();
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'product.updated',
    entity: 'product',
    entityId: id,
    // Prices follow from the containers: the trail keeps them before and after, not only that they changed.
    data: {
      changed: Object.keys(patch),
      ...(patch.containers ? { containersBefore: current.containers, containersAfter: merged.containers } : {}),
    },
  });
  return toProductView(row, canSeeMoney(actor));
}

/** Names of the firm's active systems whose layers use the product. A firm has few systems, so they are read whole. */
export async function activeSystemsUsing(tx: TenantTx, productId: string): Promise<string[]> {
  const rows = await tx.db
    .select()
    .from(finishSystems)
    .where(and(eq(finishSystems.tenantId, tx.tenantId), isNull(finishSystems.archivedAt)))
    .orderBy(asc(finishSystems.name));
  return rows.filter((s) => finishProductIds(layersOf(s)).includes(productId)).map((s) => s.name);
}

/**
 * Switching a used product between volume and weight would make the systems that use it fail to
 * compute (their coverage is measured the other way), so that change waits until they are changed.
 */
async function refuseUnitChangeInUse(tx: TenantTx, current: ProductRow, unit: string): Promise<void> {
  const wasByWeight = isMassUnit(current.unit);
  if (wasByWeight === isMassUnit(unit)) return;
  const names = await activeSystemsUsing(tx, current.id);
  if (names.length) {
    throw conflict(
      `"${current.name}" is used by ${listNames(names)}, measured by ${wasByWeight ? 'weight' : 'volume'}. Change those layers first.`,
      [{ field: 'unit', message: 'Used by finish systems measured the other way; change those layers first.' }],
    );
  }
}

export const listNames = (names: readonly string[]) => names.map((n) => `"${n}"`).join(', ');

export async function setProductArchived(tx: TenantTx, actor: Actor, id: string, isArchived: boolean, now: Date): Promise<ProductView> {
  // Locked: a finish system being saved with this product share-locks it (checkLayers), so the two go
  // one after the other and the second sees the first (never an active system naming an archived product).
  const current = await loadProduct(tx, id, true);
  if (isArchived && !current.archivedAt) {
    const names = await activeSystemsUsing(tx, id);
    if (names.length) {
      throw conflict(
        `"${current.name}" is used by ${names.length === 1 ? 'the finish system' : 'the finish systems'} ${listNames(names)}. Change or archive ${names.length === 1 ? 'it' : 'them'} first.`,
      );
    }
  }
  const [row] = await tx.db
    .update(products)
    .set({ archivedAt: isArchived ? (current.archivedAt ?? now) : null, updatedAt: now })
    .where(and(eq(products.tenantId, tx.tenantId), eq(products.id, id)))
    .returning();
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: isArchived ? 'product.archived' : 'product.unarchived',
    entity: 'product',
    entityId: id,
  });
  return toProductView(row, canSeeMoney(actor));
}
