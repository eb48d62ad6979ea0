import { withTenant } from '@layerbook/db';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

const tokenFrom = (url: string) => new URL(url).searchParams.get('token')!;

describe('invitations, end to end through the e-mail', () => {
  it('owner invites an office manager, who sets a password from the e-mailed link and signs in', async () => {
    const owner = await signUpFirm(t.app, 'Millbrook Wax Works');
    const email = uniqueEmail('office');
    const sent = await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email, role: 'office' });
    expect(sent.status).toBe(201);
    expect(sent.body).toMatchObject({ email, role: 'office', status: 'pending' });

    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email));
    expect(mail.subject).toContain('Millbrook Wax Works');
    expect(mail.text).toContain('/accept-invitation?token=');
    const token = tokenFrom(linkIn(mail));

    const guest = await newAgent(t.app);
    const preview = await guest.agent.get(`/api/auth/invitations/${token}`);
    expect(preview.body).toEqual({ firmName: 'Millbrook Wax Works', email, role: 'office', hasAccount: false });
    // A new person must give a name.
    const nameless = await guest.agent
      .post('/api/auth/invitations/accept')
      .set('x-csrf-token', guest.csrf())
      .send({ token, password: 'ledger-and-lime-77' });
    expect(nameless.status).toBe(400);
    expect(nameless.body.errors[0].field).toBe('name');

    const accepted = await guest.agent
      .post('/api/auth/invitations/accept')
      .set('x-csrf-token', guest.csrf())
      .send({ token, name: 'Otto Office', password: 'ledger-and-lime-77' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user).toMatchObject({ role: 'office', firmId: owner.firmId, name: 'Otto Office' });

    const reuse = await guest.agent
      .post('/api/auth/invitations/accept')
      .set('x-csrf-token', accepted.body.csrfToken)
      .send({ token, name: 'Otto', password: 'ledger-and-lime-78' });
    expect(reuse.status).toBe(410);

    const fresh = await newAgent(t.app);
    const signin = await fresh.agent
      .post('/api/auth/signin')
      .set('x-csrf-token', fresh.csrf())
      .send({ email, password: 'ledger-and-lime-77' });
    expect(signin.body.user.role).toBe('office');

    const members = await owner.agent.get('/api/team/members');
    expect(members.body.items.map((m: { email: string }) => m.email)).toContain(email);
    // Accepted invitations leave the list of those waiting.
    expect((await owner.agent.get('/api/team/invitations')).body).toEqual({ items: [] });
  });

  it('sends the invitation e-mail once even when its job runs twice', async () => {
    const owner = await signUpFirm(t.app);
    const email = uniqueEmail('twice');
    await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email, role: 'crew' });
    await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email));
    const { rows } = await t.queue.boss.getDb().executeSql(`select id from mail_outbox where to_address = $1`, [email]);
    await t.queue.boss.send('mail-send', { outboxId: rows[0].id });
    const marker = uniqueEmail('marker');
    await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email: marker, role: 'crew' });
    await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(marker));
    expect(t.inbox.messages.filter((m) => JSON.stringify(m.to).includes(email))).toHaveLength(1);
  });

  it('someone who already has an account is told so, and joins with its password and no name', async () => {
    const existing = await signUpFirm(t.app, 'Second Home Plaster');
    const inviter = await signUpFirm(t.app, 'Welcoming Plaster');
    await inviter.agent.post('/api/team/invitations').set('x-csrf-token', inviter.csrf()).send({ email: existing.email, role: 'office' });
    const token = tokenFrom(
      linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(existing.email) && /Welcoming Plaster/.test(m.subject ?? ''))),
    );
    const guest = await newAgent(t.app);
    expect((await guest.agent.get(`/api/auth/invitations/${token}`)).body).toMatchObject({ hasAccount: true });
    const joined = await guest.agent
      .post('/api/auth/invitations/accept')
      .set('x-csrf-token', guest.csrf())
      .send({ token, password: existing.password });
    expect(joined.status).toBe(200);
    expect(joined.body.user).toMatchObject({ role: 'office', firmId: inviter.firmId });
  });

  it('throttles password guessing through an invitation to an existing account (429, no lock)', async () => {
    const existing = await signUpFirm(t.app, 'Existing Account Plaster');
    const inviter = await signUpFirm(t.app, 'Inviting Plaster');
    await inviter.agent.post('/api/team/invitations').set('x-csrf-token', inviter.csrf()).send({ email: existing.email, role: 'crew' });
    const token = tokenFrom(
      linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(existing.email) && /Inviting Plaster/.test(m.subject ?? ''))),
    );
    const guest = await newAgent(t.app);
    const statuses: number[] = [];
    for (let i = 0; i < 6; i++) {
      statuses.push(
        (
          await guest.agent
            .post('/api/auth/invitations/accept')
            .set('x-csrf-token', guest.csrf())
            .send({ token, name: 'X', password: `wrong-guess-${i}-xyz` })
        ).status,
      );
    }
    expect(statuses).toEqual([409, 409, 409, 409, 409, 429]);
    const right = await guest.agent
      .post('/api/auth/invitations/accept')
      .set('x-csrf-token', guest.csrf())
      .send({ token, name: 'X', password: existing.password });
    expect(right.status).toBe(429);
  });

  it('refuses a second invitation to a pending or existing e-mail, naming the field', async () => {
    const owner = await signUpFirm(t.app);
    const email = uniqueEmail('dup');
    await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email, role: 'crew' });
    const again = await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email, role: 'crew' });
    expect(again.status).toBe(409);
    expect(again.body.errors[0].field).toBe('email');
    const self = await owner.agent
      .post('/api/team/invitations')
      .set('x-csrf-token', owner.csrf())
      .send({ email: owner.email, role: 'crew' });
    expect(self.status).toBe(409);
  });

  it('refuses an expired or revoked invitation with a clear message', async () => {
    const owner = await signUpFirm(t.app);
    const email = uniqueEmail('late');
    const sent = await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email, role: 'crew' });
    const token = tokenFrom(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email))));
    t.setNow(new Date(Date.now() + 8 * 24 * 3600 * 1000));
    try {
      const late = await (await newAgent(t.app)).agent.get(`/api/auth/invitations/${token}`);
      expect(late.status).toBe(410);
      expect(late.body.detail).toMatch(/expired/);
    } finally {
      t.setNow(null);
    }
    t.setNow(new Date(Date.now() + 8 * 24 * 3600 * 1000));
    try {
      // A week on, the owner's own session has ended too: they sign in again to look.
      const later = await newAgent(t.app);
      await later.agent.post('/api/auth/signin').set('x-csrf-token', later.csrf()).send({ email: owner.email, password: owner.password });
      const listed = await later.agent.get('/api/team/invitations');
      expect(listed.body.items).toEqual([expect.objectContaining({ id: sent.body.id, email, status: 'expired' })]);
    } finally {
      t.setNow(null);
    }
    expect((await owner.agent.get('/api/team/invitations')).body.items[0]).toMatchObject({ id: sent.body.id, status: 'pending' });
    expect((await owner.agent.delete(`/api/team/invitations/${sent.body.id}`).set('x-csrf-token', owner.csrf())).status).toBe(204);
    expect((await owner.agent.get('/api/team/invitations')).body).toEqual({ items: [] });
    const revoked = await (await newAgent(t.app)).agent.get(`/api/auth/invitations/${token}`);
    expect(revoked.status).toBe(410);
    expect(revoked.body.detail).toMatch(/withdrawn/);
  });
});

