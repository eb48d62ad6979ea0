import type { JobProgressView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { joinAs } from '../proposals/proposal-fixtures';
import { startTestServer, type TestServer } from '../testing/harness';
import { acceptedJob, billingQueueSettled } from './progress-fixtures';
import { startBilling } from './schedule';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Job = Awaited<ReturnType<typeof acceptedJob>>;
type Member = Pick<Job, 'agent' | 'csrf'>;
const mark = (job: Job, who: Member, body: object) =>
  who.agent.post(`/api/jobs/${job.job.id}/progress`).set('x-csrf-token', who.csrf()).send(body);
const progress = async (job: Job) => (await job.agent.get(`/api/jobs/${job.job.id}/progress`)).body as JobProgressView;
const rows = <R extends object>(job: Job, sql: string) =>
  withTenant(t.ctx.pool, job.firmId, async (tx) => (await tx.client.query<R>(sql, [tx.tenantId, job.job.id])).rows);
const historyCount = async (job: Job) =>
  (await rows<{ n: number }>(job, `select count(*)::int as n from job_progress where tenant_id = $1 and job_id = $2`))[0].n;

describe('progress and the job’s state', () => {
  it('a finished job refuses layer and percent marks (409, nothing written) but takes the office’s walkthrough', async () => {
    const job = await acceptedJob(t, 'Finished Marks Studio');
    const crew = await joinAs(t, job, 'crew');
    const view = await progress(job);
    expect((await mark(job, job, { kind: 'layerDone', workItemId: view.workItems[0].id, on: '2026-12-01' })).status).toBe(201);
    const done = await job.agent.post(`/api/jobs/${job.job.id}/status`).set('x-csrf-token', job.csrf()).send({ status: 'complete' });
    expect(done.status).toBe(200);
    const before = await historyCount(job);
    const refusals = [
      await mark(job, crew, { kind: 'layerDone', workItemId: view.workItems[1].id, on: '2026-12-01' }),
      await mark(job, crew, { kind: 'valuePercent', valueLineId: view.valueLines[0].id, percentComplete: 60, on: '2026-12-01' }),
      await mark(job, job, { kind: 'layerReopened', workItemId: view.workItems[0].id, on: '2026-12-01' }),
    ];
    expect(refusals.map((r) => [r.status, r.body.detail])).toEqual(
      refusals.map(() => [409, 'This job is marked finished: its progress changes only once the office reopens it.']),
    );
    expect(await historyCount(job)).toBe(before);
    const walk = await mark(job, job, { kind: 'walkthrough', on: '2026-12-01' });
    expect([walk.status, (walk.body as JobProgressView).walkthroughOn]).toEqual([201, '2026-12-01']);
  });

  it('tells a crew member who reads Spanish why in Spanish, dates for the firm’s country', async () => {
    const job = await acceptedJob(t, 'Spanish Refusal Studio');
    const crew = await joinAs(t, job, 'crew');
    const crewId = (await crew.agent.get('/api/auth/session')).body.user.id as string;
    await withTenant(t.ctx.pool, job.firmId, (tx) =>
      tx.client.query(`update memberships set language = 'es' where tenant_id = $1 and user_id = $2`, [tx.tenantId, crewId]),
    );
    const view = await progress(job);
    const late = await mark(job, crew, { kind: 'layerDone', workItemId: view.workItems[0].id, on: '2026-12-09' });
    expect([late.status, late.body.errors[0]]).toEqual([
      400,
      { field: 'on', message: 'El día no puede ser posterior al 2 de diciembre de 2026.' },
    ]);
    await job.agent.post(`/api/jobs/${job.job.id}/status`).set('x-csrf-token', job.csrf()).send({ status: 'complete' });
    const finished = await mark(job, crew, { kind: 'layerDone', workItemId: view.workItems[0].id, on: '2026-12-01' });
    expect([finished.status, finished.body.detail]).toEqual([
      409,
      'Este trabajo está marcado como terminado: su avance solo cambia cuando la oficina lo reabre.',
    ]);
  });

  it('the walkthrough is the office’s: crew get 403 and nothing is written', async () => {
    const job = await acceptedJob(t, 'Crew Walkthrough Studio');
    const crew = await joinAs(t, job, 'crew');
    const res = await mark(job, crew, { kind: 'walkthrough', on: '2026-12-01' });
    expect([res.status, res.body.detail]).toEqual([403, 'The office records the final walkthrough.']);
    expect(await historyCount(job)).toBe(0);
    expect((await progress(job)).walkthroughOn).toBeNull();
  });
});

describe('reopening a layer whose stage payment is invoiced', () => {
  it('answers 409 naming the invoice to the office (the crew are told to ask), until the invoice is voided', async () => {
    const job = await acceptedJob(t, 'Reopen Issued Studio');
    const crew = await joinAs(t, job, 'crew');
    await withTenant(t.ctx.pool, job.firmId, (tx) =>
      startBilling(tx, t.ctx.queue, { kind: 'staff', userId: job.userId, role: 'owner' }, job.job.id, t.ctx.now()),
    );
    await billingQueueSettled(t, [job.firmId]);
    const stage = job.option.payments.find((p) => p.trigger.kind === 'layerComplete')!;
    const layerId = stage.trigger.kind === 'layerComplete' ? stage.trigger.layerId : '';
    const items = (await progress(job)).workItems.filter((w) => w.layerId === layerId);
    for (const item of items)
      expect((await mark(job, crew, { kind: 'layerDone', workItemId: item.id, on: '2026-12-01' })).status).toBe(201);
    await billingQueueSettled(t, [job.firmId]);
    const [draft] = await rows<{ id: string }>(job, `select id from invoices where tenant_id = $1 and job_id = $2 and kind = 'milestone'`);
    const issued = await job.agent.post(`/api/invoices/${draft.id}/issue`).set('x-csrf-token', job.csrf()).send({ send: false });
    expect(issued.status).toBe(200);
    const number = issued.body.number as string;
    const before = await historyCount(job);

    const reopen = { kind: 'layerReopened', workItemId: items[0].id, on: '2026-12-01' };
    const byCrew = await mark(job, crew, reopen);
    expect([byCrew.status, byCrew.body.detail]).toEqual([
      409,
      'The payment for this layer is already billed, so it stays done: ask the office if the work needs doing again.',
    ]);
    expect(JSON.stringify(byCrew.body)).not.toContain(number);
    const byOffice = await mark(job, job, reopen);
    const said = `Invoice ${number} bills the payment due when this layer is done, so it stays done. If the work is not done, void ${number} first, then reopen the layer.`;
    expect([byOffice.status, byOffice.body.detail, byOffice.body.errors]).toEqual([409, said, [{ field: 'workItemId', message: said }]]);
    expect(await historyCount(job)).toBe(before);
    expect((await progress(job)).workItems.find((w) => w.id === items[0].id)?.doneOn).toBe('2026-12-01');

    const voided = await job.agent
      .post(`/api/invoices/${draft.id}/void`)
      .set('x-csrf-token', job.csrf())
      .send({ reason: 'Billed before the layer was done' });
    expect(voided.status).toBe(200);
    await billingQueueSettled(t, [job.firmId]);
    const again = await mark(job, job, reopen);
    expect(again.status).toBe(201);
    expect((again.body as JobProgressView).workItems.find((w) => w.id === items[0].id)?.doneOn).toBeNull();
  }, 120_000);
});
