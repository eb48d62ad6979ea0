import { withTenant } from '@layerbook/db';
import type Stripe from 'stripe';
import { staffActor } from '../http/actor';
import { startTestServer, type TestServer } from '../testing/harness';
import { applyProcessorRefund, RefundPaymentNotYetRecorded } from './refund-events';
import { issuedInvoice } from './refund-fixtures';
import { startRefund } from './refunds';

let t: TestServer;
const NOW = new Date('2026-12-20T15:00:00Z');
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(NOW);
});
afterAll(() => t.stop());

/** A processor refund object as its events carry it (only the fields applyProcessorRefund reads). */
const processorRefund = (fields: Partial<Stripe.Refund>): Stripe.Refund =>
  ({ object: 'refund', currency: 'usd', metadata: {}, reason: null, ...fields }) as Stripe.Refund;

/** INV-0001 for 100.00 paid by card (checkout cs_…, payment intent pi_…) in full. */
async function cardPaid(name: string) {
  const f = await issuedInvoice(t, name);
  const pi = `pi_${name.replace(/\W/g, '')}`;
  const paid = await f.payDirect({ method: 'card', amount: '100.00', processorSessionId: `cs_${pi}`, processorPaymentIntentId: pi });
  const apply = (refund: Stripe.Refund) => withTenant(t.ctx.pool, f.firmId, (tx) => applyProcessorRefund(tx, t.ctx, refund, NOW));
  const refundRows = () =>
    withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const { rows } = await tx.client.query<{
        status: string;
        amount: string;
        receipt_no: number | null;
        processor_refund_id: string | null;
      }>(`select status, amount::text as amount, receipt_no, processor_refund_id from refunds where tenant_id = $1 order by created_at`, [
        tx.tenantId,
      ]);
      return rows;
    });
  return { ...f, pi, paymentId: paid.paymentId, apply, refundRows };
}

