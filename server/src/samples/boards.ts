import type { FinishSnapshot, SampleBoardInput, SampleBoardUpdate, SampleBoardView } from '@layerbook/contracts';
import { and, clients, eq, estimates, portalUsers, sampleBoards, sites, TenantTx } from '@layerbook/db';
import { siteLine } from '@layerbook/domain';
import type { AppContext } from '../context';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { badRequest, conflict, notFound } from '../http/problem';
import { ensurePortalAccount } from '../proposals/client-portal-account';
import { boardPhotosOf } from './board-photos';
import { mailBoardShown } from './sample-mail';
import { describeFinish, snapshotFinish } from './snapshot';

export type BoardRow = typeof sampleBoards.$inferSelect;

/** The board, or the same 404 whether it never existed or belongs to another firm (RLS). */
export async function findBoard(tx: TenantTx, boardId: string, lock = false): Promise<BoardRow> {
  const query = tx.db
    .select()
    .from(sampleBoards)
    .where(and(eq(sampleBoards.tenantId, tx.tenantId), eq(sampleBoards.id, boardId)));
  const row = (lock ? await query.for('update') : await query)[0];
  if (!row) throw notFound('sample board');
  return row;
}

type BoardClient = { id: string; name: string; email: string };

/**
 * The board locked for a write that makes a row pointing at its client (the next round, a portal
 * login): the client first, `for key share`, then the board `for update`. A merge locks the clients
 * before it moves their boards, so the other order deadlocks against it. This way a merge under way
 * finishes first, and the board is read again with the client it was moved to.
 */
async function lockBoardAndClient(tx: TenantTx, boardId: string): Promise<{ board: BoardRow; client: BoardClient }> {
  for (let attempt = 0; attempt < 3; attempt++) {
    const { clientId } = await findBoard(tx, boardId);
    const client = (
      await tx.db
        .select({ id: clients.id, name: clients.name, email: clients.email })
        .from(clients)
        .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, clientId)))
        .for('key share')
    )[0];
    // Merged away while we waited: the board now belongs to the kept client.
    if (!client) continue;
    const board = await findBoard(tx, boardId, true);
    // Held `for key share`, the client cannot be merged away any more; a board moved anyway is not ours to guess at.
    if (board.clientId !== client.id) break;
    return { board, client };
  }
  throw conflict("This board's client was being merged with another at that moment. Try again.");
}

export async function getBoard(tx: TenantTx, boardId: string): Promise<SampleBoardView> {
  const board = await findBoard(tx, boardId);
  const client = (
    await tx.db
      .select({ name: clients.name })
      .from(clients)
      .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, board.clientId)))
  )[0];
  const site = board.siteId
    ? (
        await tx.db
          .select()
          .from(sites)
          .where(and(eq(sites.tenantId, tx.tenantId), eq(sites.id, board.siteId)))
      )[0]
    : undefined;
  const decidedBy = board.decidedBy
    ? (
        await tx.db
          .select({ name: portalUsers.name })
          .from(portalUsers)
          .where(and(eq(portalUsers.tenantId, tx.tenantId), eq(portalUsers.id, board.decidedBy)))
      )[0]
    : undefined;
  const snapshot = board.finishSnapshot as FinishSnapshot | null;
  return {
    id: board.id,
    label: board.label,
    round: board.round,
    status: board.status,
    clientId: board.clientId,
    clientName: client?.name ?? '',
    siteId: board.siteId,
    siteAddress: site ? siteLine(site) : null,
    estimateId: board.estimateId,
    finishSystemId: board.finishSystemId,
    finish: snapshot,
    finishSteps: describeFinish(snapshot),
    notes: board.notes,
    clientComment: board.clientComment,
    decidedAt: board.decidedAt?.toISOString() ?? null,
    decidedByName: decidedBy?.name ?? null,
    hasNextRound: (await findNextRound(tx, board)) !== undefined,
    photos: (await boardPhotosOf(tx, [board.id])).get(board.id) ?? [],
    createdAt: board.createdAt.toISOString(),
    updatedAt: board.updatedAt.toISOString(),
  };
}

/**
 * The client, site and estimate must be this firm's and belong together; each refusal names its field.
 * The client is read `for key share`: a merge removing it finishes first and it is then gone (400),
 * where a plain read would let the insert fail on the foreign key (500).
 */
async function checkLinks(
  tx: TenantTx,
  input: { clientId: string; siteId?: string | undefined; estimateId?: string | undefined },
): Promise<void> {
  const client = (
    await tx.db
      .select({ id: clients.id })
      .from(clients)
      .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, input.clientId)))
      .for('key share')
  )[0];
  if (!client) throw badRequest([{ field: 'clientId', message: 'Choose one of your clients.' }]);
  if (input.siteId) {
    const site = (
      await tx.db
        .select({ clientId: sites.clientId })
        .from(sites)
        .where(and(eq(sites.tenantId, tx.tenantId), eq(sites.id, input.siteId)))
    )[0];
    if (!site || site.clientId !== input.clientId) throw badRequest([{ field: 'siteId', message: 'Choose a site of this client.' }]);
  }
  if (input.estimateId) {
    const est = (
      await tx.db
        .select({ clientId: estimates.clientId })
        .from(estimates)
        .where(and(eq(estimates.tenantId, tx.tenantId), eq(estimates.id, input.estimateId)))
    )[0];
    if (!est || est.clientId !== input.clientId)
      throw badRequest([{ field: 'estimateId', message: 'Choose an estimate for this client.' }]);
  }
}

