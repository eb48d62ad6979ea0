import Decimal from 'decimal.js';
import { assembleEstimateInput, defaultEstimatingSettings, EstimateInputs } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { computeEstimate } from '@layerbook/domain';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

/** A firm with one site measured as DOMAIN.md §2.2's round dining room, a primer and a one-layer system. */
async function firmWithMeasuredSite(name = 'Estimate Plaster') {
  const o = await signUpFirm(t.app, name);
  const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Edwina Marl' });
  const site = await o.agent
    .post(`/api/clients/${client.body.id}/sites`)
    .set('x-csrf-token', o.csrf())
    .send({ addressLine1: '1 Round Row', yearBuilt: 1990 });
  const ids = await withTenant(t.ctx.pool, o.firmId, async (tx) => {
    const room = await tx.client.query(`insert into rooms (tenant_id, site_id, name) values ($1, $2, 'Dining room') returning id`, [
      tx.tenantId,
      site.body.id,
    ]);
    const walls = {
      kind: 'roundWalls',
      radius: 9,
      height: 10,
      openings: [
        { width: 3, height: 7 },
        { width: 4, height: 5, count: 2 },
      ],
    };
    const surface = await tx.client.query(
      `insert into surfaces (tenant_id, room_id, name, shape, length_unit) values ($1, $2, 'Walls', $3, 'ft') returning id`,
      [tx.tenantId, room.rows[0].id, walls],
    );
    const product = await tx.client.query(
      `insert into products (tenant_id, name, kind, unit, containers) values ($1, 'Acrylic primer', 'primer', 'gallon', $2) returning id`,
      [
        tx.tenantId,
        JSON.stringify([
          { label: 'Gallon', size: 1, unit: 'gallon', price: '45.00' },
          { label: 'Quart', size: 1, unit: 'quart', price: '16.00' },
        ]),
      ],
    );
    const layers = [
      {
        id: 'prime',
        name: 'Primer',
        method: 'roll',
        productId: product.rows[0].id,
        coverage: { kind: 'spreadRate', surfacePerUnit: 350, unit: 'gallon', lengthUnit: 'ft' },
        coats: 1,
        waste: 0.1,
        productionRate: { surfacePerHour: 250, lengthUnit: 'ft' },
        waitHoursAfter: 4,
      },
    ];
    const system = await tx.client.query(
      `insert into finish_systems (tenant_id, name, layers) values ($1, 'Primed walls', $2) returning id`,
      [tx.tenantId, JSON.stringify(layers)],
    );
    return { surfaceId: surface.rows[0].id as string, systemId: system.rows[0].id as string };
  });
  return { ...o, siteId: site.body.id as string, ...ids };
}

const inputsFor = (surfaceId: string, systemId: string): EstimateInputs => ({
  title: 'Dining room',
  startDate: '2026-12-03',
  isOccupied: false,
  variants: [
    { id: 'A', label: 'Option A', surfaces: [{ surfaceId, finishSystemId: systemId }] },
    { id: 'B', label: 'Option B', surfaces: [{ surfaceId, finishSystemId: systemId }] },
  ],
  addOns: [{ id: 'stencil', label: 'Stencilled border', labourHours: 6, materialsCost: '40.00' }],
  equipment: [],
  subcontracts: [],
  sundries: [{ label: 'Masking and protection', amount: '35.00' }],
  discount: null,
  perAreaRates: { [systemId]: '2.50' },
});

