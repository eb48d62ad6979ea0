import type { JobStatus, ProposalSnapshot, SheetChange } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { type EstimateResultJson, type FinishLayer, layerProductIds, type Product } from '@layerbook/domain';
import { notFound } from '../../http/problem';
import { type AddedSurface, type ChangeOrderCrewPart, withChangeWork } from './change-order-work';
import type { StoredCaution } from './sheet-cautions';

/**
 * What a job sheet is built from, read in one tenant transaction: the job and its site, the firm's
 * units, zone and country, the accepted option's stored result and the proposal's room order, and
 * the finish systems and products that result names, as the signed version kept them (the
 * library's current rows for older versions; archived ones too: the job was sold with them), and
 * what the approved change orders add (change-order-work.ts). No price, cost or total is selected.
 */
export interface SheetSource {
  readonly job: {
    readonly id: string;
    readonly title: string;
    readonly status: JobStatus;
    readonly startDate: string | null;
    readonly finishDate: string | null;
    readonly siteAddress: string;
  };
  readonly firm: { readonly units: 'imperial' | 'metric'; readonly timeZone: string; readonly country: string };
  /** the unit the stored sizes are in (the proposal's) */
  readonly lengthUnit: 'ft' | 'm';
  /** the accepted option's stored result (only the parts the sheet reads are relied on) */
  readonly result: Pick<EstimateResultJson, 'surfaces' | 'schedule' | 'cautions' | 'lead'> | null;
  readonly scope: ProposalSnapshot['scope'];
  readonly roomNames: ReadonlyMap<string, string>;
  readonly finishSystems: ReadonlyArray<{ readonly id: string; readonly name: string; readonly layers: readonly FinishLayer[] }>;
  readonly products: ReadonlyArray<Pick<Product, 'id' | 'name' | 'unit' | 'hazards'>>;
  /** the change orders the client approved, by number (no price is selected) */
  readonly changes: readonly SheetChange[];
  /** the surfaces approved change orders add, in their order */
  readonly added: readonly AddedSurface[];
  /** the result's cautions with the approved change orders' merged in */
  readonly cautions: readonly StoredCaution[];
}

interface JobRow {
  id: string;
  title: string;
  status: JobStatus;
  start_date: string | null;
  finish_date: string | null;
  site_address: string;
  units: 'imperial' | 'metric';
  time_zone: string;
  country: string;
  length_unit: 'ft' | 'm' | null;
  scope: ProposalSnapshot['scope'] | null;
  result: Pick<EstimateResultJson, 'surfaces' | 'schedule' | 'cautions' | 'lead'> | null;
  library: SheetLibrary | null;
}

/** The finish systems and products a job is worked with (no price: name, unit, hazards). */
export interface SheetLibrary {
  readonly finishSystems: ReadonlyArray<{ readonly id: string; readonly name: string; readonly layers: readonly FinishLayer[] }>;
  readonly products: ReadonlyArray<Pick<Product, 'id' | 'name' | 'unit' | 'hazards'>>;
}

type SheetSurfaces = NonNullable<JobRow['result']>['surfaces'];

/** The product ids each system's layers and each surface's quantities name. */
function productIdsOf(systems: SheetLibrary['finishSystems'], surfaces: SheetSurfaces): Set<string> {
  const ids = new Set<string>();
  for (const f of systems) for (const layer of f.layers) for (const id of layerProductIds(layer)) ids.add(id);
  for (const s of surfaces) for (const layer of s.layers) for (const p of layer.quantity.products) ids.add(p.productId);
  return ids;
}

/** The firm's finish systems and products these surfaces name, as the library holds them now (archived ones too). */
export async function loadLibrary(tx: TenantTx, surfaces: SheetSurfaces): Promise<SheetLibrary> {
  const systemIds = [...new Set(surfaces.map((s) => s.finishSystemId))];
  const { rows: finishSystems } = await tx.client.query<{ id: string; name: string; layers: FinishLayer[] }>(
    `select id, name, layers from finish_systems where tenant_id = $1 and id::text = any($2::text[]) order by id`,
    [tx.tenantId, systemIds],
  );
  const { rows: products } = await tx.client.query<{ id: string; name: string; unit: Product['unit']; hazards: Product['hazards'] | null }>(
    `select id, name, unit, hazards from products where tenant_id = $1 and id::text = any($2::text[]) order by name, id`,
    [tx.tenantId, [...productIdsOf(finishSystems, surfaces)]],
  );
  return { finishSystems, products: products.map((p) => ({ id: p.id, name: p.name, unit: p.unit, hazards: p.hazards ?? {} })) };
}

