import { withTenant } from '@layerbook/db';
import { seedDemoTakeoff } from '../seed/demo-takeoff';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;
/** A supertest agent called by the method name a table of routes holds. */
type AgentByMethod = Record<
  string,
  (path: string) => { set: (k: string, v: string) => { send: (body: object) => Promise<{ status: number }> } }
>;

async function makeSite(o: Owner, yearBuilt: number | null = 1924): Promise<string> {
  const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Perpetua Vane' });
  const site = await o.agent
    .post(`/api/clients/${client.body.id}/sites`)
    .set('x-csrf-token', o.csrf())
    .send({ addressLine1: '3 Larkspur Row', city: 'Ebbsfold', yearBuilt, accessNotes: 'Turret stair is narrow' });
  return site.body.id;
}

async function makeRoom(o: Owner, siteId: string, name = 'Round dining room'): Promise<string> {
  const res = await o.agent.post(`/api/takeoff/sites/${siteId}/rooms`).set('x-csrf-token', o.csrf()).send({ name });
  expect(res.status).toBe(201);
  return res.body.id;
}

const addSurface = (o: Owner, roomId: string, body: object) =>
  o.agent.post(`/api/takeoff/rooms/${roomId}/surfaces`).set('x-csrf-token', o.csrf()).send(body);
const fields = (body: { errors?: { field: string }[] }) => (body.errors ?? []).map((e) => e.field).sort();

