import { withTenant } from '@layerbook/db';
import type { ItemList, TeamInvitation, TeamMember } from '@layerbook/contracts';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, type TestServer, uniqueEmail } from '../testing/harness';

/*
 * Owners changing owners: never no active owner, even when two remove each other at once; someone
 * removed (or no longer an owner) loses the invitations they sent; a member's language answers as saved.
 */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

async function acceptInvite(email: string, firmWord: string, password: string) {
  const token = new URL(
    linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email) && (m.subject ?? '').includes(firmWord))),
  ).searchParams.get('token')!;
  const who = await newAgent(t.app);
  const res = await who.agent
    .post('/api/auth/invitations/accept')
    .set('x-csrf-token', who.csrf())
    .send({ token, name: 'Someone', password });
  return { who, res };
}

async function firmWithTwoOwners(name: string) {
  const first = await signUpFirm(t.app, name);
  const email = uniqueEmail('second-owner');
  await first.agent.post('/api/team/invitations').set('x-csrf-token', first.csrf()).send({ email, role: 'owner' });
  const second = (await acceptInvite(email, name, 'kiln-and-trowel-51')).who;
  await second.refresh();
  const members = ((await first.agent.get('/api/team/members')).body as ItemList<TeamMember>).items;
  return { first, second, a: members.find((m) => m.email === first.email)!, b: members.find((m) => m.email === email)! };
}

const activeOwners = (firmId: string) =>
  withTenant(t.ctx.pool, firmId, async (tx) =>
    Number(
      (
        await tx.client.query(`select count(*) from memberships where tenant_id = $1 and role = 'owner' and status = 'active'`, [
          tx.tenantId,
        ])
      ).rows[0].count,
    ),
  );

describe('owners', () => {
  it('removing each other at the same moment leave one active owner: one answers 200, the other 409 (eight tries)', async () => {
    for (let i = 0; i < 8; i++) {
      const { first, second, a, b } = await firmWithTwoOwners(`Two Owner Plaster ${i}`);
      const answers = await Promise.all([
        first.agent.post(`/api/team/members/${b.id}/deactivate`).set('x-csrf-token', first.csrf()).send({}),
        second.agent.post(`/api/team/members/${a.id}/deactivate`).set('x-csrf-token', second.csrf()).send({}),
      ]);
      expect(await activeOwners(first.firmId)).toBe(1);
      // the loser is either refused by the rule (409) or, having been removed first, no longer signed in (401)
      expect(answers.map((r) => r.status).sort()).toEqual(expect.arrayContaining([200]));
      expect(answers.filter((r) => r.status === 200)).toHaveLength(1);
    }
  });

  it('removed, lose the invitations they sent: a removed owner cannot come back through one', async () => {
    const founder = await signUpFirm(t.app, 'Founder Marmorino');
    const partnerEmail = uniqueEmail('partner');
    await founder.agent.post('/api/team/invitations').set('x-csrf-token', founder.csrf()).send({ email: partnerEmail, role: 'owner' });
    const partner = await acceptInvite(partnerEmail, 'Founder Marmorino', 'lime-putty-2026-x');
    expect(partner.res.body.user.role).toBe('owner');
    await partner.who.refresh();
    // Before being removed, the partner invites a second address of their own as owner.
    const backdoor = uniqueEmail('backdoor');
    const sent = await partner.who.agent
      .post('/api/team/invitations')
      .set('x-csrf-token', partner.who.csrf())
      .send({ email: backdoor, role: 'owner' });
    expect(sent.status).toBe(201);
    const members = ((await founder.agent.get('/api/team/members')).body as ItemList<TeamMember>).items;
    const row = members.find((m) => m.email === partnerEmail)!;
    const off = await founder.agent.post(`/api/team/members/${row.id}/deactivate`).set('x-csrf-token', founder.csrf()).send({});
    expect(off.body.status).toBe('deactivated');
    const pending = ((await founder.agent.get('/api/team/invitations')).body as ItemList<TeamInvitation>).items;
    expect(pending.map((i) => i.email)).not.toContain(backdoor);
    const back = await acceptInvite(backdoor, 'Founder Marmorino', 'stucco-veneziano-88');
    expect(back.res.status).toBeGreaterThanOrEqual(400);
    expect(back.res.status).toBeLessThan(500);
    expect(await activeOwners(founder.firmId)).toBe(1);
  });

  it('deactivated, are signed out of this firm: reactivated, they sign in again rather than find the old session working', async () => {
    const { first, second, b } = await firmWithTwoOwners('Signed Out Plaster');
    expect((await second.agent.get('/api/team/members')).status).toBe(200);
    expect((await first.agent.post(`/api/team/members/${b.id}/deactivate`).set('x-csrf-token', first.csrf()).send({})).status).toBe(200);
    expect((await first.agent.post(`/api/team/members/${b.id}/reactivate`).set('x-csrf-token', first.csrf()).send({})).status).toBe(200);
    expect((await second.agent.get('/api/team/members')).status).toBe(401);
    // the one who deactivated stays signed in
    expect((await first.agent.get('/api/team/members')).status).toBe(200);
  });

  it("set a member's language and get the member back as saved", async () => {
    const owner = await signUpFirm(t.app, 'Language Answer Plaster');
    const me = ((await owner.agent.get('/api/team/members')).body as ItemList<TeamMember>).items[0];
    expect(me.language).toBeNull();
    const res = await owner.agent.patch(`/api/team/members/${me.id}/language`).set('x-csrf-token', owner.csrf()).send({ language: 'es' });
    expect([res.status, (res.body as TeamMember).language]).toEqual([200, 'es']);
  });
});
