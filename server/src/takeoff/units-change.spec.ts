import type { SurfaceView, TakeoffView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { patchFirm } from '../testing/firm-settings';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

/** A firm measuring in feet with one wall of `perimeter` × `height` ft and 50 ft² of old paint to sand, which then goes metric. */
function wallThenMetric(firmName: string, perimeter: number, height: number) {
  return surfaceThenMetric(firmName, { kind: 'walls', perimeter, height });
}

/** A firm measuring in feet with one surface of `shape` and 50 ft² of old paint to sand, which then goes metric. */
async function surfaceThenMetric(firmName: string, shape: object) {
  const o = await signUpFirm(t.app, firmName);
  const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Ada Holloway' });
  const site = await o.agent
    .post(`/api/clients/${client.body.id}/sites`)
    .set('x-csrf-token', o.csrf())
    .send({ addressLine1: '3 Yule Row', yearBuilt: 1950 });
  const room = await o.agent.post(`/api/takeoff/sites/${site.body.id}/rooms`).set('x-csrf-token', o.csrf()).send({ name: 'Hall' });
  const made = await o.agent
    .post(`/api/takeoff/rooms/${room.body.id}/surfaces`)
    .set('x-csrf-token', o.csrf())
    .send({ name: 'Walls', shape, disturbedPaintedArea: 50 });
  expect(made.status).toBe(201);
  expect((await patchFirm(o, { units: 'metric' })).status).toBe(200);
  const edit = (body: object) => o.agent.patch(`/api/takeoff/surfaces/${made.body.id}`).set('x-csrf-token', o.csrf()).send(body);
  const remeasure = (shape: object) => edit({ shape });
  return { o, siteId: site.body.id as string, remeasure, edit };
}

/* A surface measured again in the firm's new units keeps its disturbed painted area the same size. */
describe('a surface re-measured after the firm went metric', () => {
  it('keeps its disturbed painted area the same size', async () => {
    const { o, siteId, remeasure } = await wallThenMetric('Metric Plaster', 40, 8);
    // The office corrects the height, in metres now: 12.192 m × 2.5 m = 30.48 m². Only the shape is sent.
    expect((await remeasure({ kind: 'walls', perimeter: 12.192, height: 2.5 })).status).toBe(200);
    const view = (await o.agent.get(`/api/takeoff/sites/${siteId}`)).body as TakeoffView;
    const walls = view.rooms[0].surfaces[0];
    // 50 ft² = 4.645152 m² (1 ft² = 0.09290304 m², NIST SP 811 B.8), kept to the column's hundredths
    expect(walls.lengthUnit).toBe('m');
    expect(walls.disturbedPaintedArea).toBe(4.65);
    // measurements drive prices: the trail keeps them before and after
    const [entry] = await withTenant(
      t.ctx.pool,
      o.firmId,
      async (tx) =>
        (await tx.client.query<{ data: Record<string, unknown> }>(`select data from audit_log where action = 'takeoff.surface_updated'`))
          .rows,
    );
    expect(entry.data).toMatchObject({
      shapeBefore: { kind: 'walls', perimeter: 40, height: 8 },
      unitBefore: 'ft',
      shapeAfter: { kind: 'walls', perimeter: 12.192, height: 2.5 },
      unitAfter: 'm',
      disturbedBefore: 50,
      disturbedAfter: 4.65,
    });
  });

  it('on a bigger wall too: it is not read as square metres and grown tenfold', async () => {
    const { remeasure } = await wallThenMetric('Metric Plaster Two', 80, 10);
    // 24.384 m × 3.048 m = 74.32 m² (the same 800 ft² wall), sent in metres
    const patched = await remeasure({ kind: 'walls', perimeter: 24.384, height: 3.048 });
    expect(patched.status).toBe(200);
    expect((patched.body as SurfaceView).disturbedPaintedArea).toBe(4.65);
  });
});

/* A surface whose whole area is disturbed, then re-measured in metres: the area kept rounds to hundredths. */
describe('a fully disturbed surface re-measured after the firm went metric', () => {
  // 10 × 5 ft = 50 ft², all sanded. 3.048 × 1.524 m = 4.645152 m² (1 ft = 0.3048 m, NIST SP 811 B.8), kept as 4.65 m².
  const metricCeiling = { kind: 'ceilingRect', length: 3.048, width: 1.524 };

  it('keeps the whole surface disturbed, with no refusal on a field nobody sent', async () => {
    const { o, siteId, remeasure } = await surfaceThenMetric('Metric Sanding', { kind: 'ceilingRect', length: 10, width: 5 });
    const first = await remeasure(metricCeiling);
    expect([first.status, first.body.errors]).toEqual([200, undefined]);
    expect((first.body as SurfaceView).disturbedPaintedArea).toBe(4.65);
    // measured again in metres: the kept 4.65 m² still counts as the whole 4.645152 m² surface
    expect((await remeasure(metricCeiling)).status).toBe(200);
    const view = (await o.agent.get(`/api/takeoff/sites/${siteId}`)).body as TakeoffView;
    expect(view.rooms[0].surfaces[0]).toMatchObject({ lengthUnit: 'm', disturbedPaintedArea: 4.65 });
  });

  it("takes the edit form's whole body (the area converted to m²), and still refuses more than the surface", async () => {
    const { edit } = await surfaceThenMetric('Metric Sanding Form', { kind: 'ceilingRect', length: 10, width: 5 });
    const body = { name: 'Ceiling', shape: metricCeiling, notes: '' };
    expect((await edit({ ...body, disturbedPaintedArea: 4.65 })).status).toBe(200);
    const over = await edit({ ...body, disturbedPaintedArea: 4.66 });
    expect([over.status, over.body.errors?.[0]?.field]).toEqual([400, 'disturbedPaintedArea']);
  });
});