describe('applyProcessorRefund', () => {
  it('records a refund made at the processor’s dashboard once, however often its events come', async () => {
    const f = await cardPaid('Dashboard Refund Plaster');
    const dash = processorRefund({ id: 're_dash_1', status: 'succeeded', amount: 2500, payment_intent: f.pi });
    expect(await f.apply(dash)).toBe('Refund re_dash_1: Refund RCT-0002 recorded');
    expect(await f.apply(dash)).toBe('Refund re_dash_1: Refund already recorded');
    // 2500 cents (USD has two decimals: Stripe Docs "Supported currencies" — zero-decimal list does not name USD) = 25.00
    expect(await f.refundRows()).toEqual([{ status: 'succeeded', amount: '25.00', receipt_no: 2, processor_refund_id: 're_dash_1' }]);
    expect(await f.money(f.paymentId)).toMatchObject({ status: 'part_paid', amountPaid: '75.00', refunded: '25.00' });
    const [entry] = await f.audit('invoice.refund_recorded');
    expect(entry).toMatchObject({ processorRefundId: 're_dash_1', method: 'card', statusBefore: 'paid', statusAfter: 'part_paid' });
  });

  it('leaves a dashboard refund that is not yet succeeded, and one larger than what is left, unrecorded', async () => {
    const f = await cardPaid('Unrecorded Refunds Glaze');
    expect(await f.apply(processorRefund({ id: 're_wait', status: 'pending', amount: 1000, payment_intent: f.pi }))).toMatch(
      /not ours and not succeeded \(pending\)/,
    );
    expect(await f.apply(processorRefund({ id: 're_big', status: 'succeeded', amount: 10001, payment_intent: f.pi }))).toMatch(
      /needs attention: 100\.01 is more than the 100\.00 left on the payment/,
    );
    expect(await f.refundRows()).toEqual([]);
    expect(await f.audit('invoice.refund_needs_attention')).toHaveLength(1);
  });

  it('throws for a refund of a payment not recorded yet, so its event is retried later', async () => {
    const f = await cardPaid('Early Refund Lime');
    await expect(
      f.apply(processorRefund({ id: 're_early', status: 'succeeded', amount: 500, payment_intent: 'pi_not_yet' })),
    ).rejects.toBeInstanceOf(RefundPaymentNotYetRecorded);
  });

  it('settles a refund we asked for from its event: succeeded once; a later failed event changes no figure and is noted for a person', async () => {
    const f = await cardPaid('Pending Settles Render');
    const start = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      startRefund(
        tx,
        { ...t.ctx, onlinePayments: true },
        staffActor({ id: f.userId, role: 'owner' }),
        f.paymentId,
        { method: 'card', amount: '40.00', reason: 'Hall not done' },
        NOW,
      ),
    );
    if (start.kind !== 'card') throw new Error('expected a card refund to send');
    // 40.00 USD → 4000 (Stripe Docs "Supported currencies": amounts in the currency's smallest unit)
    expect(start.send).toMatchObject({ paymentIntentId: f.pi, processorAmount: 4000 });
    expect(await f.refundRows()).toEqual([{ status: 'pending', amount: '40.00', receipt_no: null, processor_refund_id: null }]);
    // while pending, the 40.00 is taken: 60.00 is all that may still be refunded
    const over = await f.refund(f.paymentId, { amount: '60.01', method: 'cash' });
    expect(over.body).toMatchObject({
      errors: [{ field: 'amount', message: 'At most 60.00 can be refunded of this 100.00 payment (40.00 being sent back).' }],
    });

    const ours = { id: 're_ours_1', amount: 4000, payment_intent: f.pi, metadata: { tenant_id: f.firmId, refund_id: start.send.refundId } };
    expect(await f.apply(processorRefund({ ...ours, status: 'pending' }))).toBe('Refund re_ours_1: Refund still pending at the processor');
    expect(await f.apply(processorRefund({ ...ours, status: 'succeeded' }))).toBe('Refund re_ours_1: Refund RCT-0002 recorded');
    expect(await f.apply(processorRefund({ ...ours, status: 'failed', failure_reason: 'expired_or_canceled_card' }))).toBe(
      'Refund re_ours_1: needs attention: the processor says a refund we recorded as given back failed afterwards; nothing recorded',
    );
    expect(await f.audit('invoice.refund_needs_attention')).toEqual([
      expect.objectContaining({ amount: '40.00', currency: 'USD', processorRefundId: 're_ours_1' }),
    ]);
    expect(await f.refundRows()).toEqual([{ status: 'succeeded', amount: '40.00', receipt_no: 2, processor_refund_id: 're_ours_1' }]);
    expect(await f.money(f.paymentId)).toMatchObject({ status: 'part_paid', amountPaid: '60.00', refunded: '40.00' });
  });

  it('marks a refund we asked for failed when the processor says so, and frees its amount', async () => {
    const f = await cardPaid('Failed Refund Plaster');
    const start = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      startRefund(
        tx,
        { ...t.ctx, onlinePayments: true },
        staffActor({ id: f.userId, role: 'owner' }),
        f.paymentId,
        { method: 'card', amount: '100.00', reason: 'Cancelled' },
        NOW,
      ),
    );
    if (start.kind !== 'card') throw new Error('expected a card refund to send');
    const failed = processorRefund({
      id: 're_fail_1',
      status: 'failed',
      amount: 10000,
      payment_intent: f.pi,
      failure_reason: 'lost_or_stolen_card',
      metadata: { refund_id: start.send.refundId },
    });
    expect(await f.apply(failed)).toBe('Refund re_fail_1: Refund failed: The refund did not go through: lost or stolen card.');
    expect(await f.money(f.paymentId)).toMatchObject({ status: 'paid', amountPaid: '100.00', refunded: '0.00' });
    // told later that it went through after all: not recorded on its own, left for a person
    expect(await f.apply({ ...failed, status: 'succeeded' })).toBe(
      'Refund re_fail_1: needs attention: the processor says a refund we had marked failed succeeded; nothing recorded',
    );
    expect(await f.audit('invoice.refund_needs_attention')).toHaveLength(1);
    const again = await f.refund(f.paymentId, { amount: '100.00', method: 'cheque' });
    expect(again.status).toBe(201);
  });
});
