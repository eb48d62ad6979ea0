import type { FirmSettings, SurfaceView, TakeoffView } from '@layerbook/contracts';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

/* A surface measured again in the firm's new units keeps its disturbed painted area the same size. */
describe('a surface re-measured after the firm went metric', () => {
  it('keeps its disturbed painted area the same size', async () => {
    const o = await signUpFirm(t.app, 'Metric Plaster');
    const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Ada Holloway' });
    const site = await o.agent
      .post(`/api/clients/${client.body.id}/sites`)
      .set('x-csrf-token', o.csrf())
      .send({ addressLine1: '3 Yule Row', yearBuilt: 1950 });
    const room = await o.agent.post(`/api/takeoff/sites/${site.body.id}/rooms`).set('x-csrf-token', o.csrf()).send({ name: 'Hall' });
    // 40 ft × 8 ft = 320 ft² of walls, 50 ft² of old paint to be sanded.
    const made = await o.agent
      .post(`/api/takeoff/rooms/${room.body.id}/surfaces`)
      .set('x-csrf-token', o.csrf())
      .send({ name: 'Walls', shape: { kind: 'walls', perimeter: 40, height: 8 }, disturbedPaintedArea: 50 });
    expect(made.status).toBe(201);

    const firm = (await o.agent.get('/api/firm')).body as FirmSettings;
    const { id: _id, slug: _slug, updatedAt: _u, logoUrl: _logo, ...profile } = firm;
    expect(
      (
        await o.agent
          .patch('/api/firm')
          .set('x-csrf-token', o.csrf())
          .send({ ...profile, units: 'metric' })
      ).status,
    ).toBe(200);

    // The office corrects the height, in metres now: 12.192 m × 2.5 m = 30.48 m². Only the shape is sent.
    const patched = await o.agent
      .patch(`/api/takeoff/surfaces/${made.body.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ shape: { kind: 'walls', perimeter: 12.192, height: 2.5 } });
    expect(patched.status).toBe(200);
    const view = (await o.agent.get(`/api/takeoff/sites/${site.body.id}`)).body as TakeoffView;
    const walls = view.rooms[0].surfaces[0];
    // 50 ft² = 4.645152 m² (1 ft² = 0.09290304 m², NIST SP 811 B.8), kept to the column's hundredths
    expect(walls.lengthUnit).toBe('m');
    expect(walls.disturbedPaintedArea).toBe(4.65);
  });

  it('on a bigger wall too: it is not read as square metres and grown tenfold', async () => {
    const o = await signUpFirm(t.app, 'Metric Plaster Two');
    const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Ada Holloway' });
    const site = await o.agent
      .post(`/api/clients/${client.body.id}/sites`)
      .set('x-csrf-token', o.csrf())
      .send({ addressLine1: '3 Yule Row', yearBuilt: 1950 });
    const room = await o.agent.post(`/api/takeoff/sites/${site.body.id}/rooms`).set('x-csrf-token', o.csrf()).send({ name: 'Hall' });
    const made = await o.agent
      .post(`/api/takeoff/rooms/${room.body.id}/surfaces`)
      .set('x-csrf-token', o.csrf())
      .send({ name: 'Walls', shape: { kind: 'walls', perimeter: 80, height: 10 }, disturbedPaintedArea: 50 });
    const firm = (await o.agent.get('/api/firm')).body as FirmSettings;
    const { id: _id, slug: _slug, updatedAt: _u, logoUrl: _logo, ...profile } = firm;
    await o.agent
      .patch('/api/firm')
      .set('x-csrf-token', o.csrf())
      .send({ ...profile, units: 'metric' });
    // 24.384 m × 3.048 m = 74.32 m² (the same 800 ft² wall), sent in metres
    const patched = await o.agent
      .patch(`/api/takeoff/surfaces/${made.body.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ shape: { kind: 'walls', perimeter: 24.384, height: 3.048 } });
    expect(patched.status).toBe(200);
    expect((patched.body as SurfaceView).disturbedPaintedArea).toBe(4.65);
  });
});
