import { randomUUID } from 'node:crypto';
import { withTenant } from '@layerbook/db';
import type Stripe from 'stripe';
import { clientInvoice, invoiceBooks, type PaymentsServer, startPaymentsServer } from './checkout-fixtures';
import { expireCheckoutSession, fulfilCheckoutSession } from './fulfil';

let p: PaymentsServer;
beforeAll(async () => {
  p = await startPaymentsServer();
});
afterAll(() => p.stop());

const deps = () => ({ queue: p.t.queue, config: p.t.ctx.config });

/** Our checkout row for a session the spec makes up (what start would have written). */
async function checkoutRow(firmId: string, invoiceId: string, sessionId: string, amount: string, currency = 'USD') {
  await withTenant(p.t.ctx.pool, firmId, (tx) =>
    tx.client.query(
      `insert into checkout_sessions (tenant_id, invoice_id, client_id, processor_session_id, amount, currency, url)
       select tenant_id, id, client_id, $3, $4, $5, 'http://127.0.0.1/pay' from invoices where tenant_id = $1 and id = $2`,
      [tx.tenantId, invoiceId, sessionId, amount, currency],
    ),
  );
}

/** A Checkout Session as the processor reports a paid one (only the fields fulfilment reads). */
const paidSession = (id: string, amountTotal: number, currency: string, status: Stripe.Checkout.Session.PaymentStatus = 'paid') =>
  ({
    id,
    object: 'checkout.session',
    status: 'complete',
    payment_status: status,
    amount_total: amountTotal,
    currency,
    payment_intent: `pi_${id}`,
  }) as Stripe.Checkout.Session;

const fulfil = (firmId: string, session: Stripe.Checkout.Session) =>
  withTenant(p.t.ctx.pool, firmId, (tx) => fulfilCheckoutSession(tx, deps(), session, p.t.ctx.now(), p.t.ctx.now()));

