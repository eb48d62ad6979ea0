import { startTestServer, TestServer } from '../testing/harness';
import { sentProposal } from './portal-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type P = Awaited<ReturnType<typeof sentProposal>>;
const draft = async (p: P) => {
  const r = await p.agent.post('/api/proposals').set('x-csrf-token', p.csrf()).send({ estimateId: p.estimateId, expiresOn: '2026-12-31' });
  expect(r.status).toBe(201);
  return r.body.id as string;
};
const accept = (p: P, id: string) =>
  p.client.agent
    .post(`/api/portal/proposals/${id}/accept`)
    .set('x-csrf-token', p.client.csrf())
    .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });

describe('a draft the office replaced by another draft (never sent)', () => {
  it('does not stop the client accepting the version that was sent', async () => {
    const p = await sentProposal(t, 'Draft Twice Plaster');
    await draft(p); // v2 draft
    await draft(p); // v3 draft: v2 becomes "superseded" without ever being sent
    const res = await accept(p, p.version.id);
    expect(res.body.detail).toBeUndefined();
    expect(res.status).toBe(200);
  });

  it('is never listed to, nor readable by, the client', async () => {
    const p = await sentProposal(t, 'Draft Leak Plaster');
    const v2 = await draft(p);
    await draft(p);
    const list = await p.client.agent.get('/api/portal/proposals');
    expect(list.body.items[0].latest.id).toBe(p.version.id);
    const read = await p.client.agent.get(`/api/portal/proposals/${v2}`);
    expect(read.status).toBe(404);
  });

  it('after the client accepts v1 while a draft v2 exists, the portal list still shows the accepted v1', async () => {
    const p = await sentProposal(t, 'Accept With Draft Plaster');
    await draft(p); // v2 draft; acceptance marks it superseded
    expect((await accept(p, p.version.id)).status).toBe(200);
    const list = await p.client.agent.get('/api/portal/proposals');
    expect(list.body.items[0].latest).toMatchObject({ id: p.version.id, status: 'accepted' });
    const read = await p.client.agent.get(`/api/portal/proposals/${p.version.id}`);
    expect(read.body.isLatest).toBe(true);
  });
});
