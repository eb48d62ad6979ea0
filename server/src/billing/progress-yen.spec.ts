import { type JobBillingView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { billingJob } from './billing-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

// Yen have no minor unit (ISO 4217): the application's table holds "10000000", the column "10000000.00".
describe('a typed amount on a yen progress application', () => {
  it('is issued as typed', async () => {
    const f = await billingJob(t, 'Yen Typed Plaster');
    await withTenant(t.ctx.pool, f.firmId, async (tx) => {
      await tx.client.query(`update firms set currency = 'JPY' where id = $1`, [tx.tenantId]);
      await tx.client.query(
        `update jobs set currency = 'JPY', contract_sum = 10000000, original_contract_sum = 10000000, contract_tax = 0
          where tenant_id = $1 and id = $2`,
        [tx.tenantId, f.jobId],
      );
    });
    expect((await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, { method: 'progress', lines: [] })).status).toBe(200);
    const values = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
      lines: [{ label: 'All the work', scheduledValue: '10000000' }],
    });
    expect(values.status).toBe(200);
    const lineId = (values.body as JobBillingView).valueLines[0].id;
    expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);
    const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-01' });
    expect(draft.status).toBe(201);
    const typed = await f.send('patch', `/api/invoices/${draft.body.id}`, {
      progressLines: [{ valueLineId: lineId, workToDate: { amount: '1234567' }, storedMaterials: '0' }],
    });
    expect(typed.status).toBe(200);
    expect(typed.body.total).toBe('1234567');
    const issued = await f.issue(draft.body.id);
    expect(issued.total).toBe('1234567');
  }, 120_000);
});
