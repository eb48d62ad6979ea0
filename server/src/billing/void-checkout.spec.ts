import { withTenant } from '@layerbook/db';
import { clientInvoice, eventually, invoiceBooks, type PaymentsServer, startPaymentsServer } from '../payments/checkout-fixtures';
import { processorFor } from '../payments/processor';

/*
 * Voiding an invoice while the client has its card page open: the processor's page stops taking
 * money once the void commits (expired through the queue), so nobody is charged for a void invoice.
 */

let p: PaymentsServer;
beforeAll(async () => {
  p = await startPaymentsServer();
});
afterAll(() => p.stop());

const checkoutState = (firmId: string, checkoutId: string) =>
  withTenant(p.t.ctx.pool, firmId, async (tx) => {
    const { rows } = await tx.client.query<{ status: string }>(`select status from checkout_sessions where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      checkoutId,
    ]);
    return rows[0].status;
  });

describe('voiding an invoice with a card payment page open', () => {
  it('expires the checkout at the processor: the client can no longer pay it, and the invoice stays void with nothing paid', async () => {
    const f = await clientInvoice(p.t, 'Void Open Plaster');
    const started = await f.started();
    const voided = await f.agent.post(`/api/invoices/${f.invoiceId}/void`).set('x-csrf-token', f.csrf()).send({ reason: 'Job cancelled' });
    expect(voided.status).toBe(200);

    const stripe = processorFor(p.t.ctx.config)!;
    await eventually(async () => (await stripe.checkout.sessions.retrieve(started.sessionId)).status === 'expired', 'the session expired');
    await eventually(async () => (await checkoutState(f.firmId, started.checkoutId)) === 'expired', 'our checkout marked expired');
    const paid = p.fake.controls.pay(started.sessionId);
    expect(paid.ok).toBe(false);
    expect(await f.status(started.checkoutId)).toMatchObject({ state: 'expired', paymentId: null, credit: null });
    expect(await invoiceBooks(p.t, f.firmId, f.invoiceId)).toMatchObject({ status: 'void', amountPaid: '0.00', payments: [], credits: [] });
  });

  it('voids an invoice with no checkout as before, queueing nothing for the processor', async () => {
    const f = await clientInvoice(p.t, 'Void Closed Plaster');
    const voided = await f.agent.post(`/api/invoices/${f.invoiceId}/void`).set('x-csrf-token', f.csrf()).send({ reason: 'Wrong client' });
    expect(voided.status).toBe(200);
    const jobs = await p.t.queue.boss
      .getDb()
      .executeSql(`select count(*)::int as n from pgboss.job where name = 'payments-apply' and data->>'expireCheckoutsOf' = $1`, [
        f.invoiceId,
      ]);
    expect((jobs.rows as Array<{ n: number }>)[0].n).toBe(0);
  });
});
