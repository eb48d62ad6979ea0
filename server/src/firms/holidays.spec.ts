import { defaultEstimatingSettings, type EstimateInputs } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

/** A firm with one measured round room and a slow one-layer system: about three days of work. */
async function firmWithSlowJob(name: string) {
  const o = await signUpFirm(t.app, name);
  const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Ada Holloway' });
  const site = await o.agent
    .post(`/api/clients/${client.body.id}/sites`)
    .set('x-csrf-token', o.csrf())
    .send({ addressLine1: '3 Yule Row', yearBuilt: 1990 });
  const ids = await withTenant(t.ctx.pool, o.firmId, async (tx) => {
    const room = await tx.client.query(`insert into rooms (tenant_id, site_id, name) values ($1, $2, 'Parlour') returning id`, [
      tx.tenantId,
      site.body.id,
    ]);
    const surface = await tx.client.query(
      `insert into surfaces (tenant_id, room_id, name, shape, length_unit) values ($1, $2, 'Walls', $3, 'ft') returning id`,
      [tx.tenantId, room.rows[0].id, { kind: 'roundWalls', radius: 9, height: 10, openings: [] }],
    );
    const product = await tx.client.query(
      `insert into products (tenant_id, name, kind, unit, containers) values ($1, 'Lime putty', 'finish', 'gallon', $2) returning id`,
      [tx.tenantId, JSON.stringify([{ label: 'Gallon', size: 1, unit: 'gallon', price: '60.00' }])],
    );
    const layers = [
      {
        id: 'lime',
        name: 'Lime coat',
        method: 'trowel',
        productId: product.rows[0].id,
        coverage: { kind: 'spreadRate', surfacePerUnit: 100, unit: 'gallon', lengthUnit: 'ft' },
        coats: 1,
        waste: 0.1,
        productionRate: { surfacePerHour: 20, lengthUnit: 'ft' },
        waitHoursAfter: 0,
      },
    ];
    const system = await tx.client.query(
      `insert into finish_systems (tenant_id, name, layers) values ($1, 'Lime walls', $2) returning id`,
      [tx.tenantId, JSON.stringify(layers)],
    );
    return { surfaceId: surface.rows[0].id as string, systemId: system.rows[0].id as string };
  });
  return { ...o, siteId: site.body.id as string, ...ids };
}

async function scheduledDays(f: Awaited<ReturnType<typeof firmWithSlowJob>>, startDate: string): Promise<string[]> {
  const made = await f.agent.post('/api/estimates').set('x-csrf-token', f.csrf()).send({ siteId: f.siteId, title: 'Parlour', startDate });
  const inputs: EstimateInputs = {
    title: 'Parlour',
    startDate,
    isOccupied: false,
    variants: [{ id: 'A', label: 'Option A', surfaces: [{ surfaceId: f.surfaceId, finishSystemId: f.systemId }] }],
    addOns: [],
    equipment: [],
    subcontracts: [],
    sundries: [],
    discount: null,
    perAreaRates: {},
  };
  const saved = await f.agent.put(`/api/estimates/${made.body.id}/inputs`).set('x-csrf-token', f.csrf()).send(inputs);
  expect(saved.status).toBe(200);
  return (saved.body.result.variants[0].result.schedule.days as Array<{ date: string }>).map((d) => d.date);
}

describe("the firm's days off", () => {
  it('a schedule over 25 December skips it once the firm keeps it as a day off', async () => {
    const f = await firmWithSlowJob('Yuletide Plaster');
    // Thursday 24 December 2026; without days off, Friday the 25th is worked
    expect(await scheduledDays(f, '2026-12-24')).toContain('2026-12-25');
    const settings = defaultEstimatingSettings('imperial');
    const saved = await f.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', f.csrf())
      .send({ ...settings, calendar: { ...settings.calendar, holidays: ['2026-12-25', '2027-01-01'] } });
    expect(saved.status).toBe(200);
    expect(saved.body.settings.calendar.holidays).toEqual(['2026-12-25', '2027-01-01']);
    const days = await scheduledDays(f, '2026-12-24');
    expect(days).not.toContain('2026-12-25');
    expect(days[0]).toBe('2026-12-24');
    expect(days[1]).toBe('2026-12-28');
  });

  it.each([
    ['2026-02-30', 'calendar.holidays.0'],
    ['25/12/2026', 'calendar.holidays.0'],
    [['2026-12-25', '2026-12-25'], 'calendar.holidays'],
  ])('refuses the days off %j, naming the field', async (days, field) => {
    const o = await signUpFirm(t.app, 'Bad Day Plaster');
    const settings = defaultEstimatingSettings('imperial');
    const res = await o.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', o.csrf())
      .send({ ...settings, calendar: { ...settings.calendar, holidays: typeof days === 'string' ? [days] : days } });
    expect(res.status).toBe(400);
    expect(res.body.errors.length).toBeGreaterThan(0);
    expect(res.body.errors.every((e: { field: string }) => e.field === field)).toBe(true);
    expect((await o.agent.get('/api/firm/estimating')).body.isDefault).toBe(true);
  });
});
