import { PROBLEM_TYPES } from '@layerbook/contracts';
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
    const elsewhere = await newAgent(t.app, 'portal');
    const used = await elsewhere.agent.post('/api/portal/auth/redeem').set('x-csrf-token', elsewhere.csrf()).send({ token });
    expect(used.status).toBe(410);
    expect(used.body.detail).toMatch(/already used/);
  });

  it('lets a second click on a spent or expired link through for the client still signed in with it, keeping the session and its token', async () => {
    const firm = await signUpFirm(t.app, 'Second Click Plaster');
    const email = uniqueEmail('client');
    await clientOf(firm.firmId, email);
    const [{ id }] = await withTenant(t.ctx.pool, firm.firmId, (tx) =>
      tx.db.select({ id: portalUsers.id }).from(portalUsers).where(eq(portalUsers.email, email)),
    );
    const { token } = await withTenant(t.ctx.pool, firm.firmId, (tx) => createPortalLink(tx, id, new Date(), 60));
    const c = await newAgent(t.app, 'portal');
    const first = await c.agent.post('/api/portal/auth/redeem').set('x-csrf-token', c.csrf()).send({ token });
    expect(first.status).toBe(200);
    const again = await c.agent.post('/api/portal/auth/redeem').set('x-csrf-token', first.body.csrfToken).send({ token });
    expect([again.status, again.body.client?.email, again.body.csrfToken]).toEqual([200, email, first.body.csrfToken]);
    t.setNow(new Date(Date.now() + 4 * 24 * 60 * 60 * 1000));
    try {
      const late = await c.agent.post('/api/portal/auth/redeem').set('x-csrf-token', first.body.csrfToken).send({ token });
      expect([late.status, late.body.client?.email]).toEqual([200, email]);
    } finally {
      t.setNow(null);
    }
    // another client signed in on this browser is not let in with it
    const otherEmail = uniqueEmail('client');
    await clientOf(firm.firmId, otherEmail);
    const [{ id: otherId }] = await withTenant(t.ctx.pool, firm.firmId, (tx) =>
      tx.db.select({ id: portalUsers.id }).from(portalUsers).where(eq(portalUsers.email, otherEmail)),
    );
    const other = await newAgent(t.app, 'portal');
    const { token: otherToken } = await withTenant(t.ctx.pool, firm.firmId, (tx) => createPortalLink(tx, otherId, new Date(), 60));
    const signedIn = await other.agent.post('/api/portal/auth/redeem').set('x-csrf-token', other.csrf()).send({ token: otherToken });
    const refused = await other.agent.post('/api/portal/auth/redeem').set('x-csrf-token', signedIn.body.csrfToken).send({ token });
    expect(refused.status).toBe(410);
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
    // the page the link opens speaks the e-mail's language before the client is signed in
    expect(url.searchParams.get('lang')).toBe('en');
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

  it('tells a turned-off account apart from a spent link: its own problem type on redeem, and the session answer says so', async () => {
    const firm = await signUpFirm(t.app, 'Shut Door Plaster');
    const email = uniqueEmail('client');
    await clientOf(firm.firmId, email);
    const setStatus = (status: 'active' | 'disabled') =>
      withTenant(t.ctx.pool, firm.firmId, (tx) => tx.db.update(portalUsers).set({ status }).where(eq(portalUsers.email, email)));
    const tokenFor = (id: string) => withTenant(t.ctx.pool, firm.firmId, (tx) => createPortalLink(tx, id, new Date(), 60));
    const [{ id }] = await withTenant(t.ctx.pool, firm.firmId, (tx) =>
      tx.db.select({ id: portalUsers.id }).from(portalUsers).where(eq(portalUsers.email, email)),
    );

    // A signed-in client whose access the firm then turns off: the next call is refused, and the
    // session answer names the firm that turned it off.
    const c = await newAgent(t.app, 'portal');
    const first = await c.agent
      .post('/api/portal/auth/redeem')
      .set('x-csrf-token', c.csrf())
      .send({ token: (await tokenFor(id)).token });
    expect(first.status).toBe(200);
    expect(first.body.accessOff).toBeUndefined();
    await setStatus('disabled');
    expect((await c.agent.get('/api/portal/proposals')).status).toBe(401);
    const session = await c.agent.get('/api/portal/session');
    expect([session.body.client, session.body.accessOff]).toEqual([null, { firmName: 'Shut Door Plaster' }]);

    // A new link for the turned-off account: 410 as before, with its own type.
    const other = await newAgent(t.app, 'portal');
    const refused = await other.agent
      .post('/api/portal/auth/redeem')
      .set('x-csrf-token', other.csrf())
      .send({ token: (await tokenFor(id)).token });
    expect([refused.status, refused.body.type]).toEqual([410, PROBLEM_TYPES.portalAccessOff]);
    // A spent link keeps the plain 410.
    await setStatus('active');
    const { token } = await tokenFor(id);
    expect((await other.agent.post('/api/portal/auth/redeem').set('x-csrf-token', other.csrf()).send({ token })).status).toBe(200);
    const later = await newAgent(t.app, 'portal');
    const spent = await later.agent.post('/api/portal/auth/redeem').set('x-csrf-token', later.csrf()).send({ token });
    expect([spent.status, spent.body.type]).toEqual([410, 'https://layerbook.local/problems/410']);
  });

  it('answers a stale security token (a sign-in in another tab replaced it) with the csrf problem type; the session hands out the new one', async () => {
    const firm = await signUpFirm(t.app);
    const email = uniqueEmail('client');
    await clientOf(firm.firmId, email);
    const [{ id }] = await withTenant(t.ctx.pool, firm.firmId, (tx) =>
      tx.db.select({ id: portalUsers.id }).from(portalUsers).where(eq(portalUsers.email, email)),
    );
    const tokenFor = async () => (await withTenant(t.ctx.pool, firm.firmId, (tx) => createPortalLink(tx, id, new Date(), 60))).token;
    // Tab A opened the inquiry form signed out; tab B signs in on the same browser.
    const browser = await newAgent(t.app, 'portal');
    const tabA = browser.csrf();
    const tabB = await browser.agent
      .post('/api/portal/auth/redeem')
      .set('x-csrf-token', tabA)
      .send({ token: await tokenFor() });
    expect(tabB.status).toBe(200);
    const stale = await browser.agent.post('/api/portal/auth/signout').set('x-csrf-token', tabA).send({});
    expect([stale.status, stale.body.type]).toEqual([403, PROBLEM_TYPES.csrf]);
    const fresh = (await browser.agent.get('/api/portal/session')).body.csrfToken;
    expect(fresh).toBe(tabB.body.csrfToken);
    expect((await browser.agent.post('/api/portal/auth/signout').set('x-csrf-token', fresh).send({})).status).toBe(200);
    // signed out (the signed double-submit token): a token not matching its cookie, the same type
    const anonymous = await newAgent(t.app, 'portal');
    const forged = await anonymous.agent.post('/api/portal/auth/link').set('x-csrf-token', 'x.y').send({ email });
    expect([forged.status, forged.body.type]).toEqual([403, PROBLEM_TYPES.csrf]);
  });

  it('keeps signed-out clients out of their projects', async () => {
    const c = await newAgent(t.app, 'portal');
    expect((await c.agent.get('/api/portal/proposals')).status).toBe(401);
  });
});
