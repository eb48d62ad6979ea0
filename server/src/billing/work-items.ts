import type { ProposalSnapshot, WorkItemView } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { allocateByWeights, minorUnitDigits } from '@layerbook/domain';
import Decimal from 'decimal.js';

/** The parts of a stored estimate result the work list reads (one variant's surfaces and their layers). */
interface StoredSurface {
  readonly roomId: string;
  readonly surfaceId: string;
  readonly name: string;
  readonly layers?: ReadonlyArray<{ readonly layerId: string; readonly name: string; readonly labour?: { readonly hours?: number } }>;
}

interface JobSource {
  contract_sum: string;
  currency: string;
  variant_id: string;
  result: { variants?: ReadonlyArray<{ id: string; result?: { surfaces?: readonly StoredSurface[] } }> } | null;
  scope: ProposalSnapshot['scope'] | null;
  /** the add-ons the client took with the option, as the snapshot prices them */
  add_ons: Array<{ label: string; total: string }>;
  work_items: number;
  value_lines: number;
}

export interface JobWorkItem {
  readonly position: number;
  readonly roomId: string;
  readonly roomName: string;
  readonly surfaceId: string;
  readonly surfaceName: string;
  readonly layerId: string;
  readonly layerName: string;
  readonly layerOrder: number;
  readonly hours: number;
}

/**
 * The accepted option's work in the order a crew does it: room by room (the proposal's order),
 * surface by surface within a room, each surface's layers first on to last. Pure.
 */
export function workItemsOf(
  surfaces: readonly StoredSurface[],
  scope: ProposalSnapshot['scope'] | null,
  roomNames: ReadonlyMap<string, string>,
): JobWorkItem[] {
  const roomOrder = new Map<string, number>();
  const surfaceOrder = new Map<string, number>();
  const scopeNames = new Map<string, string>();
  (scope ?? []).forEach((room, r) => {
    roomOrder.set(room.id, r);
    scopeNames.set(room.id, room.name);
    room.surfaces.forEach((s, i) => surfaceOrder.set(s.id, i));
  });
  const far = Number.MAX_SAFE_INTEGER;
  const sorted = surfaces
    .map((s, i) => ({ s, i }))
    .sort(
      (a, b) =>
        (roomOrder.get(a.s.roomId) ?? far) - (roomOrder.get(b.s.roomId) ?? far) ||
        (surfaceOrder.get(a.s.surfaceId) ?? far) - (surfaceOrder.get(b.s.surfaceId) ?? far) ||
        a.i - b.i,
    )
    .map(({ s }) => s);
  const items: JobWorkItem[] = [];
  for (const s of sorted) {
    const roomName = scopeNames.get(s.roomId) ?? roomNames.get(s.roomId) ?? 'Room';
    (s.layers ?? []).forEach((layer, i) => {
      const hours = layer.labour?.hours;
      items.push({
        position: items.length + 1,
        roomId: s.roomId,
        roomName,
        surfaceId: s.surfaceId,
        surfaceName: s.name,
        layerId: layer.layerId,
        layerName: layer.name,
        layerOrder: i + 1,
        hours: typeof hours === 'number' && Number.isFinite(hours) && hours > 0 ? hours : 0,
      });
    });
  }
  return items;
}

/**
 * The default schedule of values: one line per room, the contract sum split by each room's share
 * of the labour hours, to the cent and adding up exactly (largest remainder; common practice, no
 * source). A job without hours gets one line for all the work. Each add-on the client took is a
 * line of its own at its price, and the rooms share the rest.
 */
export function defaultValueLines(
  items: readonly JobWorkItem[],
  contractSum: string,
  currency: string,
  addOns: ReadonlyArray<{ label: string; total: string }> = [],
): Array<{ label: string; amount: string }> {
  const digits = minorUnitDigits(currency);
  const addOnLines = addOns.map((a) => ({ label: a.label, amount: new Decimal(a.total).toFixed(digits) }));
  const work = addOnLines.reduce((rest, a) => rest.minus(a.amount), new Decimal(contractSum));
  return [...workValueLines(items, work.toFixed(digits), digits), ...addOnLines];
}

