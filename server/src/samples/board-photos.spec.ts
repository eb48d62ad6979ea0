import { storedFor } from '../files/test-storage';
import { startTestServer, TestServer } from '../testing/harness';
import { firmWithFinish, joinAs, makeBoard, post, signInClient, uploadBoardPhoto, type Firm } from './sample-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

const deletePhoto = (f: Pick<Firm, 'agent' | 'csrf'>, photoId: string) =>
  f.agent.delete(`/api/samples/photos/${photoId}`).set('x-csrf-token', f.csrf());

const photoIds = async (f: Firm, boardId: string) =>
  ((await f.agent.get(`/api/samples/${boardId}`)).body as { photos: { id: string }[] }).photos.map((p) => p.id);

describe('the photos of a sample board', () => {
  it('are added and deleted only while the board is being made: once shown, the client approves what they saw', async () => {
    const f = await firmWithFinish(t, 'Seen Photos Plaster');
    const crew = await joinAs(t, f, 'crew');
    const client = await signInClient(t, f.firmId, f.clientId, f.clientEmail);
    const board = await makeBoard(f, { clientId: f.clientId, label: 'Hall board', finishSystemId: f.systemId });
    const seen = (await uploadBoardPhoto(f, board.id)).body as { id: string };
    const crewPhoto = await uploadBoardPhoto(crew, board.id);
    expect(crewPhoto.status).toBe(201);
    expect((await deletePhoto(f, crewPhoto.body.id)).status).toBe(204);
    const before = await storedFor(t.ctx, f.firmId);
    expect((await post(f, `/api/samples/${board.id}/show`)).status).toBe(200);

    const deleted = await deletePhoto(f, seen.id);
    expect(deleted.status).toBe(409);
    expect(deleted.body.detail).toBe(
      'The client has been shown this board with these photos, so they stay as shown. If they ask for changes, add new ones to the next round.',
    );
    for (const who of [f, crew]) {
      const added = await uploadBoardPhoto(who, board.id);
      expect(added.status).toBe(409);
      expect(added.body.detail).toBe(
        'The client has been shown this board with these photos, so no more can be added. If they ask for changes, add new ones to the next round.',
      );
    }
    // Nothing stored for the refused uploads.
    expect(await storedFor(t.ctx, f.firmId)).toEqual(before);

    const approved = await post(client, `/api/portal/boards/${board.id}/approve`);
    expect(approved.body.photos.map((p: { id: string }) => p.id)).toEqual([seen.id]);
  });

  it('stay on record once the client has asked for changes, and the next round starts with none', async () => {
    const f = await firmWithFinish(t, 'Turned Down Photos Plaster');
    const client = await signInClient(t, f.firmId, f.clientId, f.clientEmail);
    const board = await makeBoard(f, { clientId: f.clientId, label: 'Hall board', finishSystemId: f.systemId });
    const seen = (await uploadBoardPhoto(f, board.id)).body as { id: string };
    expect((await post(f, `/api/samples/${board.id}/show`)).status).toBe(200);
    expect((await post(client, `/api/portal/boards/${board.id}/request-changes`, { comment: 'Warmer, please' })).status).toBe(200);

    const deleted = await deletePhoto(f, seen.id);
    expect(deleted.status).toBe(409);
    expect(deleted.body.detail).toBe(
      'The client asked for changes to this board as it was shown, so its photos stay on record. Add new ones to the next round.',
    );
    expect((await uploadBoardPhoto(f, board.id)).status).toBe(409);
    expect(await photoIds(f, board.id)).toEqual([seen.id]);

    const next = (await post(f, `/api/samples/${board.id}/next-round`)).body as { id: string; photos: unknown[] };
    expect(next.photos).toEqual([]);
    expect((await uploadBoardPhoto(f, next.id)).status).toBe(201);
  });
});
