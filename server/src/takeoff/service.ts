import {
  isMoreThanSurface,
  type MoveInput,
  type RoomInput,
  type RoomUpdate,
  type RoomView,
  type SurfaceInput,
  type SurfaceUpdate,
  type SurfaceView,
  type TakeoffLengthUnit,
  type TakeoffView,
} from '@layerbook/contracts';
import { and, asc, clients, eq, firms, rooms, sites, sql, surfaces, TenantTx } from '@layerbook/db';
import { convertArea } from '@layerbook/domain';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { badRequest, notFound } from '../http/problem';
import type { ObjectKeys } from '../files/stored-files';
import { leadCaution, measureOrReject, sumMeasures, unitOfSystem } from './measure';
import { detachRoomPhotos } from './photos';
import { type OpeningRule, takeoffSettingsIn, toSurfaceView, type SurfaceRow } from './surface-view';
import { getEstimatingSettings } from '../firms/estimating';

type RoomRow = typeof rooms.$inferSelect;

/** Each write names who made it in the firm's audit log. */
const auditedBy = (actor: Actor) => ({ actorUserId: actor.userId, actorKind: actor.kind });

async function firmUnit(tx: TenantTx): Promise<TakeoffLengthUnit> {
  return (await firmFacts(tx)).unit;
}

/** The firm's smallest deducted opening, in its unit: the takeoff measures as the estimate will. */
async function openingRule(tx: TenantTx): Promise<OpeningRule> {
  const { settings, lengthUnit } = await getEstimatingSettings(tx);
  return { area: settings.minDeductedOpeningArea, unit: lengthUnit };
}

async function firmFacts(tx: TenantTx): Promise<{ unit: TakeoffLengthUnit; country: string }> {
  const firm = (await tx.db.select({ units: firms.units, country: firms.country }).from(firms).where(eq(firms.id, tx.tenantId)))[0];
  if (!firm) throw notFound('firm');
  return { unit: unitOfSystem(firm.units), country: firm.country };
}

// Every lookup filters on tenant_id as well as relying on RLS: the index leads with it, and a
// wrong-firm id answers the same 404 as an id that never existed.
async function findSite(tx: TenantTx, siteId: string) {
  const row = (
    await tx.db
      .select({ site: sites, clientName: clients.name })
      .from(sites)
      .innerJoin(clients, and(eq(clients.tenantId, sites.tenantId), eq(clients.id, sites.clientId)))
      .where(and(eq(sites.tenantId, tx.tenantId), eq(sites.id, siteId)))
  )[0];
  if (!row) throw notFound('site');
  return row;
}

/**
 * The room, locked when a write depends on it: `key share` by a writer adding a row that points at
 * it (a surface), which waits for a delete of the room under way and then finds it gone (404) where
 * a plain read would let the insert fail on the foreign key (500); `update` by that delete, which
 * so waits for the rows being added and takes them with the room.
 */
async function findRoom(tx: TenantTx, roomId: string, lock?: 'key share' | 'update'): Promise<RoomRow> {
  const query = tx.db
    .select()
    .from(rooms)
    .where(and(eq(rooms.tenantId, tx.tenantId), eq(rooms.id, roomId)));
  const row = (await (lock ? query.for(lock) : query))[0];
  if (!row) throw notFound('room');
  return row;
}

async function findSurface(tx: TenantTx, surfaceId: string): Promise<SurfaceRow> {
  const row = (
    await tx.db
      .select()
      .from(surfaces)
      .where(and(eq(surfaces.tenantId, tx.tenantId), eq(surfaces.id, surfaceId)))
  )[0];
  if (!row) throw notFound('surface');
  return row;
}