describe('estimates', () => {
  it("take an inquiry of this client or of no one yet, and refuse another client's (400 on inquiryId): accepting would mark it won", async () => {
    const f = await firmWithMeasuredSite('Inquiry Link Plaster');
    const other = await f.agent.post('/api/clients').set('x-csrf-token', f.csrf()).send({ kind: 'homeowner', name: 'Someone Else' });
    const inquiry = async (clientId: string | null) =>
      withTenant(t.ctx.pool, f.firmId, async (tx) => {
        const { rows } = await tx.client.query<{ id: string }>(
          `insert into inquiries (tenant_id, contact_name, source, stage, client_id) values ($1, 'Asker', 'phone', 'new', $2) returning id`,
          [tx.tenantId, clientId],
        );
        return rows[0].id;
      });
    const create = (inquiryId: string) =>
      f.agent
        .post('/api/estimates')
        .set('x-csrf-token', f.csrf())
        .send({ siteId: f.siteId, title: 'Dining room', startDate: '2026-12-03', inquiryId });
    const refused = await create(await inquiry(other.body.id as string));
    expect([refused.status, refused.body.errors?.[0]?.field]).toEqual([400, 'inquiryId']);
    expect((await create(await inquiry(null))).status).toBe(201);
  });

  it('recomputes on the server with the same engine and input as the browser, and stores the numbers', async () => {
    const f = await firmWithMeasuredSite();
    const made = await f.agent
      .post('/api/estimates')
      .set('x-csrf-token', f.csrf())
      .send({ siteId: f.siteId, title: 'Dining room', startDate: '2026-12-03' });
    expect(made.status).toBe(201);
    expect(made.body.context.rooms[0].surfaces[0].id).toBe(f.surfaceId);
    const inputs = inputsFor(f.surfaceId, f.systemId);
    const saved = await f.agent.put(`/api/estimates/${made.body.id}/inputs`).set('x-csrf-token', f.csrf()).send(inputs);
    expect(saved.status).toBe(200);
    // What the browser would compute from the context it was given:
    const browser = JSON.parse(JSON.stringify(computeEstimate(assembleEstimateInput(saved.body.context, inputs, 'A'))));
    expect(saved.body.result.variants[0].result).toEqual(browser);
    // DOMAIN.md §2.3/§2.5 worked example [D]: walls 504.49 ft² net (2π·9·10 − 61), primer at 350 ft²/gal
    // with 10 % waste = 1.5855 gal; the cheapest pack is 2 gallons at $90 (not 1 gal + 3 qt = $93).
    const primer = saved.body.result.variants[0].result.products[0];
    expect(primer.needInUnit).toBeCloseTo(1.5855, 4);
    expect(primer.pack.totalCost).toBe('90');
    expect(saved.body.price).toBe(new Decimal(saved.body.result.variants[0].result.price.price).toFixed(2));
    expect(saved.body.result.variants[0].result.options[0].label).toBe('Stencilled border');
  });

  it('stamps the save with the server clock and lists the drying waits the schedule plans', async () => {
    const f = await firmWithMeasuredSite('Clocked Estimates');
    const made = await f.agent
      .post('/api/estimates')
      .set('x-csrf-token', f.csrf())
      .send({ siteId: f.siteId, title: 'T', startDate: '2026-12-03' });
    t.setNow(new Date('2026-12-01T09:30:00.000Z'));
    try {
      const saved = await f.agent
        .put(`/api/estimates/${made.body.id}/inputs`)
        .set('x-csrf-token', f.csrf())
        .send(inputsFor(f.surfaceId, f.systemId));
      expect(saved.body.computedAt).toBe('2026-12-01T09:30:00.000Z');
    } finally {
      t.setNow(null);
    }
    // One layer only: its 4 h wait is the cure before use, not a wait before another layer.
    expect((await f.agent.get(`/api/estimates/${made.body.id}`)).body.result.variants[0].result.schedule.waits).toEqual([]);
  });

  it("lists the firm's estimates newest first, one keyset page at a time, optionally for one site", async () => {
    const f = await firmWithMeasuredSite('Listed Estimates');
    const ids: string[] = [];
    for (const title of ['First', 'Second', 'Third']) {
      ids.push(
        (await f.agent.post('/api/estimates').set('x-csrf-token', f.csrf()).send({ siteId: f.siteId, title, startDate: '2026-12-03' })).body
          .id,
      );
    }
    const first = await f.agent.get('/api/estimates').query({ limit: 2 });
    expect(first.status).toBe(200);
    expect(first.body.items.map((e: { title: string }) => e.title)).toEqual(['Third', 'Second']);
    expect(first.body.items[0]).toEqual({
      id: ids[2],
      title: 'Third',
      status: 'draft',
      price: null,
      siteId: f.siteId,
      clientId: expect.any(String),
      clientName: 'Edwina Marl',
      updatedAt: expect.any(String),
    });
    const second = await f.agent.get('/api/estimates').query({ limit: 2, after: first.body.nextCursor });
    expect(second.body).toEqual({ items: [expect.objectContaining({ id: ids[0] })], nextCursor: null });
    const otherSite = await firmWithMeasuredSite('Other Site Estimates');
    expect((await f.agent.get('/api/estimates').query({ siteId: otherSite.siteId })).body.items).toEqual([]);
    const bad = await f.agent.get('/api/estimates').query({ after: 'not-a-cursor', limit: 500 });
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['limit']);
  });

  it("gives surfaces saved in another unit in the firm's unit, so the engine never mixes metres and feet", async () => {
    const f = await firmWithMeasuredSite('Unit Estimates');
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update surfaces set length_unit = 'm', disturbed_painted_area = 2 where id = $1`, [f.surfaceId]),
    );
    const made = await f.agent
      .post('/api/estimates')
      .set('x-csrf-token', f.csrf())
      .send({ siteId: f.siteId, title: 'T', startDate: '2026-12-03' });
    const surface = made.body.context.rooms[0].surfaces[0];
    // 1 ft = 0.3048 m exactly (NIST SP 811 App. B.8): 9 m = 29.5276 ft; 2 m² = 21.5278 ft².
    expect(made.body.context.lengthUnit).toBe('ft');
    expect(surface.shape.radius).toBeCloseTo(9 / 0.3048, 9);
    expect(surface.shape.openings[1]).toEqual({ width: expect.closeTo(4 / 0.3048, 9), height: expect.closeTo(5 / 0.3048, 9), count: 2 });
    expect(Number(surface.disturbedPaintedArea)).toBeCloseTo(2 / 0.09290304, 9);
  });

  it('starts from the firm defaults when it has not set its own', async () => {
    const f = await firmWithMeasuredSite('Default Plaster');
    const made = await f.agent
      .post('/api/estimates')
      .set('x-csrf-token', f.csrf())
      .send({ siteId: f.siteId, title: 'T', startDate: '2026-12-03' });
    expect(made.body.context.settings).toEqual(defaultEstimatingSettings('imperial'));
  });

  it('refuses surfaces of another site and unknown finish systems, naming the path, and keeps the last good numbers', async () => {
    const f = await firmWithMeasuredSite('Strict Estimates');
    const made = await f.agent
      .post('/api/estimates')
      .set('x-csrf-token', f.csrf())
      .send({ siteId: f.siteId, title: 'T', startDate: '2026-12-03' });
    const good = await f.agent
      .put(`/api/estimates/${made.body.id}/inputs`)
      .set('x-csrf-token', f.csrf())
      .send(inputsFor(f.surfaceId, f.systemId));
    const other = await firmWithMeasuredSite('Other Estimates');
    const bad = await f.agent
      .put(`/api/estimates/${made.body.id}/inputs`)
      .set('x-csrf-token', f.csrf())
      .send(inputsFor(other.surfaceId, other.systemId));
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual([
      'variants.0.surfaces.0.finishSystemId',
      'variants.0.surfaces.0.surfaceId',
      'variants.1.surfaces.0.finishSystemId',
      'variants.1.surfaces.0.surfaceId',
    ]);
    const invalid = await f.agent
      .put(`/api/estimates/${made.body.id}/inputs`)
      .set('x-csrf-token', f.csrf())
      .send({ ...inputsFor(f.surfaceId, f.systemId), variants: [], startDate: '2026-13-01' });
    expect(invalid.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['startDate', 'variants']);
    const after = await f.agent.get(`/api/estimates/${made.body.id}`);
    expect(after.body.price).toBe(good.body.price);
  });

  it('turns an engine refusal into a 400 naming the field', async () => {
    const f = await firmWithMeasuredSite('Engine Refusal');
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update surfaces set shape = '{"kind":"sphericalCapFromSphere","sphereRadius":2,"rise":9}' where id = $1`, [
        f.surfaceId,
      ]),
    );
    const made = await f.agent
      .post('/api/estimates')
      .set('x-csrf-token', f.csrf())
      .send({ siteId: f.siteId, title: 'T', startDate: '2026-12-03' });
    const res = await f.agent
      .put(`/api/estimates/${made.body.id}/inputs`)
      .set('x-csrf-token', f.csrf())
      .send(inputsFor(f.surfaceId, f.systemId));
    expect(res.status).toBe(400);
    expect(res.body.errors[0].field).toMatch(/^variants\.0\.rooms\.0\.surfaces\.0\.shape/);
  });

  it('keeps crew out (prices) and another firm out (404)', async () => {
    const f = await firmWithMeasuredSite('Owner Estimates');
    const made = await f.agent
      .post('/api/estimates')
      .set('x-csrf-token', f.csrf())
      .send({ siteId: f.siteId, title: 'T', startDate: '2026-12-03' });
    const other = await signUpFirm(t.app, 'Nosy Firm');
    expect((await other.agent.get(`/api/estimates/${made.body.id}`)).status).toBe(404);
    expect(
      (
        await other.agent
          .put(`/api/estimates/${made.body.id}/inputs`)
          .set('x-csrf-token', other.csrf())
          .send(inputsFor(f.surfaceId, f.systemId))
      ).status,
    ).toBe(404);
    expect(
      (
        await other.agent
          .post('/api/estimates')
          .set('x-csrf-token', other.csrf())
          .send({ siteId: f.siteId, title: 'T', startDate: '2026-12-03' })
      ).status,
    ).toBe(404);
    expect((await other.agent.get('/api/estimates')).body.items).toEqual([]);
  });
});
