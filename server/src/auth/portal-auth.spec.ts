import { eq, portalUsers, withTenant } from '@layerbook/db';
import { LINKS_PER_HOUR } from './password-reset';
import { createPortalLink } from './portal-auth';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

async function clientOf(firmId: string, email: string) {
  await withTenant(t.ctx.pool, firmId, (tx) => tx.db.insert(portalUsers).values({ tenantId: firmId, email, name: 'Cora Client' }));
}

describe('portal sign-in by e-mailed one-time link', () => {
  it('sends a link that signs the client in once, into their own firm only', async () => {
    const firm = await signUpFirm(t.app, 'Lantern Street Plaster');
    const email = uniqueEmail('client');
    await clientOf(firm.firmId, email);
    const c = await newAgent(t.app, 'portal');
    expect((await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email })).status).toBe(202);
    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email));
    const url = new URL(linkIn(mail));
    expect(url.pathname).toBe('/portal/sign-in/link');
    const token = url.searchParams.get('token')!;
    const signedIn = await c.agent.post('/api/portal/auth/redeem').set('x-csrf-token', c.csrf()).send({ token });
    expect(signedIn.status).toBe(200);
    expect(signedIn.body.client).toMatchObject({ email, firmName: 'Lantern Street Plaster' });
    expect((await c.agent.get('/api/portal/proposals')).body).toEqual({ items: [] });
    // A client is not staff.
    expect((await c.agent.get('/api/team/members')).status).toBe(401);
    const again = await (
      await newAgent(t.app, 'portal')
    ).agent
      .post('/api/portal/auth/redeem')
      .set('x-csrf-token', signedIn.body.csrfToken)
      .send({ token });
    expect([403, 410]).toContain(again.status);
  });

  it('refuses a reused or expired link with a clear message', async () => {
    const firm = await signUpFirm(t.app);
    const email = uniqueEmail('client');
    await clientOf(firm.firmId, email);
    const c = await newAgent(t.app, 'portal');
    await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email });
    const token = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)))).searchParams.get('token')!;
    t.setNow(new Date(Date.now() + 60 * 60 * 1000));
    try {
      const late = await c.agent.post('/api/portal/auth/redeem').set('x-csrf-token', c.csrf()).send({ token });
      expect(late.status).toBe(410);
      expect(late.body.detail).toMatch(/expired/);
    } finally {
      t.setNow(null);
    }
    const ok = await c.agent.post('/api/portal/auth/redeem').set('x-csrf-token', c.csrf()).send({ token });
    expect(ok.status).toBe(200);
    const used = await c.agent.post('/api/portal/auth/redeem').set('x-csrf-token', ok.body.csrfToken).send({ token });
    expect(used.status).toBe(410);
    expect(used.body.detail).toMatch(/already used/);
  });

  it('carries the page the client was sent from in the link (next), and refuses one outside the portal naming the field', async () => {
    const firm = await signUpFirm(t.app, 'Next Page Plaster');
    const email = uniqueEmail('client');
    await clientOf(firm.firmId, email);
    const c = await newAgent(t.app, 'portal');
    const ask = (next: string) => c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email, next });
    expect((await ask('/portal/invoices/0b6f2c1e-8d5a-4c3b-9e7f-1a2b3c4d5e6f')).status).toBe(202);
    const url = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email))));
    expect(url.searchParams.get('next')).toBe('/portal/invoices/0b6f2c1e-8d5a-4c3b-9e7f-1a2b3c4d5e6f');
    for (const next of ['//elsewhere.example/portal', '/portal/../admin', 'https://elsewhere.example/portal/x', '/jobs']) {
      const refused = await ask(next);
      expect([next, refused.status, refused.body.errors?.[0]?.field]).toEqual([next, 400, 'next']);
    }
  });

  it('answers 202 for an unknown address and sends nothing; 400 for a malformed one', async () => {
    const c = await newAgent(t.app, 'portal');
    const email = uniqueEmail('nobody');
    expect((await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email })).status).toBe(202);
    const bad = await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email: 'nope' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors[0].field).toBe('email');
    expect(
      (
        await c.agent
          .post('/api/portal/auth/redeem')
          .set('x-csrf-token', c.csrf())
          .send({ token: 'x'.repeat(43) })
      ).status,
    ).toBe(404);
  });

  it('stops e-mailing asked-for links after a few an hour per client; links in the firm’s own mail do not count', async () => {
    const firm = await signUpFirm(t.app, 'Capped Links Plaster');
    const email = uniqueEmail('client');
    await clientOf(firm.firmId, email);
    const account = await withTenant(t.ctx.pool, firm.firmId, async (tx) => {
      const [user] = await tx.db.select({ id: portalUsers.id }).from(portalUsers).where(eq(portalUsers.email, email));
      // the firm sent proposals and invoices this hour, each with its link
      for (let i = 0; i < LINKS_PER_HOUR; i++) await createPortalLink(tx, user.id, new Date(), 60);
      return user.id;
    });
    const asked = () =>
      withTenant(t.ctx.pool, firm.firmId, (tx) =>
        tx.client.query(`select id from portal_links where portal_user_id = $1 and asked`, [account]).then((r) => r.rowCount),
      );
    const c = await newAgent(t.app, 'portal');
    for (let i = 1; i <= LINKS_PER_HOUR + 2; i++) {
      expect((await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email })).status).toBe(202);
      // the lookup runs after the answer: wait for its link (or, past the cap, give it time)
      const want = Math.min(i, LINKS_PER_HOUR);
      for (let tries = 0; tries < 50 && (await asked()) !== want; tries++) await new Promise((r) => setTimeout(r, 20));
      if (i > LINKS_PER_HOUR) await new Promise((r) => setTimeout(r, 300));
      expect([i, await asked()]).toEqual([i, want]);
    }
  });

  it('keeps signed-out clients out of their projects', async () => {
    const c = await newAgent(t.app, 'portal');
    expect((await c.agent.get('/api/portal/proposals')).status).toBe(401);
  });
});
