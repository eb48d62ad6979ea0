import type { CashJobs } from '@layerbook/contracts';
import { makeAndSend, sentProposal, signInByLink } from '../proposals/portal-fixtures';
import { newAgent, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('the win rate counts estimates, not proposal versions', () => {
  it('a first version declined and its revision accepted is one estimate won', async () => {
    const p = await sentProposal(t, 'Win Rate Plaster Co');
    const declined = await p.client.agent
      .post(`/api/portal/proposals/${p.version.id}/decline`)
      .set('x-csrf-token', p.client.csrf())
      .send({ comment: 'Too dear this year.' });
    expect(declined.status).toBe(200);

    const revised = await makeAndSend(t, p, '2026-12-31');
    const client = await newAgent(t.app, 'portal');
    await signInByLink(client, revised.link);
    const accepted = await client.agent
      .post(`/api/portal/proposals/${revised.id}/accept`)
      .set('x-csrf-token', client.csrf())
      .send({ variantId: 'B', signedName: 'Edwina Marl', consent: true });
    expect(accepted.status).toBe(200);

    const jobs = await p.agent.get('/api/cash/jobs');
    expect(jobs.status).toBe(200);
    expect((jobs.body as CashJobs).winRate).toEqual({ accepted: 1, decided: 1, percent: '100.0' });
  });
});
