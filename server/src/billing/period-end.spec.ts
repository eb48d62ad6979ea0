import { type InvoiceDetail, type JobBillingView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { billingJob } from './billing-fixtures';
import { billingQueueSettled } from './progress-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type F = Awaited<ReturnType<typeof billingJob>>;

async function progressJob(name: string): Promise<{ f: F; lineId: string }> {
  const f = await billingJob(t, name);
  expect((await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, { method: 'progress', lines: [] })).status).toBe(200);
  const started = await f.send('post', `/api/jobs/${f.jobId}/billing/start`);
  expect(started.status).toBe(200);
  return { f, lineId: (started.body as JobBillingView).valueLines[0].id };
}

const markPercent = (f: F, valueLineId: string, percentComplete: number, on: string) =>
  f.send('post', `/api/jobs/${f.jobId}/progress`, { kind: 'valuePercent', valueLineId, percentComplete, on });

async function openProgressDraft(f: F): Promise<InvoiceDetail> {
  await billingQueueSettled(t, [f.firmId]);
  const drafts = (await f.billing()).invoices.filter((i) => i.status === 'draft' && i.kind === 'progress');
  expect(drafts).toHaveLength(1);
  return (await f.agent.get(`/api/invoices/${drafts[0].id}`)).body as InvoiceDetail;
}

describe("an application's period and the queue", () => {
  it('a mark from the work leaves the period the office chose for the open draft', async () => {
    const { f, lineId } = await progressJob('Period Kept Plaster');
    const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-31' });
    expect(draft.status).toBe(201);
    expect((await markPercent(f, lineId, 10, '2026-12-01')).status).toBe(201);
    const after = await openProgressDraft(f);
    expect(after.id).toBe(draft.body.id);
    expect(after.periodEnd).toBe('2026-12-31');
  }, 120_000);

  it('a later mark moves the period of a draft the queue made forward to its day', async () => {
    const { f, lineId } = await progressJob('Period Forward Plaster');
    expect((await markPercent(f, lineId, 10, '2026-12-01')).status).toBe(201);
    expect((await openProgressDraft(f)).periodEnd).toBe('2026-12-01');
    t.setNow(new Date('2026-12-04T15:00:00Z'));
    try {
      expect((await markPercent(f, lineId, 20, '2026-12-04')).status).toBe(201);
      expect((await openProgressDraft(f)).periodEnd).toBe('2026-12-04');
    } finally {
      t.setNow(new Date('2026-12-01T15:00:00Z'));
    }
  }, 120_000);

  it('never drafts or issues an application whose period ends before the last issued one', async () => {
    const { f, lineId } = await progressJob('Period Queue Plaster');
    // Application #1: drafted by the queue from a mark, its period set by the office to the month's end, issued.
    expect((await markPercent(f, lineId, 25, '2026-12-01')).status).toBe(201);
    const first = await openProgressDraft(f);
    expect((await f.send('patch', `/api/invoices/${first.id}`, { periodEnd: '2026-12-31' })).status).toBe(200);
    const app1 = await f.issue(first.id);
    expect(app1.periodEnd).toBe('2026-12-31');
    // The office itself cannot draft a period before it.
    expect((await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-15' })).status).toBe(400);

    // A later mark: the queue drafts application #2 …
    expect((await markPercent(f, lineId, 50, '2026-12-01')).status).toBe(201);
    const second = await openProgressDraft(f);
    // … for a period from the last issued one's end on, and it issues
    expect(second.periodEnd).toBe('2026-12-31');
    // a draft whose period was left before it (written before this rule) is refused at issue, naming the period
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update invoices set period_end = '2026-12-20' where tenant_id = $1 and id = $2`, [tx.tenantId, second.id]),
    );
    const early = await f.send('post', `/api/invoices/${second.id}/issue`, { send: false });
    expect([early.status, early.body.errors?.[0]?.field]).toEqual([409, 'periodEnd']);
    expect((await f.send('patch', `/api/invoices/${second.id}`, { periodEnd: '2026-12-31' })).status).toBe(200);
    expect((await f.issue(second.id)).periodEnd).toBe('2026-12-31');
  }, 120_000);
});

describe('marks from the field after an application billed to the end of its period', () => {
  it('a percent marked today moves the line after an application typed for the month', async () => {
    const { f, lineId } = await progressJob('Period Marks Plaster');
    const first = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-31' });
    expect(first.status).toBe(201);
    const typed = await f.send('patch', `/api/invoices/${first.body.id}`, {
      progressLines: [{ valueLineId: lineId, workToDate: { percent: 25 }, storedMaterials: '0' }],
    });
    expect(typed.status).toBe(200);
    await f.issue(first.body.id);

    const mark = await markPercent(f, lineId, 50, '2026-12-02');
    expect(mark.status).toBe(201);
    const line = (mark.body as { valueLines: Array<{ id: string; percentComplete: string }> }).valueLines.find((v) => v.id === lineId);
    await billingQueueSettled(t, [f.firmId]);
    expect(line?.percentComplete).toBe('50');
    // and the queue drafts the next application for it
    expect((await openProgressDraft(f)).periodEnd).toBe('2026-12-31');
  }, 120_000);
});
