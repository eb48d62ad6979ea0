import type { PhotoView } from '@layerbook/contracts';
import { and, asc, eq, files, inArray, TenantTx } from '@layerbook/db';
import type { AnyPgColumn, PgTable } from 'drizzle-orm/pg-core';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { notFound } from '../http/problem';
import { deleteFileRows, fileUrls, FileRow, insertImageRow, ObjectKeys, StoredImage } from './stored-files';

type Text = AnyPgColumn<{ data: string; notNull: true }>;

/**
 * One kind of photo: a table linking file rows to the record they show (a room, a sample board),
 * with the same columns whatever the record. Everything else about photos — the file rows, the
 * stored objects, the views, the audit — is the same for every kind and lives here.
 */
export interface PhotoAlbum {
  readonly table: PgTable;
  readonly columns: {
    readonly id: Text;
    readonly tenantId: Text;
    /** the record the photo shows (room_id, board_id) */
    readonly ownerId: Text;
    readonly fileId: Text;
    readonly caption: Text;
    readonly createdAt: AnyPgColumn<{ data: Date; notNull: true }>;
  };
  /** writes the link row (the one place the owner column has its own name) */
  readonly link: (tx: TenantTx, row: { ownerId: string; fileId: string; caption: string }) => Promise<{ id: string; createdAt: Date }>;
  /** `files.purpose` of its uploads */
  readonly purpose: string;
  /** what the audit log calls it: entity 'room_photo', actions 'takeoff.photo_added' / '…_deleted', owner key 'roomId' */
  readonly audit: { readonly entity: string; readonly area: string; readonly ownerKey: string };
}

/** A photo with the record it belongs to, before each area names that record. */
export interface OwnedPhoto {
  readonly ownerId: string;
  readonly view: PhotoView;
}

const toView = (photo: { id: string; caption: string; createdAt: Date }, file: FileRow): PhotoView => ({
  id: photo.id,
  fileId: file.id,
  caption: photo.caption,
  originalName: file.originalName,
  ...fileUrls(file.id),
  width: file.width,
  height: file.height,
  createdAt: photo.createdAt.toISOString(),
});

function selectPhotos(tx: TenantTx, album: PhotoAlbum) {
  const c = album.columns;
  return tx.db
    .select({ id: c.id, ownerId: c.ownerId, caption: c.caption, createdAt: c.createdAt, file: files })
    .from(album.table)
    .innerJoin(files, and(eq(files.tenantId, c.tenantId), eq(files.id, c.fileId)));
}

/** The photos of these records in the order they were added, grouped by record. */
export async function listPhotos(tx: TenantTx, album: PhotoAlbum, ownerIds: readonly string[]): Promise<Map<string, PhotoView[]>> {
  const byOwner = new Map<string, PhotoView[]>();
  if (ownerIds.length === 0) return byOwner;
  const c = album.columns;
  const rows = await selectPhotos(tx, album)
    .where(and(eq(c.tenantId, tx.tenantId), inArray(c.ownerId, [...ownerIds])))
    .orderBy(asc(c.createdAt), asc(c.id));
  for (const row of rows) {
    const list = byOwner.get(row.ownerId) ?? [];
    list.push(toView(row, row.file));
    byOwner.set(row.ownerId, list);
  }
  return byOwner;
}

/** One photo and its file row, or the same 404 whether it never existed or is another firm's. */
export async function findPhoto(tx: TenantTx, album: PhotoAlbum, photoId: string): Promise<OwnedPhoto & { file: FileRow }> {
  const c = album.columns;
  const row = (await selectPhotos(tx, album).where(and(eq(c.tenantId, tx.tenantId), eq(c.id, photoId))))[0];
  if (!row) throw notFound('photo');
  return { ownerId: row.ownerId, view: toView(row, row.file), file: row.file };
}

/**
 * Writes the file row and links it to its record in the caller's transaction; the bytes are
 * already stored (storeImageThen deletes them again if this throws). `about` goes into the audit
 * row, naming the record in words.
 */
export async function addPhoto(
  tx: TenantTx,
  album: PhotoAlbum,
  actor: Actor,
  owner: { readonly id: string; readonly about: Readonly<Record<string, unknown>> },
  caption: string,
  stored: StoredImage,
): Promise<PhotoView> {
  const file = await insertImageRow(tx, stored, album.purpose, actor.kind === 'staff' ? actor.userId : null);
  const photo = await album.link(tx, { ownerId: owner.id, fileId: file.id, caption });
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: `${album.audit.area}.photo_added`,
    entity: album.audit.entity,
    entityId: photo.id,
    data: { [album.audit.ownerKey]: owner.id, ...owner.about, fileId: file.id, sizeBytes: file.sizeBytes, contentType: file.contentType },
  });
  return toView({ ...photo, caption }, file);
}

/**
 * Removes the photo and its file row; returns the object keys to delete once the transaction has
 * committed (a rolled-back delete must still find its bytes). `check` may refuse first, given the
 * record the photo belongs to.
 */
export async function deletePhoto(
  tx: TenantTx,
  album: PhotoAlbum,
  actor: Actor,
  photoId: string,
  check: (ownerId: string) => Promise<void> = () => Promise.resolve(),
): Promise<ObjectKeys> {
  const photo = await findPhoto(tx, album, photoId);
  await check(photo.ownerId);
  const c = album.columns;
  await tx.db.delete(album.table).where(and(eq(c.tenantId, tx.tenantId), eq(c.id, photoId)));
  const keys = await deleteFileRows(tx, [photo.file]);
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: `${album.audit.area}.photo_deleted`,
    entity: album.audit.entity,
    entityId: photoId,
    data: { [album.audit.ownerKey]: photo.ownerId, fileId: photo.file.id, originalName: photo.file.originalName },
  });
  return keys;
}

/** For a record being deleted: its photo links and file rows go with it (keys returned for the store). */
export async function deleteAllPhotos(tx: TenantTx, album: PhotoAlbum, ownerId: string): Promise<{ count: number; keys: ObjectKeys }> {
  const c = album.columns;
  const links = await tx.db
    .delete(album.table)
    .where(and(eq(c.tenantId, tx.tenantId), eq(c.ownerId, ownerId)))
    .returning({ fileId: c.fileId });
  if (links.length === 0) return { count: 0, keys: [] };
  const fileRows = await tx.db
    .select()
    .from(files)
    .where(
      and(
        eq(files.tenantId, tx.tenantId),
        inArray(
          files.id,
          links.map((l) => l.fileId),
        ),
      ),
    );
  return { count: links.length, keys: await deleteFileRows(tx, fileRows) };
}
