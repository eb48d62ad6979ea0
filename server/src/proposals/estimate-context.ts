import type { EngineRoom, EstimateContext } from '@layerbook/contracts';
import { convertArea, convertShape, type FinishSystem, type LengthUnit, type Product, type SurfaceShape } from '@layerbook/domain';
import type { TenantTx } from '@layerbook/db';
import { getEstimatingSettings } from '../firms/estimating';
import { notFound } from '../http/problem';

/**
 * Loads what an estimate for `siteId` is computed from: the firm's settings, the site's measured
 * rooms and surfaces, and the firm's live finish systems and products. Plain SQL over the
 * library and takeoff tables, whose JSON columns hold the engine's own shapes. A surface saved in
 * another unit (feet, before the firm went metric) is given in the firm's unit of today, which is
 * the unit the engine computes in.
 */
export async function loadEstimateContext(tx: TenantTx, siteId: string): Promise<EstimateContext & { siteId: string; clientId: string }> {
  const site = (
    await tx.client.query<{ id: string; client_id: string; year_built: number | null }>(
      `select id, client_id, year_built from sites where tenant_id = $1 and id = $2`,
      [tx.tenantId, siteId],
    )
  ).rows[0];
  if (!site) throw notFound('site');
  const { settings, lengthUnit, currency } = await getEstimatingSettings(tx);
  const firmCountry = (await tx.client.query<{ country: string }>(`select country from firms where id = $1`, [tx.tenantId])).rows[0]
    ?.country;
  const { rows: roomRows } = await tx.client.query<{ id: string; name: string; is_exterior: boolean }>(
    `select id, name, is_exterior from rooms where tenant_id = $1 and site_id = $2 order by position, created_at, id`,
    [tx.tenantId, siteId],
  );
  const { rows: surfaceRows } = await tx.client.query<{
    id: string;
    room_id: string;
    name: string;
    shape: SurfaceShape;
    length_unit: LengthUnit;
    disturbed_painted_area: string | null;
  }>(
    `select s.id, s.room_id, s.name, s.shape, s.length_unit, s.disturbed_painted_area::text as disturbed_painted_area
       from surfaces s join rooms r on r.id = s.room_id
      where s.tenant_id = $1 and r.site_id = $2 order by s.position, s.created_at, s.id`,
    [tx.tenantId, siteId],
  );
  const rooms: EngineRoom[] = roomRows.map((r) => ({
    id: r.id,
    name: r.name,
    isExterior: r.is_exterior,
    surfaces: surfaceRows
      .filter((s) => s.room_id === r.id)
      .map((s) => ({
        id: s.id,
        name: s.name,
        shape: convertShape(s.shape, s.length_unit, lengthUnit),
        disturbedPaintedArea:
          s.disturbed_painted_area === null || s.length_unit === lengthUnit
            ? s.disturbed_painted_area
            : String(convertArea(Number(s.disturbed_painted_area), s.length_unit, lengthUnit)),
      })),
  }));
  const { rows: systemRows } = await tx.client.query<{ id: string; name: string; layers: FinishSystem['layers'] }>(
    `select id, name, layers from finish_systems where tenant_id = $1 and archived_at is null order by name`,
    [tx.tenantId],
  );
  const { rows: productRows } = await tx.client.query<{
    id: string;
    name: string;
    unit: Product['unit'];
    containers: Product['containers'];
    hazards: Product['hazards'];
  }>(`select id, name, unit, containers, hazards from products where tenant_id = $1 and archived_at is null order by name`, [tx.tenantId]);
  return {
    siteId: site.id,
    clientId: site.client_id,
    settings,
    lengthUnit,
    currency,
    ...(firmCountry !== undefined ? { firmCountry } : {}),
    yearBuilt: site.year_built,
    rooms,
    finishSystems: systemRows.map((f) => ({ id: f.id, name: f.name, layers: f.layers })),
    products: productRows.map((p) => ({ id: p.id, name: p.name, unit: p.unit, containers: p.containers, hazards: p.hazards ?? {} })),
  };
}
