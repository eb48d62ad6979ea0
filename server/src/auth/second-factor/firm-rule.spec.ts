import type { ItemList, SecondFactorEnrolment, TeamMember } from '@layerbook/contracts';
import { signUpFirm, startTestServer, TestServer } from '../../testing/harness';
import { auditOf, enrol, invite, passwordStep, stepClock, type Signed } from './second-factor-fixtures';
import { codeAt } from './totp';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterEach(() => t.setNow(null));
afterAll(() => t.stop());

describe("the firm's rule", () => {
  it('is set by an owner with a second factor; office without one must set one up after the password; crew is not asked', async () => {
    const clock = stepClock(t);
    const owner = await signUpFirm(t.app);
    const office = await invite(t, owner, 'office');
    const crew = await invite(t, owner, 'crew');
    const setRule = (required: boolean) =>
      owner.agent.put('/api/auth/second-factor/firm').set('x-csrf-token', owner.csrf()).send({ required });
    const early = await setRule(true);
    expect(early.status).toBe(409);
    expect(early.body.errors[0].field).toBe('required');
    await enrol(owner, clock.now());
    const on = await setRule(true);
    expect(on.status).toBe(200);
    expect(on.body.firmRequires).toBe(true);
    expect((await auditOf(t, owner.firmId, 'firm.secondFactorRequired')).map((r) => r.data)).toEqual([{ required: true }]);

    const crewIn = await passwordStep(t, crew.email, crew.password);
    expect(crewIn.res.body).toMatchObject({ user: { role: 'crew' }, secondFactor: null });

    const officeIn = await passwordStep(t, office.email, office.password);
    expect(officeIn.res.body).toMatchObject({ user: null, secondFactor: { step: 'enrol' } });
    expect((await officeIn.agent.get('/api/clients')).status).toBe(401);
    expect(
      (await officeIn.agent.post('/api/auth/second-factor').set('x-csrf-token', officeIn.csrf()).send({ code: '123456' })).status,
    ).toBe(401);
    const started = await officeIn.agent.post('/api/auth/second-factor/enrolment').set('x-csrf-token', officeIn.csrf()).send({});
    expect(started.status).toBe(201);
    const secret = (started.body as SecondFactorEnrolment).secretGroups.join('');
    clock.advance();
    const confirmed = await officeIn.agent
      .post('/api/auth/second-factor/enrolment/confirm')
      .set('x-csrf-token', officeIn.csrf())
      .send({ code: codeAt(secret, clock.now()) });
    expect(confirmed.status).toBe(200);
    expect(confirmed.body).toMatchObject({ user: { role: 'office', email: office.email } });
    expect(confirmed.body.codes).toHaveLength(10);
    expect((await officeIn.agent.get('/api/clients')).status).toBe(200);
    expect(
      (await officeIn.agent.put('/api/auth/second-factor/firm').set('x-csrf-token', confirmed.body.csrfToken).send({ required: false }))
        .status,
    ).toBe(403);

    // Not turned off while the firm requires it; with the rule off, the password turns it off.
    const member = { agent: officeIn.agent, csrf: () => String(confirmed.body.csrfToken) };
    const turnOff = (body: object) => member.agent.post('/api/auth/second-factor/turn-off').set('x-csrf-token', member.csrf()).send(body);
    expect((await turnOff({ password: office.password })).status).toBe(409);
    expect((await setRule(false)).body.firmRequires).toBe(false);
    const wrong = await turnOff({ password: 'not-my-password' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors[0].field).toBe('password');
    const off = await turnOff({ password: office.password });
    expect(off.status).toBe(200);
    expect(off.body.enrolled).toBe(false);
    expect(await auditOf(t, owner.firmId, 'staff.secondFactorRemoved')).toHaveLength(1);
    expect((await passwordStep(t, office.email, office.password)).res.body.user.role).toBe('office');
  });

  it("lets the owner clear a member's lost second factor, in their own firm only", async () => {
    const clock = stepClock(t);
    const owner = await signUpFirm(t.app);
    const other = await signUpFirm(t.app, 'Other Limewash Co');
    const office = await invite(t, owner, 'office');
    const officeIn = await passwordStep(t, office.email, office.password);
    await enrol({ ...officeIn, password: office.password }, clock.now());
    clock.advance();
    expect((await passwordStep(t, office.email, office.password)).res.body.secondFactor).toMatchObject({ step: 'code' });

    const members = (await owner.agent.get('/api/team/members')).body as ItemList<TeamMember>;
    const member = members.items.find((m) => m.email === office.email)!;
    const me = members.items.find((m) => m.isYou)!;
    const reset = (who: { agent: Signed['agent']; csrf: () => string }, id: string) =>
      who.agent.post(`/api/auth/second-factor/members/${id}/reset`).set('x-csrf-token', who.csrf()).send({});
    expect((await reset(officeIn, member.id)).status).toBe(403);
    expect((await reset(other, member.id)).status).toBe(404);
    expect((await reset(owner, me.id)).status).toBe(409);
    expect((await reset(owner, 'not-an-id')).status).toBe(400);
    expect((await reset(owner, member.id)).status).toBe(204);
    expect(await auditOf(t, owner.firmId, 'staff.secondFactorReset')).toEqual([expect.objectContaining({ actor_user_id: owner.userId })]);
    expect((await passwordStep(t, office.email, office.password)).res.body).toMatchObject({ user: { role: 'office' }, secondFactor: null });
  });

  it('switched on, ends the sessions of owner and office without a factor; the owner switching it goes on', async () => {
    const clock = stepClock(t);
    const owner = await signUpFirm(t.app);
    await enrol(owner, clock.now());
    const [bare, guarded, crew] = [await invite(t, owner, 'office'), await invite(t, owner, 'office'), await invite(t, owner, 'crew')];
    const bareIn = await passwordStep(t, bare.email, bare.password);
    const guardedIn = await passwordStep(t, guarded.email, guarded.password);
    await enrol({ ...guardedIn, password: guarded.password }, clock.now());
    const crewIn = await passwordStep(t, crew.email, crew.password);
    for (const who of [bareIn, guardedIn, crewIn]) expect((await who.agent.get('/api/team/members')).status).toBe(200);

    const on = await owner.agent.put('/api/auth/second-factor/firm').set('x-csrf-token', owner.csrf()).send({ required: true });
    expect(on.status).toBe(200);
    const statuses = async () =>
      Promise.all([owner, bareIn, guardedIn, crewIn].map(async (who) => (await who.agent.get('/api/team/members')).status));
    expect(await statuses()).toEqual([200, 401, 200, 200]);
    expect((await passwordStep(t, bare.email, bare.password)).res.body.secondFactor).toMatchObject({ step: 'enrol' });
    // Saying "on" again changes nothing and ends nothing more.
    expect((await owner.agent.put('/api/auth/second-factor/firm').set('x-csrf-token', owner.csrf()).send({ required: true })).status).toBe(
      200,
    );
    expect(await statuses()).toEqual([200, 401, 200, 200]);
  });

  it('keeps the setting and status to owner and office', async () => {
    const owner = await signUpFirm(t.app);
    const crew = await invite(t, owner, 'crew');
    const crewIn = await passwordStep(t, crew.email, crew.password);
    expect((await crewIn.agent.get('/api/auth/second-factor')).status).toBe(403);
    expect((await crewIn.agent.post('/api/auth/second-factor/enrolment').set('x-csrf-token', crewIn.csrf()).send({})).status).toBe(403);
    const bad = await owner.agent.put('/api/auth/second-factor/firm').set('x-csrf-token', owner.csrf()).send({ required: 'yes' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors[0].field).toBe('required');
  });
});
