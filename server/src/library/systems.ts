import type {
  ArchivedFilter,
  FieldProblem,
  FinishSystemInput,
  FinishSystemSummary,
  FinishSystemUpdate,
  FinishSystemView,
  ItemList,
} from '@layerbook/contracts';
import { and, asc, eq, finishSystems, inArray, isNotNull, isNull, products, TenantTx } from '@layerbook/db';
import { finishProductIds } from '@layerbook/domain';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { conflict, HttpError, notFound } from '../http/problem';
import { checkLayers } from './layer-checks';
import { auditedBy } from './products';
import { layersOf, type ProductRow, type SystemRow, toSystemSummary, toSystemView } from './views';

/** A firm keeps tens of systems; the list is read whole (see products.ts). */
const LIST_CAP = 1000;

async function productsFor(tx: TenantTx, rows: readonly SystemRow[]): Promise<Map<string, ProductRow>> {
  const ids = [...new Set(rows.flatMap((r) => finishProductIds(layersOf(r))))];
  if (!ids.length) return new Map();
  const found = await tx.db
    .select()
    .from(products)
    .where(and(eq(products.tenantId, tx.tenantId), inArray(products.id, ids)));
  return new Map(found.map((p) => [p.id, p]));
}

async function loadSystem(tx: TenantTx, id: string): Promise<SystemRow> {
  const row = (
    await tx.db
      .select()
      .from(finishSystems)
      .where(and(eq(finishSystems.tenantId, tx.tenantId), eq(finishSystems.id, id)))
  )[0];
  if (!row) throw notFound('finish system');
  return row;
}

async function view(tx: TenantTx, row: SystemRow): Promise<FinishSystemView> {
  return toSystemView(row, await productsFor(tx, [row]));
}

export async function listSystems(tx: TenantTx, archived: ArchivedFilter): Promise<ItemList<FinishSystemSummary>> {
  const scope =
    archived === 'exclude' ? isNull(finishSystems.archivedAt) : archived === 'only' ? isNotNull(finishSystems.archivedAt) : undefined;
  const rows = await tx.db
    .select()
    .from(finishSystems)
    .where(and(eq(finishSystems.tenantId, tx.tenantId), scope))
    .orderBy(asc(finishSystems.name), asc(finishSystems.id))
    .limit(LIST_CAP);
  const byId = await productsFor(tx, rows);
  return { items: rows.map((r) => toSystemSummary(r, byId)) };
}

export async function getSystem(tx: TenantTx, id: string): Promise<FinishSystemView> {
  return view(tx, await loadSystem(tx, id));
}

export async function createSystem(tx: TenantTx, actor: Actor, input: FinishSystemInput): Promise<FinishSystemView> {
  await checkLayers(tx, input.layers);
  const [row] = await tx.db
    .insert(finishSystems)
    .values({ ...input, tenantId: tx.tenantId })
    .returning();
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'finish_system.created',
    entity: 'finish_system',
    entityId: row.id,
    data: { name: input.name, layers: input.layers.length },
  });
  return view(tx, row);
}

export async function updateSystem(
  tx: TenantTx,
  actor: Actor,
  id: string,
  patch: FinishSystemUpdate,
  now: Date,
): Promise<FinishSystemView> {
  const current = await loadSystem(tx, id);
  // An archived system may hold archived products; its layers are checked again when it comes back.
  if (patch.layers && !current.archivedAt) await checkLayers(tx, patch.layers);
  if (patch.layers && current.archivedAt) throw conflict('Bring this finish system back before changing its layers.');
  const [row] = await tx.db
    .update(finishSystems)
    .set({ ...patch, updatedAt: now })
    .where(and(eq(finishSystems.tenantId, tx.tenantId), eq(finishSystems.id, id)))
    .returning();
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'finish_system.updated',
    entity: 'finish_system',
    entityId: id,
    data: { changed: Object.keys(patch) },
  });
  return view(tx, row);
}

/** Field problems from a stored system (no form to show them beside) become one 409 sentence. */
async function requireComputable(tx: TenantTx, row: SystemRow, what: string): Promise<void> {
  try {
    await checkLayers(tx, layersOf(row));
  } catch (error) {
    if (!(error instanceof HttpError) || error.status !== 400) throw error;
    const reasons = (error.errors ?? []).map((p: FieldProblem) => `layer ${layerNumber(p.field)}: ${p.message}`);
    throw conflict(`${what} ${reasons.join(' ')}`.trim());
  }
}

const layerNumber = (field: string) => Number(/^layers\.(\d+)/.exec(field)?.[1] ?? 0) + 1;

export async function setSystemArchived(tx: TenantTx, actor: Actor, id: string, isArchived: boolean, now: Date): Promise<FinishSystemView> {
  const current = await loadSystem(tx, id);
  if (!isArchived && current.archivedAt) await requireComputable(tx, current, 'This finish system cannot come back yet:');
  const [row] = await tx.db
    .update(finishSystems)
    .set({ archivedAt: isArchived ? (current.archivedAt ?? now) : null, updatedAt: now })
    .where(and(eq(finishSystems.tenantId, tx.tenantId), eq(finishSystems.id, id)))
    .returning();
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: isArchived ? 'finish_system.archived' : 'finish_system.unarchived',
    entity: 'finish_system',
    entityId: id,
  });
  return view(tx, row);
}

/** A starting point for a variant ("same, with a darker glaze"): a new active system with the same layers. */
export async function duplicateSystem(tx: TenantTx, actor: Actor, id: string): Promise<FinishSystemView> {
  const source = await loadSystem(tx, id);
  await requireComputable(tx, source, 'This finish system cannot be copied yet:');
  const name = `${source.name} (copy)`.slice(0, 120);
  const [row] = await tx.db
    .insert(finishSystems)
    .values({ tenantId: tx.tenantId, name, description: source.description, layers: source.layers })
    .returning();
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'finish_system.created',
    entity: 'finish_system',
    entityId: row.id,
    data: { name, copiedFrom: id },
  });
  return view(tx, row);
}
