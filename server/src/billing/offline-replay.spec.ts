import type { JobProgressView } from '@layerbook/contracts';
import { acceptedJob } from './progress-fixtures';
import { joinAs } from '../proposals/proposal-fixtures';
import { startTestServer, type TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-04T15:00:00Z'));
});
afterAll(() => t.stop());

type Job = Awaited<ReturnType<typeof acceptedJob>>;
let job: Job;
let phoneA: Awaited<ReturnType<typeof joinAs>>;
let phoneB: Awaited<ReturnType<typeof joinAs>>;
let view: JobProgressView;
beforeAll(async () => {
  job = await acceptedJob(t, 'Replay Studio');
  phoneA = await joinAs(t, job, 'crew');
  phoneB = await joinAs(t, job, 'crew');
  view = (await job.agent.get(`/api/jobs/${job.job.id}/progress`)).body as JobProgressView;
});
const mark = (who: { agent: Job['agent']; csrf: () => string }, body: object) =>
  who.agent.post(`/api/jobs/${job.job.id}/progress`).set('x-csrf-token', who.csrf()).send(body);

/*
 * Marks kept on a crew phone without a signal arrive late and out of order: each stays in the history,
 * but where a thing stands follows the latest-dated mark for it (common practice, no source).
 */
describe('marks queued offline and replayed late', () => {
  it('an older percent replayed after a newer one does not roll the line back', async () => {
    const line = view.valueLines[0];
    // Phone B, online, on the 3rd: 60 %.
    expect(
      (await mark(phoneB, { kind: 'valuePercent', valueLineId: line.id, percentComplete: 60, on: '2026-12-03', clientKey: 'B:1' })).status,
    ).toBe(201);
    // Phone A was offline since the 1st, when it read 30 %; it comes back on the 4th and replays.
    const late = await mark(phoneA, {
      kind: 'valuePercent',
      valueLineId: line.id,
      percentComplete: 30,
      on: '2026-12-01',
      clientKey: 'A:1',
    });
    expect(late.status).toBe(201);
    const now = (late.body as JobProgressView).valueLines.find((l) => l.id === line.id)!;
    expect(now.percentComplete).toBe('60');
  });

  it('a done mark replayed after a later reopen does not close the layer again', async () => {
    const item = view.workItems[0];
    expect((await mark(phoneA, { kind: 'layerDone', workItemId: item.id, on: '2026-12-01', clientKey: 'A:done' })).status).toBe(201);
    // The office sees a defect on the 3rd and reopens the layer.
    expect((await mark(job, { kind: 'layerReopened', workItemId: item.id, on: '2026-12-03' })).status).toBe(201);
    // Phone B had also marked it done on the 2nd while offline; it replays now.
    const late = await mark(phoneB, { kind: 'layerDone', workItemId: item.id, on: '2026-12-02', clientKey: 'B:done' });
    expect(late.status).toBe(201);
    expect((late.body as JobProgressView).workItems.find((w) => w.id === item.id)!.doneOn).toBeNull();
  });

  it('a second phone’s later done mark does not rewrite when the layer was first done', async () => {
    const item = view.workItems[1];
    expect((await mark(phoneA, { kind: 'layerDone', workItemId: item.id, on: '2026-12-01', clientKey: 'A:done2' })).status).toBe(201);
    const late = await mark(phoneB, { kind: 'layerDone', workItemId: item.id, on: '2026-12-03', clientKey: 'B:done2' });
    expect(late.status).toBe(201);
    expect((late.body as JobProgressView).workItems.find((w) => w.id === item.id)!.doneOn).toBe('2026-12-01');
  });
});
