import { randomUUID } from 'node:crypto';
import { and, eq, files, TenantTx } from '@layerbook/db';
import type { Logger } from 'pino';
import { notFound } from '../http/problem';
import type { CheckedImage } from './image';
import type { ObjectStore } from './object-store';

export type FileRow = typeof files.$inferSelect;

/** An image whose bytes are in the store but whose row is not written yet. */
export interface StoredImage {
  readonly fileId: string;
  readonly storageKey: string;
  readonly thumbnailKey: string;
  readonly image: CheckedImage;
}

/** The object keys a deleted row leaves behind, removed once its transaction has committed. */
export type ObjectKeys = readonly string[];

/**
 * Puts the image and its thumbnail under keys made here (`<tenant>/<uuid>`), never from the
 * uploader's name, then runs `record` — the transaction that writes the rows. If `record` fails
 * (a 404, a constraint, a failed commit), the objects are deleted again so nothing is left unowned.
 */
export async function storeImageThen<T>(
  storage: ObjectStore,
  logger: Logger,
  tenantId: string,
  image: CheckedImage,
  record: (stored: StoredImage) => Promise<T>,
): Promise<T> {
  const fileId = randomUUID();
  const stored: StoredImage = { fileId, storageKey: `${tenantId}/${fileId}`, thumbnailKey: `${tenantId}/${fileId}-thumb.webp`, image };
  const keys = [stored.storageKey, stored.thumbnailKey];
  try {
    await storage.put(stored.storageKey, image.bytes, image.contentType);
    await storage.put(stored.thumbnailKey, image.thumbnail, 'image/webp');
    return await record(stored);
  } catch (error) {
    await discardObjects(storage, logger, keys);
    throw error;
  }
}

/** Best effort: a failed delete leaves an orphan object, which is logged, not a failed request. */
export async function discardObjects(storage: ObjectStore, logger: Logger, keys: ObjectKeys): Promise<void> {
  for (const key of keys) {
    try {
      await storage.delete(key);
    } catch (err) {
      logger.warn({ err, key }, 'could not delete a stored object');
    }
  }
}

/** `uploadedBy` is a staff member's user id (null for an upload no staff member made). */
export async function insertImageRow(tx: TenantTx, stored: StoredImage, purpose: string, uploadedBy: string | null): Promise<FileRow> {
  const { image } = stored;
  const rows = await tx.db
    .insert(files)
    .values({
      id: stored.fileId,
      tenantId: tx.tenantId,
      storageKey: stored.storageKey,
      thumbnailKey: stored.thumbnailKey,
      originalName: image.originalName,
      contentType: image.contentType,
      sizeBytes: image.bytes.length,
      width: image.width,
      height: image.height,
      purpose,
      uploadedBy,
    })
    .returning();
  return rows[0];
}

export async function findFile(tx: TenantTx, fileId: string): Promise<FileRow> {
  const row = (
    await tx.db
      .select()
      .from(files)
      .where(and(eq(files.tenantId, tx.tenantId), eq(files.id, fileId)))
  )[0];
  if (!row) throw notFound('file');
  return row;
}

/** Deletes the rows; the caller removes the returned keys from the store after the commit. */
export async function deleteFileRows(tx: TenantTx, rows: readonly FileRow[]): Promise<ObjectKeys> {
  const keys: string[] = [];
  for (const row of rows) {
    await tx.db.delete(files).where(and(eq(files.tenantId, tx.tenantId), eq(files.id, row.id)));
    keys.push(row.storageKey);
    if (row.thumbnailKey) keys.push(row.thumbnailKey);
  }
  return keys;
}

export const fileUrls = (fileId: string) => ({ downloadUrl: `/api/files/${fileId}`, thumbnailUrl: `/api/files/${fileId}/thumbnail` });
