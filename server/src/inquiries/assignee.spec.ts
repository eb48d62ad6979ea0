import { joinAs } from '../library/library-fixtures';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;
type Member = { id: string; userId: string; role: string };

const members = async (o: Owner) => (await o.agent.get('/api/team/members')).body.items as Member[];

describe('who an inquiry is given to', () => {
  it('refuses a crew member, who cannot open inquiries (403), naming assigneeUserId, and files nothing', async () => {
    const o = await signUpFirm(t.app, 'Crew Assign Plaster');
    const crew = await joinAs(t, o, 'crew');
    const crewId = (await crew.agent.get('/api/auth/session')).body.user.id as string;
    expect((await crew.agent.get('/api/inquiries')).status).toBe(403);
    const made = await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Cressida Vale', source: 'phone', nextFollowUp: '2020-01-01', assigneeUserId: crewId });
    expect(made.status).toBe(400);
    expect(made.body.errors.map((e: { field: string }) => e.field)).toEqual(['assigneeUserId']);
    expect((await o.agent.get('/api/inquiries')).body.items).toHaveLength(0);
    // Nor can an inquiry be handed to them later; the owner may be.
    const owner = (await members(o)).find((m) => m.role === 'owner')!;
    const lead = await o.agent.post('/api/inquiries').set('x-csrf-token', o.csrf()).send({ contactName: 'Cressida Vale', source: 'phone' });
    const toCrew = await o.agent.patch(`/api/inquiries/${lead.body.id}`).set('x-csrf-token', o.csrf()).send({ assigneeUserId: crewId });
    expect([toCrew.status, toCrew.body.errors?.[0]?.field]).toEqual([400, 'assigneeUserId']);
    const toOwner = await o.agent
      .patch(`/api/inquiries/${lead.body.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ assigneeUserId: owner.userId });
    expect([toOwner.status, toOwner.body.assigneeUserId]).toEqual([200, owner.userId]);
  });

  it('lets the office change the follow-up date of an inquiry whose assignee has since left (the form sends the assignee unchanged)', async () => {
    const o = await signUpFirm(t.app, 'Left Firm Plaster');
    await joinAs(t, o, 'office');
    const member = (await members(o)).find((m) => m.role === 'office')!;
    const made = await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Perpetua Holm', source: 'phone', assigneeUserId: member.userId, nextFollowUp: '2026-01-05' });
    expect(made.status).toBe(201);
    const off = await o.agent.post(`/api/team/members/${member.id}/deactivate`).set('x-csrf-token', o.csrf()).send({});
    expect(off.status).toBe(200);
    // NextStepForm.toUpdate() always sends estimatedValue, assigneeUserId and nextFollowUp together.
    const saved = await o.agent
      .patch(`/api/inquiries/${made.body.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ estimatedValue: null, assigneeUserId: member.userId, nextFollowUp: '2026-02-01' });
    expect([saved.status, saved.body.errors]).toEqual([200, undefined]);
    expect(saved.body).toMatchObject({ nextFollowUp: '2026-02-01', assigneeUserId: member.userId });
    // Giving it to them afresh is still refused: they have left.
    const other = await o.agent.post('/api/inquiries').set('x-csrf-token', o.csrf()).send({ contactName: 'Ivo Brandt', source: 'phone' });
    const given = await o.agent
      .patch(`/api/inquiries/${other.body.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ assigneeUserId: member.userId });
    expect([given.status, given.body.errors?.[0]?.field]).toEqual([400, 'assigneeUserId']);
  });
});
