import type { JobProgressView, JobSheet } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { billingJob } from '../../billing/billing-fixtures';
import { approvedChangeOrder } from '../../billing/change-orders/change-order-fixtures';
import { billingQueueSettled } from '../../billing/progress-fixtures';
import { startBilling } from '../../billing/schedule';
import { joinAs } from '../../proposals/proposal-fixtures';
import { startTestServer, type TestServer } from '../../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Job = Awaited<ReturnType<typeof billingJob>>;
type Member = Pick<Job, 'agent' | 'csrf'>;
const mark = (f: Job, who: Member, kind: 'layerDone' | 'layerReopened', workItemId: string) =>
  who.agent.post(`/api/jobs/${f.jobId}/progress`).set('x-csrf-token', who.csrf()).send({ kind, workItemId, on: '2026-12-01' });
const sheetOf = async (f: Job, who: Member) => (await who.agent.get(`/api/jobs/${f.jobId}/sheet`)).body as JobSheet;
const surfaces = (sheet: JobSheet) => sheet.rooms.flatMap((r) => r.surfaces);
const redoOf = (f: Job) =>
  approvedChangeOrder(f, {
    title: 'Redo dining walls in the new colour',
    description: '',
    pricing: { kind: 'engine', surfaceIds: [f.surfaceId], finishSystemId: f.systemId },
  });
const started = async (f: Job) => {
  await withTenant(t.ctx.pool, f.firmId, (tx) =>
    startBilling(tx, t.ctx.queue, { kind: 'staff', userId: f.userId, role: 'owner' }, f.jobId, t.ctx.now()),
  );
  await billingQueueSettled(t, [f.firmId]);
};
const stageLine = async (f: Job) => {
  const line = (await f.billing()).lines.find((l) => l.trigger.kind === 'layerComplete')!;
  return { layerId: line.trigger.kind === 'layerComplete' ? line.trigger.layerId : '', line };
};

// A change order may redo a surface already sold with the same finish (another colour after the sample):
// its layers are work of their own, marked apart from the sold ones.
describe('a change order redoing a sold surface', () => {
  it('gives the redo its own layers on the sheet and in the work list, marked apart from the sold ones', async () => {
    const f = await billingJob(t, 'Redo Walls Studio');
    const crew = await joinAs(t, f, 'crew');
    const sold = surfaces(await sheetOf(f, crew)).find((s) => s.id === f.surfaceId)!;
    for (const layer of sold.layers) expect((await mark(f, crew, 'layerDone', layer.workItemId!)).status).toBe(201);
    const co = await redoOf(f);

    const sheet = await sheetOf(f, crew);
    const redo = surfaces(sheet).find((s) => s.changeOrder === co.number)!;
    expect(redo.id).toBe(f.surfaceId);
    expect(redo.layers.map((l) => l.doneOn)).toEqual(sold.layers.map(() => null));
    const soldIds = sold.layers.map((l) => l.workItemId);
    expect(redo.layers.every((l) => l.workItemId !== null && !soldIds.includes(l.workItemId))).toBe(true);
    const work = ((await f.agent.get(`/api/jobs/${f.jobId}/progress`)).body as JobProgressView).workItems;
    expect(work.filter((w) => w.surfaceId === f.surfaceId).map((w) => [w.changeOrder, w.doneOn !== null])).toEqual([
      ...sold.layers.map(() => [null, true]),
      ...redo.layers.map(() => [co.number, false]),
    ]);

    expect((await mark(f, crew, 'layerDone', redo.layers[0].workItemId!)).status).toBe(201);
    const after = surfaces(await sheetOf(f, crew));
    expect(after.find((s) => s.changeOrder === co.number)!.layers[0].doneOn).toBe('2026-12-01');
    expect(after.find((s) => s.id === f.surfaceId && s.changeOrder === null)!.layers.every((l) => l.doneOn === '2026-12-01')).toBe(true);
  }, 120_000);

  it('holds back a stage payment not yet billed until the redo’s layer is done too (its amount grew with the change)', async () => {
    const f = await billingJob(t, 'Redo Waits Studio');
    await started(f);
    const { layerId, line } = await stageLine(f);
    const co = await redoOf(f);
    const work = ((await f.agent.get(`/api/jobs/${f.jobId}/progress`)).body as JobProgressView).workItems.filter(
      (w) => w.layerId === layerId,
    );
    for (const w of work.filter((x) => x.changeOrder === null)) expect((await mark(f, f, 'layerDone', w.id)).status).toBe(201);
    await billingQueueSettled(t, [f.firmId]);
    expect((await f.billing()).lines.find((l) => l.id === line.id)?.invoiceId ?? null).toBeNull();
    const redo = work.find((x) => x.changeOrder === co.number)!;
    expect((await mark(f, f, 'layerDone', redo.id)).status).toBe(201);
    await billingQueueSettled(t, [f.firmId]);
    expect((await f.billing()).lines.find((l) => l.id === line.id)?.invoiceId).toEqual(expect.any(String));
  }, 120_000);

  it('leaves a stage payment billed before the change alone: the redo neither holds it nor stops its layer reopening', async () => {
    const f = await billingJob(t, 'Redo Billed Studio');
    await started(f);
    const { layerId, line } = await stageLine(f);
    const sold = ((await f.agent.get(`/api/jobs/${f.jobId}/progress`)).body as JobProgressView).workItems.filter(
      (w) => w.layerId === layerId,
    );
    for (const w of sold) expect((await mark(f, f, 'layerDone', w.id)).status).toBe(201);
    await billingQueueSettled(t, [f.firmId]);
    const invoiceId = (await f.billing()).lines.find((l) => l.id === line.id)!.invoiceId!;
    await f.issue(invoiceId);
    const co = await redoOf(f);
    await billingQueueSettled(t, [f.firmId]);

    const redo = ((await f.agent.get(`/api/jobs/${f.jobId}/progress`)).body as JobProgressView).workItems.find(
      (w) => w.layerId === layerId && w.changeOrder === co.number,
    )!;
    expect((await mark(f, f, 'layerDone', redo.id)).status).toBe(201);
    expect((await mark(f, f, 'layerReopened', redo.id)).status).toBe(201);
    expect((await mark(f, f, 'layerReopened', sold[0].id)).status).toBe(409);
    expect((await f.agent.get(`/api/invoices/${invoiceId}`)).body.status).toBe('issued');
  }, 120_000);
});
