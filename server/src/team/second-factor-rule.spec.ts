import type { ItemList, TeamMember } from '@layerbook/contracts';
import { enrol, invite, passwordStep, stepClock, type Owner } from '../auth/second-factor/second-factor-fixtures';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';

/*
 * The firm's second-factor rule is checked at sign-in; raising someone into office or owner must not
 * hand office access to a session that never met it.
 */
let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterEach(() => t.setNow(null));
afterAll(() => t.stop());

async function firm(required: boolean) {
  const clock = stepClock(t);
  const owner = await signUpFirm(t.app);
  await enrol(owner, clock.now());
  if (required) {
    const on = await owner.agent.put('/api/auth/second-factor/firm').set('x-csrf-token', owner.csrf()).send({ required: true });
    expect(on.status).toBe(200);
  }
  return owner;
}

async function setRole(owner: Owner, email: string, role: TeamMember['role']) {
  const members = (await owner.agent.get('/api/team/members')).body as ItemList<TeamMember>;
  const member = members.items.find((m) => m.email === email)!;
  const changed = await owner.agent.patch(`/api/team/members/${member.id}`).set('x-csrf-token', owner.csrf()).send({ role });
  expect(changed.status).toBe(200);
}

describe('raising a member into office or owner', () => {
  it('where the firm requires a second factor they have not set up, ends their sessions; the next sign-in asks for the set-up', async () => {
    const owner = await firm(true);
    const crew = await invite(t, owner, 'crew');
    const crewIn = await passwordStep(t, crew.email, crew.password);
    expect(crewIn.res.body).toMatchObject({ user: { role: 'crew' }, secondFactor: null });
    expect((await crewIn.agent.get('/api/team/members')).status).toBe(200);

    await setRole(owner, crew.email, 'office');
    expect((await crewIn.agent.get('/api/clients')).status).toBe(401);
    expect((await crewIn.agent.get('/api/team/members')).status).toBe(401);
    expect((await passwordStep(t, crew.email, crew.password)).res.body).toMatchObject({ user: null, secondFactor: { step: 'enrol' } });
    // The owner who made the change goes on.
    expect((await owner.agent.get('/api/team/members')).status).toBe(200);
  });

  it('keeps their sessions where the firm does not require one, or when they have one', async () => {
    const relaxed = await firm(false);
    const crew = await invite(t, relaxed, 'crew');
    const crewIn = await passwordStep(t, crew.email, crew.password);
    await setRole(relaxed, crew.email, 'office');
    expect((await crewIn.agent.get('/api/clients')).status).toBe(200);

    const owner = await firm(true);
    const office = await invite(t, owner, 'office');
    const officeIn = await passwordStep(t, office.email, office.password);
    const clock = stepClock(t);
    clock.advance();
    await enrol({ ...officeIn, password: office.password }, clock.now()); // the set-up the firm asks for, finishing the sign-in
    expect((await officeIn.agent.get('/api/clients')).status).toBe(200);
    await setRole(owner, office.email, 'owner');
    expect((await officeIn.agent.get('/api/clients')).status).toBe(200);
  });
});

describe('the owner clearing a member’s lost second factor', () => {
  it('where the firm requires one, ends that member’s sessions too: the next sign-in sets a new one up', async () => {
    const owner = await firm(true);
    const office = await invite(t, owner, 'office');
    const officeIn = await passwordStep(t, office.email, office.password);
    const clock = stepClock(t);
    clock.advance();
    await enrol({ ...officeIn, password: office.password }, clock.now());
    expect((await officeIn.agent.get('/api/clients')).status).toBe(200);

    const members = (await owner.agent.get('/api/team/members')).body as ItemList<TeamMember>;
    const member = members.items.find((m) => m.email === office.email)!;
    expect(member.hasSecondFactor).toBe(true);
    const cleared = await owner.agent.post(`/api/auth/second-factor/members/${member.id}/reset`).set('x-csrf-token', owner.csrf()).send({});
    expect(cleared.status).toBe(204);
    expect((await officeIn.agent.get('/api/clients')).status).toBe(401);
    expect((await passwordStep(t, office.email, office.password)).res.body).toMatchObject({ user: null, secondFactor: { step: 'enrol' } });
    const after = (await owner.agent.get('/api/team/members')).body as ItemList<TeamMember>;
    expect(after.items.find((m) => m.email === office.email)!.hasSecondFactor).toBe(false);
  });
});
