import type { ClientDetail, ClientSummary, PortalSession, StaffSession, TeamMember } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;

/** A client of the owner's firm (made through the API) signed in to the portal by an e-mailed link. */
async function portalClientOf(owner: Owner, body: Record<string, unknown> = {}) {
  const email = uniqueEmail('reader');
  const made = await owner.agent
    .post('/api/clients')
    .set('x-csrf-token', owner.csrf())
    .send({ kind: 'homeowner', name: 'Rosa Lectora', email, ...body });
  expect(made.status).toBe(201);
  const clientId = (made.body as ClientSummary).id;
  await withTenant(t.ctx.pool, owner.firmId, (tx) =>
    tx.client.query(`insert into portal_users (tenant_id, client_id, email, name) values ($1, $2, $3, 'Rosa Lectora')`, [
      tx.tenantId,
      clientId,
      email,
    ]),
  );
  const c = await newAgent(t.app, 'portal');
  await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email });
  const token = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)))).searchParams.get('token');
  const redeemed = await c.agent.post('/api/portal/auth/redeem').set('x-csrf-token', c.csrf()).send({ token });
  expect(redeemed.status).toBe(200);
  await c.refresh();
  return { ...c, clientId };
}

const fieldsOf = (body: { errors?: { field: string }[] }) => (body.errors ?? []).map((e) => e.field);

describe('PATCH /api/auth/me/language', () => {
  it('keeps the person own choice and answers the whole session in it; null follows the firm again', async () => {
    const owner = await signUpFirm(t.app, 'Lengua Plaster');
    const before = (await owner.agent.get('/api/auth/session')).body as StaffSession;
    expect(before.user).toMatchObject({ language: 'en', ownLanguage: null, country: 'US' });

    const es = await owner.agent.patch('/api/auth/me/language').set('x-csrf-token', owner.csrf()).send({ language: 'es' });
    expect(es.status).toBe(200);
    expect((es.body as StaffSession).user).toMatchObject({ language: 'es', ownLanguage: 'es', firmId: owner.firmId });
    expect(typeof (es.body as StaffSession).csrfToken).toBe('string');
    expect(((await owner.agent.get('/api/auth/session')).body as StaffSession).user?.language).toBe('es');

    const firm = await owner.agent.patch('/api/auth/me/language').set('x-csrf-token', owner.csrf()).send({ language: null });
    expect((firm.body as StaffSession).user).toMatchObject({ language: 'en', ownLanguage: null });
  });

  it('answers 400 naming language for a language we do not have, a missing one and unknown fields', async () => {
    const owner = await signUpFirm(t.app);
    for (const body of [{ language: 'fr' }, {}, { language: 1 }]) {
      const res = await owner.agent.patch('/api/auth/me/language').set('x-csrf-token', owner.csrf()).send(body);
      expect(res.status).toBe(400);
      expect(res.headers['content-type']).toContain('application/problem+json');
      expect(fieldsOf(res.body)).toEqual(['language']);
    }
    const extra = await owner.agent
      .patch('/api/auth/me/language')
      .set('x-csrf-token', owner.csrf())
      .send({ language: 'es', units: 'metric' });
    expect(extra.status).toBe(400);
    expect(fieldsOf(extra.body)).toContain('units');
  });

  it('refuses a visitor (401) and a portal client (401)', async () => {
    const guest = await newAgent(t.app);
    expect((await guest.agent.patch('/api/auth/me/language').set('x-csrf-token', guest.csrf()).send({ language: 'es' })).status).toBe(401);
    const owner = await signUpFirm(t.app);
    const client = await portalClientOf(owner);
    expect((await client.agent.patch('/api/auth/me/language').set('x-csrf-token', client.csrf()).send({ language: 'es' })).status).toBe(
      401,
    );
  });
});

