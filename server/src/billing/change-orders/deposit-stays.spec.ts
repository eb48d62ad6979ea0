import { type BillingSettings, DEFAULT_BILLING_SETTINGS } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { startTestServer, TestServer } from '../../testing/harness';
import { billingJob } from '../billing-fixtures';
import { approvedChangeOrder } from './change-order-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

/** A job of `contract` under the firm's deposit cap, its deposit waiting for a date and the rest at the walkthrough. */
async function jobWithDeposit(name: string, depositCap: BillingSettings['depositCap'], contract: number, deposit: number) {
  const f = await billingJob(t, name);
  const settings = { ...DEFAULT_BILLING_SETTINGS, depositCap, depositCapName: 'The firm’s rule' };
  expect((await f.send('put', '/api/firm/billing', settings)).status).toBe(200);
  await withTenant(t.ctx.pool, f.firmId, (tx) =>
    tx.client.query(`update jobs set contract_sum = $3, original_contract_sum = $3, contract_tax = 0 where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      f.jobId,
      contract,
    ]),
  );
  const schedule = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
    method: 'schedule',
    lines: [
      { label: 'Deposit', role: 'deposit', trigger: { kind: 'date', date: '2026-12-10' }, amount: deposit.toFixed(2) },
      { label: 'Final payment', role: 'final', trigger: { kind: 'walkthrough' }, amount: (contract - deposit).toFixed(2) },
    ],
  });
  expect(schedule.status).toBe(200);
  return f;
}

const lump = (title: string, price: string) => ({ title, description: '', pricing: { kind: 'lumpSum' as const, price } });

describe('an approved change order and a deposit not yet billed', () => {
  it('leaves the deposit as agreed on an addition, within the firm’s cap, and spreads the change over the other payments', async () => {
    // California Bus. & Prof. Code §7159: the lesser of $1,000 or 10 % — spread in proportion it would have become 2,000.00
    const f = await jobWithDeposit('Deposit Stays Plaster', { kind: 'lesserOf', amount: '1000.00', percent: 10 }, 20000, 1000);
    expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);
    await approvedChangeOrder(f, lump('Second room', '20000.00'));
    const view = await f.billing();
    // the change order with its tax all goes on the final payment
    expect(view.lines.map((l) => [l.role, l.amount])).toEqual([
      ['deposit', '1000.00'],
      ['final', new Decimal(view.contractSum).minus(1000).toFixed(2)],
    ]);
    expect(new Decimal(view.contractSum).greaterThan(40000)).toBe(true);
  });

  it('lowers it with the other payments on a deduction, so it keeps within a cap that is a share of the smaller contract', async () => {
    const f = await jobWithDeposit('Deposit Lowered Plaster', { kind: 'share', percent: 10 }, 10000, 1000);
    await approvedChangeOrder(f, lump('One room less', '-4000.00'));
    // 10 % of the 6,000.00 left: the deposit comes down from 1,000.00 in proportion, and billing can start
    const view = await f.billing();
    expect(view.contractSum).toBe('6000.00');
    expect(view.lines.map((l) => [l.role, l.amount])).toEqual([
      ['deposit', '600.00'],
      ['final', '5400.00'],
    ]);
    expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);
  });
});
