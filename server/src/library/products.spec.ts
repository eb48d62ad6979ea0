import { withTenant } from '@layerbook/db';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { addProduct, fields, glazeLayer, joinAs, LIME, MEDIUM, PRIMER, TINT } from './library-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('library products', () => {
  it('adds, lists, reads and partly updates a product without blanking other fields', async () => {
    const o = await signUpFirm(t.app, 'Product Studio');
    const made = await o.agent
      .post('/api/library/products')
      .set('x-csrf-token', o.csrf())
      .send({ ...PRIMER, notes: 'Tint to the base colour.' });
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({
      name: 'Acrylic primer',
      unit: 'gallon',
      isFlammable: false,
      archivedAt: null,
      containers: [
        { label: '1 gal', price: '45.00' },
        { label: '1 qt', price: '16.00' },
      ],
    });
    const patched = await o.agent
      .patch(`/api/library/products/${made.body.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ name: 'Bonding primer' });
    expect(patched.status).toBe(200);
    expect(patched.body).toMatchObject({
      name: 'Bonding primer',
      notes: 'Tint to the base colour.',
      kind: 'primer',
      containers: [{ price: '45.00' }, { price: '16.00' }],
    });
    expect((await o.agent.get(`/api/library/products/${made.body.id}`)).body.name).toBe('Bonding primer');
    // a price change keeps the containers before and after in the trail, not only that they changed
    const repriced = await o.agent
      .patch(`/api/library/products/${made.body.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ containers: [{ label: '1 gal', size: 1, unit: 'gallon', price: '48.00' }] });
    expect(repriced.status).toBe(200);
    const [entry] = await withTenant(
      t.ctx.pool,
      o.firmId,
      async (tx) =>
        (
          await tx.client.query<{ data: { containersBefore: Array<{ price: string }>; containersAfter: Array<{ price: string }> } }>(
            `select data from audit_log where action = 'product.updated' and data ? 'containersAfter'`,
          )
        ).rows,
    );
    expect([entry.data.containersBefore.map((c) => c.price), entry.data.containersAfter.map((c) => c.price)]).toEqual([
      ['45.00', '16.00'],
      ['48.00'],
    ]);
    expect((await o.agent.get('/api/library/products')).body.items.map((p: { name: string }) => p.name)).toEqual(['Bonding primer']);
  });

  it('derives "flammable" and its category from the flash point (at or below 93 °C, 29 CFR 1910.106(a)(19)) and keeps lime and silica flags', async () => {
    const o = await signUpFirm(t.app);
    const ipa = await o.agent
      .post('/api/library/products')
      .set('x-csrf-token', o.csrf())
      .send({
        ...PRIMER,
        name: 'Isopropyl alcohol',
        kind: 'solvent',
        unit: 'L',
        containers: [{ label: '1 L', size: 1, unit: 'L', price: '9.50' }],
        hazards: { flashPointC: 12 },
      });
    expect(ipa.body).toMatchObject({ isFlammable: true, flammableCategories: [1, 2], hazards: { flashPointC: 12 } });
    const sealer = await o.agent
      .post('/api/library/products')
      .set('x-csrf-token', o.csrf())
      .send({ ...PRIMER, name: 'Oil sealer', hazards: { flashPointC: 40 } });
    // mineral-spirits based, about 40 °C: category 3 (29 CFR 1910.106(a)(19)(iii)), still flammable
    expect(sealer.body).toMatchObject({ isFlammable: true, flammableCategories: [3] });
    const wax = await o.agent
      .post('/api/library/products')
      .set('x-csrf-token', o.csrf())
      .send({ ...PRIMER, name: 'Hard wax', hazards: { flashPointC: 120 } });
    expect(wax.body).toMatchObject({ isFlammable: false, flammableCategories: [] });
    const marble = await o.agent
      .post('/api/library/products')
      .set('x-csrf-token', o.csrf())
      .send({ ...LIME, name: 'Marble dust plaster', hazards: { isLime: true, containsSilica: true } });
    expect(marble.body.hazards).toEqual({ isLime: true, containsSilica: true });
    const oil = await o.agent
      .post('/api/library/products')
      .set('x-csrf-token', o.csrf())
      .send({ ...PRIMER, name: 'Linseed oil', hazards: { flashPointC: 200, containsDryingOil: true } });
    expect(oil.body).toMatchObject({ isFlammable: false, hazards: { flashPointC: 200, containsDryingOil: true } });
  });

  it('answers 400 naming each bad field (missing price, no containers, mixed units) and saves nothing', async () => {
    const o = await signUpFirm(t.app);
    const send = (body: object) => o.agent.post('/api/library/products').set('x-csrf-token', o.csrf()).send(body);
    const noPrice = await send({
      ...PRIMER,
      containers: [
        { label: '1 gal', size: 1, unit: 'gallon' },
        { label: '1 qt', size: 0, unit: 'quart', price: '16' },
      ],
    });
    expect(noPrice.status).toBe(400);
    expect(fields(noPrice.body)).toEqual(['containers.0.price', 'containers.1.size']);
    const none = await send({ ...PRIMER, containers: [] });
    expect(none.body.errors).toEqual([{ field: 'containers', message: 'Add at least one container with its price.' }]);
    const mixed = await send({ ...PRIMER, containers: [{ label: '20 kg pail', size: 20, unit: 'kg', price: '95.00' }] });
    expect(fields(mixed.body)).toEqual(['containers.0.unit']);
    const junk = await send({
      ...PRIMER,
      name: ' ',
      kind: 'varnish',
      unit: 'bucket',
      colour: 'red',
      hazards: { flashPointC: 'low', containsDryingOil: 'yes' },
      sdsUrl: 'javascript:alert(1)',
    });
    expect(fields(junk.body)).toEqual(['colour', 'hazards.containsDryingOil', 'hazards.flashPointC', 'kind', 'name', 'sdsUrl', 'unit']);
    expect((await o.agent.get('/api/library/products')).body.items).toEqual([]);
    const id = await addProduct(o, PRIMER);
    const badPatch = await o.agent.patch(`/api/library/products/${id}`).set('x-csrf-token', o.csrf()).send({ unit: 'kg' });
    expect(fields(badPatch.body)).toEqual(['containers.0.unit', 'containers.1.unit']);
    expect((await o.agent.get(`/api/library/products/${id}`)).body.unit).toBe('gallon');
  });

  it('refuses to archive a product an active finish system uses, naming the system', async () => {
    const o = await signUpFirm(t.app);
    const tint = await addProduct(o, TINT);
    const medium = await addProduct(o, MEDIUM);
    const system = await o.agent
      .post('/api/library/systems')
      .set('x-csrf-token', o.csrf())
      .send({ name: 'Antiqued glaze', layers: [glazeLayer(tint, medium)] });
    expect(system.status).toBe(201);
    const refused = await o.agent.post(`/api/library/products/${medium}/archive`).set('x-csrf-token', o.csrf());
    expect(refused.status).toBe(409);
    expect(refused.body.detail).toContain('"Antiqued glaze"');
    const unitChange = await o.agent
      .patch(`/api/library/products/${medium}`)
      .set('x-csrf-token', o.csrf())
      .send({ unit: 'kg', containers: [{ label: '1 kg', size: 1, unit: 'kg', price: '20.00' }] });
    expect(unitChange.status).toBe(409);
    expect((await o.agent.post(`/api/library/systems/${system.body.id}/archive`).set('x-csrf-token', o.csrf())).status).toBe(200);
    const archived = await o.agent.post(`/api/library/products/${medium}/archive`).set('x-csrf-token', o.csrf());
    expect(archived.status).toBe(200);
    expect(archived.body.archivedAt).not.toBeNull();
    expect((await o.agent.get('/api/library/products')).body.items.map((p: { id: string }) => p.id)).toEqual([tint]);
    expect((await o.agent.get('/api/library/products').query({ archived: 'only' })).body.items.map((p: { id: string }) => p.id)).toEqual([
      medium,
    ]);
    // The system cannot come back while its product is archived; once the product returns, it can.
    const back = await o.agent.post(`/api/library/systems/${system.body.id}/unarchive`).set('x-csrf-token', o.csrf());
    expect(back.status).toBe(409);
    expect(back.body.detail).toContain('archived');
    expect((await o.agent.post(`/api/library/products/${medium}/unarchive`).set('x-csrf-token', o.csrf())).body.archivedAt).toBeNull();
    expect((await o.agent.post(`/api/library/systems/${system.body.id}/unarchive`).set('x-csrf-token', o.csrf())).status).toBe(200);
  });

  it('lets crew read products without prices, and refuses their writes with 403 before any 400', async () => {
    const o = await signUpFirm(t.app);
    const id = await addProduct(o, PRIMER);
    const crew = await joinAs(t, o, 'crew');
    const list = await crew.agent.get('/api/library/products');
    expect(list.status).toBe(200);
    expect(list.body.items[0].containers).toEqual([
      { label: '1 gal', size: 1, unit: 'gallon', price: null },
      { label: '1 qt', size: 1, unit: 'quart', price: null },
    ]);
    expect((await crew.agent.get(`/api/library/products/${id}`)).body.containers[0].price).toBeNull();
    expect((await crew.agent.post('/api/library/products').set('x-csrf-token', crew.csrf()).send({ name: '' })).status).toBe(403);
    expect((await crew.agent.patch(`/api/library/products/${id}`).set('x-csrf-token', crew.csrf()).send({ name: '' })).status).toBe(403);
    expect((await crew.agent.post(`/api/library/products/${id}/archive`).set('x-csrf-token', crew.csrf())).status).toBe(403);
    const office = await joinAs(t, o, 'office');
    const edited = await office.agent
      .patch(`/api/library/products/${id}`)
      .set('x-csrf-token', office.csrf())
      .send({ notes: 'Office note' });
    expect(edited.status).toBe(200);
    expect(edited.body.containers[0].price).toBe('45.00');
  });

  it('writes an audit line for each change', async () => {
    const o = await signUpFirm(t.app);
    const id = await addProduct(o, PRIMER);
    await o.agent.patch(`/api/library/products/${id}`).set('x-csrf-token', o.csrf()).send({ notes: 'x' });
    await o.agent.post(`/api/library/products/${id}/archive`).set('x-csrf-token', o.csrf());
    const audit = await withTenant(t.ctx.pool, o.firmId, (tx) =>
      tx.client.query(`select action from audit_log where entity_id = $1 order by created_at`, [id]),
    );
    expect(audit.rows.map((r: { action: string }) => r.action)).toEqual(['product.created', 'product.updated', 'product.archived']);
  });
});
