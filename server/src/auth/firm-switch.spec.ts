import type { ItemList, StaffSession, TeamMember } from '@layerbook/contracts';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { auditOf, enrol, invite, passwordStep, stepClock, type Owner } from './second-factor/second-factor-fixtures';
import { codeAt } from './second-factor/totp';

/*
 * Someone in two firms signs in to the first they joined and switches to the other (POST /api/auth/firm),
 * on a fresh session id, as signing in to it would ask: a second factor proved in this session counts.
 */
let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterEach(() => t.setNow(null));
afterAll(() => t.stop());

/** The owner of `firm` invites an address that already has an account; its holder joins with their password. */
async function joinExisting(firm: Owner & { name: string }, who: { email: string; password: string }, role: 'office' | 'crew') {
  await firm.agent.post('/api/team/invitations').set('x-csrf-token', firm.csrf()).send({ email: who.email, role });
  const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(who.email) && (m.subject ?? '').includes(firm.name));
  const token = new URL(linkIn(mail)).searchParams.get('token')!;
  const joining = await newAgent(t.app);
  const joined = await joining.agent
    .post('/api/auth/invitations/accept')
    .set('x-csrf-token', joining.csrf())
    .send({ token, password: who.password });
  return joined;
}

async function firm(name: string) {
  return { ...(await signUpFirm(t.app, name)), name };
}

type Agent = Awaited<ReturnType<typeof passwordStep>>;
const switchTo = (who: Agent, firmId: unknown) => who.agent.post('/api/auth/firm').set('x-csrf-token', who.csrf()).send({ firmId });

it('lists the other firm, enters it on a new session id, and reads its records (and no longer the first one)', async () => {
  const first = await firm('Quarry Lane Finishes');
  const second = await firm('Bellwether Glazing');
  const person = await invite(t, first, 'crew');
  expect((await joinExisting(second, person, 'office')).status).toBe(200);

  const signedIn = await passwordStep(t, person.email, person.password);
  const session = signedIn.res.body as StaffSession;
  expect(session.user).toMatchObject({ firmId: first.firmId, role: 'crew' });
  expect(session.user?.otherFirms).toEqual([{ id: second.firmId, name: 'Bellwether Glazing', role: 'office' }]);
  const cookieBefore = String(signedIn.res.headers['set-cookie']);

  const switched = await switchTo(signedIn, second.firmId);
  expect(switched.status).toBe(200);
  const after = switched.body as StaffSession;
  expect(after.user).toMatchObject({ firmId: second.firmId, firmName: 'Bellwether Glazing', role: 'office' });
  expect(after.user?.otherFirms).toEqual([{ id: first.firmId, name: 'Quarry Lane Finishes', role: 'crew' }]);
  expect(String(switched.headers['set-cookie'])).not.toBe(cookieBefore);
  const token = after.csrfToken;

  const members = (await signedIn.agent.get('/api/team/members')).body as ItemList<TeamMember>;
  expect(members.items.map((m) => m.email).sort()).toEqual([person.email, second.email].sort());
  expect((await signedIn.agent.get('/api/auth/session')).body.user.firmId).toBe(second.firmId);
  // Back again: crew in the first firm, no money.
  const back = await signedIn.agent.post('/api/auth/firm').set('x-csrf-token', token).send({ firmId: first.firmId });
  expect(back.body.user).toMatchObject({ firmId: first.firmId, role: 'crew' });
  expect((await signedIn.agent.get('/api/invoices')).status).toBe(403);
  expect((await auditOf(t, second.firmId, 'staff.signedIn')).map((r) => r.data)).toContainEqual({ secondFactor: false, by: 'firmSwitch' });
});

