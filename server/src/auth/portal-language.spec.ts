import type { ClientSummary, PortalSession } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;

/** A client of the owner's firm signed in to the portal by an e-mailed link. */
async function portalClientOf(owner: Owner) {
  const email = uniqueEmail('sigue');
  const made = await owner.agent
    .post('/api/clients')
    .set('x-csrf-token', owner.csrf())
    .send({ kind: 'homeowner', name: 'Marta Sigue', email });
  expect(made.status).toBe(201);
  const clientId = (made.body as ClientSummary).id;
  await withTenant(t.ctx.pool, owner.firmId, (tx) =>
    tx.client.query(`insert into portal_users (tenant_id, client_id, email, name) values ($1, $2, $3, 'Marta Sigue')`, [
      tx.tenantId,
      clientId,
      email,
    ]),
  );
  const c = await newAgent(t.app, 'portal');
  await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email });
  const token = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)))).searchParams.get('token');
  expect((await c.agent.post('/api/portal/auth/redeem').set('x-csrf-token', c.csrf()).send({ token })).status).toBe(200);
  await c.refresh();
  return { ...c, clientId };
}

describe('the portal session names the client’s own language beside the firm’s', () => {
  it('answers ownLanguage null while the client follows the firm, and stores null when they go back to it', async () => {
    const owner = await signUpFirm(t.app, 'Sigue Plaster');
    // The firm reads Spanish; the client has chosen nothing yet.
    await withTenant(t.ctx.pool, owner.firmId, (tx) => tx.client.query(`update firms set language = 'es' where id = $1`, [tx.tenantId]));
    const client = await portalClientOf(owner);
    const session = async () => ((await client.agent.get('/api/portal/session')).body as PortalSession).client;
    expect(await session()).toMatchObject({ language: 'es', ownLanguage: null, firmLanguage: 'es' });

    const en = await client.agent.patch('/api/portal/me/language').set('x-csrf-token', client.csrf()).send({ language: 'en' });
    expect(en.status).toBe(200);
    expect((en.body as PortalSession).client).toMatchObject({ language: 'en', ownLanguage: 'en', firmLanguage: 'es' });
    expect(await session()).toMatchObject({ language: 'en', ownLanguage: 'en', firmLanguage: 'es' });

    const follow = await client.agent.patch('/api/portal/me/language').set('x-csrf-token', client.csrf()).send({ language: null });
    expect(follow.status).toBe(200);
    expect((follow.body as PortalSession).client).toMatchObject({ language: 'es', ownLanguage: null, firmLanguage: 'es' });
    const stored = await withTenant(t.ctx.pool, owner.firmId, (tx) =>
      tx.client.query<{ language: string | null }>(`select language from clients where id = $1`, [client.clientId]),
    );
    expect(stored.rows[0].language).toBeNull();
    // The firm's language changing is followed on the next answer.
    await withTenant(t.ctx.pool, owner.firmId, (tx) => tx.client.query(`update firms set language = 'en' where id = $1`, [tx.tenantId]));
    expect(await session()).toMatchObject({ language: 'en', ownLanguage: null, firmLanguage: 'en' });
  });
});
