import type { ItemList, TeamMember } from '@layerbook/contracts';
import { linkIn } from '../../testing/inbox';
import { newAgent, signUpFirm, startTestServer, type TestServer } from '../../testing/harness';
import { enrol, passwordStep, stepClock } from './second-factor-fixtures';

/*
 * A person's second factor guards every firm they belong to: one firm's owner may clear it only for
 * someone who belongs to no other firm.
 */
let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterEach(() => t.setNow(null));
afterAll(() => t.stop());

it("firm A's owner cannot clear the second factor of a person who is also owner of firm B (409); firm B stays guarded", async () => {
  const clock = stepClock(t);
  const victim = await signUpFirm(t.app, 'Victim Venetian Works'); // owner of firm B, first firm
  await enrol(victim, clock.now());
  clock.advance();
  // With the factor on, the password alone does not sign in to firm B.
  expect((await passwordStep(t, victim.email, victim.password)).res.body).toMatchObject({ user: null, secondFactor: { step: 'code' } });

  // Firm A invites the same person as crew; they join with their existing password.
  const other = await signUpFirm(t.app, 'Other Tadelakt Co');
  await other.agent.post('/api/team/invitations').set('x-csrf-token', other.csrf()).send({ email: victim.email, role: 'crew' });
  const token = new URL(
    linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(victim.email) && /Other Tadelakt/.test(m.subject ?? ''))),
  ).searchParams.get('token')!;
  const joining = await newAgent(t.app);
  const joined = await joining.agent
    .post('/api/auth/invitations/accept')
    .set('x-csrf-token', joining.csrf())
    .send({ token, name: 'V', password: victim.password });
  expect(joined.status).toBe(200);

  // Firm A's owner tries to clear the member's factor: refused, since it guards firm B too.
  const members = (await other.agent.get('/api/team/members')).body as ItemList<TeamMember>;
  const member = members.items.find((m) => m.email === victim.email)!;
  const reset = await other.agent.post(`/api/auth/second-factor/members/${member.id}/reset`).set('x-csrf-token', other.csrf()).send({});
  expect(reset.status).toBe(409);
  expect(reset.body.detail).toContain('another firm');

  // The password alone still does not sign in to firm B.
  clock.advance();
  const after = await passwordStep(t, victim.email, victim.password);
  expect(after.res.body).toMatchObject({ user: null, secondFactor: { step: 'code' } });
});
