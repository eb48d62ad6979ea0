import { DEFAULT_BILLING_SETTINGS, type InvoiceDetail, type JobBillingView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { startTestServer, TestServer } from '../testing/harness';
import { billingJob } from './billing-fixtures';
import { approvedChangeOrder } from './change-orders/change-order-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

const sum = (xs: readonly string[]) => xs.reduce((a, x) => a.plus(x), new Decimal(0)).toFixed(2);

/** A progress-billed job under the firm's default terms (deposit credited pro rata, no retainage), its deposit issued. */
async function progressJob(name: string, contractTax: string, values: readonly string[]) {
  const f = await billingJob(t, name);
  expect((await f.send('put', '/api/firm/billing', { ...DEFAULT_BILLING_SETTINGS })).status).toBe(200);
  await withTenant(t.ctx.pool, f.firmId, (tx) =>
    tx.client.query(
      `update jobs set contract_sum = 10000, original_contract_sum = 10000, contract_tax = $3 where tenant_id = $1 and id = $2`,
      [tx.tenantId, f.jobId, contractTax],
    ),
  );
  const schedule = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
    method: 'progress',
    lines: [{ label: 'Deposit', role: 'deposit', trigger: { kind: 'acceptance' }, amount: '1000.00' }],
  });
  expect(schedule.status).toBe(200);
  const set = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
    lines: values.map((scheduledValue, i) => ({ label: `Area ${i + 1}`, scheduledValue })),
  });
  expect(set.status).toBe(200);
  const started = await f.send('post', `/api/jobs/${f.jobId}/billing/start`);
  expect(started.status).toBe(200);
  await f.issue(await f.lineDraft((started.body as JobBillingView).lines[0].id));
  const application = async (progressLines: object[]): Promise<InvoiceDetail> => {
    const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-01' });
    expect(draft.status).toBe(201);
    expect((await f.send('patch', `/api/invoices/${draft.body.id}`, { progressLines })).status).toBe(200);
    return f.issue(draft.body.id);
  };
  return { f, valueLines: (set.body as JobBillingView).valueLines.map((v) => v.id), application };
}

// With no retainage there is no release to take what is left of the deposit: the application that bills the
// contract sum in full does (common practice, no source: the deposit is an advance on the contract sum).
describe('a deposit credited pro rata on a progress-billed job', () => {
  it('is credited in full over three thirds, rounded on the totals to date (333.33, 666.67 − 333.33, the rest)', async () => {
    const { f, valueLines, application } = await progressJob('Thirds Deposit Plaster', '0', ['10000.00']);
    const issued = [];
    for (const amount of ['3333.33', '6666.66', '10000.00']) {
      issued.push(await application([{ valueLineId: valueLines[0], workToDate: { amount }, storedMaterials: '0' }]));
    }
    // 1,000 × 3,333.33 / 10,000 = 333.33; 1,000 × 6,666.66 / 10,000 = 666.67 to date; the contract billed in full takes the rest
    expect(issued.map((i) => i.depositCredit)).toEqual(['333.33', '333.34', '333.33']);
    // 1,000.00 deposit + the applications' totals = the 10,000.00 contract
    expect(sum(['1000.00', ...issued.map((i) => i.total)])).toBe('10000.00');
    expect((await f.billing()).totals.unbilled).toBe('0.00');
  }, 120_000);

  it('is credited in full when a deduction change order lowers the contract sum halfway', async () => {
    const { f, valueLines, application } = await progressJob('Deduction Deposit Plaster', '762.12', ['5000.00', '5000.00']);
    const first = await application([{ valueLineId: valueLines[0], workToDate: { percent: 100 }, storedMaterials: '0' }]);
    expect(first.depositCredit).toBe('500.00');
    await approvedChangeOrder(f, { title: 'Smaller ceilings', description: '', pricing: { kind: 'lumpSum', price: '-4000.00' } });
    const second = await application([{ valueLineId: valueLines[1], workToDate: { percent: 100 }, storedMaterials: '0' }]);
    expect(sum([first.depositCredit, second.depositCredit])).toBe('1000.00');
    expect((await f.billing()).totals.unbilled).toBe('0.00');
  }, 120_000);
});