/** Of a kept library (every option's), what these surfaces use. */
function pickLibrary(library: SheetLibrary, surfaces: SheetSurfaces): SheetLibrary {
  const systemIds = new Set(surfaces.map((s) => s.finishSystemId));
  const finishSystems = library.finishSystems.filter((f) => systemIds.has(f.id));
  const productIds = productIdsOf(finishSystems, surfaces);
  return { finishSystems, products: library.products.filter((p) => productIds.has(p.id)) };
}

export async function loadSheetSource(tx: TenantTx, jobId: string): Promise<SheetSource> {
  const { rows } = await tx.client.query<JobRow>(
    `select j.id, j.title, j.status, j.start_date::text as start_date, j.finish_date::text as finish_date,
            concat_ws(', ', nullif(s.address_line1, ''), nullif(s.city, '')) as site_address,
            f.units, f.time_zone, f.country,
            pv.snapshot->>'lengthUnit' as length_unit, pv.snapshot->'scope' as scope, pv.library,
            (select v->'result' from jsonb_array_elements(coalesce(coalesce(pv.result, e.result)->'variants', '[]'::jsonb)) v
              where v->>'id' = j.accepted_variant_id limit 1) as result
       from jobs j
       join sites s on s.tenant_id = j.tenant_id and s.id = j.site_id
       join firms f on f.id = j.tenant_id
       join estimates e on e.tenant_id = j.tenant_id and e.id = j.estimate_id
       join proposal_versions pv on pv.tenant_id = j.tenant_id and pv.id = j.proposal_version_id
      where j.tenant_id = $1 and j.id = $2`,
    [tx.tenantId, jobId],
  );
  const r = rows[0];
  if (!r) throw notFound('job');
  const surfaces = r.result?.surfaces ?? [];

  // The finish systems and products as the version the client signed kept them; the library as it is now
  // only for versions made before versions kept theirs (an edit for future work must not reach this crew).
  const soldLibrary = pickLibrary(r.library ?? (await loadLibrary(tx, surfaces)), surfaces);
  const { rows: changes } = await tx.client.query<{
    number: number;
    title: string;
    description: string;
    approved_on: string;
    engine: { finishName: string; surfaces: SheetChange['surfaces'] } | null;
    crew: ChangeOrderCrewPart | null;
  }>(
    `select co.number, co.title, co.description, (co.decided_at at time zone f.time_zone)::date::text as approved_on,
            co.detail->'engine' as engine, co.detail->'crew' as crew
       from change_orders co join firms f on f.id = co.tenant_id
      where co.tenant_id = $1 and co.job_id = $2 and co.status = 'approved' order by co.number`,
    [tx.tenantId, jobId],
  );
  const lengthUnit = r.length_unit ?? (r.units === 'metric' ? 'm' : 'ft');
  const { added, library, cautions } = withChangeWork({ library: soldLibrary, cautions: r.result?.cautions ?? [] }, changes, lengthUnit);
  const roomIds = [...new Set([...surfaces, ...added.map((a) => a.surface)].map((s) => s.roomId))];
  const { rows: rooms } = await tx.client.query<{ id: string; name: string }>(
    `select id, name from rooms where tenant_id = $1 and id::text = any($2::text[])`,
    [tx.tenantId, roomIds],
  );

  return {
    job: {
      id: r.id,
      title: r.title,
      status: r.status,
      startDate: r.start_date,
      finishDate: r.finish_date,
      siteAddress: r.site_address,
    },
    firm: { units: r.units, timeZone: r.time_zone, country: r.country },
    lengthUnit,
    result: r.result,
    cautions,
    scope: r.scope ?? [],
    roomNames: new Map(rooms.map((room) => [room.id, room.name])),
    finishSystems: library.finishSystems,
    products: library.products,
    added,
    changes: changes.map((c) => ({
      number: c.number,
      title: c.title,
      description: c.description,
      approvedOn: c.approved_on,
      finishName: c.engine?.finishName ?? null,
      surfaces: (c.engine?.surfaces ?? []).map((s) => ({ room: s.room, surface: s.surface, quantity: s.quantity })),
    })),
  };
}
