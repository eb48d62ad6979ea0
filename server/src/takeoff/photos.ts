import { and, asc, eq, files, roomPhotos, rooms, TenantTx } from '@layerbook/db';
import { z } from 'zod';
import { recordAudit } from '../audit/record';
import { deleteFileRows, fileUrls, FileRow, insertImageRow, ObjectKeys, StoredImage } from '../files/stored-files';
import { notFound } from '../http/problem';
import type { Actor } from './service';

export const ROOM_PHOTO_PURPOSE = 'room_photo';

/** The text fields sent beside the file. Kept here until the app shares a contract for photos. */
export const roomPhotoFields = z.strictObject({
  caption: z.string().trim().max(200, { error: 'Keep the caption under 200 characters.' }).optional(),
});
export type RoomPhotoFields = z.infer<typeof roomPhotoFields>;

export interface RoomPhotoView {
  readonly id: string;
  readonly roomId: string;
  readonly fileId: string;
  readonly caption: string;
  readonly originalName: string;
  readonly thumbnailUrl: string;
  readonly downloadUrl: string;
  readonly width: number | null;
  readonly height: number | null;
  readonly createdAt: string;
}

type PhotoRow = typeof roomPhotos.$inferSelect;

const toView = (photo: PhotoRow, file: FileRow): RoomPhotoView => ({
  id: photo.id,
  roomId: photo.roomId,
  fileId: file.id,
  caption: photo.caption,
  originalName: file.originalName,
  ...fileUrls(file.id),
  width: file.width,
  height: file.height,
  createdAt: photo.createdAt.toISOString(),
});

/** The room, or the same 404 whether it never existed or belongs to another firm. */
export async function findPhotoRoom(tx: TenantTx, roomId: string): Promise<{ id: string; name: string; siteId: string }> {
  const room = (await tx.db.select({ id: rooms.id, name: rooms.name, siteId: rooms.siteId }).from(rooms).where(and(eq(rooms.tenantId, tx.tenantId), eq(rooms.id, roomId))))[0];
  if (!room) throw notFound('room');
  return room;
}

export async function listRoomPhotos(tx: TenantTx, roomId: string): Promise<RoomPhotoView[]> {
  await findPhotoRoom(tx, roomId);
  const rows = await tx.db
    .select({ photo: roomPhotos, file: files })
    .from(roomPhotos)
    .innerJoin(files, and(eq(files.tenantId, roomPhotos.tenantId), eq(files.id, roomPhotos.fileId)))
    .where(and(eq(roomPhotos.tenantId, tx.tenantId), eq(roomPhotos.roomId, roomId)))
    .orderBy(asc(roomPhotos.createdAt), asc(roomPhotos.id));
  return rows.map((r) => toView(r.photo, r.file));
}

/** Writes the file row and links it to the room in one transaction; the bytes are already stored. */
export async function addRoomPhoto(tx: TenantTx, actor: Actor, roomId: string, fields: RoomPhotoFields, stored: StoredImage): Promise<RoomPhotoView> {
  const room = await findPhotoRoom(tx, roomId);
  const file = await insertImageRow(tx, stored, ROOM_PHOTO_PURPOSE, actor.userId);
  const photo = (await tx.db.insert(roomPhotos).values({ tenantId: tx.tenantId, roomId, fileId: file.id, caption: fields.caption ?? '' }).returning())[0]!;
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: 'staff',
    action: 'takeoff.photo_added',
    entity: 'room_photo',
    entityId: photo.id,
    data: { roomId, roomName: room.name, siteId: room.siteId, fileId: file.id, sizeBytes: file.sizeBytes, contentType: file.contentType },
  });
  return toView(photo, file);
}

/** Removes the photo and its file row; returns the object keys to delete after the commit. */
export async function deleteRoomPhoto(tx: TenantTx, actor: Actor, photoId: string): Promise<ObjectKeys> {
  const row = (
    await tx.db
      .select({ photo: roomPhotos, file: files })
      .from(roomPhotos)
      .innerJoin(files, and(eq(files.tenantId, roomPhotos.tenantId), eq(files.id, roomPhotos.fileId)))
      .where(and(eq(roomPhotos.tenantId, tx.tenantId), eq(roomPhotos.id, photoId)))
  )[0];
  if (!row) throw notFound('photo');
  await tx.db.delete(roomPhotos).where(and(eq(roomPhotos.tenantId, tx.tenantId), eq(roomPhotos.id, photoId)));
  const keys = await deleteFileRows(tx, [row.file]);
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: 'staff',
    action: 'takeoff.photo_deleted',
    entity: 'room_photo',
    entityId: photoId,
    data: { roomId: row.photo.roomId, fileId: row.file.id, originalName: row.file.originalName },
  });
  return keys;
}

/** For a room being deleted: its photo links and file rows go with it (keys returned for the store). */
export async function detachRoomPhotos(tx: TenantTx, roomId: string): Promise<{ count: number; keys: ObjectKeys }> {
  const rows = await tx.db
    .delete(roomPhotos)
    .where(and(eq(roomPhotos.tenantId, tx.tenantId), eq(roomPhotos.roomId, roomId)))
    .returning({ fileId: roomPhotos.fileId });
  if (rows.length === 0) return { count: 0, keys: [] };
  const fileRows: FileRow[] = [];
  for (const { fileId } of rows) {
    const file = (await tx.db.select().from(files).where(and(eq(files.tenantId, tx.tenantId), eq(files.id, fileId))))[0];
    if (file) fileRows.push(file);
  }
  return { count: rows.length, keys: await deleteFileRows(tx, fileRows) };
}
