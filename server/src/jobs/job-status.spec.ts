import type { JobBillingView, JobDetail, Problem } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { billingJob } from '../billing/billing-fixtures';
import { joinAs } from '../proposals/proposal-fixtures';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';

/*
 * The office moves a job on: finished, reopened, cancelled. A cancelled job bills nothing more and
 * its contract stays as it ended (common practice, no source: a job called off is closed, not deleted).
 */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Firm = Awaited<ReturnType<typeof billingJob>>;
const move = (f: Firm, body: object, jobId = f.jobId) => f.send('post', `/api/jobs/${jobId}/status`, body);
const fields = (res: { body: unknown }) => (res.body as Problem).errors?.map((e) => e.field);

describe('a job’s status', () => {
  it('goes to finished and back to under way; asking again for the same changes nothing; each move is in the history', async () => {
    const f = await billingJob(t, 'Finish Line Plaster');
    const done = await move(f, { status: 'complete' });
    expect([done.status, (done.body as JobDetail).status]).toEqual([200, 'complete']);
    expect((await move(f, { status: 'complete' })).status).toBe(200);
    const reopened = await move(f, { status: 'in_progress' });
    expect((reopened.body as JobDetail).status).toBe('in_progress');
    // only a finished job reopens
    const again = await move(f, { status: 'in_progress' });
    expect(again.status).toBe(200);
    const history = await withTenant(t.ctx.pool, f.firmId, async (tx) =>
      (
        await tx.client.query<{ data: { from: string; to: string } }>(
          `select data from audit_log where action = 'job.status_changed' order by created_at`,
        )
      ).rows.map((r) => `${r.data.from}→${r.data.to}`),
    );
    expect(history).toEqual(['scheduled→complete', 'complete→in_progress']);
  });

  it('cancels only with a reason and once no invoice of the job stands; its drafts go with it, and then it bills and changes nothing', async () => {
    const f = await billingJob(t, 'Called Off Plaster');
    const started = (await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).body as JobBillingView;
    const deposit = await f.lineDraft(started.lines[0].id);
    await f.issue(deposit);
    // no reason: 400 naming it
    const bare = await move(f, { status: 'cancelled' });
    expect([bare.status, fields(bare)]).toEqual([400, ['reason']]);
    // an issued invoice stands: 409 naming status and the invoice
    const standing = await move(f, { status: 'cancelled', reason: 'The client moved house' });
    expect([standing.status, fields(standing)]).toEqual([409, ['status']]);
    expect((standing.body as Problem).detail).toContain('INV-0001');
    // void it, leave a draft of the stage payment: the cancel goes through and the draft is withdrawn
    expect((await f.send('post', `/api/invoices/${deposit}/void`, { reason: 'Job called off' })).status).toBe(200);
    const stage = await f.lineDraft(started.lines[1].id);
    const cancelled = await move(f, { status: 'cancelled', reason: 'The client moved house' });
    expect([cancelled.status, (cancelled.body as JobDetail).status]).toEqual([200, 'cancelled']);
    expect((await f.agent.get(`/api/invoices/${stage}`)).status).toBe(404);
    // nothing more: no draft, no schedule change, no change order, no reopening
    expect((await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'line', scheduleLineId: started.lines[1].id })).status).toBe(409);
    expect(
      (
        await f.send('post', `/api/jobs/${f.jobId}/change-orders`, {
          title: 'Extra',
          description: '',
          pricing: { kind: 'lumpSum', price: '100.00' },
        })
      ).status,
    ).toBe(409);
    const reopen = await move(f, { status: 'in_progress' });
    expect([reopen.status, fields(reopen)]).toEqual([409, ['status']]);
  });

  it('is the office’s to change: crew 403, another firm 404, a status that is no move 400', async () => {
    const f = await billingJob(t, 'Status Guard Plaster');
    const crew = await joinAs(t, f, 'crew');
    expect(
      (await crew.agent.post(`/api/jobs/${f.jobId}/status`).set('x-csrf-token', crew.csrf()).send({ status: 'complete' })).status,
    ).toBe(403);
    const other = await signUpFirm(t.app, 'Other Status Plaster');
    expect(
      (await other.agent.post(`/api/jobs/${f.jobId}/status`).set('x-csrf-token', other.csrf()).send({ status: 'complete' })).status,
    ).toBe(404);
    const odd = await move(f, { status: 'scheduled' });
    expect([odd.status, fields(odd)]).toEqual([400, ['status']]);
    expect(
      (await withTenant(t.ctx.pool, f.firmId, (tx) => tx.client.query(`select status from jobs where id = $1`, [f.jobId]))).rows[0].status,
    ).toBe('scheduled');
  });
});
