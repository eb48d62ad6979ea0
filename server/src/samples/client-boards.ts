import {
  CLIENT_BOARD_STATUSES,
  type ClientBoardPhoto,
  type ClientBoardStatus,
  type ClientBoardView,
  type FinishSnapshot,
} from '@layerbook/contracts';
import { and, asc, eq, firms, inArray, portalUsers, sampleBoards, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { AppContext } from '../context';
import { clientActor } from '../http/actor';
import type { ClientPrincipal } from '../http/principal';
import { conflict, notFound } from '../http/problem';
import { findPhoto, listPhotos } from '../files/photos';
import type { FileRow } from '../files/stored-files';
import { BOARD_PHOTOS } from './board-photos';
import type { BoardRow } from './boards';
import { mailBoardDecision } from './sample-mail';
import { clientFinishStepsIn } from './step-words';

/** What a client may see: boards of their own client record that the firm has shown. Drafts stay in the office. */
const VISIBLE = CLIENT_BOARD_STATUSES;

const portalPhoto = (photoId: string) => `/api/portal/boards/photos/${photoId}`;

/** The client record this portal login belongs to; a login with none sees no boards. */
async function clientRecordOf(tx: TenantTx, client: ClientPrincipal): Promise<string | null> {
  const row = (
    await tx.db
      .select({ clientId: portalUsers.clientId })
      .from(portalUsers)
      .where(and(eq(portalUsers.tenantId, tx.tenantId), eq(portalUsers.id, client.id)))
  )[0];
  return row?.clientId ?? null;
}

/** The board if this client may see it; otherwise the same 404 as a board that does not exist. */
async function findClientBoard(tx: TenantTx, client: ClientPrincipal, boardId: string): Promise<BoardRow> {
  const clientId = await clientRecordOf(tx, client);
  const row = clientId
    ? (
        await tx.db
          .select()
          .from(sampleBoards)
          .where(
            and(
              eq(sampleBoards.tenantId, tx.tenantId),
              eq(sampleBoards.id, boardId),
              eq(sampleBoards.clientId, clientId),
              inArray(sampleBoards.status, [...VISIBLE]),
            ),
          )
      )[0]
    : undefined;
  if (!row) throw notFound('sample board');
  return row;
}

/** Thumbnails and full photos, each served by the portal's own routes (clients cannot use /api/files). */
async function photosOf(tx: TenantTx, boardIds: readonly string[]): Promise<Map<string, ClientBoardPhoto[]>> {
  const byBoard = new Map<string, ClientBoardPhoto[]>();
  for (const [boardId, views] of await listPhotos(tx, BOARD_PHOTOS, boardIds)) {
    byBoard.set(
      boardId,
      views.map((p) => ({
        id: p.id,
        caption: p.caption,
        thumbnailUrl: `${portalPhoto(p.id)}/thumbnail`,
        downloadUrl: portalPhoto(p.id),
        width: p.width,
        height: p.height,
      })),
    );
  }
  return byBoard;
}

/** The firm's time zone: the portal shows when a board was answered as the firm's own day. */
async function firmTimeZone(tx: TenantTx): Promise<string> {
  const row = (await tx.db.select({ timeZone: firms.timeZone }).from(firms).where(eq(firms.id, tx.tenantId)))[0];
  if (!row) throw notFound('firm');
  return row.timeZone;
}

const toClientView = (board: BoardRow, client: ClientPrincipal, photos: ClientBoardPhoto[], timeZone: string): ClientBoardView => {
  const snapshot = board.finishSnapshot as FinishSnapshot | null;
  return {
    id: board.id,
    label: board.label,
    round: board.round,
    status: board.status as ClientBoardStatus,
    firmName: client.firmName,
    finishName: snapshot?.systemName ?? null,
    // In the client's language: the system's words by key, the firm's names as typed.
    finishSteps: snapshot ? clientFinishStepsIn(snapshot.layers, client.language) : [],
    clientComment: board.clientComment,
    decidedAt: board.decidedAt?.toISOString() ?? null,
    timeZone,
    photos,
  };
};

export async function listClientBoards(tx: TenantTx, client: ClientPrincipal): Promise<ClientBoardView[]> {
  const clientId = await clientRecordOf(tx, client);
  if (!clientId) return [];
  const boards = await tx.db
    .select()
    .from(sampleBoards)
    .where(and(eq(sampleBoards.tenantId, tx.tenantId), eq(sampleBoards.clientId, clientId), inArray(sampleBoards.status, [...VISIBLE])))
    .orderBy(asc(sampleBoards.label), asc(sampleBoards.round), asc(sampleBoards.createdAt));
  const photos = await photosOf(
    tx,
    boards.map((b) => b.id),
  );
  const timeZone = await firmTimeZone(tx);
  return boards.map((b) => toClientView(b, client, photos.get(b.id) ?? [], timeZone));
}

export async function getClientBoard(tx: TenantTx, client: ClientPrincipal, boardId: string): Promise<ClientBoardView> {
  const board = await findClientBoard(tx, client, boardId);
  return toClientView(board, client, (await photosOf(tx, [board.id])).get(board.id) ?? [], await firmTimeZone(tx));
}

/** The stored file of a photo on a board this client may see (404 otherwise). */
export async function clientBoardPhotoFile(tx: TenantTx, client: ClientPrincipal, photoId: string): Promise<FileRow> {
  const photo = await findPhoto(tx, BOARD_PHOTOS, photoId);
  await findClientBoard(tx, client, photo.ownerId).catch(() => {
    throw notFound('photo');
  });
  return photo.file;
}

const alreadyDecided = (board: BoardRow) =>
  conflict(
    board.status === 'approved'
      ? 'You have already approved this board. Thank you — nothing more to do here.'
      : 'You have already asked for changes to this board. The firm will show you the next round.',
  );

/** The client's answer, once: the update only applies while the board is still waiting, so two clicks cannot both count. */
export async function decideBoard(
  tx: TenantTx,
  ctx: AppContext,
  client: ClientPrincipal,
  boardId: string,
  decision: 'approved' | 'changes_requested',
  readComment: () => string,
): Promise<ClientBoardView> {
  const board = await findClientBoard(tx, client, boardId);
  if (board.status !== 'shown') throw alreadyDecided(board);
  const comment = readComment();
  const now = ctx.now();
  const updated = (
    await tx.db
      .update(sampleBoards)
      .set({ status: decision, clientComment: comment, decidedAt: now, decidedBy: client.id, updatedAt: now })
      .where(and(eq(sampleBoards.tenantId, tx.tenantId), eq(sampleBoards.id, boardId), eq(sampleBoards.status, 'shown')))
      .returning()
  )[0];
  if (!updated) throw alreadyDecided(await findClientBoard(tx, client, boardId));
  const actor = clientActor(client);
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: decision === 'approved' ? 'samples.board_approved' : 'samples.changes_requested',
    entity: 'sample_board',
    entityId: boardId,
    data: { label: board.label, round: board.round, clientName: client.name, ...(comment ? { comment } : {}) },
  });
  await mailBoardDecision(tx, ctx, { board: updated, clientName: client.name, decision, comment });
  return toClientView(updated, client, (await photosOf(tx, [boardId])).get(boardId) ?? [], await firmTimeZone(tx));
}
