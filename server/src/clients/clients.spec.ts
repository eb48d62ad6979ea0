import { withTenant } from '@layerbook/db';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';
import { patchFirm } from '../testing/firm-settings';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('clients, contacts and sites', () => {
  it('moves portal access with the client’s e-mail: the old address stops getting sign-in links', async () => {
    const o = await signUpFirm(t.app, 'Portal Move Plaster');
    const oldEmail = uniqueEmail('old');
    const made = await o.agent
      .post('/api/clients')
      .set('x-csrf-token', o.csrf())
      .send({ kind: 'homeowner', name: 'Moved Client', email: oldEmail });
    await withTenant(t.ctx.pool, o.firmId, (tx) =>
      tx.client.query(`insert into portal_users (tenant_id, client_id, email, name) values ($1, $2, $3, 'Moved Client')`, [
        tx.tenantId,
        made.body.id,
        oldEmail,
      ]),
    );
    const newEmail = uniqueEmail('new');
    expect((await o.agent.patch(`/api/clients/${made.body.id}`).set('x-csrf-token', o.csrf()).send({ email: newEmail })).status).toBe(200);
    const { rows } = await withTenant(t.ctx.pool, o.firmId, (tx) =>
      tx.client.query(`select status from portal_users where email = $1`, [oldEmail]),
    );
    expect(rows[0].status).toBe('disabled');
    const c = await newAgent(t.app, 'portal');
    await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email: oldEmail });
    const marker = uniqueEmail('marker');
    await o.agent.post('/api/team/invitations').set('x-csrf-token', o.csrf()).send({ email: marker, role: 'crew' });
    await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(marker));
    expect(t.inbox.messages.filter((m) => JSON.stringify(m.to).includes(oldEmail))).toHaveLength(0);
  });

  it('creates a designer client with a contact and a site, and lists with search and pages', async () => {
    const o = await signUpFirm(t.app, 'Client Plaster');
    const made = await o.agent
      .post('/api/clients')
      .set('x-csrf-token', o.csrf())
      .send({ kind: 'designer', isCompany: true, name: 'Quillfeather Interiors', email: 'studio@quillfeather.example' });
    expect(made.status).toBe(201);
    const id = made.body.id;
    expect(
      (
        await o.agent
          .post(`/api/clients/${id}/contacts`)
          .set('x-csrf-token', o.csrf())
          .send({ name: 'Rosalind Vetch', roleTitle: 'Project lead' })
      ).status,
    ).toBe(201);
    const site = await o.agent
      .post(`/api/clients/${id}/sites`)
      .set('x-csrf-token', o.csrf())
      .send({ addressLine1: '9 Heron Walk', city: 'Ashbury', yearBuilt: 1994, accessNotes: 'Stairwell ceiling 22 ft' });
    expect(site.body).toMatchObject({ isPre1978: false, accessNotes: 'Stairwell ceiling 22 ft' });
    const patched = await o.agent.patch(`/api/sites/${site.body.id}`).set('x-csrf-token', o.csrf()).send({ label: 'Main house' });
    expect(patched.body).toMatchObject({ label: 'Main house', addressLine1: '9 Heron Walk', yearBuilt: 1994 });
    const renamed = await o.agent.patch(`/api/clients/${id}`).set('x-csrf-token', o.csrf()).send({ phone: '555-0123' });
    expect(renamed.body).toMatchObject({ phone: '555-0123', name: 'Quillfeather Interiors', email: 'studio@quillfeather.example' });
    const detail = await o.agent.get(`/api/clients/${id}`);
    expect(detail.body.contacts[0].name).toBe('Rosalind Vetch');
    expect(detail.body.sites[0].label).toBe('Main house');
    for (let i = 0; i < 3; i++)
      await o.agent
        .post('/api/clients')
        .set('x-csrf-token', o.csrf())
        .send({ kind: 'homeowner', name: `Home ${i}` });
    const first = await o.agent.get('/api/clients').query({ limit: 2 });
    const second = await o.agent.get('/api/clients').query({ limit: 2, after: first.body.nextCursor });
    expect([...first.body.items, ...second.body.items].map((c: { name: string }) => c.name)).toEqual([
      'Home 2',
      'Home 1',
      'Home 0',
      'Quillfeather Interiors',
    ]);
    expect(second.body.nextCursor).toBeNull();
    expect((await o.agent.get('/api/clients').query({ q: 'quill' })).body.items).toHaveLength(1);
    expect((await o.agent.get('/api/clients').query({ kind: 'designer' })).body.items).toHaveLength(1);
  });

  it('answers 400 naming the field for bad input, and writes nothing', async () => {
    const o = await signUpFirm(t.app);
    const bad = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'landlord', name: '', email: 'nope' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['email', 'kind', 'name']);
    const made = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'H' });
    const badSite = await o.agent
      .post(`/api/clients/${made.body.id}/sites`)
      .set('x-csrf-token', o.csrf())
      .send({ addressLine1: '', yearBuilt: 1066, country: 'usa' });
    expect(badSite.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['addressLine1', 'country', 'yearBuilt']);
    expect((await o.agent.get(`/api/clients/${made.body.id}`)).body.sites).toHaveLength(0);
  });

  it('takes a site country only from the ISO 3166-1 list, as the firm’s, on create and on change', async () => {
    const o = await signUpFirm(t.app);
    const made = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Country Check' });
    const sites = `/api/clients/${made.body.id}/sites`;
    for (const country of ['UN', 'XX', 'UK', 'EU', 'us', 'United States']) {
      const res = await o.agent.post(sites).set('x-csrf-token', o.csrf()).send({ addressLine1: '1 Lime Row', country });
      expect(res.status).toBe(400);
      expect(res.body.errors).toEqual([{ field: 'country', message: 'Choose a country from the list (an ISO 3166-1 code, like US).' }]);
    }
    expect((await o.agent.get(`/api/clients/${made.body.id}`)).body.sites).toHaveLength(0);
    const site = await o.agent.post(sites).set('x-csrf-token', o.csrf()).send({ addressLine1: '1 Lime Row', country: 'GB' });
    expect(site.status).toBe(201);
    expect(site.body.country).toBe('GB');
    const change = await o.agent.patch(`/api/sites/${site.body.id}`).set('x-csrf-token', o.csrf()).send({ country: 'UN' });
    expect(change.status).toBe(400);
    expect(change.body.errors.map((e: { field: string }) => e.field)).toEqual(['country']);
    const ok = await o.agent.patch(`/api/sites/${site.body.id}`).set('x-csrf-token', o.csrf()).send({ country: 'CA' });
    expect(ok.status).toBe(200);
    expect(ok.body.country).toBe('CA');
  });

  it('puts a site sent without a country in the firm’s country', async () => {
    const o = await signUpFirm(t.app);
    expect((await patchFirm(o, { country: 'CA' })).status).toBe(200);
    const made = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Maple Row' });
    const site = await o.agent
      .post(`/api/clients/${made.body.id}/sites`)
      .set('x-csrf-token', o.csrf())
      .send({ addressLine1: '9 Kiln Lane' });
    expect(site.status).toBe(201);
    expect(site.body.country).toBe('CA');
  });

  it('keeps crew out of clients and inquiries (no contact or money figures for crew here)', async () => {
    const o = await signUpFirm(t.app);
    const email = uniqueEmail('crew');
    await o.agent.post('/api/team/invitations').set('x-csrf-token', o.csrf()).send({ email, role: 'crew' });
    const token = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)))).searchParams.get('token')!;
    const crew = await newAgent(t.app);
    await crew.agent
      .post('/api/auth/invitations/accept')
      .set('x-csrf-token', crew.csrf())
      .send({ token, name: 'Crew', password: 'scaffold-pass-2026' });
    await crew.refresh();
    for (const path of ['/api/clients', '/api/inquiries', '/api/inquiries/board', '/api/inquiries/today']) {
      expect({ path, status: (await crew.agent.get(path)).status }).toEqual({ path, status: 403 });
    }
  });
});