export async function createBoard(tx: TenantTx, actor: Actor, input: SampleBoardInput, now: Date): Promise<SampleBoardView> {
  await checkLinks(tx, input);
  const snapshot = input.finishSystemId ? await snapshotFinish(tx, input.finishSystemId, now) : null;
  const row = (
    await tx.db
      .insert(sampleBoards)
      .values({
        tenantId: tx.tenantId,
        clientId: input.clientId,
        siteId: input.siteId ?? null,
        estimateId: input.estimateId ?? null,
        label: input.label,
        finishSystemId: input.finishSystemId ?? null,
        finishSnapshot: snapshot,
        notes: input.notes,
      })
      .returning()
  )[0];
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'samples.board_created',
    entity: 'sample_board',
    entityId: row.id,
    data: { label: row.label, clientId: row.clientId, finishSystemId: row.finishSystemId },
  });
  return getBoard(tx, row.id);
}

export async function updateBoard(
  tx: TenantTx,
  actor: Actor,
  boardId: string,
  input: SampleBoardUpdate,
  now: Date,
): Promise<SampleBoardView> {
  // Locked, as adding a photo is: a client's approval cannot slip in between this check and the write.
  const board = await findBoard(tx, boardId, true);
  if (board.status === 'approved') throw conflict('The client has approved this board; it is now the control sample and stays as it was.');
  // The client knows the board by its label (portal, e-mail, their answer): it changes only on a draft.
  if (input.label !== undefined && input.label !== board.label && board.status !== 'draft')
    throw conflict('The client has seen this board under its label, so it stays as shown. Start the next round to change it.', [
      { field: 'label', message: 'The label of a board the client has seen cannot change.' },
    ]);
  const changes: Partial<typeof sampleBoards.$inferInsert> = { updatedAt: now };
  if (input.label !== undefined) changes.label = input.label;
  if (input.notes !== undefined) changes.notes = input.notes;
  if (input.finishSystemId !== undefined) {
    // What the client has seen stays what they saw: the finish is chosen again only on a draft.
    if (board.status !== 'draft')
      throw conflict('The client has seen this board, so its finish stays as shown. Start the next round to change it.', [
        { field: 'finishSystemId', message: 'The finish of a shown board cannot change.' },
      ]);
    changes.finishSystemId = input.finishSystemId;
    changes.finishSnapshot = input.finishSystemId ? await snapshotFinish(tx, input.finishSystemId, now) : null;
  }
  await tx.db
    .update(sampleBoards)
    .set(changes)
    .where(and(eq(sampleBoards.tenantId, tx.tenantId), eq(sampleBoards.id, boardId)));
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'samples.board_updated',
    entity: 'sample_board',
    entityId: boardId,
    data: { fields: Object.keys(input) },
  });
  return getBoard(tx, boardId);
}

export async function showBoard(
  tx: TenantTx,
  ctx: AppContext,
  actor: Actor,
  firmName: string,
  boardId: string,
  now: Date,
): Promise<SampleBoardView> {
  // Locked: a second show (a double click) waits here and then finds the board shown (409), so the client is told and audited once.
  const { board, client } = await lockBoardAndClient(tx, boardId);
  if (board.status !== 'draft') throw conflict('This board has already been shown to the client.');
  // Boards come before any proposal, so the client may have no portal login yet: made here, as a proposal's send does.
  if (!client.email.trim())
    throw badRequest(
      [{ field: 'client.email', message: "Add the client's e-mail address before showing them the board." }],
      'The client has no e-mail address to tell them about the board.',
    );
  await ensurePortalAccount(tx, client);
  await tx.db
    .update(sampleBoards)
    .set({ status: 'shown', updatedAt: now })
    .where(and(eq(sampleBoards.tenantId, tx.tenantId), eq(sampleBoards.id, boardId), eq(sampleBoards.status, 'draft')));
  const recipients = await mailBoardShown(tx, ctx, { board, firmName });
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'samples.board_shown',
    entity: 'sample_board',
    entityId: boardId,
    data: { label: board.label, round: board.round, mailedTo: recipients },
  });
  return getBoard(tx, boardId);
}

/** The round that follows this board, if one was started (a unique index allows only one). */
async function findNextRound(tx: TenantTx, board: BoardRow): Promise<BoardRow | undefined> {
  return (
    await tx.db
      .select()
      .from(sampleBoards)
      .where(and(eq(sampleBoards.tenantId, tx.tenantId), eq(sampleBoards.previousBoardId, board.id)))
      .limit(1)
  )[0];
}

/** After the client asked for changes: a new draft, round N+1, carrying the finish forward to be adjusted. Photos stay with the board they show. */
export async function startNextRound(tx: TenantTx, actor: Actor, boardId: string): Promise<SampleBoardView> {
  // Locked: a second start (a double click) waits here and then finds the round this one made (409, not the unique index's 500).
  const { board } = await lockBoardAndClient(tx, boardId);
  if (board.status !== 'changes_requested') throw conflict('Start the next round once the client has asked for changes.');
  if (await findNextRound(tx, board)) throw conflict(`Round ${board.round + 1} of this board has already been started.`);
  const row = (
    await tx.db
      .insert(sampleBoards)
      .values({
        tenantId: tx.tenantId,
        clientId: board.clientId,
        siteId: board.siteId,
        estimateId: board.estimateId,
        label: board.label,
        round: board.round + 1,
        previousBoardId: board.id,
        finishSystemId: board.finishSystemId,
        finishSnapshot: board.finishSnapshot,
        notes: board.notes,
      })
      .returning()
  )[0];
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'samples.round_started',
    entity: 'sample_board',
    entityId: row.id,
    data: { previousBoardId: board.id, round: row.round },
  });
  return getBoard(tx, row.id);
}