describe('site takeoff', () => {
  it('measures the worked round room through the API', async () => {
    const o = await signUpFirm(t.app, 'Takeoff Plaster');
    const siteId = await makeSite(o);
    const roomId = await makeRoom(o, siteId);

    // DOMAIN.md §2.2 worked example [D]: walls 2π·9·10 − (3·7 + 2·4·5) = 565.49 − 61 = 504.49 ft².
    const walls = await addSurface(o, roomId, {
      name: 'Round walls',
      shape: {
        kind: 'roundWalls',
        radius: 9,
        height: 10,
        openings: [
          { width: 3, height: 7 },
          { width: 4, height: 5, count: 2 },
        ],
      },
    });
    expect(walls.status).toBe(201);
    expect(walls.body).toMatchObject({ lengthUnit: 'ft', measure: { measure: 'area', deductions: 61, isCurved: true } });
    expect(walls.body.measure.gross).toBeCloseTo(565.49, 2);
    expect(walls.body.measure.quantity).toBeCloseTo(504.49, 2);

    // DOMAIN.md §2.2 worked example [D]; cap area 2πRh per Weisstein, MathWorld "Zone":
    // R = (81 + 9)/6 = 15, 2π·15·3 = 90π = 282.74 ft².
    const dome = await addSurface(o, roomId, {
      name: 'Shallow dome',
      shape: { kind: 'sphericalCap', baseRadius: 9, rise: 3, elevation: 10 },
    });
    expect(dome.status).toBe(201);
    expect(dome.body.measure.quantity).toBeCloseTo(90 * Math.PI, 9);
    expect(dome.body.measure.quantity).toBeCloseTo(282.74, 2);
    expect(dome.body.measure.topHeight).toBe(13);

    // DOMAIN.md §2.2 worked example [D]: crown at the springing line 2π·9 = 56.55 LF.
    const crown = await addSurface(o, roomId, { name: 'Crown', shape: { kind: 'crownCircular', radius: 9 } });
    expect(crown.body.measure).toMatchObject({ measure: 'length' });
    expect(crown.body.measure.quantity).toBeCloseTo(56.55, 2);

    const view = await o.agent.get(`/api/takeoff/sites/${siteId}`);
    expect(view.status).toBe(200);
    expect(view.body.site).toMatchObject({
      id: siteId,
      addressLine1: '3 Larkspur Row',
      yearBuilt: 1924,
      isPre1978: true,
      accessNotes: 'Turret stair is narrow',
      clientName: 'Perpetua Vane',
    });
    expect(view.body.lengthUnit).toBe('ft');
    expect(view.body.rooms).toHaveLength(1);
    expect(view.body.rooms[0].surfaces.map((s: { name: string }) => s.name)).toEqual(['Round walls', 'Shallow dome', 'Crown']);
    expect(view.body.rooms[0].totals.area).toBeCloseTo(504.49 + 282.74, 1);
    expect(view.body.totals.length).toBeCloseTo(56.55, 2);
  });

  it('measures the turret check and converts totals when the firm goes metric', async () => {
    const o = await signUpFirm(t.app);
    const siteId = await makeSite(o, 1990);
    const roomId = await makeRoom(o, siteId, 'Turret');
    // DOMAIN.md §3.7 project check [D]; lateral area π·r·s, Pearson Geometry Common Core (2011) §11-3:
    // r 8, rise 6 → s = 10, 80π = 251.33 ft².
    const cone = await addSurface(o, roomId, { name: 'Turret ceiling', shape: { kind: 'cone', radius: 8, rise: 6 } });
    expect(cone.status).toBe(201);
    expect(cone.body.measure.quantity).toBeCloseTo(80 * Math.PI, 9);
    expect(cone.body.measure.quantity).toBeCloseTo(251.33, 2);

    const firm = (await o.agent.get('/api/firm')).body;
    const { id: _id, slug: _slug, updatedAt: _at, logoUrl: _logo, ...settings } = firm;
    expect(
      (
        await o.agent
          .patch('/api/firm')
          .set('x-csrf-token', o.csrf())
          .send({ ...settings, units: 'metric' })
      ).status,
    ).toBe(200);
    const view = (await o.agent.get(`/api/takeoff/sites/${siteId}`)).body;
    expect(view.lengthUnit).toBe('m');
    expect(view.site.isPre1978).toBe(false);
    // The surface keeps the unit it was measured in; the totals come in the firm's unit now.
    // 1 ft² = 0.09290304 m² exactly (NIST SP 811 App. B.8): 251.327 ft² = 23.349 m².
    expect(view.rooms[0].surfaces[0].lengthUnit).toBe('ft');
    expect(view.totals.area).toBeCloseTo(80 * Math.PI * 0.09290304, 6);
    const metric = await addSurface(o, roomId, { name: 'Floor band', shape: { kind: 'border', length: 2.5 } });
    expect(metric.body.lengthUnit).toBe('m');
  });

  it.each([
    // 40 CFR 745.83: minor repair is at most 6 ft² of painted surface per room inside; target housing is pre-1978.
    ['more than 6 ft² disturbed in a 1924 house', 1924, [4, 3], 'lead-safe-work'],
    ['6 ft² or less disturbed in a 1924 house', 1924, [4, 2], null],
    ['a 1990 house, however much is disturbed', 1990, [40], null],
    // As the estimate, the proposal and the crew's sheet read it (leadStatus): an unknown year with paint disturbed counts as pre-1978.
    ['more than 6 ft² disturbed in a house of unknown age', null, [40], 'lead-safe-work'],
    ['6 ft² or less disturbed in a house of unknown age', null, [4, 2], null],
    ['no paint disturbed in a house of unknown age', null, [0], null],
  ])('answers the lead-safe reminder with the takeoff: %s', async (_what, yearBuilt, disturbed, caution) => {
    const o = await signUpFirm(t.app);
    const siteId = await makeSite(o, yearBuilt);
    const roomId = await makeRoom(o, siteId, 'Parlour');
    for (const [i, area] of disturbed.entries()) {
      expect(
        (
          await addSurface(o, roomId, {
            name: `Wall ${i + 1}`,
            shape: { kind: 'walls', perimeter: 12, height: 10 },
            disturbedPaintedArea: area,
          })
        ).status,
      ).toBe(201);
    }
    const view = (await o.agent.get(`/api/takeoff/sites/${siteId}`)).body;
    expect(view.leadCaution?.id ?? null).toBe(caution);
    expect(view.rooms[0].totals.disturbedPaintedArea).toBe(disturbed.reduce((sum, x) => sum + x, 0));
    if (caution !== null && yearBuilt === null) {
      // the year asked for first, and the home said to be treated as pre-1978 rather than built then
      expect(view.leadCaution.bullets[0]).toMatch(/^The year the building was built is not recorded\./);
      expect(view.leadCaution.bullets[1]).toMatch(/^Treated as built before 1978/);
    } else if (caution !== null) {
      expect(view.leadCaution.bullets[0]).toMatch(/^Built before 1978/);
    }
  });

  it.each([
    ['US', 'A US federal rule.'],
    ['CA', 'A US federal rule. Outside the US, check your national or provincial rules.'],
  ])('the lead-safe reminder of a firm in %s says whose rule it is: "%s"', async (country, line) => {
    const o = await signUpFirm(t.app);
    await withTenant(t.ctx.pool, o.firmId, (tx) => tx.client.query(`update firms set country = $2 where id = $1`, [tx.tenantId, country]));
    const siteId = await makeSite(o, 1924);
    const roomId = await makeRoom(o, siteId, 'Parlour');
    await addSurface(o, roomId, { name: 'Wall', shape: { kind: 'walls', perimeter: 12, height: 10 }, disturbedPaintedArea: 40 });
    const view = (await o.agent.get(`/api/takeoff/sites/${siteId}`)).body;
    expect(view.leadCaution.id).toBe('lead-safe-work');
    expect(view.leadCaution.jurisdiction).toBe(line);
  });

  it('refuses impossible geometry naming the field, and saves nothing', async () => {
    const o = await signUpFirm(t.app);
    const siteId = await makeSite(o);
    const roomId = await makeRoom(o, siteId);
    const vault = await addSurface(o, roomId, { name: 'Vault', shape: { kind: 'segmentalVault', span: 12, rise: 7, length: 20 } });
    expect(vault.status).toBe(400);
    expect(vault.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(vault.body.errors).toEqual([{ field: 'shape.rise', message: 'The rise of a segmental vault cannot exceed half its span.' }]);

    const cap = await addSurface(o, roomId, { name: 'Dome', shape: { kind: 'sphericalCap', baseRadius: 6, rise: 7 } });
    expect(fields(cap.body)).toEqual(['shape.rise']);

    const doors = await addSurface(o, roomId, {
      name: 'Walls',
      shape: { kind: 'walls', perimeter: 4, height: 2, openings: [{ width: 3, height: 2, count: 2 }] },
    });
    expect(fields(doors.body)).toEqual(['shape.openings']);

    const negative = await addSurface(o, roomId, {
      name: '',
      shape: { kind: 'roundWalls', radius: -9, height: 0, openings: [{ width: -3, height: 7, count: 1.5 }] },
    });
    expect(negative.status).toBe(400);
    expect(fields(negative.body)).toEqual(['name', 'shape.height', 'shape.openings.0.count', 'shape.openings.0.width', 'shape.radius']);
    expect(negative.body.errors.find((e: { field: string }) => e.field === 'shape.radius').message).toBe('Enter the radius, more than 0.');

    const unknown = await addSurface(o, roomId, { name: 'Blob', shape: { kind: 'blob', size: 3 } });
    expect(fields(unknown.body)).toEqual(['shape.kind']);
    const stray = await addSurface(o, roomId, { name: 'Cone', shape: { kind: 'cone', radius: 3, rise: 4, slant: 5 } });
    expect(fields(stray.body)).toEqual(['shape.slant']);
    const tooDisturbed = await addSurface(o, roomId, {
      name: 'Ceiling',
      shape: { kind: 'ceilingRect', length: 2, width: 3 },
      disturbedPaintedArea: 7,
    });
    expect(fields(tooDisturbed.body)).toEqual(['disturbedPaintedArea']);

    expect((await o.agent.get(`/api/takeoff/sites/${siteId}`)).body.rooms[0].surfaces).toHaveLength(0);

    // An edit that breaks the geometry leaves the stored shape as it was.
    const good = await addSurface(o, roomId, { name: 'Vault', shape: { kind: 'segmentalVault', span: 12, rise: 3, length: 20 } });
    // DOMAIN.md §3.7 project check [D]: span 12, rise 3, L 20 → R 7.5, θ 1.85459 rad, 278.19 ft².
    expect(good.body.measure.quantity).toBeCloseTo(278.19, 2);
    const broken = await o.agent
      .patch(`/api/takeoff/surfaces/${good.body.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ name: 'Renamed', shape: { kind: 'segmentalVault', span: 12, rise: 6.5, length: 20 } });
    expect(fields(broken.body)).toEqual(['shape.rise']);
    const after = (await o.agent.get(`/api/takeoff/sites/${siteId}`)).body.rooms[0].surfaces[0];
    expect(after).toMatchObject({ name: 'Vault', shape: { rise: 3 } });
  });

  it('refuses an opening taller than its wall or wider than a curved segment, naming the opening', async () => {
    const o = await signUpFirm(t.app);
    const siteId = await makeSite(o);
    const roomId = await makeRoom(o, siteId);
    // A door typed 80 (inches meant) on an 8 ft wall once took 240 ft² off the 320 ft² of walls.
    const door = await addSurface(o, roomId, {
      name: 'Walls',
      shape: { kind: 'walls', perimeter: 40, height: 8, openings: [{ width: 3, height: 80 }] },
    });
    expect(door.status).toBe(400);
    expect(door.body.errors).toEqual([{ field: 'shape.openings.0.height', message: 'An opening cannot be taller than the wall.' }]);
    const wideWindow = await addSurface(o, roomId, {
      name: 'Curved wall',
      shape: {
        kind: 'curvedWall',
        radius: 2,
        angleDegrees: 90,
        height: 8,
        openings: [
          { width: 3, height: 4 },
          { width: 5, height: 4 },
        ],
      },
    });
    expect(wideWindow.body.errors).toEqual([
      { field: 'shape.openings.1.width', message: 'An opening cannot be wider than the curved wall segment.' },
    ]);
    expect((await o.agent.get(`/api/takeoff/sites/${siteId}`)).body.rooms[0].surfaces).toHaveLength(0);
    // common practice, no source: 40 × 8 − 3 × 6.75 = 299.75 ft²
    const fits = await addSurface(o, roomId, {
      name: 'Walls',
      shape: { kind: 'walls', perimeter: 40, height: 8, openings: [{ width: 3, height: 6.75 }] },
    });
    expect(fits.status).toBe(201);
    expect(fits.body.measure.quantity).toBe(299.75);
  });

  it('still opens a surface saved with an opening taller than its wall before that was refused, and asks for it on the next save', async () => {
    const o = await signUpFirm(t.app);
    const siteId = await makeSite(o);
    const roomId = await makeRoom(o, siteId);
    const shape = { kind: 'walls', perimeter: 40, height: 8, openings: [{ width: 3, height: 80 }] };
    const [{ id }] = await withTenant(
      t.ctx.pool,
      o.firmId,
      async (tx) =>
        (
          await tx.client.query<{ id: string }>(
            `insert into surfaces (tenant_id, room_id, name, shape, length_unit) values ($1, $2, 'Walls', $3, 'ft') returning id`,
            [tx.tenantId, roomId, shape],
          )
        ).rows,
    );
    const page = await o.agent.get(`/api/takeoff/sites/${siteId}`);
    expect(page.status).toBe(200);
    // as it was saved: 40 × 8 − 3 × 80 = 80 ft² (common practice, no source)
    expect(page.body.rooms[0].surfaces[0].measure.quantity).toBe(80);
    const renamed = await o.agent.patch(`/api/takeoff/surfaces/${id}`).set('x-csrf-token', o.csrf()).send({ name: 'North walls' });
    expect(renamed.status).toBe(200);
    const saved = await o.agent.patch(`/api/takeoff/surfaces/${id}`).set('x-csrf-token', o.csrf()).send({ name: 'North walls', shape });
    expect(fields(saved.body)).toEqual(['shape.openings.0.height']);
  });

  it('refuses a size too small or too big to measure, naming it, so the site page keeps opening', async () => {
    const o = await signUpFirm(t.app);
    const siteId = await makeSite(o);
    const roomId = await makeRoom(o, siteId);
    // A rise of 1e-300 under a wide span was once saved with an area of NaN, and the page answered 500 from then on.
    const flat = await addSurface(o, roomId, { name: 'Vault', shape: { kind: 'segmentalVault', span: 100000, rise: 1e-300, length: 10 } });
    expect(flat.status).toBe(400);
    expect(flat.body.errors).toEqual([{ field: 'shape.rise', message: 'Enter the rise, at least 0.001.' }]);
    const wide = await addSurface(o, roomId, { name: 'Vault', shape: { kind: 'segmentalVault', span: 100001, rise: 3, length: 10 } });
    expect(wide.body.errors).toEqual([{ field: 'shape.span', message: 'Enter the span, at most 100000.' }]);
    const good = await addSurface(o, roomId, { name: 'Vault', shape: { kind: 'segmentalVault', span: 12, rise: 3, length: 20 } });
    const edited = await o.agent
      .patch(`/api/takeoff/surfaces/${good.body.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ shape: { kind: 'segmentalVault', span: 12, rise: 0.0001, length: 20 } });
    expect(edited.body.errors).toEqual([{ field: 'shape.rise', message: 'Enter the rise, at least 0.001.' }]);
    const page = await o.agent.get(`/api/takeoff/sites/${siteId}`);
    expect(page.status).toBe(200);
    expect(page.body.rooms[0].surfaces).toEqual([
      expect.objectContaining({ id: good.body.id, shape: expect.objectContaining({ rise: 3 }) }),
    ]);
  });

  it('renames, orders, duplicates and deletes, auditing creates and deletes', async () => {
    const o = await signUpFirm(t.app);
    const siteId = await makeSite(o);
    const hall = await makeRoom(o, siteId, 'Stair hall');
    const porch = await o.agent
      .post(`/api/takeoff/sites/${siteId}/rooms`)
      .set('x-csrf-token', o.csrf())
      .send({ name: 'Porch', isExterior: true, notes: 'North side' });
    expect(porch.body).toMatchObject({ name: 'Porch', isExterior: true, position: 1, surfaces: [], totals: { area: 0, length: 0 } });

    const renamed = await o.agent.patch(`/api/takeoff/rooms/${hall}`).set('x-csrf-token', o.csrf()).send({ name: 'Front stair hall' });
    expect(renamed.body).toMatchObject({ name: 'Front stair hall', isExterior: false, notes: '' });
    const badRoom = await o.agent.patch(`/api/takeoff/rooms/${hall}`).set('x-csrf-token', o.csrf()).send({ name: ' ', colour: 'red' });
    expect(fields(badRoom.body)).toEqual(['colour', 'name']);

    const moved = await o.agent.post(`/api/takeoff/rooms/${porch.body.id}/move`).set('x-csrf-token', o.csrf()).send({ to: 0 });
    expect(moved.body.rooms.map((r: { name: string }) => r.name)).toEqual(['Porch', 'Front stair hall']);

    const wall = await addSurface(o, hall, {
      name: 'North wall',
      shape: { kind: 'walls', perimeter: 12, height: 10 },
      disturbedPaintedArea: 4.5,
      notes: 'Patch the crack first',
    });
    expect(wall.body).toMatchObject({
      position: 0,
      disturbedPaintedArea: 4.5,
      notes: 'Patch the crack first',
      measure: { quantity: 120, formula: 'P·H − openings' },
    });
    const ceiling = await addSurface(o, hall, { name: 'Vault', shape: { kind: 'barrelVault', radius: 6, length: 20 } });
    const copy = await o.agent.post(`/api/takeoff/surfaces/${wall.body.id}/duplicate`).set('x-csrf-token', o.csrf());
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({
      name: 'North wall (copy)',
      position: 1,
      disturbedPaintedArea: 4.5,
      shape: { kind: 'walls', perimeter: 12, height: 10 },
    });
    let view = (await o.agent.get(`/api/takeoff/sites/${siteId}`)).body;
    expect(view.rooms[1].surfaces.map((s: { name: string }) => s.name)).toEqual(['North wall', 'North wall (copy)', 'Vault']);
    // DOMAIN.md §3.7 project check [D]: barrel r 6, L 20 → 120π = 376.99 ft²; with two 120 ft² walls.
    expect(view.rooms[1].totals.area).toBeCloseTo(240 + 120 * Math.PI, 9);

    const patched = await o.agent
      .patch(`/api/takeoff/surfaces/${copy.body.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ name: 'South wall', disturbedPaintedArea: null });
    expect(patched.body).toMatchObject({
      name: 'South wall',
      disturbedPaintedArea: null,
      notes: 'Patch the crack first',
      measure: { quantity: 120 },
    });
    const movedSurface = await o.agent.post(`/api/takeoff/surfaces/${ceiling.body.id}/move`).set('x-csrf-token', o.csrf()).send({ to: 0 });
    expect(movedSurface.body.rooms[1].surfaces.map((s: { name: string }) => s.name)).toEqual(['Vault', 'North wall', 'South wall']);

    expect((await o.agent.delete(`/api/takeoff/surfaces/${wall.body.id}`).set('x-csrf-token', o.csrf())).status).toBe(204);
    expect((await o.agent.delete(`/api/takeoff/rooms/${hall}`).set('x-csrf-token', o.csrf())).status).toBe(204);
    view = (await o.agent.get(`/api/takeoff/sites/${siteId}`)).body;
    expect(view.rooms.map((r: { name: string }) => r.name)).toEqual(['Porch']);
    expect((await o.agent.patch(`/api/takeoff/surfaces/${ceiling.body.id}`).set('x-csrf-token', o.csrf()).send({ name: 'x' })).status).toBe(
      404,
    );

    const actions = await withTenant(
      t.ctx.pool,
      o.firmId,
      async (tx) =>
        (await tx.client.query(`select action, data from audit_log where action like 'takeoff.%' order by created_at, action`)).rows,
    );
    const counts = actions.reduce<Record<string, number>>((acc, a) => ({ ...acc, [a.action]: (acc[a.action] ?? 0) + 1 }), {});
    expect(counts).toEqual({
      'takeoff.room_created': 2,
      'takeoff.room_deleted': 1,
      'takeoff.surface_created': 3,
      'takeoff.surface_deleted': 1,
      // a room renamed, a surface re-measured (its shape before and after kept)
      'takeoff.room_updated': 1,
      'takeoff.surface_updated': 1,
    });
    expect(actions.find((a) => a.action === 'takeoff.room_deleted').data).toMatchObject({ name: 'Front stair hall', surfacesDeleted: 2 });
  });

  it('lets crew read but not change (403 before any 400)', async () => {
    const o = await signUpFirm(t.app);
    const siteId = await makeSite(o);
    const roomId = await makeRoom(o, siteId);
    const surface = await addSurface(o, roomId, { name: 'Ceiling', shape: { kind: 'ceilingCircle', radius: 4 } });
    const email = uniqueEmail('crew');
    await o.agent.post('/api/team/invitations').set('x-csrf-token', o.csrf()).send({ email, role: 'crew' });
    const token = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)))).searchParams.get('token')!;
    const crew = await newAgent(t.app);
    await crew.agent
      .post('/api/auth/invitations/accept')
      .set('x-csrf-token', crew.csrf())
      .send({ token, name: 'Crew', password: 'scaffold-pass-2026' });
    await crew.refresh();

    const read = await crew.agent.get(`/api/takeoff/sites/${siteId}`);
    expect(read.status).toBe(200);
    expect(read.body.rooms[0].surfaces[0].measure.quantity).toBeCloseTo(16 * Math.PI, 9);
    const writes: [string, string, object][] = [
      ['post', `/api/takeoff/sites/${siteId}/rooms`, { name: '' }],
      ['patch', `/api/takeoff/rooms/${roomId}`, { name: '' }],
      ['delete', `/api/takeoff/rooms/${roomId}`, {}],
      ['post', `/api/takeoff/rooms/${roomId}/move`, { to: -1 }],
      ['post', `/api/takeoff/rooms/${roomId}/surfaces`, { shape: { kind: 'cone', radius: -1 } }],
      ['patch', `/api/takeoff/surfaces/${surface.body.id}`, { shape: 'nope' }],
      ['delete', `/api/takeoff/surfaces/${surface.body.id}`, {}],
      ['post', `/api/takeoff/surfaces/${surface.body.id}/duplicate`, {}],
      ['post', `/api/takeoff/surfaces/${surface.body.id}/move`, { to: 'x' }],
    ];
    for (const [method, path, body] of writes) {
      const res = await (crew.agent as unknown as AgentByMethod)[method](path).set('x-csrf-token', crew.csrf()).send(body);
      expect({ method, path, status: res.status }).toEqual({ method, path, status: 403 });
    }
    expect((await o.agent.get(`/api/takeoff/sites/${siteId}`)).body.rooms[0].surfaces).toHaveLength(1);
  });

  it("answers 404 for another firm's site, room and surface on every route", async () => {
    const a = await signUpFirm(t.app, 'Firm A');
    const siteId = await makeSite(a);
    const roomId = await makeRoom(a, siteId);
    const surfaceId = (await addSurface(a, roomId, { name: 'Walls', shape: { kind: 'walls', perimeter: 40, height: 9 } })).body.id;
    const b = await signUpFirm(t.app, 'Firm B');
    const shape = { kind: 'walls', perimeter: 40, height: 9 };
    const calls: [string, string, object][] = [
      ['get', `/api/takeoff/sites/${siteId}`, {}],
      ['post', `/api/takeoff/sites/${siteId}/rooms`, { name: 'Hall' }],
      ['patch', `/api/takeoff/rooms/${roomId}`, { name: 'Hall' }],
      ['delete', `/api/takeoff/rooms/${roomId}`, {}],
      ['post', `/api/takeoff/rooms/${roomId}/move`, { to: 0 }],
      ['post', `/api/takeoff/rooms/${roomId}/surfaces`, { name: 'Walls', shape }],
      ['patch', `/api/takeoff/surfaces/${surfaceId}`, { name: 'Walls', shape }],
      ['delete', `/api/takeoff/surfaces/${surfaceId}`, {}],
      ['post', `/api/takeoff/surfaces/${surfaceId}/duplicate`, {}],
      ['post', `/api/takeoff/surfaces/${surfaceId}/move`, { to: 0 }],
    ];
    for (const [method, path, body] of calls) {
      const res = await (b.agent as unknown as AgentByMethod)[method](path).set('x-csrf-token', b.csrf()).send(body);
      expect({ method, path, status: res.status }).toEqual({ method, path, status: 404 });
    }
    const still = (await a.agent.get(`/api/takeoff/sites/${siteId}`)).body;
    expect(still.rooms[0]).toMatchObject({ name: 'Round dining room', surfaces: [{ id: surfaceId, name: 'Walls' }] });
  });

  it('seeds the invented demo rooms so they read back measured', async () => {
    const o = await signUpFirm(t.app);
    const siteId = await makeSite(o);
    await withTenant(t.ctx.pool, o.firmId, (tx) => seedDemoTakeoff(tx, siteId));
    const view = (await o.agent.get(`/api/takeoff/sites/${siteId}`)).body;
    expect(view.rooms.map((r: { name: string }) => r.name)).toEqual(['Round sitting room', 'Stair hall']);
    const [walls, turret] = view.rooms[0].surfaces;
    // Invented sizes; formulas per DOMAIN.md §2.2: 2π·7·10 − (3·7 + 2·3·5), and π·r·√(r²+h²).
    expect(walls.measure.quantity).toBeCloseTo(2 * Math.PI * 70 - 51, 9);
    expect(turret.measure.quantity).toBeCloseTo(Math.PI * 7 * Math.sqrt(85), 9);
    expect(view.rooms[1].surfaces.map((s: { shape: { kind: string } }) => s.shape.kind)).toEqual(['walls', 'barrelVault']);
  });
});