describe('PATCH /api/portal/me/language', () => {
  it('keeps the choice on the client record, which the office reads and the next session answers', async () => {
    const owner = await signUpFirm(t.app, 'Idioma Glaze');
    const client = await portalClientOf(owner);
    expect(((await client.agent.get('/api/portal/session')).body as PortalSession).client).toMatchObject({ language: 'en', country: 'US' });

    const es = await client.agent.patch('/api/portal/me/language').set('x-csrf-token', client.csrf()).send({ language: 'es' });
    expect(es.status).toBe(200);
    expect((es.body as PortalSession).client).toMatchObject({ language: 'es', firmId: owner.firmId });
    expect(((await owner.agent.get(`/api/clients/${client.clientId}`)).body as ClientDetail).language).toBe('es');

    const back = await client.agent.patch('/api/portal/me/language').set('x-csrf-token', client.csrf()).send({ language: null });
    expect((back.body as PortalSession).client?.language).toBe('en');
    expect(((await owner.agent.get(`/api/clients/${client.clientId}`)).body as ClientDetail).language).toBeNull();
  });

  it('answers 400 naming language, and 401 to staff and visitors', async () => {
    const owner = await signUpFirm(t.app);
    const client = await portalClientOf(owner);
    const bad = await client.agent.patch('/api/portal/me/language').set('x-csrf-token', client.csrf()).send({ language: 'de' });
    expect(bad.status).toBe(400);
    expect(fieldsOf(bad.body)).toEqual(['language']);
    expect((await owner.agent.patch('/api/portal/me/language').set('x-csrf-token', owner.csrf()).send({ language: 'es' })).status).toBe(
      401,
    );
    const guest = await newAgent(t.app, 'portal');
    expect((await guest.agent.patch('/api/portal/me/language').set('x-csrf-token', guest.csrf()).send({ language: 'es' })).status).toBe(
      401,
    );
  });
});

describe('client language (office)', () => {
  it('is taken on create and changed or cleared on update; the client reads in it', async () => {
    const owner = await signUpFirm(t.app);
    const client = await portalClientOf(owner, { language: 'es' });
    expect(((await owner.agent.get(`/api/clients/${client.clientId}`)).body as ClientDetail).language).toBe('es');
    expect(((await client.agent.get('/api/portal/session')).body as PortalSession).client?.language).toBe('es');

    const cleared = await owner.agent.patch(`/api/clients/${client.clientId}`).set('x-csrf-token', owner.csrf()).send({ language: null });
    expect(cleared.status).toBe(200);
    expect(((await owner.agent.get(`/api/clients/${client.clientId}`)).body as ClientDetail).language).toBeNull();

    const plain = await owner.agent.post('/api/clients').set('x-csrf-token', owner.csrf()).send({ kind: 'designer', name: 'Dana Default' });
    expect(((await owner.agent.get(`/api/clients/${(plain.body as ClientSummary).id}`)).body as ClientDetail).language).toBeNull();
  });

  it('answers 400 naming language on create and update', async () => {
    const owner = await signUpFirm(t.app);
    const made = await owner.agent
      .post('/api/clients')
      .set('x-csrf-token', owner.csrf())
      .send({ kind: 'homeowner', name: 'Frank Francés', language: 'fr' });
    expect(made.status).toBe(400);
    expect(fieldsOf(made.body)).toEqual(['language']);
    const ok = await owner.agent.post('/api/clients').set('x-csrf-token', owner.csrf()).send({ kind: 'homeowner', name: 'Frank' });
    const bad = await owner.agent
      .patch(`/api/clients/${(ok.body as ClientSummary).id}`)
      .set('x-csrf-token', owner.csrf())
      .send({ language: 'EN' });
    expect(bad.status).toBe(400);
    expect(fieldsOf(bad.body)).toEqual(['language']);
  });
});

describe('PATCH /api/team/members/:id/language (owner)', () => {
  it('sets a member language, which their next session answers; another firm member is 404; bad input 400', async () => {
    const owner = await signUpFirm(t.app);
    const members = (await owner.agent.get('/api/team/members')).body as { items: TeamMember[] };
    const me = members.items.find((m) => m.isYou)!;
    const res = await owner.agent.patch(`/api/team/members/${me.id}/language`).set('x-csrf-token', owner.csrf()).send({ language: 'es' });
    expect(res.status).toBe(200);
    expect((res.body as TeamMember).id).toBe(me.id);
    expect(((await owner.agent.get('/api/auth/session')).body as StaffSession).user).toMatchObject({ language: 'es', ownLanguage: 'es' });

    const bad = await owner.agent.patch(`/api/team/members/${me.id}/language`).set('x-csrf-token', owner.csrf()).send({ language: 'pt' });
    expect(bad.status).toBe(400);
    expect(fieldsOf(bad.body)).toEqual(['language']);

    const other = await signUpFirm(t.app);
    const foreign = await other.agent
      .patch(`/api/team/members/${me.id}/language`)
      .set('x-csrf-token', other.csrf())
      .send({ language: 'es' });
    expect(foreign.status).toBe(404);
  });
});
