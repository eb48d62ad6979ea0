import { eq, firms, withTenant } from '@layerbook/db';
import { newAgent, startTestServer, TestServer } from '../testing/harness';
import { addClient, firmWithFinish, makeBoard, post, signInClient, uploadBoardPhoto } from './sample-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

/** A firm with a board (finish and one photo) shown to its signed-in client. */
async function shownBoard(firmName = 'Umber & Lime') {
  const f = await firmWithFinish(t, firmName);
  const client = await signInClient(t, f.firmId, f.clientId, f.clientEmail);
  const board = await makeBoard(f, { clientId: f.clientId, siteId: f.siteId, label: 'Stair hall, board A', finishSystemId: f.systemId });
  const photo = (await uploadBoardPhoto(f, board.id)).body;
  const shown = await post(f, `/api/samples/${board.id}/show`);
  if (shown.status !== 200) throw new Error(`not shown: ${shown.status}`);
  return { f, client, board, photo };
}

describe('sample boards in the client portal', () => {
  it('shows the client only boards the firm has shown them, with portal thumbnails', async () => {
    const { f, client, board, photo } = await shownBoard();
    await makeBoard(f, { clientId: f.clientId, label: 'Still a draft' });
    const list = await client.agent.get('/api/portal/boards');
    expect(list.status).toBe(200);
    expect(list.body.items).toHaveLength(1);
    const item = list.body.items[0];
    expect(item).toMatchObject({
      id: board.id,
      label: 'Stair hall, board A',
      round: 1,
      status: 'shown',
      firmName: 'Umber & Lime',
      finishName: 'Antiqued glaze over primer',
      decidedAt: null,
    });
    expect(item.finishSteps[0]).toBe('1. Primer: Acrylic primer, rolled on, one coat.');
    // No recipe details, no staff file URLs.
    expect(JSON.stringify(item)).not.toMatch(/surfacePerUnit|\/api\/files\//);
    expect(item.photos).toEqual([
      {
        id: photo.id,
        caption: '',
        thumbnailUrl: `/api/portal/boards/photos/${photo.id}/thumbnail`,
        downloadUrl: `/api/portal/boards/photos/${photo.id}`,
        width: 64,
        height: 48,
      },
    ]);
    // The full photo, to look closely at the finish: an attachment of the stored bytes.
    const full = await client.agent.get(item.photos[0].downloadUrl).buffer(true);
    expect(full.status).toBe(200);
    expect(full.headers['content-disposition']).toMatch(/^attachment; filename=/);
    expect(full.headers['x-content-type-options']).toBe('nosniff');
    expect(full.headers['content-security-policy']).toBe("default-src 'none'; sandbox");
    expect(Number(full.headers['content-length'])).toBeGreaterThan(0);

    const thumb = await client.agent.get(item.photos[0].thumbnailUrl);
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    expect(thumb.headers['x-content-type-options']).toBe('nosniff');
    // Staff routes stay closed to clients.
    expect((await client.agent.get(photo.thumbnailUrl)).status).toBe(401);
    expect((await client.agent.get(`/api/samples/${board.id}`)).status).toBe(401);
    expect((await client.agent.get(`/api/portal/boards/${board.id}`)).body.id).toBe(board.id);
  });

  it('records the approval once (409 after), audits it and tells the office', async () => {
    const { f, client, board } = await shownBoard('Approval Plaster Co');
    // the portal shows the day it was answered in the firm's zone, the same on the server and in the browser
    await withTenant(t.ctx.pool, f.firmId, (tx) => tx.db.update(firms).set({ timeZone: 'Pacific/Auckland' }).where(eq(firms.id, f.firmId)));
    expect((await client.agent.get(`/api/portal/boards/${board.id}`)).body.timeZone).toBe('Pacific/Auckland');
    expect((await client.agent.get('/api/portal/boards')).body.items[0].timeZone).toBe('Pacific/Auckland');
    t.setNow(new Date('2026-03-04T15:30:00Z'));
    try {
      const approved = await post(client, `/api/portal/boards/${board.id}/approve`);
      expect(approved.status).toBe(200);
      expect(approved.body).toMatchObject({ status: 'approved', decidedAt: '2026-03-04T15:30:00.000Z', timeZone: 'Pacific/Auckland' });
    } finally {
      t.setNow(null);
    }
    const twice = await post(client, `/api/portal/boards/${board.id}/approve`);
    expect(twice.status).toBe(409);
    expect(twice.body.detail).toBe('You have already approved this board. Thank you — nothing more to do here.');
    expect((await post(client, `/api/portal/boards/${board.id}/request-changes`, { comment: 'Darker' })).status).toBe(409);

    const staffView = (await f.agent.get(`/api/samples/${board.id}`)).body;
    expect(staffView).toMatchObject({ status: 'approved', decidedAt: '2026-03-04T15:30:00.000Z', decidedByName: 'Wren Halloway' });
    // The approved board is the control sample: it stays as it was.
    expect((await f.agent.patch(`/api/samples/${board.id}`).set('x-csrf-token', f.csrf()).send({ notes: 'x' })).status).toBe(409);
    expect((await f.agent.delete(`/api/samples/photos/${staffView.photos[0].id}`).set('x-csrf-token', f.csrf())).status).toBe(409);
    expect((await uploadBoardPhoto(f, board.id)).status).toBe(409);
    expect((await f.agent.get(`/api/samples/${board.id}/photos`)).body.items).toEqual(staffView.photos);
    expect((await post(f, `/api/samples/${board.id}/next-round`)).status).toBe(409);

    const mail = await t.inbox.waitFor(
      (m) => JSON.stringify(m.to).includes(f.email) && (m.subject ?? '').includes('approved the sample board'),
    );
    expect(mail.subject).toBe('Wren Halloway approved the sample board "Stair hall, board A" (round 1)');
    const audit = await withTenant(
      t.ctx.pool,
      f.firmId,
      async (tx) =>
        (await tx.client.query(`select actor_kind, action from audit_log where entity = 'sample_board' order by created_at`)).rows,
    );
    expect(audit.at(-1)).toEqual({ actor_kind: 'client', action: 'samples.board_approved' });
  });

  it('takes a change request (comment required), then the office starts the next round', async () => {
    const { f, client, board } = await shownBoard('Round Two Finishes');
    const empty = await post(client, `/api/portal/boards/${board.id}/request-changes`, { comment: '  ' });
    expect(empty.status).toBe(400);
    expect(empty.body.errors).toEqual([{ field: 'comment', message: 'Tell us what you would like changed.' }]);
    const asked = await post(client, `/api/portal/boards/${board.id}/request-changes`, {
      comment: 'A little less glaze in the corners, please.',
    });
    expect(asked.status).toBe(200);
    expect(asked.body).toMatchObject({ status: 'changes_requested', clientComment: 'A little less glaze in the corners, please.' });
    expect((await post(client, `/api/portal/boards/${board.id}/request-changes`, { comment: 'Again' })).status).toBe(409);
    expect((await post(client, `/api/portal/boards/${board.id}/approve`)).status).toBe(409);
    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(f.email) && (m.subject ?? '').includes('asked for changes'));
    expect(mail.text).toContain('A little less glaze in the corners, please.');

    const next = await post(f, `/api/samples/${board.id}/next-round`);
    expect(next.status).toBe(201);
    expect(next.body).toMatchObject({
      label: 'Stair hall, board A',
      round: 2,
      status: 'draft',
      clientComment: '',
      decidedAt: null,
      photos: [],
      siteId: f.siteId,
    });
    const original = (await f.agent.get(`/api/samples/${board.id}`)).body;
    expect(next.body.finish).toEqual(original.finish);
    expect(original.hasNextRound).toBe(true);
    expect((await post(f, `/api/samples/${board.id}/next-round`)).status).toBe(409);
    // The new round is a draft: the client does not see it until it is shown.
    expect((await client.agent.get(`/api/portal/boards/${next.body.id}`)).status).toBe(404);
    expect((await post(f, `/api/samples/${next.body.id}/show`)).status).toBe(200);
    const rounds = (await client.agent.get('/api/portal/boards')).body.items.map((b: { round: number; status: string }) => [
      b.round,
      b.status,
    ]);
    expect(rounds).toEqual([
      [1, 'changes_requested'],
      [2, 'shown'],
    ]);
  });

  it("answers 404 for another client's board, a draft, and another firm's board", async () => {
    const { f, client, board, photo } = await shownBoard('Neighbours Plaster');
    const neighbour = await addClient(f, 'Nell Neighbour');
    const other = await signInClient(t, f.firmId, neighbour.clientId, neighbour.email, 'Nell Neighbour');
    const draft = await makeBoard(f, { clientId: f.clientId, label: 'Draft' });
    const g = await shownBoard('Elsewhere Studio');
    const cases: [string, () => Promise<{ status: number }>][] = [
      ['get', () => other.agent.get(`/api/portal/boards/${board.id}`)],
      ['approve', () => post(other, `/api/portal/boards/${board.id}/approve`)],
      ['ask', () => post(other, `/api/portal/boards/${board.id}/request-changes`, { comment: 'Mine now' })],
      ['thumbnail', () => other.agent.get(`/api/portal/boards/photos/${photo.id}/thumbnail`)],
      ['full photo', () => other.agent.get(`/api/portal/boards/photos/${photo.id}`)],
      ['other firm full photo', () => g.client.agent.get(`/api/portal/boards/photos/${photo.id}`)],
      ['other firm', () => g.client.agent.get(`/api/portal/boards/${board.id}`)],
      ['other firm thumbnail', () => g.client.agent.get(`/api/portal/boards/photos/${photo.id}/thumbnail`)],
      ['other firm approve', () => post(g.client, `/api/portal/boards/${board.id}/approve`)],
    ];
    for (const [name, call] of cases) expect({ name, status: (await call()).status }).toEqual({ name, status: 404 });
    expect((await client.agent.get(`/api/portal/boards/${draft.id}`)).status).toBe(404);
    expect((await other.agent.get('/api/portal/boards')).body).toEqual({ items: [] });
    expect((await (await newAgent(t.app, 'portal')).agent.get('/api/portal/boards')).status).toBe(401);
    expect((await f.agent.get(`/api/samples/${board.id}`)).body.status).toBe('shown');
  });
});