export async function getTakeoff(tx: TenantTx, siteId: string): Promise<TakeoffView> {
  const { site, clientName } = await findSite(tx, siteId);
  const { unit, country } = await firmFacts(tx);
  const roomRows = await tx.db
    .select()
    .from(rooms)
    .where(and(eq(rooms.tenantId, tx.tenantId), eq(rooms.siteId, siteId)))
    .orderBy(asc(rooms.position), asc(rooms.createdAt));
  const surfaceRows = await tx.db
    .select({ surface: surfaces })
    .from(surfaces)
    .innerJoin(rooms, and(eq(rooms.tenantId, surfaces.tenantId), eq(rooms.id, surfaces.roomId)))
    .where(and(eq(surfaces.tenantId, tx.tenantId), eq(rooms.siteId, siteId)))
    .orderBy(asc(surfaces.position), asc(surfaces.createdAt));
  const rule = await openingRule(tx);
  const byRoom = new Map<string, SurfaceView[]>();
  for (const { surface } of surfaceRows) {
    const list = byRoom.get(surface.roomId) ?? [];
    list.push(toSurfaceView(surface, rule));
    byRoom.set(surface.roomId, list);
  }
  const roomViews = roomRows.map((r) => toRoomView(r, byRoom.get(r.id) ?? [], unit));
  return {
    site: {
      id: site.id,
      clientId: site.clientId,
      clientName,
      label: site.label,
      addressLine1: site.addressLine1,
      city: site.city,
      yearBuilt: site.yearBuilt,
      // Target housing is built before 1978 (15 U.S.C. 2681(17)); an unknown year stays unknown.
      isPre1978: site.yearBuilt === null ? null : site.yearBuilt < 1978,
      accessNotes: site.accessNotes,
    },
    lengthUnit: unit,
    minDeductedOpeningArea: takeoffSettingsIn(rule, unit).minDeductedOpeningArea,
    rooms: roomViews,
    totals: sumMeasures(
      roomViews.flatMap((r) => r.surfaces),
      unit,
    ),
    leadCaution: leadCaution(roomViews, site.yearBuilt, unit, country),
  };
}

function toRoomView(r: RoomRow, list: SurfaceView[], unit: TakeoffLengthUnit): RoomView {
  return {
    id: r.id,
    siteId: r.siteId,
    name: r.name,
    position: r.position,
    isExterior: r.isExterior,
    notes: r.notes,
    surfaces: list,
    totals: sumMeasures(list, unit),
  };
}

async function roomSurfaces(tx: TenantTx, roomId: string): Promise<SurfaceView[]> {
  const rows = await tx.db
    .select()
    .from(surfaces)
    .where(and(eq(surfaces.tenantId, tx.tenantId), eq(surfaces.roomId, roomId)))
    .orderBy(asc(surfaces.position), asc(surfaces.createdAt));
  const rule = await openingRule(tx);
  return rows.map((row) => toSurfaceView(row, rule));
}

export async function addRoom(tx: TenantTx, actor: Actor, siteId: string, input: RoomInput): Promise<RoomView> {
  await findSite(tx, siteId);
  const [{ next }] = await tx.db
    .select({ next: sql<number>`coalesce(max(${rooms.position}) + 1, 0)::int` })
    .from(rooms)
    .where(and(eq(rooms.tenantId, tx.tenantId), eq(rooms.siteId, siteId)));
  const [row] = await tx.db
    .insert(rooms)
    .values({ ...input, tenantId: tx.tenantId, siteId, position: next ?? 0 })
    .returning();
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'takeoff.room_created',
    entity: 'room',
    entityId: row.id,
    data: { siteId, name: row.name },
  });
  return toRoomView(row, [], await firmUnit(tx));
}

export async function updateRoom(tx: TenantTx, actor: Actor, roomId: string, patch: RoomUpdate, now: Date): Promise<RoomView> {
  const [row] = await tx.db
    .update(rooms)
    .set({ ...patch, updatedAt: now })
    .where(and(eq(rooms.tenantId, tx.tenantId), eq(rooms.id, roomId)))
    .returning();
  if (!row) throw notFound('room');
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'takeoff.room_updated',
    entity: 'room',
    entityId: roomId,
    data: { changed: Object.keys(patch) },
  });
  return toRoomView(row, await roomSurfaces(tx, roomId), await firmUnit(tx));
}

/**
 * The room, its surfaces and its photos go together, in the request's one transaction. Returns the
 * photos' object keys, which the caller deletes from the store after the commit.
 */
export async function deleteRoom(tx: TenantTx, actor: Actor, roomId: string): Promise<ObjectKeys> {
  const room = await findRoom(tx, roomId, 'update');
  const photos = await detachRoomPhotos(tx, roomId);
  const gone = await tx.db
    .delete(surfaces)
    .where(and(eq(surfaces.tenantId, tx.tenantId), eq(surfaces.roomId, roomId)))
    .returning({ id: surfaces.id });
  await tx.db.delete(rooms).where(and(eq(rooms.tenantId, tx.tenantId), eq(rooms.id, roomId)));
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'takeoff.room_deleted',
    entity: 'room',
    entityId: roomId,
    data: { siteId: room.siteId, name: room.name, surfacesDeleted: gone.length, photosDeleted: photos.count },
  });
  return photos.keys;
}

