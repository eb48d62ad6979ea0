import { withTenant } from '@layerbook/db';
import { clientInvoice, eventually, invoiceBooks, type PaymentsServer, startPaymentsServer, storedEvents } from './checkout-fixtures';
import { processorFor } from './processor';

let p: PaymentsServer;
beforeAll(async () => {
  p = await startPaymentsServer();
});
afterAll(() => p.stop());

async function refundRows(firmId: string, invoiceId: string) {
  return withTenant(p.t.ctx.pool, firmId, async (tx) => {
    const { rows } = await tx.client.query<{
      amount: string;
      status: string;
      processor_refund_id: string | null;
      receipt_no: number | null;
    }>(
      `select amount::text as amount, status, processor_refund_id, receipt_no from refunds where tenant_id = $1 and invoice_id = $2 order by created_at`,
      [tx.tenantId, invoiceId],
    );
    return rows;
  });
}

describe('refunds made at the processor’s dashboard, through the webhook', () => {
  it('records each one once from charge.refunded, listing the charge’s refunds (not embedded since API 2022-11-15)', async () => {
    const f = await clientInvoice(p.t, 'Dashboard Refund Plaster');
    const checkout = await f.started();
    const paid = p.fake.controls.pay(checkout.sessionId);
    if (!paid.ok) throw new Error(paid.message);
    await eventually(async () => (await invoiceBooks(p.t, f.firmId, f.invoiceId)).status === 'paid', 'the payment recorded');

    // Made at the dashboard: no metadata of ours on the refund, so only charge.refunded names the firm.
    const stripe = processorFor(p.t.ctx.config)!;
    const first = await stripe.refunds.create({ payment_intent: paid.paymentIntent.id, amount: 10_000 });
    await p.fake.controls.idle();
    await eventually(async () => (await refundRows(f.firmId, f.invoiceId)).length === 1, 'the first refund recorded');
    const second = await stripe.refunds.create({ payment_intent: paid.paymentIntent.id, amount: 15_000 });
    await p.fake.controls.idle();
    await eventually(async () => {
      const events = await storedEvents(p.t, f.firmId);
      return events.filter((e) => e.type === 'charge.refunded' && e.applied_at).length === 2;
    }, 'both charge.refunded events applied');

    const refunds = await refundRows(f.firmId, f.invoiceId);
    // 250.00 paid; 100.00 then 150.00 given back: each recorded once, with its processor id and a receipt.
    expect(refunds.map((r) => [r.amount, r.status, r.processor_refund_id])).toEqual([
      ['100.00', 'succeeded', first.id],
      ['150.00', 'succeeded', second.id],
    ]);
    expect(refunds.every((r) => r.receipt_no !== null)).toBe(true);
    const books = await invoiceBooks(p.t, f.firmId, f.invoiceId);
    expect([books.status, books.amountPaid]).toEqual(['refunded', '0.00']);
    // The refunds' own events name no firm (Stripe copies no metadata onto a dashboard refund): not stored.
    expect((await storedEvents(p.t, f.firmId)).filter((e) => e.type.startsWith('refund.'))).toEqual([]);
  });
});