function workValueLines(items: readonly JobWorkItem[], contractSum: string, digits: number): Array<{ label: string; amount: string }> {
  const rooms = new Map<string, { label: string; hours: Decimal }>();
  for (const item of items) {
    const room = rooms.get(item.roomId) ?? { label: item.roomName, hours: new Decimal(0) };
    room.hours = room.hours.plus(item.hours);
    rooms.set(item.roomId, room);
  }
  const weighted = [...rooms.values()].filter((r) => r.hours.greaterThan(0));
  if (!weighted.length) return [{ label: 'All the work', amount: new Decimal(contractSum).toFixed(digits) }];
  const amounts = allocateByWeights(
    contractSum,
    weighted.map((r) => r.hours),
    digits,
  );
  return weighted.map((r, i) => ({ label: r.label, amount: amounts[i].toFixed(digits) }));
}

async function loadSource(tx: TenantTx, jobId: string): Promise<JobSource | undefined> {
  const { rows } = await tx.client.query<JobSource>(
    `select j.contract_sum::text as contract_sum, j.currency, j.accepted_variant_id as variant_id, coalesce(pv.result, e.result) as result, pv.snapshot->'scope' as scope,
            coalesce((select jsonb_agg(jsonb_build_object('label', a->>'label', 'total', a->>'total') order by k.n)
                        from unnest(pv.accepted_add_on_ids) with ordinality as k(id, n)
                        join jsonb_array_elements(pv.snapshot->'addOns') a on a->>'id' = k.id), '[]'::jsonb) as add_ons,
            (select count(*)::int from job_work_items w where w.tenant_id = j.tenant_id and w.job_id = j.id) as work_items,
            (select count(*)::int from job_value_lines v where v.tenant_id = j.tenant_id and v.job_id = j.id) as value_lines
       from jobs j
       join estimates e on e.tenant_id = j.tenant_id and e.id = j.estimate_id
       join proposal_versions pv on pv.tenant_id = j.tenant_id and pv.id = j.proposal_version_id
      where j.tenant_id = $1 and j.id = $2`,
    [tx.tenantId, jobId],
  );
  return rows[0];
}

/**
 * Makes the job's work items (one per layer per surface of the accepted option, in crew order)
 * and its default schedule of values when it has none: at acceptance, and for a job made before
 * either existed (GET progress, the billing view). Idempotent and safe when two requests race:
 * the second waits on the job row and finds them made.
 */
export async function ensureJobWork(tx: TenantTx, jobId: string): Promise<void> {
  const first = await loadSource(tx, jobId);
  if (!first || (first.work_items > 0 && first.value_lines > 0)) return;
  // Lock, then count again in a statement of its own: a statement that waited for the lock would
  // still count with the snapshot it started with (READ COMMITTED), and make the work twice.
  await tx.client.query(`select 1 from jobs where tenant_id = $1 and id = $2 for update`, [tx.tenantId, jobId]);
  const src = await loadSource(tx, jobId);
  if (!src || (src.work_items > 0 && src.value_lines > 0)) return;
  const variant = src.result?.variants?.find((v) => v.id === src.variant_id);
  const surfaces = variant?.result?.surfaces ?? [];
  const roomIds = [...new Set(surfaces.map((s) => s.roomId))];
  const { rows: rooms } = await tx.client.query<{ id: string; name: string }>(
    `select id, name from rooms where tenant_id = $1 and id = any($2::uuid[])`,
    [tx.tenantId, roomIds],
  );
  const items = workItemsOf(surfaces, src.scope, new Map(rooms.map((r) => [r.id, r.name])));
  if (src.work_items === 0 && items.length) await insertWorkItems(tx, jobId, items);
  if (src.value_lines === 0) {
    const lines = defaultValueLines(items, src.contract_sum, src.currency, src.add_ons);
    await tx.client.query(
      `insert into job_value_lines (tenant_id, job_id, position, label, scheduled_value)
       select $1, $2, x.position, x.label, x.amount::numeric from jsonb_to_recordset($3::jsonb) as x(position int, label text, amount text)`,
      [tx.tenantId, jobId, JSON.stringify(lines.map((l, i) => ({ position: i + 1, label: l.label, amount: l.amount })))],
    );
  }
}

