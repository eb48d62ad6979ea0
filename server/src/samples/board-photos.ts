import type { BoardPhotoView } from '@layerbook/contracts';
import { sampleBoardPhotos, TenantTx } from '@layerbook/db';
import { addPhoto, deletePhoto, listPhotos, type PhotoAlbum } from '../files/photos';
import type { ObjectKeys, StoredImage } from '../files/stored-files';
import type { Actor } from '../http/actor';
import { conflict, type HttpError } from '../http/problem';
import { findBoard, type BoardRow } from './boards';

/** Sample-board photos: what the client looks at before approving (files/photos.ts does the rest). */
export const BOARD_PHOTOS: PhotoAlbum = {
  table: sampleBoardPhotos,
  columns: {
    id: sampleBoardPhotos.id,
    tenantId: sampleBoardPhotos.tenantId,
    ownerId: sampleBoardPhotos.boardId,
    fileId: sampleBoardPhotos.fileId,
    caption: sampleBoardPhotos.caption,
    createdAt: sampleBoardPhotos.createdAt,
  },
  link: async (tx, row) =>
    (
      await tx.db
        .insert(sampleBoardPhotos)
        .values({ tenantId: tx.tenantId, boardId: row.ownerId, fileId: row.fileId, caption: row.caption })
        .returning({ id: sampleBoardPhotos.id, createdAt: sampleBoardPhotos.createdAt })
    )[0],
  purpose: 'sample_board_photo',
  audit: { entity: 'sample_board_photo', area: 'samples', ownerKey: 'boardId' },
};

/** The photos of these boards, grouped by board, in the order they were added. */
export async function boardPhotosOf(tx: TenantTx, boardIds: readonly string[]): Promise<Map<string, BoardPhotoView[]>> {
  const byBoard = new Map<string, BoardPhotoView[]>();
  for (const [boardId, views] of await listPhotos(tx, BOARD_PHOTOS, boardIds))
    byBoard.set(
      boardId,
      views.map((view) => ({ ...view, boardId })),
    );
  return byBoard;
}

export async function listBoardPhotos(tx: TenantTx, boardId: string): Promise<BoardPhotoView[]> {
  await findBoard(tx, boardId);
  return (await boardPhotosOf(tx, [boardId])).get(boardId) ?? [];
}

/**
 * Photos are added and deleted only while the board is being made: once shown, the client answers
 * on what they saw, and a turned-down board keeps the photos they turned down. Why not, in words.
 */
function photosFixed(board: BoardRow, change: 'add' | 'delete'): HttpError | null {
  const isAdd = change === 'add';
  switch (board.status) {
    case 'draft':
      return null;
    case 'shown':
      return conflict(
        `The client has been shown this board with these photos, so ${isAdd ? 'no more can be added' : 'they stay as shown'}. If they ask for changes, add new ones to the next round.`,
      );
    case 'changes_requested':
      return conflict(
        `The client asked for changes to this board as it was shown, so ${isAdd ? 'no more photos can be added' : 'its photos stay on record'}. Add new ones to the next round.`,
      );
    case 'approved':
      return conflict(
        isAdd
          ? 'The client approved this board with its photos; start a new board to show different ones.'
          : 'The client approved this board with these photos, so they stay on record.',
      );
  }
}

/** Before an upload's body is read: the board is there and still takes photos (404 or 409 otherwise). */
export async function findBoardTakingPhotos(tx: TenantTx, boardId: string): Promise<BoardRow> {
  const board = await findBoard(tx, boardId);
  const refusal = photosFixed(board, 'add');
  if (refusal) throw refusal;
  return board;
}

/** Writes the file row and links it to the board in one transaction; the bytes are already stored. */
export async function addBoardPhoto(
  tx: TenantTx,
  actor: Actor,
  boardId: string,
  caption: string,
  stored: StoredImage,
): Promise<BoardPhotoView> {
  // Locked, so showing the board cannot slip in between this check and the insert.
  const board = await findBoard(tx, boardId, true);
  const refusal = photosFixed(board, 'add');
  if (refusal) throw refusal;
  const view = await addPhoto(tx, BOARD_PHOTOS, actor, { id: boardId, about: { label: board.label, round: board.round } }, caption, stored);
  return { ...view, boardId };
}

/** Removes the photo and its file row; returns the object keys to delete after the commit. */
export function deleteBoardPhoto(tx: TenantTx, actor: Actor, photoId: string): Promise<ObjectKeys> {
  return deletePhoto(tx, BOARD_PHOTOS, actor, photoId, async (boardId) => {
    const refusal = photosFixed(await findBoard(tx, boardId, true), 'delete');
    if (refusal) throw refusal;
  });
}
