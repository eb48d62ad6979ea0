import type { InvoiceDetail } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { billingJob } from './billing-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('an offline payment sent again with its key', () => {
  it('is recorded once, whether the copies come one after the other or at the same time', async () => {
    const f = await billingJob(t, 'Payment Key Plaster');
    expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);
    const b = await f.billing();
    const [firstId, secondId] = [await f.lineDraft(b.lines[1].id), await f.lineDraft(b.lines[2].id)];
    await f.issue(firstId);
    await f.issue(secondId);
    const payment = { method: 'transfer', amount: '100.00', receivedOn: '2026-12-01', reference: 'T-88', clientKey: 'form-key-1' };

    // the first answer was lost and the office pressed again; then two copies at once
    const answers = [await f.send('post', `/api/invoices/${firstId}/payments`, payment)];
    answers.push(...(await Promise.all([1, 2].map(() => f.send('post', `/api/invoices/${firstId}/payments`, payment)))));
    expect(answers.map((r) => r.status)).toEqual([200, 200, 200]);
    for (const r of answers) expect(r.body as InvoiceDetail).toMatchObject({ status: 'part_paid', amountPaid: '100.00' });
    const rows = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`select receipt_no from payments where tenant_id = $1 and invoice_id = $2`, [tx.tenantId, firstId]),
    );
    expect(rows.rowCount).toBe(1);

    // another payment is another key; one key on another invoice is refused, naming it
    expect((await f.send('post', `/api/invoices/${firstId}/payments`, { ...payment, clientKey: 'form-key-2' })).body).toMatchObject({
      amountPaid: '200.00',
    });
    const elsewhere = await f.send('post', `/api/invoices/${secondId}/payments`, payment);
    expect(elsewhere.status).toBe(409);
    expect(elsewhere.body.errors.map((e: { field: string }) => e.field)).toEqual(['clientKey']);
    for (const clientKey of ['', 'k'.repeat(101), 7]) {
      const bad = await f.send('post', `/api/invoices/${secondId}/payments`, { ...payment, clientKey });
      expect([clientKey, bad.status, bad.body.errors?.map((e: { field: string }) => e.field)]).toEqual([clientKey, 400, ['clientKey']]);
    }
    expect(((await f.agent.get(`/api/invoices/${secondId}`)).body as InvoiceDetail).amountPaid).toBe('0.00');
  });
});