/**
 * Adds work items to a job: the work sold (`changeOrderId` null) or an approved change order's. A
 * surface and layer already on the job for the same change order (or for none) stays as it is; a
 * change order redoing a sold surface with the same finish gets layers of its own to mark.
 */
export async function insertWorkItems(
  tx: TenantTx,
  jobId: string,
  items: ReadonlyArray<Pick<JobWorkItem, 'position' | 'roomName' | 'surfaceId' | 'surfaceName' | 'layerId' | 'layerName' | 'layerOrder'>>,
  changeOrderId: string | null = null,
): Promise<void> {
  await tx.client.query(
    `insert into job_work_items (tenant_id, job_id, position, room_name, surface_id, surface_name, layer_id, layer_name, layer_order, change_order_id)
     select $1, $2, x.position, x.room_name, x.surface_id, x.surface_name, x.layer_id, x.layer_name, x.layer_order, $4::uuid
       from jsonb_to_recordset($3::jsonb) as x(position int, room_name text, surface_id text, surface_name text, layer_id text, layer_name text, layer_order int)
     on conflict (tenant_id, job_id, surface_id, layer_id, change_order_id) do nothing`,
    [
      tx.tenantId,
      jobId,
      JSON.stringify(
        items.map((i) => ({
          position: i.position,
          room_name: i.roomName,
          surface_id: i.surfaceId,
          surface_name: i.surfaceName,
          layer_id: i.layerId,
          layer_name: i.layerName,
          layer_order: i.layerOrder,
        })),
      ),
      changeOrderId,
    ],
  );
}

/** The job's work items in crew order, each with the number of the change order that added it (null: sold). */
export async function loadWorkItems(tx: TenantTx, jobId: string): Promise<WorkItemView[]> {
  const { rows } = await tx.client.query<WorkItemView>(
    `select w.id, w.position, w.room_name as "roomName", w.surface_id as "surfaceId", w.surface_name as "surfaceName", w.layer_id as "layerId",
            w.layer_name as "layerName", w.layer_order as "layerOrder", w.done_on::text as "doneOn", co.number as "changeOrder"
       from job_work_items w
       left join change_orders co on co.tenant_id = w.tenant_id and co.id = w.change_order_id
      where w.tenant_id = $1 and w.job_id = $2 order by w.position, w.id`,
    [tx.tenantId, jobId],
  );
  return rows;
}

/**
 * Whether a work item counts towards a stage payment waiting on its layer ("when the base coat is
 * done on every surface"). The work sold always does. A change order's work does only if the
 * change order was approved before the line was first billed: approval spreads its amount over the
 * lines not yet billed (respreadSchedule), so such a line now pays for the change order's layers
 * too — a redo of a sold surface included — and waits for them. A line already billed then kept its
 * amount, which pays for the work sold only: the change order's work neither holds it back, nor
 * withdraws its draft, nor stops its layer being reopened. Both times are the database's (a change
 * order's items are made in its approval's transaction). Pure.
 */
export function countsTowardLine(item: { readonly isChange: boolean; readonly createdAt: Date }, lineBilledSince: Date | null): boolean {
  return !item.isChange || lineBilledSince === null || item.createdAt < lineBilledSince;
}

/** countsTowardLine in SQL, for work item `w` (joined with its tenant) and the schedule line whose id is `lineId`. */
export const countsTowardLineSql = (w: string, lineId: string) =>
  `(${w}.change_order_id is null or ${w}.created_at < coalesce((select min(fi.created_at) from invoices fi
     where fi.tenant_id = ${w}.tenant_id and fi.schedule_line_id = ${lineId}), 'infinity'::timestamptz))`;
