import { DEFAULT_BILLING_SETTINGS, type JobBillingView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { billingJob } from './billing-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

// Contract 20,000.00, 10 % retainage: #1 at 50 % holds 1,000.00, the release bills it, #2 at 60 % holds 1,200.00 on the
// work to date of which 1,000.00 is already released (worked by hand).
describe('an application after a retainage release', () => {
  it('prints a balance to finish that agrees with what is left to bill', async () => {
    const f = await billingJob(t, 'Release Then Apply Plaster');
    const settings = { ...DEFAULT_BILLING_SETTINGS, retainage: { workPercent: 10, storedPercent: 10, stopAtPercentComplete: null } };
    expect((await f.send('put', '/api/firm/billing', settings)).status).toBe(200);
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(
        `update jobs set contract_sum = 20000, original_contract_sum = 20000, contract_tax = 0 where tenant_id = $1 and id = $2`,
        [tx.tenantId, f.jobId],
      ),
    );
    expect((await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, { method: 'progress', lines: [] })).status).toBe(200);
    const values = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
      lines: [{ label: 'All the work', scheduledValue: '20000.00' }],
    });
    const lineId = (values.body as JobBillingView).valueLines[0].id;
    expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);
    const application = async (percent: number) => {
      const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-01' });
      await f.send('patch', `/api/invoices/${draft.body.id}`, {
        progressLines: [{ valueLineId: lineId, workToDate: { percent }, storedMaterials: '0' }],
      });
      return f.issue(draft.body.id);
    };
    const first = await application(50);
    const release = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'retainage' });
    expect(release.status).toBe(201);
    await f.issue(release.body.id);
    const second = await application(60);
    const view = await f.billing();
    expect(second.progress!.summary).toMatchObject({
      retainage: '1200.00',
      retainageReleased: '1000.00',
      dueThisPeriod: '1800.00',
      // 20,000.00 − 10,800.00 earned less retainage − 1,000.00 released
      balanceToFinishWithRetainage: '8200.00',
    });
    expect(view.totals).toMatchObject({ unbilled: '8200.00', retainageHeld: '200.00' });
    // the first application, before any release, shows no released row
    expect(first.progress!.summary.retainageReleased).toBeUndefined();
  }, 120_000);
});