it('refuses a firm the person is not an active member of (404), a malformed id (400 naming firmId), and no session (401)', async () => {
  const first = await firm('Kestrel Plasterworks');
  const second = await firm('Marlow Limewash');
  const stranger = await firm('Fennick Stucco');
  const person = await invite(t, first, 'office');
  expect((await joinExisting(second, person, 'crew')).status).toBe(200);

  const signedIn = await passwordStep(t, person.email, person.password);
  expect((await switchTo(signedIn, stranger.firmId)).status).toBe(404);
  const bad = await switchTo(signedIn, 'not-a-firm');
  expect(bad.status).toBe(400);
  expect(bad.body.errors[0].field).toBe('firmId');
  expect((await switchTo(signedIn, first.firmId)).body.user.firmId).toBe(first.firmId);

  // Turned off in the second firm: it is no longer offered, and switching to it answers 404.
  const members = (await second.agent.get('/api/team/members')).body as ItemList<TeamMember>;
  const row = members.items.find((m) => m.email === person.email)!;
  expect((await second.agent.post(`/api/team/members/${row.id}/deactivate`).set('x-csrf-token', second.csrf()).send({})).status).toBe(200);
  expect((await signedIn.agent.get('/api/auth/session')).body.user.otherFirms).toEqual([]);
  expect((await switchTo(signedIn, second.firmId)).status).toBe(404);

  const anonymous = await newAgent(t.app);
  expect((await anonymous.agent.post('/api/auth/firm').set('x-csrf-token', anonymous.csrf()).send({ firmId: second.firmId })).status).toBe(
    401,
  );
});

it('a second factor proved in the session carries over; one not proved here is asked for before the other firm opens', async () => {
  const clock = stepClock(t);
  const first = await firm('Heron Gate Decor');
  const second = await firm('Wexcombe Finishes');
  const person = await invite(t, first, 'crew');
  expect((await joinExisting(second, person, 'office')).status).toBe(200);

  // Crew in the first firm is asked for nothing; in the second (office) they set up a factor.
  const setUp = await passwordStep(t, person.email, person.password);
  const entered = (await switchTo(setUp, second.firmId)).body as StaffSession;
  expect(entered.user?.firmId).toBe(second.firmId);
  const { secret } = await enrol({ agent: setUp.agent, csrf: () => entered.csrfToken, password: person.password }, clock.now());

  // A new sign-in lands in the first firm without a code; switching to the second asks for it and leaves the first.
  clock.advance();
  const later = await passwordStep(t, person.email, person.password);
  expect(later.res.body).toMatchObject({ user: { firmId: first.firmId }, secondFactor: null });
  const asked = await switchTo(later, second.firmId);
  expect(asked.body).toMatchObject({ user: null, secondFactor: { step: 'code' } });
  expect((await later.agent.get('/api/team/members')).status).toBe(401);
  const halfToken = (asked.body as StaffSession).csrfToken;
  const code = await later.agent
    .post('/api/auth/second-factor')
    .set('x-csrf-token', halfToken)
    .send({ code: codeAt(secret, clock.now()) });
  expect(code.body.user).toMatchObject({ firmId: second.firmId, role: 'office' });

  // Proved now: back to the first and into the second again without another code.
  const token = (code.body as StaffSession).csrfToken;
  const back = await later.agent.post('/api/auth/firm').set('x-csrf-token', token).send({ firmId: first.firmId });
  const again = await later.agent.post('/api/auth/firm').set('x-csrf-token', back.body.csrfToken).send({ firmId: second.firmId });
  expect(again.body.user).toMatchObject({ firmId: second.firmId });
  expect((await auditOf(t, second.firmId, 'staff.signedIn')).map((r) => r.data)).toContainEqual({
    secondFactor: true,
    secondFactorBy: 'app',
    by: 'firmSwitch',
  });
});

it('a firm that requires a second factor asks an office member without one to set it up', async () => {
  const clock = stepClock(t);
  const first = await firm('Tamsin Row Painters');
  const second = await firm('Orchard Kiln Plaster');
  await enrol(second, clock.now());
  expect((await second.agent.put('/api/auth/second-factor/firm').set('x-csrf-token', second.csrf()).send({ required: true })).status).toBe(
    200,
  );
  const person = await invite(t, first, 'crew');
  // Joining with the password already asks for the set-up, as a sign-in to that firm would.
  expect((await joinExisting(second, person, 'office')).body).toMatchObject({ user: null, secondFactor: { step: 'enrol' } });
  const signedIn = await passwordStep(t, person.email, person.password);
  expect((await switchTo(signedIn, second.firmId)).body).toMatchObject({ user: null, secondFactor: { step: 'enrol' } });
});
