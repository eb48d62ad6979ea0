import type { EstimateView } from '@layerbook/contracts';
import { sentProposal } from './portal-fixtures';
import { startTestServer, type TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('the client’s project list after the office renames its working estimate', () => {
  it('shows the title of the proposal that was sent, not the office’s current working title', async () => {
    const p = await sentProposal(t, 'Renamed Estimate Plaster');
    const est = (await p.agent.get(`/api/estimates/${p.estimateId}`)).body as EstimateView;
    const saved = await p.agent
      .put(`/api/estimates/${p.estimateId}/inputs`)
      .set('x-csrf-token', p.csrf())
      .send({ ...est.inputs, title: 'Marl dining - cheaper v2 idea (internal)' });
    expect(saved.status).toBe(200);
    const list = await p.client.agent.get('/api/portal/proposals');
    expect(list.body.items[0].latest.id).toBe(p.version.id);
    expect(list.body.items[0].title).toBe(p.version.snapshot.title);
  });
});