/** Renumbers the list 0…n−1 with `id` at `to` (clamped to the end). Lists are a room or a site long. */
function reorder(ids: readonly string[], id: string, to: number): string[] {
  const rest = ids.filter((x) => x !== id);
  rest.splice(Math.min(to, rest.length), 0, id);
  return rest;
}

export async function moveRoom(tx: TenantTx, roomId: string, { to }: MoveInput): Promise<TakeoffView> {
  const room = await findRoom(tx, roomId);
  const siblings = await tx.db
    .select({ id: rooms.id })
    .from(rooms)
    .where(and(eq(rooms.tenantId, tx.tenantId), eq(rooms.siteId, room.siteId)))
    .orderBy(asc(rooms.position), asc(rooms.createdAt));
  const order = reorder(
    siblings.map((s) => s.id),
    roomId,
    to,
  );
  for (const [position, id] of order.entries()) {
    await tx.db
      .update(rooms)
      .set({ position })
      .where(and(eq(rooms.tenantId, tx.tenantId), eq(rooms.id, id)));
  }
  return getTakeoff(tx, room.siteId);
}

/** Refuses a disturbed area larger than the surface it is on: a typing slip, and it would trip lead-safe reminders. */
function checkDisturbed(disturbed: number | null, measure: ReturnType<typeof measureOrReject>): void {
  if (disturbed !== null && measure.measure === 'area' && isMoreThanSurface(disturbed, measure.gross)) {
    throw badRequest([{ field: 'disturbedPaintedArea', message: 'The disturbed painted area cannot be more than the surface itself.' }]);
  }
}

export async function addSurface(tx: TenantTx, actor: Actor, roomId: string, input: SurfaceInput): Promise<SurfaceView> {
  await findRoom(tx, roomId, 'key share');
  const unit = await firmUnit(tx);
  const rule = await openingRule(tx);
  const measure = measureOrReject(input.shape, takeoffSettingsIn(rule, unit));
  checkDisturbed(input.disturbedPaintedArea, measure);
  const [{ next }] = await tx.db
    .select({ next: sql<number>`coalesce(max(${surfaces.position}) + 1, 0)::int` })
    .from(surfaces)
    .where(and(eq(surfaces.tenantId, tx.tenantId), eq(surfaces.roomId, roomId)));
  const [row] = await tx.db
    .insert(surfaces)
    .values({
      tenantId: tx.tenantId,
      roomId,
      name: input.name,
      position: next ?? 0,
      shape: input.shape,
      lengthUnit: unit,
      disturbedPaintedArea: input.disturbedPaintedArea === null ? null : String(input.disturbedPaintedArea),
      notes: input.notes,
    })
    .returning();
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'takeoff.surface_created',
    entity: 'surface',
    entityId: row.id,
    data: { roomId, kind: input.shape.kind },
  });
  return toSurfaceView(row, rule);
}

/**
 * A new shape is measured again and saved in the firm's unit of today; a disturbed area not sent
 * with it is converted to that unit too (50 ft² stays 4.65 m², never becomes 50 m²). Without a
 * shape, the stored one keeps its unit, and a disturbed area sent alone is read in that unit too.
 */
