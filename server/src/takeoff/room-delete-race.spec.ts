import type { TakeoffView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import type { Response } from 'supertest';
import { jpegImage } from '../files/test-images';
import { SYSTEM_ACTOR } from '../http/actor';
import { sessionsWaiting } from '../testing/lock-waits';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { addSurface, deleteRoom } from './service';

/* The room's row orders a room delete and a write adding a row under it: whichever comes second sees the first. */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;

const WALLS = { name: 'Walls', shape: { kind: 'walls', perimeter: 40, height: 9 } } as const;

/** A site with one room holding one surface. */
async function roomWithWalls(o: Owner): Promise<{ siteId: string; roomId: string; surfaceId: string }> {
  const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Tamsin Reed' });
  const site = await o.agent
    .post(`/api/clients/${client.body.id}/sites`)
    .set('x-csrf-token', o.csrf())
    .send({ addressLine1: '4 Mill Lane' });
  const room = await o.agent.post(`/api/takeoff/sites/${site.body.id}/rooms`).set('x-csrf-token', o.csrf()).send({ name: 'Parlour' });
  const surface = await o.agent.post(`/api/takeoff/rooms/${room.body.id}/surfaces`).set('x-csrf-token', o.csrf()).send(WALLS);
  expect(surface.status).toBe(201);
  return { siteId: site.body.id, roomId: room.body.id, surfaceId: surface.body.id };
}

/**
 * Runs `write` while the room is being deleted (deleteRoom done, held open before its COMMIT),
 * and answers what `write` got once the delete has committed.
 */
async function duringRoomDelete(o: Owner, roomId: string, write: () => Promise<Response>): Promise<Response> {
  let release!: () => void;
  const gate = new Promise<void>((resolve) => (release = resolve));
  let deleted!: () => void;
  const isDeleted = new Promise<void>((resolve) => (deleted = resolve));
  const deleting = withTenant(t.ctx.pool, o.firmId, async (tx) => {
    await deleteRoom(tx, SYSTEM_ACTOR, roomId);
    deleted();
    await gate;
  });
  await isDeleted;
  const writing = write();
  await sessionsWaiting(t.ctx.pool, 1, 'the write');
  release();
  await deleting;
  return writing;
}

describe('writing under a room that is deleted at that moment', () => {
  it('adding a surface answers 404, not 500', async () => {
    const o = await signUpFirm(t.app, 'Room Race Add Plaster');
    const { roomId } = await roomWithWalls(o);
    const added = await duringRoomDelete(o, roomId, () =>
      o.agent
        .post(`/api/takeoff/rooms/${roomId}/surfaces`)
        .set('x-csrf-token', o.csrf())
        .send(WALLS)
        .then((r) => r),
    );
    expect(added.status).toBe(404);
  });

  it('duplicating one of its surfaces answers 404, not 500', async () => {
    const o = await signUpFirm(t.app, 'Room Race Copy Plaster');
    const { roomId, surfaceId } = await roomWithWalls(o);
    const copied = await duringRoomDelete(o, roomId, () =>
      o.agent
        .post(`/api/takeoff/surfaces/${surfaceId}/duplicate`)
        .set('x-csrf-token', o.csrf())
        .then((r) => r),
    );
    expect(copied.status).toBe(404);
  });

  it('uploading a photo of it answers 404, not 500', async () => {
    const o = await signUpFirm(t.app, 'Room Race Photo Plaster');
    const { roomId } = await roomWithWalls(o);
    const image = await jpegImage();
    const uploaded = await duringRoomDelete(o, roomId, () =>
      o.agent
        .post(`/api/takeoff/rooms/${roomId}/photos`)
        .set('x-csrf-token', o.csrf())
        .attach('file', image, 'cornice.jpg')
        .then((r) => r),
    );
    expect(uploaded.status).toBe(404);
  });
});

describe('deleting a room while a surface is being added to it', () => {
  it('waits for the surface, then deletes the room with it (204, not 500)', async () => {
    const o = await signUpFirm(t.app, 'Room Race Delete Plaster');
    const { siteId, roomId } = await roomWithWalls(o);
    let release!: () => void;
    const gate = new Promise<void>((resolve) => (release = resolve));
    let added!: () => void;
    const isAdded = new Promise<void>((resolve) => (added = resolve));
    const adding = withTenant(t.ctx.pool, o.firmId, async (tx) => {
      await addSurface(tx, SYSTEM_ACTOR, roomId, { ...WALLS, name: 'South wall', disturbedPaintedArea: null, notes: '' });
      added();
      await gate;
    });
    await isAdded;
    const deleting = o.agent
      .delete(`/api/takeoff/rooms/${roomId}`)
      .set('x-csrf-token', o.csrf())
      .then((r) => r);
    await sessionsWaiting(t.ctx.pool, 1, 'the delete');
    release();
    await adding;
    expect((await deleting).status).toBe(204);
    const view = (await o.agent.get(`/api/takeoff/sites/${siteId}`)).body as TakeoffView;
    expect(view.rooms).toEqual([]);
    const [audit] = await withTenant(
      t.ctx.pool,
      o.firmId,
      async (tx) =>
        (await tx.client.query<{ data: Record<string, unknown> }>(`select data from audit_log where action = 'takeoff.room_deleted'`)).rows,
    );
    expect(audit.data).toMatchObject({ name: 'Parlour', surfacesDeleted: 2 });
  });
});