describe('roles', () => {
  async function memberWithRole(role: 'office' | 'crew') {
    const owner = await signUpFirm(t.app);
    const email = uniqueEmail(role);
    await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email, role });
    const token = tokenFrom(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email))));
    const member = await newAgent(t.app);
    const res = await member.agent
      .post('/api/auth/invitations/accept')
      .set('x-csrf-token', member.csrf())
      .send({ token, name: 'Member', password: 'gilder-pass-2026' });
    await member.refresh();
    return { owner, member, membershipId: '', userId: res.body.user.id as string };
  }

  it('crew and office cannot invite, change roles or edit firm settings; they can read', async () => {
    for (const role of ['office', 'crew'] as const) {
      const { member } = await memberWithRole(role);
      expect((await member.agent.get('/api/team/members')).status).toBe(200);
      expect((await member.agent.get('/api/team/invitations')).status).toBe(200);
      expect((await member.agent.get('/api/firm')).status).toBe(200);
      expect(
        (await member.agent.post('/api/team/invitations').set('x-csrf-token', member.csrf()).send({ email: uniqueEmail(), role: 'crew' }))
          .status,
      ).toBe(403);
      const patch = await member.agent.patch('/api/firm').set('x-csrf-token', member.csrf()).send({});
      expect(patch.status).toBe(403);
    }
  });

  it('an anonymous caller gets 401 problem+json', async () => {
    const anon = await newAgent(t.app);
    for (const path of ['/api/team/members', '/api/team/invitations']) {
      const res = await anon.agent.get(path);
      expect(res.status).toBe(401);
      expect(res.headers['content-type']).toMatch(/problem\+json/);
    }
  });

  it('owner changes a role and deactivates a member, who then loses access at once', async () => {
    const { owner, member, userId } = await memberWithRole('crew');
    const team = await owner.agent.get('/api/team/members');
    const row = team.body.items.find((m: { userId: string }) => m.userId === userId);
    const changed = await owner.agent.patch(`/api/team/members/${row.id}`).set('x-csrf-token', owner.csrf()).send({ role: 'office' });
    expect(changed.body.role).toBe('office');
    expect((await member.agent.get('/api/auth/session')).body.user.role).toBe('office');
    const off = await owner.agent.post(`/api/team/members/${row.id}/deactivate`).set('x-csrf-token', owner.csrf()).send({});
    expect(off.body.status).toBe('deactivated');
    expect((await member.agent.get('/api/team/members')).status).toBe(401);
  });

  it('never leaves a firm without an active owner', async () => {
    const owner = await signUpFirm(t.app);
    const team = await owner.agent.get('/api/team/members');
    expect(team.body.items).toEqual([expect.objectContaining({ role: 'owner', status: 'active', isYou: true })]);
    const me = team.body.items[0];
    const demote = await owner.agent.patch(`/api/team/members/${me.id}`).set('x-csrf-token', owner.csrf()).send({ role: 'crew' });
    expect(demote.status).toBe(409);
    expect(demote.body.errors[0].field).toBe('role');
    expect((await owner.agent.post(`/api/team/members/${me.id}/deactivate`).set('x-csrf-token', owner.csrf()).send({})).status).toBe(409);
  });

  it('answers 400 naming the field for a bad role or id', async () => {
    const owner = await signUpFirm(t.app);
    const bad = await owner.agent
      .post('/api/team/invitations')
      .set('x-csrf-token', owner.csrf())
      .send({ email: uniqueEmail(), role: 'boss' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors[0].field).toBe('role');
    const badId = await owner.agent.patch('/api/team/members/not-a-uuid').set('x-csrf-token', owner.csrf()).send({ role: 'crew' });
    expect(badId.status).toBe(400);
    expect(badId.body.errors[0].field).toBe('id');
  });
});