export async function updateSurface(tx: TenantTx, actor: Actor, surfaceId: string, patch: SurfaceUpdate, now: Date): Promise<SurfaceView> {
  const current = await findSurface(tx, surfaceId);
  const rule = await openingRule(tx);
  const before = toSurfaceView(current, rule);
  const shape = patch.shape ?? before.shape;
  const unit = patch.shape !== undefined ? await firmUnit(tx) : (current.lengthUnit as TakeoffLengthUnit);
  // the stored shape is taken as it reads (toSurfaceView); a new one must pass every check
  const measure = measureOrReject(shape, { ...takeoffSettingsIn(rule, unit), openingsAsSaved: patch.shape === undefined });
  const stored = before.disturbedPaintedArea;
  const kept =
    stored !== null && unit !== current.lengthUnit
      ? Math.round(convertArea(stored, current.lengthUnit as TakeoffLengthUnit, unit) * 100) / 100
      : stored;
  const disturbed = patch.disturbedPaintedArea !== undefined ? patch.disturbedPaintedArea : kept;
  checkDisturbed(disturbed, measure);
  const [row] = await tx.db
    .update(surfaces)
    .set({
      ...(patch.name !== undefined ? { name: patch.name } : {}),
      ...(patch.notes !== undefined ? { notes: patch.notes } : {}),
      ...(patch.shape !== undefined ? { shape: patch.shape, lengthUnit: unit } : {}),
      ...(patch.disturbedPaintedArea !== undefined || kept !== stored
        ? { disturbedPaintedArea: disturbed === null ? null : String(disturbed) }
        : {}),
      updatedAt: now,
    })
    .where(and(eq(surfaces.tenantId, tx.tenantId), eq(surfaces.id, surfaceId)))
    .returning();
  // deleted with its room meanwhile
  if (!row) throw notFound('surface');
  // Measurements drive quantities and prices: the trail keeps a changed shape and disturbed area before and after.
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'takeoff.surface_updated',
    entity: 'surface',
    entityId: surfaceId,
    data: {
      changed: Object.keys(patch),
      ...(patch.shape ? { shapeBefore: before.shape, unitBefore: current.lengthUnit, shapeAfter: patch.shape, unitAfter: unit } : {}),
      ...(disturbed !== stored ? { disturbedBefore: stored, disturbedAfter: disturbed } : {}),
    },
  });
  return toSurfaceView(row, rule);
}

export async function deleteSurface(tx: TenantTx, actor: Actor, surfaceId: string): Promise<void> {
  const current = await findSurface(tx, surfaceId);
  await tx.db.delete(surfaces).where(and(eq(surfaces.tenantId, tx.tenantId), eq(surfaces.id, surfaceId)));
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'takeoff.surface_deleted',
    entity: 'surface',
    entityId: surfaceId,
    data: { roomId: current.roomId, name: current.name },
  });
}

/** A copy placed right after the original (four alike walls, two alike vault bays). */
export async function duplicateSurface(tx: TenantTx, actor: Actor, surfaceId: string): Promise<SurfaceView> {
  const original = await findSurface(tx, surfaceId);
  await findRoom(tx, original.roomId, 'key share');
  await tx.db
    .update(surfaces)
    .set({ position: sql`${surfaces.position} + 1` })
    .where(and(eq(surfaces.tenantId, tx.tenantId), eq(surfaces.roomId, original.roomId), sql`${surfaces.position} > ${original.position}`));
  const [row] = await tx.db
    .insert(surfaces)
    .values({
      tenantId: tx.tenantId,
      roomId: original.roomId,
      name: copyName(original.name),
      position: original.position + 1,
      shape: original.shape,
      lengthUnit: original.lengthUnit,
      disturbedPaintedArea: original.disturbedPaintedArea,
      notes: original.notes,
    })
    .returning();
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'takeoff.surface_created',
    entity: 'surface',
    entityId: row.id,
    data: { roomId: original.roomId, copyOf: surfaceId },
  });
  return toSurfaceView(row, await openingRule(tx));
}

/** "North wall" → "North wall (copy)"; names stay within the 120-character limit. */
function copyName(name: string): string {
  const suffix = ' (copy)';
  return `${name.slice(0, 120 - suffix.length)}${suffix}`;
}

export async function moveSurface(tx: TenantTx, surfaceId: string, { to }: MoveInput): Promise<TakeoffView> {
  const surface = await findSurface(tx, surfaceId);
  const room = await findRoom(tx, surface.roomId);
  const siblings = await tx.db
    .select({ id: surfaces.id })
    .from(surfaces)
    .where(and(eq(surfaces.tenantId, tx.tenantId), eq(surfaces.roomId, room.id)))
    .orderBy(asc(surfaces.position), asc(surfaces.createdAt));
  const order = reorder(
    siblings.map((s) => s.id),
    surfaceId,
    to,
  );
  for (const [position, id] of order.entries()) {
    await tx.db
      .update(surfaces)
      .set({ position })
      .where(and(eq(surfaces.tenantId, tx.tenantId), eq(surfaces.id, id)));
  }
  return getTakeoff(tx, room.siteId);
}
