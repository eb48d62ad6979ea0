import { withTenant } from '@layerbook/db';
import { pngImage, SVG } from '../files/test-images';
import { storedFor } from '../files/test-storage';
import { startTestServer, TestServer } from '../testing/harness';
import { addClient, firmWithFinish, joinAs, makeBoard, post, signInClient, uploadBoardPhoto } from './sample-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

const fields = (body: { errors?: { field: string }[] }) => (body.errors ?? []).map((e) => e.field).sort();

describe('sample boards (staff)', () => {
  it('snapshots the finish at creation, so later library edits leave the record as made', async () => {
    const f = await firmWithFinish(t);
    const board = await makeBoard(f, {
      clientId: f.clientId,
      siteId: f.siteId,
      label: 'Stair hall, board A',
      finishSystemId: f.systemId,
      notes: 'Lot 2291 of the tint',
    });
    const got = await f.agent.get(`/api/samples/${board.id}`);
    expect(got.status).toBe(200);
    expect(got.body).toMatchObject({
      label: 'Stair hall, board A',
      round: 1,
      status: 'draft',
      clientName: 'Wren Halloway',
      siteAddress: '14 Kiln Row, Ashford Vale',
      notes: 'Lot 2291 of the tint',
      decidedAt: null,
      photos: [],
    });
    expect(got.body.finish).toMatchObject({
      systemId: f.systemId,
      systemName: 'Antiqued glaze over primer',
      description: 'Warm umber glaze',
    });
    expect(got.body.finish.layers.map((l: { position: number; name: string }) => [l.position, l.name])).toEqual([
      [1, 'Primer'],
      [2, 'Antiquing glaze'],
    ]);
    expect(got.body.finish.layers[1].products).toEqual([
      { id: f.productIds.tint, name: 'Umber tint paint', parts: 1 },
      { id: f.productIds.medium, name: 'Glazing medium', parts: 4 },
    ]);
    expect(got.body.finish.layers[0].layer).toMatchObject({ coverage: { kind: 'spreadRate', surfacePerUnit: 300 } });
    expect(got.body.finishSteps).toEqual([
      '1. Primer: Acrylic primer, rolled on, one coat.',
      '2. Antiquing glaze: a mix of Umber tint paint and Glazing medium, glazed, one coat, over about 30 % of the surface.',
    ]);

    // The library changes afterwards: renamed product, a layer removed. The board keeps what was made.
    await f.agent.patch(`/api/library/products/${f.productIds.primer}`).set('x-csrf-token', f.csrf()).send({ name: 'Renamed primer' });
    const sys = await f.agent.get(`/api/library/systems/${f.systemId}`);
    await f.agent
      .patch(`/api/library/systems/${f.systemId}`)
      .set('x-csrf-token', f.csrf())
      .send({ layers: [sys.body.layers[0]] });
    const after = await f.agent.get(`/api/samples/${board.id}`);
    expect(after.body.finish).toEqual(got.body.finish);

    const list = await f.agent.get('/api/samples').query({ clientId: f.clientId });
    expect(list.body.items).toEqual([
      expect.objectContaining({
        id: board.id,
        label: 'Stair hall, board A',
        clientName: 'Wren Halloway',
        round: 1,
        status: 'draft',
        finishName: 'Antiqued glaze over primer',
        photoCount: 0,
        coverThumbnailUrl: null,
      }),
    ]);
    const audit = await withTenant(
      t.ctx.pool,
      f.firmId,
      async (tx) => (await tx.client.query(`select action from audit_log where entity = 'sample_board'`)).rows,
    );
    expect(audit.map((a: { action: string }) => a.action)).toEqual(['samples.board_created']);
  });

  it('names the bad field: a client, site or finish of another firm, and unknown fields', async () => {
    const f = await firmWithFinish(t);
    const other = await firmWithFinish(t, 'Another Studio');
    const send = (body: object) => post(f, '/api/samples', body);
    expect(fields((await send({ clientId: other.clientId, label: 'A' })).body)).toEqual(['clientId']);
    expect(fields((await send({ clientId: f.clientId, siteId: other.siteId, label: 'A' })).body)).toEqual(['siteId']);
    expect(fields((await send({ clientId: f.clientId, finishSystemId: other.systemId, label: 'A' })).body)).toEqual(['finishSystemId']);
    expect(fields((await send({ clientId: f.clientId, label: ' ', colour: 'red' })).body)).toEqual(['colour', 'label']);
    const otherClientSite = (await addClient(f, 'Someone Else')).siteId;
    expect(fields((await send({ clientId: f.clientId, siteId: otherClientSite, label: 'A' })).body)).toEqual(['siteId']);
    expect((await f.agent.get('/api/samples')).body).toEqual({ items: [], nextCursor: null });
  });

  it('edits a draft, re-snapshots its finish, and keeps a shown finish as shown', async () => {
    const f = await firmWithFinish(t);
    const board = await makeBoard(f, { clientId: f.clientId, label: 'Dining room' });
    const edited = await f.agent
      .patch(`/api/samples/${board.id}`)
      .set('x-csrf-token', f.csrf())
      .send({ label: 'Dining room, board B', finishSystemId: f.systemId });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ label: 'Dining room, board B', notes: '', finishSystemId: f.systemId });
    expect(edited.body.finish.layers).toHaveLength(2);
    expect((await post(f, `/api/samples/${board.id}/show`)).status).toBe(200);
    const refused = await f.agent.patch(`/api/samples/${board.id}`).set('x-csrf-token', f.csrf()).send({ finishSystemId: null });
    expect(refused.status).toBe(409);
    expect(
      (await f.agent.patch(`/api/samples/${board.id}`).set('x-csrf-token', f.csrf()).send({ notes: 'Shown by the window' })).body.notes,
    ).toBe('Shown by the window');
  });

  it('adds photos (refusing an SVG), lists them with a cover, and deletes them with their stored objects', async () => {
    const f = await firmWithFinish(t);
    const board = await makeBoard(f, { clientId: f.clientId, label: 'Hall' });
    const svg = await uploadBoardPhoto(f, board.id, { bytes: SVG, name: 'board.svg' });
    expect(svg.status).toBe(400);
    expect(svg.body.errors[0].field).toBe('file');
    const disguised = await uploadBoardPhoto(f, board.id, { bytes: SVG, name: 'board.png' });
    expect(disguised.status).toBe(400);
    expect(await storedFor(t.ctx, f.firmId)).toEqual({ keys: [], rows: 0 });

    const added = await uploadBoardPhoto(f, board.id);
    expect(added.status).toBe(201);
    expect(added.body).toMatchObject({
      boardId: board.id,
      caption: '',
      width: 64,
      height: 48,
      thumbnailUrl: `/api/files/${added.body.fileId}/thumbnail`,
    });
    await uploadBoardPhoto(f, board.id, { bytes: await pngImage(), name: 'daylight.png' });
    expect((await f.agent.get(`/api/samples/${board.id}`)).body.photos).toHaveLength(2);
    expect((await f.agent.get(`/api/samples/${board.id}/photos`)).body.items.map((p: { id: string }) => p.id)).toEqual([
      added.body.id,
      expect.any(String),
    ]);
    const listed = (await f.agent.get('/api/samples')).body.items[0];
    expect(listed).toMatchObject({ photoCount: 2, coverThumbnailUrl: added.body.thumbnailUrl });
    expect((await f.agent.get(added.body.thumbnailUrl)).status).toBe(200);

    expect((await f.agent.delete(`/api/samples/photos/${added.body.id}`).set('x-csrf-token', f.csrf())).status).toBe(204);
    expect((await f.agent.get(`/api/samples/${board.id}`)).body.photos).toHaveLength(1);
    const stored = await storedFor(t.ctx, f.firmId);
    expect(stored.rows).toBe(1);
    expect(stored.keys.some((k) => k.includes(added.body.fileId))).toBe(false);
  });

  it('lets crew read boards and add photos, but not make, edit, show, start a round or delete (403 before 400)', async () => {
    const f = await firmWithFinish(t);
    const board = await makeBoard(f, { clientId: f.clientId, label: 'Library ceiling', finishSystemId: f.systemId });
    const crew = await joinAs(t, f, 'crew');
    expect((await crew.agent.get('/api/samples')).body.items).toHaveLength(1);
    expect((await crew.agent.get(`/api/samples/${board.id}`)).body.finish.layers).toHaveLength(2);
    const photo = await uploadBoardPhoto(crew, board.id);
    expect(photo.status).toBe(201);
    const writes = [
      () => post(crew, '/api/samples', { colour: 'red' }),
      () => crew.agent.patch(`/api/samples/${board.id}`).set('x-csrf-token', crew.csrf()).send({ label: '' }),
      () => post(crew, `/api/samples/${board.id}/show`),
      () => post(crew, `/api/samples/${board.id}/next-round`),
      () => crew.agent.delete(`/api/samples/photos/${photo.body.id}`).set('x-csrf-token', crew.csrf()),
      () => crew.agent.delete('/api/samples/photos/not-a-uuid').set('x-csrf-token', crew.csrf()),
    ];
    for (const [i, call] of writes.entries()) expect({ i, status: (await call()).status }).toEqual({ i, status: 403 });
    expect((await f.agent.get(`/api/samples/${board.id}`)).body).toMatchObject({ label: 'Library ceiling', status: 'draft' });
  });

  it("answers 404 for another firm's board and photo on every route, storing nothing", async () => {
    const a = await firmWithFinish(t, 'Firm A');
    const board = await makeBoard(a, { clientId: a.clientId, label: 'A board' });
    const photo = (await uploadBoardPhoto(a, board.id)).body;
    const b = await firmWithFinish(t, 'Firm B');
    const calls: [string, () => Promise<{ status: number }>][] = [
      ['get', () => b.agent.get(`/api/samples/${board.id}`)],
      ['patch', () => b.agent.patch(`/api/samples/${board.id}`).set('x-csrf-token', b.csrf()).send({ label: 'Mine' })],
      ['show', () => post(b, `/api/samples/${board.id}/show`)],
      ['next-round', () => post(b, `/api/samples/${board.id}/next-round`)],
      ['upload', () => uploadBoardPhoto(b, board.id)],
      ['photos', () => b.agent.get(`/api/samples/${board.id}/photos`)],
      ['delete photo', () => b.agent.delete(`/api/samples/photos/${photo.id}`).set('x-csrf-token', b.csrf())],
      ['thumbnail', () => b.agent.get(photo.thumbnailUrl)],
    ];
    for (const [name, call] of calls) expect({ name, status: (await call()).status }).toEqual({ name, status: 404 });
    expect((await b.agent.get('/api/samples')).body).toEqual({ items: [], nextCursor: null });
    expect(await storedFor(t.ctx, b.firmId)).toEqual({ keys: [], rows: 0 });
  });

  it('shows a board to the client once, e-mailing each portal login of that client', async () => {
    const f = await firmWithFinish(t, 'Verdigris & Daughters');
    await signInClient(t, f.firmId, f.clientId, f.clientEmail);
    const board = await makeBoard(f, { clientId: f.clientId, label: 'Powder room' });
    const shown = await post(f, `/api/samples/${board.id}/show`);
    expect(shown.status).toBe(200);
    expect(shown.body.status).toBe('shown');
    const mail = await t.inbox.waitFor(
      (m) => JSON.stringify(m.to).includes(f.clientEmail) && m.subject === 'Verdigris & Daughters has a sample board for you to look at',
    );
    expect(mail.text).toContain(`next=/portal/boards/${board.id}`);
    const again = await post(f, `/api/samples/${board.id}/show`);
    expect(again.status).toBe(409);
    expect(again.body.detail).toBe('This board has already been shown to the client.');
    const { rows: outbox } = await t.queue.boss
      .getDb()
      .executeSql(`select to_address from mail_outbox where purpose_key like $1`, [`sample-shown:${board.id}:%`]);
    expect(outbox).toEqual([{ to_address: f.clientEmail }]);
  });
});
