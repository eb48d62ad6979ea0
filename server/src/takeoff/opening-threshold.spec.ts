import { defaultEstimatingSettings, type TakeoffView } from '@layerbook/contracts';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

// The firm's smallest deducted opening is an estimating setting; the takeoff measures with it, so the
// area the office reads on the site is the area the estimate prices.
describe("the takeoff and the firm's smallest deducted opening", () => {
  it('keeps an opening under the threshold in the wall area, in the surface, the room and the site totals', async () => {
    const o = await signUpFirm(t.app, 'Threshold Walls Studio');
    const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Perpetua Vane' });
    const site = await o.agent
      .post(`/api/clients/${client.body.id}/sites`)
      .set('x-csrf-token', o.csrf())
      .send({ addressLine1: '3 Larkspur Row' });
    const room = await o.agent.post(`/api/takeoff/sites/${site.body.id}/rooms`).set('x-csrf-token', o.csrf()).send({ name: 'Hall' });
    // 40 ft × 10 ft of wall (400 ft²) with one 2 × 3 ft opening (6 ft², rectangle areas)
    const wall = { kind: 'walls', perimeter: 40, height: 10, openings: [{ width: 2, height: 3 }] };
    const added = await o.agent
      .post(`/api/takeoff/rooms/${room.body.id}/surfaces`)
      .set('x-csrf-token', o.csrf())
      .send({ name: 'Walls', shape: wall });
    expect(added.status).toBe(201);
    expect(added.body.measure.quantity).toBe(394); // every opening deducted by default

    const settings = { ...defaultEstimatingSettings('imperial'), minDeductedOpeningArea: 10 };
    expect((await o.agent.put('/api/firm/estimating').set('x-csrf-token', o.csrf()).send(settings)).status).toBe(200);
    const takeoff = (await o.agent.get(`/api/takeoff/sites/${site.body.id}`)).body as TakeoffView;
    expect(takeoff.minDeductedOpeningArea).toBe(10);
    expect(takeoff.rooms[0].surfaces[0].measure.quantity).toBe(400);
    expect(takeoff.rooms[0].totals.area).toBe(400);
    expect(takeoff.totals.area).toBe(400);
  });
});
