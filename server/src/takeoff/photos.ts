import type { RoomPhotoView } from '@layerbook/contracts';
import { and, eq, roomPhotos, rooms, TenantTx } from '@layerbook/db';
import { addPhoto, deleteAllPhotos, deletePhoto, listPhotos, type PhotoAlbum } from '../files/photos';
import type { ObjectKeys, StoredImage } from '../files/stored-files';
import type { Actor } from '../http/actor';
import { notFound } from '../http/problem';

/** Room photos: taken during takeoff and on site, kept with the room (files/photos.ts does the rest). */
export const ROOM_PHOTOS: PhotoAlbum = {
  table: roomPhotos,
  columns: {
    id: roomPhotos.id,
    tenantId: roomPhotos.tenantId,
    ownerId: roomPhotos.roomId,
    fileId: roomPhotos.fileId,
    caption: roomPhotos.caption,
    createdAt: roomPhotos.createdAt,
  },
  link: async (tx, row) =>
    (
      await tx.db
        .insert(roomPhotos)
        .values({ tenantId: tx.tenantId, roomId: row.ownerId, fileId: row.fileId, caption: row.caption })
        .returning({ id: roomPhotos.id, createdAt: roomPhotos.createdAt })
    )[0],
  purpose: 'room_photo',
  audit: { entity: 'room_photo', area: 'takeoff', ownerKey: 'roomId' },
};

type PhotoRoom = { id: string; name: string; siteId: string };

/**
 * The room, or the same 404 whether it never existed or belongs to another firm. `keyShare` when a
 * photo is about to point at it: a delete of the room under way is waited for and then answers 404,
 * not a foreign-key 500 (and the delete, locking the room first, waits for the photo and takes it too).
 */
async function roomOfPhotos(tx: TenantTx, roomId: string, keyShare: boolean): Promise<PhotoRoom> {
  const query = tx.db
    .select({ id: rooms.id, name: rooms.name, siteId: rooms.siteId })
    .from(rooms)
    .where(and(eq(rooms.tenantId, tx.tenantId), eq(rooms.id, roomId)));
  const room = (await (keyShare ? query.for('key share') : query))[0];
  if (!room) throw notFound('room');
  return room;
}

export const findPhotoRoom = (tx: TenantTx, roomId: string): Promise<PhotoRoom> => roomOfPhotos(tx, roomId, false);

export async function listRoomPhotos(tx: TenantTx, roomId: string): Promise<RoomPhotoView[]> {
  await findPhotoRoom(tx, roomId);
  return ((await listPhotos(tx, ROOM_PHOTOS, [roomId])).get(roomId) ?? []).map((view) => ({ ...view, roomId }));
}

export async function addRoomPhoto(
  tx: TenantTx,
  actor: Actor,
  roomId: string,
  caption: string,
  stored: StoredImage,
): Promise<RoomPhotoView> {
  const room = await roomOfPhotos(tx, roomId, true);
  const view = await addPhoto(tx, ROOM_PHOTOS, actor, { id: roomId, about: { roomName: room.name, siteId: room.siteId } }, caption, stored);
  return { ...view, roomId };
}

export function deleteRoomPhoto(tx: TenantTx, actor: Actor, photoId: string): Promise<ObjectKeys> {
  return deletePhoto(tx, ROOM_PHOTOS, actor, photoId);
}

/** For a room being deleted: its photo links and file rows go with it (keys returned for the store). */
export function detachRoomPhotos(tx: TenantTx, roomId: string): Promise<{ count: number; keys: ObjectKeys }> {
  return deleteAllPhotos(tx, ROOM_PHOTOS, roomId);
}
