import type { InvoiceDetail, JobProgressView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { joinAs } from '../../proposals/proposal-fixtures';
import { startTestServer, type TestServer } from '../../testing/harness';
import { acceptedJob, billingQueueSettled } from '../progress-fixtures';
import { startBilling } from '../schedule';
import { evaluateJobBilling } from './evaluate';
import { SYSTEM_ACTOR } from '../../http/actor';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Job = Awaited<ReturnType<typeof acceptedJob>>;

const query = <R extends object = Record<string, unknown>>(job: Job, sql: string, params: unknown[] = []) =>
  withTenant(t.ctx.pool, job.firmId, async (tx) => (await tx.client.query<R>(sql, [tx.tenantId, job.job.id, ...params])).rows);

const queueSettled = (firmIds: readonly string[]) => billingQueueSettled(t, firmIds);

async function start(job: Job): Promise<void> {
  await withTenant(t.ctx.pool, job.firmId, (tx) =>
    startBilling(tx, t.ctx.queue, { kind: 'staff', userId: job.userId, role: 'owner' }, job.job.id, t.ctx.now()),
  );
}

const invoicesOf = (job: Job) =>
  query<{ kind: string; status: string; origin: string; trigger: { text?: string } | null; line_status: string | null }>(
    job,
    `select i.kind, i.status, i.origin, i.trigger, l.status as line_status from invoices i
       left join payment_schedule_lines l on l.tenant_id = i.tenant_id and l.id = i.schedule_line_id
      where i.tenant_id = $1 and i.job_id = $2 order by i.created_at, l.position`,
  );

describe('billing triggers from the work', () => {
  it('drafts the stage payment once, by the queue, when its layer is done on every surface it covers', async () => {
    const job = await acceptedJob(t, 'Trigger Studio');
    const crew = await joinAs(t, job, 'crew');
    await start(job);
    await queueSettled([job.firmId]);
    // The deposit is due on acceptance: drafted as soon as billing starts.
    expect((await invoicesOf(job)).map((i) => [i.kind, i.status, i.origin])).toEqual([['deposit', 'draft', 'queue']]);

    const stage = job.option.payments.find((p) => p.trigger.kind === 'layerComplete')!;
    const layerId = stage.trigger.kind === 'layerComplete' ? stage.trigger.layerId : '';
    const items = ((await job.agent.get(`/api/jobs/${job.job.id}/progress`)).body as JobProgressView).workItems.filter(
      (w) => w.layerId === layerId,
    );
    expect(items).toHaveLength(3);
    const mark = (workItemId: string, on: string, clientKey?: string) =>
      crew.agent
        .post(`/api/jobs/${job.job.id}/progress`)
        .set('x-csrf-token', crew.csrf())
        .send({ kind: 'layerDone', workItemId, on, ...(clientKey ? { clientKey } : {}) });
    expect((await mark(items[0].id, '2026-11-30')).status).toBe(201);
    expect((await mark(items[1].id, '2026-12-01')).status).toBe(201);
    await queueSettled([job.firmId]);
    expect((await invoicesOf(job)).map((i) => i.kind)).toEqual(['deposit']);

    // The last surface, sent twice from a phone with one key, and once more without: one stage invoice.
    await Promise.all([mark(items[2].id, '2026-12-01', 'phone:last'), mark(items[2].id, '2026-12-01', 'phone:last')]);
    expect((await mark(items[2].id, '2026-12-01')).status).toBe(201);
    await queueSettled([job.firmId]);
    const invoices = await invoicesOf(job);
    expect(invoices.map((i) => [i.kind, i.status, i.origin, i.line_status])).toEqual([
      ['deposit', 'draft', 'queue', 'ready'],
      ['milestone', 'draft', 'queue', 'ready'],
    ]);
    expect(invoices[1].trigger?.text).toBe(`${items[0].layerName} finished on all 3 surfaces it covers on December 1, 2026`);
    expect(
      await query(job, `select count(*)::int as n from job_progress where tenant_id = $1 and job_id = $2 and client_key = 'phone:last'`),
    ).toEqual([{ n: 1 }]);
    // Asked again (a retry, the daily run): nothing new.
    const again = await withTenant(t.ctx.pool, job.firmId, (tx) => evaluateJobBilling(tx, job.job.id, '2026-12-01', SYSTEM_ACTOR));
    expect(again).toBe(0);
    expect(await invoicesOf(job)).toHaveLength(2);
    const history = (await job.agent.get(`/api/jobs/${job.job.id}/history`)).body as { items: Array<{ text: string; who: string }> };
    const drafted = history.items.filter((e) => e.text === 'Stage payment drafted');
    expect(drafted.map((e) => e.who)).toEqual(['Automatic (billing)']);

    // A surface reopened (the coat failed): the untouched stage draft goes, its line waits again.
    const reopen = () =>
      job.agent
        .post(`/api/jobs/${job.job.id}/progress`)
        .set('x-csrf-token', job.csrf())
        .send({ kind: 'layerReopened', workItemId: items[1].id, on: '2026-12-01' });
    expect((await reopen()).status).toBe(201);
    await queueSettled([job.firmId]);
    expect((await invoicesOf(job)).map((i) => [i.kind, i.line_status])).toEqual([['deposit', 'ready']]);
    expect(
      await query(job, `select status from payment_schedule_lines where tenant_id = $1 and job_id = $2 and role = 'milestone'`),
    ).toEqual([{ status: 'scheduled' }]);
    const after = (await job.agent.get(`/api/jobs/${job.job.id}/history`)).body as { items: Array<{ text: string; who: string }> };
    expect(after.items.filter((e) => e.text.startsWith('Stage payment draft withdrawn'))).toEqual([
      expect.objectContaining({ text: `Stage payment draft withdrawn: ${items[0].layerName} was reopened`, who: 'Automatic (billing)' }),
    ]);

    // Done again: drafted again. Once the office has changed that draft, a reopening leaves it to them.
    expect((await mark(items[1].id, '2026-12-01')).status).toBe(201);
    await queueSettled([job.firmId]);
    const [, stageDraft] = await query<{ id: string }>(
      job,
      `select id from invoices where tenant_id = $1 and job_id = $2 and status = 'draft' order by created_at`,
    );
    expect(stageDraft).toBeDefined();
    const noted = await job.agent
      .patch(`/api/invoices/${stageDraft.id}`)
      .set('x-csrf-token', job.csrf())
      .send({ notes: 'Second coat checked on site' });
    expect(noted.status).toBe(200);
    const reopenedLayer = async () => ((await job.agent.get(`/api/invoices/${stageDraft.id}`)).body as InvoiceDetail).reopenedLayer;
    expect(await reopenedLayer()).toBeNull();
    expect((await reopen()).status).toBe(201);
    await queueSettled([job.firmId]);
    expect((await invoicesOf(job)).map((i) => [i.kind, i.status])).toEqual([
      ['deposit', 'draft'],
      ['milestone', 'draft'],
    ]);
    // Kept, and its page says the layer is open again until it is done once more.
    expect(await reopenedLayer()).toBe(items[0].layerName);
    expect((await mark(items[1].id, '2026-12-01')).status).toBe(201);
    expect(await reopenedLayer()).toBeNull();
  }, 120_000);

  it('drafts nothing before billing starts, and drafts the final invoice at the walkthrough', async () => {
    const job = await acceptedJob(t, 'Walkthrough Studio');
    const walk = () =>
      job.agent.post(`/api/jobs/${job.job.id}/progress`).set('x-csrf-token', job.csrf()).send({ kind: 'walkthrough', on: '2026-12-01' });
    expect((await walk()).status).toBe(201);
    await queueSettled([job.firmId]);
    expect(await invoicesOf(job)).toEqual([]);
    await start(job);
    await queueSettled([job.firmId]);
    expect((await invoicesOf(job)).map((i) => [i.kind, i.trigger?.text])).toEqual([
      ['deposit', 'Due on acceptance: billing started'],
      ['final', 'Final walkthrough held on December 1, 2026'],
    ]);

    // Issued, then voided: its line's trigger still met, the queue drafts it again for review at once.
    const [final] = await query<{ id: string }>(job, `select id from invoices where tenant_id = $1 and job_id = $2 and kind = 'final'`);
    const post = (path: string, body: object) => job.agent.post(path).set('x-csrf-token', job.csrf()).send(body);
    expect((await post(`/api/invoices/${final.id}/issue`, { send: false })).status).toBe(200);
    expect((await post(`/api/invoices/${final.id}/void`, { reason: 'Wrong walkthrough day' })).status).toBe(200);
    await queueSettled([job.firmId]);
    const rows = (await invoicesOf(job)).map((i) => [i.kind, i.status, i.origin, i.line_status].join(' '));
    expect(rows.sort()).toEqual(['deposit draft queue ready', 'final draft queue ready', 'final void queue ready']);
  }, 120_000);

  it('drafts or refreshes one progress application after a percent is marked on a progress-billed job', async () => {
    const job = await acceptedJob(t, 'Progress Method Studio');
    await query(job, `update jobs set billing_method = 'progress' where tenant_id = $1 and id = $2`);
    await query(job, `delete from payment_schedule_lines where tenant_id = $1 and job_id = $2 and role <> 'deposit'`);
    await query(
      job,
      `update payment_schedule_lines set amount = (select contract_sum from jobs where tenant_id = $1 and id = $2) * 0.1 where tenant_id = $1 and job_id = $2`,
    );
    await start(job);
    const lines = ((await job.agent.get(`/api/jobs/${job.job.id}/progress`)).body as JobProgressView).valueLines;
    const percent = (n: number) =>
      job.agent
        .post(`/api/jobs/${job.job.id}/progress`)
        .set('x-csrf-token', job.csrf())
        .send({ kind: 'valuePercent', valueLineId: lines[0].id, percentComplete: n, on: '2026-12-01' });
    expect((await percent(25)).status).toBe(201);
    await queueSettled([job.firmId]);
    expect((await percent(40)).status).toBe(201);
    await queueSettled([job.firmId]);
    const progress = await query<{
      status: string;
      origin: string;
      progress: { lines: Array<{ valueLineId: string; thisPeriodWork: string; percentComplete: string }> };
    }>(job, `select status, origin, progress from invoices where tenant_id = $1 and job_id = $2 and kind = 'progress'`);
    expect(progress.map((p) => [p.status, p.origin])).toEqual([['draft', 'queue']]);
    expect(progress[0].progress.lines.find((l) => l.valueLineId === lines[0].id)?.percentComplete).toBe('40');

    // A schedule of values that no longer ties out is the office's to fix: the check leaves the draft alone and does not fail.
    await query(job, `update job_value_lines set scheduled_value = scheduled_value + 1 where tenant_id = $1 and job_id = $2 and id = $3`, [
      lines[1].id,
    ]);
    expect((await percent(45)).status).toBe(201);
    await queueSettled([job.firmId]);
    const [draft] = await query<{ progress: { lines: Array<{ valueLineId: string; percentComplete: string }> } }>(
      job,
      `select progress from invoices where tenant_id = $1 and job_id = $2 and kind = 'progress'`,
    );
    expect(draft.progress.lines.find((l) => l.valueLineId === lines[0].id)?.percentComplete).toBe('40');
  }, 120_000);
});

describe('the billing day', () => {
  it('meets a date trigger at 08:00 in the firm’s own time zone (Auckland a day ahead of Los Angeles)', async () => {
    const auckland = await acceptedJob(t, 'Auckland Studio', { timeZone: 'Pacific/Auckland' });
    const angeles = await acceptedJob(t, 'Angeles Studio', { timeZone: 'America/Los_Angeles' });
    for (const job of [auckland, angeles]) {
      await start(job);
      await query(
        job,
        `update payment_schedule_lines set trigger = '{"kind":"date","date":"2026-12-10"}' where tenant_id = $1 and job_id = $2 and role = 'final'`,
      );
    }
    await queueSettled([auckland.firmId, angeles.firmId]);
    const finals = async (job: Job) => (await invoicesOf(job)).filter((i) => i.kind === 'final');
    const sweep = async (at: string) => {
      t.setNow(new Date(at));
      await t.queue.boss.send('billing-sweep', { tenantIds: [auckland.firmId, angeles.firmId] });
      await new Promise((r) => setTimeout(r, 300));
      await queueSettled([auckland.firmId, angeles.firmId]);
    };
    try {
      // 2026-12-09 19:30 UTC: 08:30 on the 10th in Auckland (NZDT, +13), 11:30 on the 9th in Los Angeles.
      await sweep('2026-12-09T19:30:00Z');
      expect((await finals(auckland)).map((i) => i.trigger?.text)).toEqual(['Billing date December 10, 2026 reached']);
      expect(await finals(angeles)).toEqual([]);
      // 2026-12-10 16:00 UTC: 08:00 on the 10th in Los Angeles.
      await sweep('2026-12-10T16:00:00Z');
      expect(await finals(angeles)).toHaveLength(1);
      expect(await finals(auckland)).toHaveLength(1);
    } finally {
      t.setNow(new Date('2026-12-01T15:00:00Z'));
    }
  }, 120_000);
});