describe('firm settings', () => {
  const settings = {
    name: 'Cobble Hill Plaster',
    addressLine1: '12 Kiln Row',
    addressLine2: '',
    city: 'Ashbury',
    region: 'VT',
    postalCode: '05001',
    country: 'US',
    phone: '555-0100',
    timeZone: 'America/New_York',
    currency: 'USD',
    units: 'metric',
    language: 'es',
  };

  it('owner reads and saves settings, and the change is audited', async () => {
    const owner = await signUpFirm(t.app);
    const saved = await owner.agent.patch('/api/firm').set('x-csrf-token', owner.csrf()).send(settings);
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ ...settings });
    const audit = await withTenant(t.ctx.pool, owner.firmId, (tx) =>
      tx.client.query(`select action, data from audit_log where action = 'firm.settings_changed'`),
    );
    expect(audit.rows).toHaveLength(1);
    expect(audit.rows[0].data.changed).toEqual(expect.arrayContaining(['name', 'units', 'language']));
  });

  it('refuses a bad time zone, currency and units, naming each field', async () => {
    const owner = await signUpFirm(t.app);
    const res = await owner.agent
      .patch('/api/firm')
      .set('x-csrf-token', owner.csrf())
      .send({ ...settings, timeZone: 'Mars/Olympus', currency: 'usd', units: 'cubits' });
    expect(res.status).toBe(400);
    expect(res.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['currency', 'timeZone', 'units']);
    const unknownCurrency = await owner.agent
      .patch('/api/firm')
      .set('x-csrf-token', owner.csrf())
      .send({ ...settings, currency: 'ZZZ' });
    expect(unknownCurrency.status).toBe(400);
    expect(unknownCurrency.body.errors[0].field).toBe('currency');
  });
});
