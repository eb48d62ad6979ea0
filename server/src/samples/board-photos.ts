import { and, asc, eq, files, sampleBoardPhotos, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import { deleteFileRows, fileUrls, FileRow, insertImageRow, ObjectKeys, StoredImage } from '../files/stored-files';
import { conflict, notFound } from '../http/problem';
import type { Actor } from './boards';
import { findBoard } from './boards';
import type { BoardPhotoView } from './schemas';

export const BOARD_PHOTO_PURPOSE = 'sample_board_photo';

type PhotoRow = typeof sampleBoardPhotos.$inferSelect;

const toView = (photo: PhotoRow, file: FileRow): BoardPhotoView => ({
  id: photo.id,
  boardId: photo.boardId,
  fileId: file.id,
  caption: photo.caption,
  originalName: file.originalName,
  ...fileUrls(file.id),
  width: file.width,
  height: file.height,
  createdAt: photo.createdAt.toISOString(),
});

export async function listBoardPhotos(tx: TenantTx, boardId: string): Promise<BoardPhotoView[]> {
  const rows = await tx.db
    .select({ photo: sampleBoardPhotos, file: files })
    .from(sampleBoardPhotos)
    .innerJoin(files, and(eq(files.tenantId, sampleBoardPhotos.tenantId), eq(files.id, sampleBoardPhotos.fileId)))
    .where(and(eq(sampleBoardPhotos.tenantId, tx.tenantId), eq(sampleBoardPhotos.boardId, boardId)))
    .orderBy(asc(sampleBoardPhotos.createdAt), asc(sampleBoardPhotos.id));
  return rows.map((r) => toView(r.photo, r.file));
}

/** Writes the file row and links it to the board in one transaction; the bytes are already stored. */
export async function addBoardPhoto(tx: TenantTx, actor: Actor, boardId: string, caption: string, stored: StoredImage): Promise<BoardPhotoView> {
  // Locked, so a client's approval cannot slip in between this check and the insert.
  const board = await findBoard(tx, boardId, true);
  if (board.status === 'approved') throw conflict('The client approved this board with its photos; start a new board or round to show different ones.');
  const file = await insertImageRow(tx, stored, BOARD_PHOTO_PURPOSE, actor.userId);
  const photo = (await tx.db.insert(sampleBoardPhotos).values({ tenantId: tx.tenantId, boardId, fileId: file.id, caption }).returning())[0]!;
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: 'staff',
    action: 'samples.photo_added',
    entity: 'sample_board_photo',
    entityId: photo.id,
    data: { boardId, label: board.label, round: board.round, fileId: file.id, sizeBytes: file.sizeBytes, contentType: file.contentType },
  });
  return toView(photo, file);
}

/** Removes the photo and its file row; returns the object keys to delete after the commit. */
export async function deleteBoardPhoto(tx: TenantTx, actor: Actor, photoId: string): Promise<ObjectKeys> {
  const row = (
    await tx.db
      .select({ photo: sampleBoardPhotos, file: files })
      .from(sampleBoardPhotos)
      .innerJoin(files, and(eq(files.tenantId, sampleBoardPhotos.tenantId), eq(files.id, sampleBoardPhotos.fileId)))
      .where(and(eq(sampleBoardPhotos.tenantId, tx.tenantId), eq(sampleBoardPhotos.id, photoId)))
  )[0];
  if (!row) throw notFound('photo');
  const board = await findBoard(tx, row.photo.boardId, true);
  // The approved board is the control sample: the photos the client approved stay on record.
  if (board.status === 'approved') throw conflict('The client approved this board with these photos, so they stay on record.');
  await tx.db.delete(sampleBoardPhotos).where(and(eq(sampleBoardPhotos.tenantId, tx.tenantId), eq(sampleBoardPhotos.id, photoId)));
  const keys = await deleteFileRows(tx, [row.file]);
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: 'staff',
    action: 'samples.photo_deleted',
    entity: 'sample_board_photo',
    entityId: photoId,
    data: { boardId: row.photo.boardId, fileId: row.file.id, originalName: row.file.originalName },
  });
  return keys;
}
