import { withTenant } from '@layerbook/db';
import { jpegImage, pngImage } from '../files/test-images';
import { storedFor } from '../files/test-storage';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;
type Agent = Pick<Owner, 'agent' | 'csrf'>;

async function makeRoom(o: Owner, name = 'Morning room'): Promise<string> {
  const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Cressida Holt' });
  const site = await o.agent
    .post(`/api/clients/${client.body.id}/sites`)
    .set('x-csrf-token', o.csrf())
    .send({ addressLine1: '2 Weir Close', city: 'Stell' });
  const room = await o.agent.post(`/api/takeoff/sites/${site.body.id}/rooms`).set('x-csrf-token', o.csrf()).send({ name });
  return room.body.id;
}

const upload = async (a: Agent, roomId: string, caption?: string) => {
  const req = a.agent
    .post(`/api/takeoff/rooms/${roomId}/photos`)
    .set('x-csrf-token', a.csrf())
    .attach('file', await jpegImage(), 'progress.jpg');
  return caption === undefined ? req : req.field('caption', caption);
};

async function crewOf(o: Owner): Promise<Agent> {
  const email = uniqueEmail('crew');
  await o.agent.post('/api/team/invitations').set('x-csrf-token', o.csrf()).send({ email, role: 'crew' });
  const token = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)))).searchParams.get('token')!;
  const crew = await newAgent(t.app);
  await crew.agent
    .post('/api/auth/invitations/accept')
    .set('x-csrf-token', crew.csrf())
    .send({ token, name: 'Crew', password: 'scaffold-pass-2026' });
  await crew.refresh();
  return crew;
}

describe('room photos', () => {
  it('adds, lists and deletes photos, auditing each change', async () => {
    const o = await signUpFirm(t.app, 'Photo Plaster');
    const roomId = await makeRoom(o);
    const added = await upload(o, roomId, '  Cornice before repair ');
    expect(added.status).toBe(201);
    expect(added.body).toMatchObject({ roomId, caption: 'Cornice before repair', width: 64, height: 48 });
    expect(added.body.thumbnailUrl).toBe(`/api/files/${added.body.fileId}/thumbnail`);
    expect(added.body.downloadUrl).toBe(`/api/files/${added.body.fileId}`);
    expect(Object.keys(added.body).sort()).toEqual([
      'caption',
      'createdAt',
      'downloadUrl',
      'fileId',
      'height',
      'id',
      'originalName',
      'roomId',
      'thumbnailUrl',
      'width',
    ]);
    await upload(o, roomId);

    const list = await o.agent.get(`/api/takeoff/rooms/${roomId}/photos`);
    expect(list.status).toBe(200);
    expect(list.body.items.map((p: { caption: string }) => p.caption)).toEqual(['Cornice before repair', '']);

    const del = await o.agent.delete(`/api/takeoff/photos/${added.body.id}`).set('x-csrf-token', o.csrf());
    expect(del.status).toBe(204);
    expect((await o.agent.get(`/api/takeoff/rooms/${roomId}/photos`)).body.items).toHaveLength(1);
    expect((await o.agent.get(added.body.downloadUrl)).status).toBe(404);
    const stored = await storedFor(t.ctx, o.firmId);
    expect(stored.rows).toBe(1);
    expect(stored.keys.some((k) => k.includes(added.body.fileId))).toBe(false);

    const actions = await withTenant(
      t.ctx.pool,
      o.firmId,
      async (tx) => (await tx.client.query(`select action, data from audit_log where entity = 'room_photo' order by created_at`)).rows,
    );
    expect(actions.map((a: { action: string }) => a.action)).toEqual([
      'takeoff.photo_added',
      'takeoff.photo_added',
      'takeoff.photo_deleted',
    ]);
    expect(actions[0].data).toMatchObject({ roomId, roomName: 'Morning room', contentType: 'image/jpeg' });
  });

  it('deletes a room with its photos and their stored objects', async () => {
    const o = await signUpFirm(t.app);
    const roomId = await makeRoom(o);
    await upload(o, roomId);
    await upload(o, roomId);
    expect((await storedFor(t.ctx, o.firmId)).keys).toHaveLength(4);
    const res = await o.agent.delete(`/api/takeoff/rooms/${roomId}`).set('x-csrf-token', o.csrf());
    expect(res.status).toBe(204);
    expect(await storedFor(t.ctx, o.firmId)).toEqual({ keys: [], rows: 0 });
  });

  it('lets crew view and upload, but not delete (403 before any 400)', async () => {
    const o = await signUpFirm(t.app);
    const roomId = await makeRoom(o);
    const crew = await crewOf(o);
    const added = await upload(crew, roomId, 'Second coat drying');
    expect(added.status).toBe(201);
    expect((await crew.agent.get(`/api/takeoff/rooms/${roomId}/photos`)).body.items).toHaveLength(1);
    expect((await crew.agent.get(added.body.thumbnailUrl)).status).toBe(200);
    expect((await crew.agent.get(added.body.downloadUrl)).status).toBe(200);
    expect((await crew.agent.delete(`/api/takeoff/photos/${added.body.id}`).set('x-csrf-token', crew.csrf())).status).toBe(403);
    expect((await crew.agent.delete('/api/takeoff/photos/not-a-uuid').set('x-csrf-token', crew.csrf())).status).toBe(403);
  });

  it('asks for sign-in and a CSRF token before reading any upload', async () => {
    const o = await signUpFirm(t.app);
    const roomId = await makeRoom(o);
    const anonymous = await newAgent(t.app);
    expect((await upload(anonymous, roomId)).status).toBe(401);
    expect((await anonymous.agent.get(`/api/takeoff/rooms/${roomId}/photos`)).status).toBe(401);
    const noToken = await o.agent.post(`/api/takeoff/rooms/${roomId}/photos`).attach('file', await pngImage(), 'a.png');
    expect(noToken.status).toBe(403);
    expect(await storedFor(t.ctx, o.firmId)).toEqual({ keys: [], rows: 0 });
  });

  it("answers 404 for another firm's room, photo and file on every route, storing nothing", async () => {
    const a = await signUpFirm(t.app, 'Firm A');
    const roomId = await makeRoom(a);
    const photo = (await upload(a, roomId)).body;
    const b = await signUpFirm(t.app, 'Firm B');
    const calls: [string, () => Promise<{ status: number }>][] = [
      ['list', () => b.agent.get(`/api/takeoff/rooms/${roomId}/photos`)],
      ['upload', () => upload(b, roomId)],
      ['delete', () => b.agent.delete(`/api/takeoff/photos/${photo.id}`).set('x-csrf-token', b.csrf())],
      ['download', () => b.agent.get(photo.downloadUrl)],
      ['thumbnail', () => b.agent.get(photo.thumbnailUrl)],
    ];
    for (const [name, call] of calls) {
      expect({ name, status: (await call()).status }).toEqual({ name, status: 404 });
    }
    expect(await storedFor(t.ctx, b.firmId)).toEqual({ keys: [], rows: 0 });
    expect((await a.agent.get(`/api/takeoff/rooms/${roomId}/photos`)).body.items).toHaveLength(1);
  });
});
