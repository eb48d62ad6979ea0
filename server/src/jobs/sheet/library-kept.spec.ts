import type { FinishSystemView, JobSheet } from '@layerbook/contracts';
import { acceptedJob } from '../../billing/progress-fixtures';
import { joinAs } from '../../proposals/proposal-fixtures';
import { startTestServer, type TestServer } from '../../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

/* The crew's sheet shows the finish systems and products as the signed version kept them, not the library as edited since. */
describe('a finish system edited after a job was accepted', () => {
  it('leaves the accepted job’s crew sheet as it was sold', async () => {
    const job = await acceptedJob(t, 'Sheet Drift Plaster');
    const crew = await joinAs(t, job, 'crew');
    const before = (await crew.agent.get(`/api/jobs/${job.job.id}/sheet`)).body as JobSheet;
    const soldLayers = before.finishes.find((f) => f.id === job.systemId)!.layers;
    expect(soldLayers.map((l) => [l.id, l.coats])).toEqual([
      ['prime', 1],
      ['lime', 2],
    ]);

    // The office reworks the library system for future work: three coats of lime, another wait.
    const system = (await job.agent.get(`/api/library/systems/${job.systemId}`)).body as FinishSystemView;
    const layers = system.layers.map((l) => (l.id === 'lime' ? { ...l, coats: 3, waitHoursAfter: 48 } : l));
    const saved = await job.agent.patch(`/api/library/systems/${job.systemId}`).set('x-csrf-token', job.csrf()).send({ layers });
    expect(saved.status).toBe(200);

    const after = (await crew.agent.get(`/api/jobs/${job.job.id}/sheet`)).body as JobSheet;
    const lime = after.finishes.find((f) => f.id === job.systemId)!.layers.find((l) => l.id === 'lime')!;
    // The job was sold (and its quantities computed) with 2 coats and a 24 h wait: the crew read those still.
    expect({ coats: lime.coats, waitHoursAfter: lime.waitHoursAfter }).toEqual({ coats: 2, waitHoursAfter: 24 });
  });
});
