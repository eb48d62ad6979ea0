import { withTenant } from '@layerbook/db';
import type { Response } from 'supertest';
import { CLIENT_TABLES } from '../clients/merge';
import { sessionsWaiting } from '../testing/lock-waits';
import { startTestServer, TestServer } from '../testing/harness';
import { addClient, firmWithFinish, makeBoard, post, type Firm } from './sample-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

/**
 * Runs `write` while a merge of `dup` into `kept` is under way (what mergeClient does: both clients
 * locked first, then every row pointing at the duplicate moved, then the duplicate deleted), held
 * open until `write` waits on a lock. Answers what `write` got and whether the merge went through.
 */
async function duringMerge(f: Firm, dup: string, kept: string, write: () => Promise<Response>) {
  let release!: () => void;
  const gate = new Promise<void>((resolve) => (release = resolve));
  let locked!: () => void;
  const isLocked = new Promise<void>((resolve) => (locked = resolve));
  const merging = withTenant(t.ctx.pool, f.firmId, async (tx) => {
    await tx.client.query(`select id from clients where tenant_id = $1 and id = any($2::uuid[]) order by id for update`, [
      tx.tenantId,
      [dup, kept],
    ]);
    locked();
    await gate;
    for (const table of CLIENT_TABLES)
      await tx.client.query(`update ${table} set client_id = $3 where tenant_id = $1 and client_id = $2`, [tx.tenantId, dup, kept]);
    await tx.client.query(`delete from clients where tenant_id = $1 and id = $2`, [tx.tenantId, dup]);
  });
  await isLocked;
  const writing = write().then((r) => r);
  try {
    await sessionsWaiting(t.ctx.pool, 1, 'the request');
  } finally {
    release();
  }
  const [merged, written] = await Promise.allSettled([merging, writing]);
  if (written.status === 'rejected') throw written.reason;
  return { merged: merged.status, res: written.value };
}

async function twoClients(name: string) {
  const f = await firmWithFinish(t, name);
  const dup = await addClient(f, 'Wren Halloway');
  return { f, kept: f.clientId, dup: dup.clientId };
}

const boardsOf = (f: Firm, clientId: string) =>
  withTenant(
    t.ctx.pool,
    f.firmId,
    async (tx) =>
      (
        await tx.client.query<{ round: number; status: string }>(
          `select round, status from sample_boards where tenant_id = $1 and client_id = $2 order by round`,
          [tx.tenantId, clientId],
        )
      ).rows,
  );

describe('sample boards while their client is merged into another', () => {
  it('making a board for the client being removed answers 400 naming clientId, not a 500, and makes nothing', async () => {
    const { f, kept, dup } = await twoClients('Merge Race Board Plaster');
    const { merged, res } = await duringMerge(f, dup, kept, () => post(f, '/api/samples', { clientId: dup, label: 'Hall board' }));
    expect(merged).toBe('fulfilled');
    expect([res.status, res.body.errors]).toEqual([400, [{ field: 'clientId', message: 'Choose one of your clients.' }]]);
    expect(await boardsOf(f, kept)).toEqual([]);
  });

  it('starting the next round waits for the merge and makes the round for the kept client: no deadlock, no 500', async () => {
    const { f, kept, dup } = await twoClients('Merge Race Round Plaster');
    const board = await makeBoard(f, { clientId: dup, label: 'Hall board', finishSystemId: f.systemId });
    // The client asked for changes (set directly: the portal's part is not what is under test).
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update sample_boards set status = 'changes_requested' where tenant_id = $1 and id = $2`, [tx.tenantId, board.id]),
    );
    const { merged, res } = await duringMerge(f, dup, kept, () => post(f, `/api/samples/${board.id}/next-round`));
    expect(merged).toBe('fulfilled');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ round: 2, status: 'draft', clientId: kept });
    expect(await boardsOf(f, kept)).toEqual([
      { round: 1, status: 'changes_requested' },
      { round: 2, status: 'draft' },
    ]);
  });

  it('showing the board waits for the merge and tells the kept client: no deadlock, no 500', async () => {
    const { f, kept, dup } = await twoClients('Merge Race Show Plaster');
    const board = await makeBoard(f, { clientId: dup, label: 'Hall board' });
    const { merged, res } = await duringMerge(f, dup, kept, () => post(f, `/api/samples/${board.id}/show`));
    expect(merged).toBe('fulfilled');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'shown', clientId: kept });
    const { rows } = await t.queue.boss
      .getDb()
      .executeSql(`select to_address from mail_outbox where purpose_key like $1`, [`sample-shown:${board.id}:%`]);
    expect(rows).toEqual([{ to_address: f.clientEmail }]);
  });
});
