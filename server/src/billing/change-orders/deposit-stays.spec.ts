import { DEFAULT_BILLING_SETTINGS } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { startTestServer, TestServer } from '../../testing/harness';
import { billingJob } from '../billing-fixtures';
import { addChangeOrder, sendChangeOrder } from './change-order-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('an approved change order and a deposit not yet billed', () => {
  it('leaves the deposit as agreed on an addition, within the firm’s cap, and spreads the change over the other payments', async () => {
    const f = await billingJob(t, 'Deposit Stays Plaster');
    const settings = {
      ...DEFAULT_BILLING_SETTINGS,
      depositCap: { kind: 'lesserOf', amount: '1000.00', percent: 10 },
      depositCapName: 'California home improvement: the lesser of $1,000 or 10 %',
    };
    expect((await f.send('put', '/api/firm/billing', settings)).status).toBe(200);
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(
        `update jobs set contract_sum = 20000, original_contract_sum = 20000, contract_tax = 0 where tenant_id = $1 and id = $2`,
        [tx.tenantId, f.jobId],
      ),
    );
    const schedule = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      method: 'schedule',
      lines: [
        { label: 'Deposit', role: 'deposit', trigger: { kind: 'date', date: '2026-12-10' }, amount: '1000.00' },
        { label: 'Final payment', role: 'final', trigger: { kind: 'walkthrough' }, amount: '19000.00' },
      ],
    });
    expect(schedule.status).toBe(200);
    expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);

    const co = await sendChangeOrder(
      f,
      (await addChangeOrder(f, { title: 'Second room', description: '', pricing: { kind: 'lumpSum', price: '20000.00' } })).id,
    );
    const decided = await f.client.agent
      .post(`/api/portal/change-orders/${co.id}/decision`)
      .set('x-csrf-token', f.client.csrf())
      .send({ decision: 'approve', signedName: 'Edwina Marl', consent: true });
    expect(decided.status).toBe(200);

    // California Bus. & Prof. Code §7159: the lesser of $1,000 or 10 % — spread in proportion it would have become 2,000.00
    const view = await f.billing();
    // the change order with its tax all goes on the final payment
    expect(view.lines.map((l) => [l.role, l.amount])).toEqual([
      ['deposit', '1000.00'],
      ['final', new Decimal(view.contractSum).minus(1000).toFixed(2)],
    ]);
    expect(new Decimal(view.contractSum).greaterThan(40000)).toBe(true);
  });

  it('lowers it with the other payments on a deduction, so it keeps within a cap that is a share of the smaller contract', async () => {
    const f = await billingJob(t, 'Deposit Lowered Plaster');
    const settings = { ...DEFAULT_BILLING_SETTINGS, depositCap: { kind: 'share', percent: 10 }, depositCapName: 'Ten per cent' };
    expect((await f.send('put', '/api/firm/billing', settings)).status).toBe(200);
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(
        `update jobs set contract_sum = 10000, original_contract_sum = 10000, contract_tax = 0 where tenant_id = $1 and id = $2`,
        [tx.tenantId, f.jobId],
      ),
    );
    const schedule = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      method: 'schedule',
      lines: [
        { label: 'Deposit', role: 'deposit', trigger: { kind: 'date', date: '2026-12-10' }, amount: '1000.00' },
        { label: 'Final payment', role: 'final', trigger: { kind: 'walkthrough' }, amount: '9000.00' },
      ],
    });
    expect(schedule.status).toBe(200);
    const co = await sendChangeOrder(
      f,
      (await addChangeOrder(f, { title: 'One room less', description: '', pricing: { kind: 'lumpSum', price: '-4000.00' } })).id,
    );
    const decided = await f.client.agent
      .post(`/api/portal/change-orders/${co.id}/decision`)
      .set('x-csrf-token', f.client.csrf())
      .send({ decision: 'approve', signedName: 'Edwina Marl', consent: true });
    expect(decided.status).toBe(200);
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