describe('fulfilling a paid checkout', () => {
  it('records a paid session whose checkout row was never written, from the invoice its metadata names', async () => {
    const f = await clientInvoice(p.t, 'Lost Row Plaster');
    const checkoutId = randomUUID();
    const session = {
      ...paidSession('cs_test_lost_row', 25000, 'usd'),
      metadata: { tenant_id: f.firmId, invoice_id: f.invoiceId, checkout_id: checkoutId },
    } as Stripe.Checkout.Session;
    expect((await fulfil(f.firmId, session)).outcome).toBe('Payment RCT-0001 recorded: 250.00 USD');
    expect(await f.status(checkoutId)).toMatchObject({ state: 'paid', amount: '250.00', receiptNumber: 'RCT-0001' });
    expect((await invoiceBooks(p.t, f.firmId, f.invoiceId)).status).toBe('paid');
  });

  it('keeps what a card pays beyond the amount due as the client’s credit (a cheque came in meanwhile)', async () => {
    const f = await clientInvoice(p.t, 'Overpaid Plaster');
    const checkout = await f.started();
    // The client pays by card as the office records the cheque: the card page is expired after the
    // cheque (payments/checkout-expiry.ts), but this payment was taken before that, and its word comes after.
    p.fake.controls.hold();
    expect(p.fake.controls.pay(checkout.sessionId).ok).toBe(true);
    const cheque = await f.agent
      .post(`/api/invoices/${f.invoiceId}/payments`)
      .set('x-csrf-token', f.csrf())
      .send({ method: 'cheque', amount: '100.00', receivedOn: '2026-12-01', reference: '1042' });
    expect(cheque.status).toBeLessThan(300);
    expect(await f.status(checkout.checkoutId)).toMatchObject({ state: 'paid', receiptNumber: 'RCT-0002' });
    await p.fake.controls.release();
    const books = await invoiceBooks(p.t, f.firmId, f.invoiceId);
    expect(books.status).toBe('paid');
    // 250.00 paid by card on 150.00 due: 150.00 applied, 100.00 kept (common practice, no source: an overpayment is the client's money).
    expect(books.payments.map((x) => [x.amount, x.amount_applied])).toEqual([
      ['100.00', '100.00'],
      ['250.00', '150.00'],
    ]);
    expect(books.credits).toEqual([{ amount: '100.00', currency: 'USD', note: 'Paid beyond the amount due on INV-0001.' }]);
  });

  it('dates a card payment by when the processor took it, and keeps its PaymentIntent id apart from the reference', async () => {
    // 15:00 UTC is 10:00 in New York: the same day in the firm's zone.
    p.t.setNow(new Date('2026-12-05T15:00:00Z'));
    try {
      const f = await clientInvoice(p.t, 'Dated Card Plaster');
      const checkout = await f.started();
      p.fake.controls.hold();
      const paid = p.fake.controls.pay(checkout.sessionId);
      if (!paid.ok) throw new Error(paid.message);
      // The client comes back two days later: the payment is still dated the day the card was charged.
      p.t.setNow(new Date('2026-12-07T15:00:00Z'));
      expect(await f.status(checkout.checkoutId)).toMatchObject({ state: 'paid', receiptNumber: 'RCT-0001' });
      await p.fake.controls.release();
      const rows = await withTenant(p.t.ctx.pool, f.firmId, async (tx) => {
        const { rows } = await tx.client.query<{ received_on: string; reference: string; processor_payment_intent_id: string }>(
          `select received_on::text as received_on, reference, processor_payment_intent_id from payments where tenant_id = $1 and invoice_id = $2`,
          [tx.tenantId, f.invoiceId],
        );
        return rows;
      });
      expect(rows).toEqual([{ received_on: '2026-12-05', reference: '', processor_payment_intent_id: paid.paymentIntent.id }]);
    } finally {
      p.t.setNow(null);
    }
  });

  it('records what was really paid when it differs from the checkout, and says it needs attention', async () => {
    const f = await clientInvoice(p.t, 'Mismatch Plaster', { total: '1000.00' });
    // Less than asked, in the invoice's currency: applied as paid, the invoice part paid.
    await checkoutRow(f.firmId, f.invoiceId, 'cs_test_short', '1000.00');
    const short = await fulfil(f.firmId, paidSession('cs_test_short', 20000, 'usd'));
    expect(short.outcome).toBe(
      'Needs attention: paid 200.00 USD where the checkout asked 1000.00 USD; payment RCT-0001 recorded, 200.00 on the invoice, 0.00 kept as credit',
    );
    // Another currency: recorded whole as the client's credit, nothing on the invoice.
    await checkoutRow(f.firmId, f.invoiceId, 'cs_test_euro', '800.00');
    const euro = await fulfil(f.firmId, paidSession('cs_test_euro', 80000, 'eur'));
    expect(euro.outcome).toBe(
      'Needs attention: paid 800.00 EUR where the checkout asked 800.00 USD; payment RCT-0002 recorded, 0.00 on the invoice, 800.00 kept as credit',
    );
    const books = await invoiceBooks(p.t, f.firmId, f.invoiceId);
    expect([books.status, books.amountPaid]).toEqual(['part_paid', '200.00']);
    expect(books.credits).toEqual([{ amount: '800.00', currency: 'EUR', note: 'Paid in EUR; the invoice is in USD.' }]);
    // Asked again (another delivery of the same session): nothing more.
    expect((await fulfil(f.firmId, paidSession('cs_test_euro', 80000, 'eur'))).outcome).toBe('Payment RCT-0002 already recorded');
    expect((await invoiceBooks(p.t, f.firmId, f.invoiceId)).payments).toHaveLength(2);
  });

  it('waits for a payment that has not cleared, ignores a session not ours, and an expiry after the payment changes nothing', async () => {
    const f = await clientInvoice(p.t, 'Order Plaster');
    await checkoutRow(f.firmId, f.invoiceId, 'cs_test_slow', '250.00');
    expect((await fulfil(f.firmId, paidSession('cs_test_slow', 25000, 'usd', 'unpaid'))).outcome).toBe(
      'Waiting: the payment for checkout cs_test_slow has not cleared',
    );
    expect((await fulfil(f.firmId, paidSession('cs_test_stranger', 25000, 'usd'))).outcome).toBe(
      'Ignored: no checkout of ours for cs_test_stranger',
    );
    expect((await fulfil(f.firmId, paidSession('cs_test_slow', 25000, 'usd'))).outcome).toBe('Payment RCT-0001 recorded: 250.00 USD');
    const expire = (id: string) => withTenant(p.t.ctx.pool, f.firmId, (tx) => expireCheckoutSession(tx, { id } as Stripe.Checkout.Session));
    expect(await expire('cs_test_slow')).toBe('Checkout cs_test_slow already complete; nothing changed');
    await checkoutRow(f.firmId, f.invoiceId, 'cs_test_lapsed', '250.00');
    expect(await expire('cs_test_lapsed')).toBe('Checkout cs_test_lapsed expired unpaid');
    expect((await invoiceBooks(p.t, f.firmId, f.invoiceId)).status).toBe('paid');
  });
});
