import type { Problem, RefundView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import type { StripeFake } from '@layerbook/stripe-fake';
import type Stripe from 'stripe';
import { startTestServer, type TestServer } from '../testing/harness';
import { processorFor } from './processor';
import { issuedInvoice } from './refund-fixtures';

let t: TestServer;
let fake: StripeFake;
let stripe: Stripe;

beforeAll(async () => {
  // The server's own stand-in: its refund events reach the server's webhook, so they race the route's own settling.
  t = await startTestServer({}, { onlinePayments: true });
  t.setNow(new Date('2026-12-20T15:00:00Z'));
  fake = t.stripe;
  stripe = processorFor(t.ctx.config)!;
});
afterAll(async () => {
  // Nothing left on its way to the webhook, so no queue job is still running when the workers stop.
  await fake.controls.idle();
  await t.stop();
});

const fieldOf = (body: unknown) => (body as Problem).errors?.[0]?.field;

// 100.00 USD is 10000 in the smallest unit (Stripe Docs "Supported currencies": USD is not a zero-decimal currency)
const USD_100 = { total: '100.00', currency: 'USD', processorAmount: 10000 };

/** Polls until `check` holds (the queue applies the processor's events on its own time). */
async function eventually(check: () => Promise<boolean>, what: string, timeoutMs = 15_000): Promise<void> {
  for (const deadline = Date.now() + timeoutMs; Date.now() < deadline; await new Promise((r) => setTimeout(r, 100))) {
    if (await check()) return;
  }
  throw new Error(`timed out waiting for ${what}`);
}

/**
 * INV-0001 for 100.00 paid in full by card at the stand-in (test card 4242…): the session has no
 * firm in its metadata, so the webhook files none of its events, and the payment is recorded here
 * as fulfilment would record it, with the processor's payment intent.
 */
async function cardPaid(name: string, money: { total: string; currency: string; processorAmount: number } = USD_100) {
  const f = await issuedInvoice(t, name, money.total, money.currency);
  const session = await stripe.checkout.sessions.create({
    mode: 'payment',
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: money.currency.toLowerCase(),
          unit_amount: money.processorAmount,
          product_data: { name: 'INV-0001 Deposit' },
        },
      },
    ],
    success_url: 'http://localhost:4300/done/{CHECKOUT_SESSION_ID}',
    cancel_url: 'http://localhost:4300/cancelled',
  });
  const paid = fake.controls.pay(session.id);
  if (!paid.ok) throw new Error(`not paid: ${paid.message}`);
  const pi = paid.paymentIntent.id;
  const payment = await f.payDirect({ method: 'card', amount: money.total, processorSessionId: session.id, processorPaymentIntentId: pi });
  /** The refunds the processor made for this payment, oldest first (it lists them newest first). */
  const atProcessor = async () => (await stripe.refunds.list({ payment_intent: pi, limit: 100 })).data.reverse();
  const refundEvents = () =>
    withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const { rows } = await tx.client.query<{ type: string; applied_at: Date | null; outcome: string | null }>(
        `select type, applied_at, outcome from processor_events where tenant_id = $1 and type like 'refund.%' order by received_at`,
        [tx.tenantId],
      );
      return rows;
    });
  return { ...f, pi, paymentId: payment.paymentId, atProcessor, refundEvents };
}

describe('card refunds through the processor', () => {
  it('gives 30.00 back to the card: one processor refund keyed by our refund, a receipt, and its events change nothing more', async () => {
    const f = await cardPaid('Card Back Plaster');
    const res = await f.refund(f.paymentId, { method: 'card', amount: '30.00', reason: 'One wall left plain' });
    expect(res.status).toBe(201);
    const view = res.body as RefundView;
    expect(view).toMatchObject({
      method: 'card',
      status: 'succeeded',
      amount: '30.00',
      refundedOn: '2026-12-20',
      receiptNumber: 'RCT-0002',
    });
    const [sent] = await f.atProcessor();
    // 30.00 USD → 3000 in the smallest unit (Stripe Docs "Supported currencies": USD is not zero-decimal)
    expect(sent).toMatchObject({
      amount: 3000,
      currency: 'usd',
      status: 'succeeded',
      metadata: { tenant_id: f.firmId, refund_id: view.id },
    });

    await eventually(async () => {
      const events = await f.refundEvents();
      return events.length > 0 && events.every((e) => e.applied_at !== null);
    }, 'the refund events applied');
    expect((await f.refundEvents()).map((e) => e.outcome)).toContain(`Refund ${sent.id}: Refund already recorded`);
    expect(await f.money(f.paymentId)).toMatchObject({ status: 'part_paid', amountPaid: '70.00', refunded: '30.00' });
    expect(await f.atProcessor()).toHaveLength(1);
  });

  it('answers 502 in words when the processor refuses, marks the refund failed and frees its amount', async () => {
    const f = await cardPaid('Refused Refund Glaze');
    fake.controls.failNext({
      method: 'POST',
      path: '/v1/refunds',
      status: 402,
      error: { type: 'invalid_request_error', code: 'charge_disputed', message: 'This charge is disputed and cannot be refunded.' },
    });
    const res = await f.refund(f.paymentId, { method: 'card', amount: '100.00' });
    expect(res.status).toBe(502);
    expect((res.body as Problem).detail).toBe('The processor refused the refund: This charge is disputed and cannot be refunded.');
    const [row] = (await f.agent.get(`/api/invoices/${f.invoiceId}`)).body.payments[0].refunds as RefundView[];
    expect(row).toMatchObject({
      status: 'failed',
      receiptNumber: null,
      failureMessage: 'The processor refused the refund: This charge is disputed and cannot be refunded.',
    });
    expect(await f.money(f.paymentId)).toMatchObject({ status: 'paid', refunded: '0.00' });
    expect((await f.refund(f.paymentId, { method: 'card', amount: '100.00' })).status).toBe(201);
    expect(await f.money(f.paymentId)).toMatchObject({ status: 'refunded', amountPaid: '0.00', refunded: '100.00' });
  });

  it('answers 409 naming clientKey when the dialog’s key names a refused refund or another method or amount, and records nothing', async () => {
    const f = await cardPaid('Key Reuse Plaster');
    fake.controls.failNext({
      method: 'POST',
      path: '/v1/refunds',
      status: 402,
      error: { type: 'invalid_request_error', code: 'charge_disputed', message: 'This charge is disputed.' },
    });
    const key = 'dialog-1';
    expect((await f.refund(f.paymentId, { method: 'card', amount: '100.00', clientKey: key })).status).toBe(502);
    // the same key again: the refused refund is not answered as if it had been made, whatever is asked
    for (const body of [
      { method: 'cash' as const, amount: '40.00', refundedOn: '2026-12-20' },
      { method: 'card' as const, amount: '100.00' },
    ]) {
      const again = await f.refund(f.paymentId, { ...body, clientKey: key });
      expect([body.method, again.status, fieldOf(again.body)]).toEqual([body.method, 409, 'clientKey']);
    }
    expect(await f.money(f.paymentId)).toMatchObject({ status: 'paid', refunded: '0.00' });
    // a new key (the dialog makes one after a refusal) records the cash given back
    const cash = await f.refund(f.paymentId, { method: 'cash', amount: '40.00', refundedOn: '2026-12-20', clientKey: 'dialog-2' });
    expect(cash.status).toBe(201);
    expect(cash.body).toMatchObject({ method: 'cash', status: 'succeeded', amount: '40.00' });
    expect(await f.money(f.paymentId)).toMatchObject({ status: 'part_paid', refunded: '40.00' });
  });

  it('answers a card refund sent again with its key, still being sent back, with the same refund; another amount is 409', async () => {
    const f = await cardPaid('Key Pending Glaze');
    fake.controls.refundsStayPending(true);
    try {
      const body = { method: 'card' as const, amount: '20.00', clientKey: 'dialog-3' };
      const first = await f.refund(f.paymentId, body);
      expect(first.body).toMatchObject({ status: 'pending', amount: '20.00' });
      const again = await f.refund(f.paymentId, body);
      expect([again.status, (again.body as RefundView).id]).toEqual([201, (first.body as RefundView).id]);
      const other = await f.refund(f.paymentId, { ...body, amount: '25.00' });
      expect([other.status, fieldOf(other.body)]).toEqual([409, 'clientKey']);
      expect(await f.atProcessor()).toHaveLength(1);
    } finally {
      fake.controls.refundsStayPending(false);
    }
  });

  it('sends again with the same idempotency key when the processor fails once: refunded once', async () => {
    const f = await cardPaid('Retry Once Lime');
    fake.controls.failNext({
      method: 'POST',
      path: '/v1/refunds',
      status: 500,
      error: { type: 'api_error', message: 'Something went wrong.' },
    });
    const res = await f.refund(f.paymentId, { method: 'card', amount: '45.50' });
    expect(res.status).toBe(201);
    expect((await f.atProcessor()).map((r) => r.amount)).toEqual([4550]);
  });

  it('keeps a refund the processor never answered as being sent back (502), and sending it again refunds once', async () => {
    const f = await cardPaid('No Answer Glaze');
    // the SDK tries three times (maxNetworkRetries 2), each answered 500
    for (let i = 0; i < 3; i++) {
      fake.controls.failNext({
        method: 'POST',
        path: '/v1/refunds',
        status: 500,
        error: { type: 'api_error', message: 'Something went wrong.' },
      });
    }
    const res = await f.refund(f.paymentId, { method: 'card', amount: '25.00' });
    expect([res.status, (res.body as Problem).title]).toEqual([502, 'The payment processor did not answer']);
    const [pending] = (await f.agent.get(`/api/invoices/${f.invoiceId}`)).body.payments[0].refunds as RefundView[];
    expect(pending).toMatchObject({ status: 'pending', amount: '25.00' });
    expect(await f.atProcessor()).toHaveLength(0);

    const again = await f.post(`/api/payments/refunds/${pending.id}/send`, {});
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ id: pending.id, status: 'succeeded', receiptNumber: 'RCT-0002' });
    expect((await f.atProcessor()).map((r) => r.amount)).toEqual([2500]);
    expect((await f.post(`/api/payments/refunds/${pending.id}/send`, {})).status).toBe(409);
    expect(await f.money(f.paymentId)).toMatchObject({ refunded: '25.00', amountPaid: '75.00' });
  });

  it('keeps a refund pending when the processor says its key is still in use (409), and sending again refunds once', async () => {
    const f = await cardPaid('Key In Use Glaze');
    // the SDK retries a 409 twice by itself; all three answered so
    fake.controls.failNext({
      method: 'POST',
      path: '/v1/refunds',
      status: 409,
      error: { type: 'idempotency_error', code: 'idempotency_key_in_use', message: 'There is currently another in-progress request.' },
      times: 3,
    });
    const res = await f.refund(f.paymentId, { method: 'card', amount: '20.00' });
    expect(res.status).toBe(502);
    const [pending] = (await f.agent.get(`/api/invoices/${f.invoiceId}`)).body.payments[0].refunds as RefundView[];
    expect(pending).toMatchObject({ status: 'pending', amount: '20.00' });
    // its amount stays reserved: no second refund of the whole payment meanwhile
    expect((await f.refund(f.paymentId, { method: 'card', amount: '100.00' })).status).toBe(400);
    const again = await f.post(`/api/payments/refunds/${pending.id}/send`, {});
    expect(again.body).toMatchObject({ id: pending.id, status: 'succeeded' });
    expect((await f.atProcessor()).map((r) => r.amount)).toEqual([2000]);
  });

  it('sending again a day later finds the refund the processor made from our first send, rather than making a second', async () => {
    const f = await cardPaid('Lost Answer Plaster');
    for (let i = 0; i < 3; i++) {
      fake.controls.failNext({ method: 'POST', path: '/v1/refunds', status: 500, error: { type: 'api_error', message: 'Down.' } });
    }
    const res = await f.refund(f.paymentId, { method: 'card', amount: '25.00' });
    expect(res.status).toBe(502);
    const [pending] = (await f.agent.get(`/api/invoices/${f.invoiceId}`)).body.payments[0].refunds as RefundView[];
    // As if the first send had reached the processor and only its answer was lost; a day on, the processor has
    // forgotten the idempotency key (Stripe Docs "Idempotent requests": keys are removed after 24 hours).
    // (No firm in its metadata here, so its events are not filed and cannot settle it first.)
    const made = await stripe.refunds.create({ payment_intent: f.pi, amount: 2500, metadata: { refund_id: pending.id } });
    const again = await f.post(`/api/payments/refunds/${pending.id}/send`, {});
    expect(again.body).toMatchObject({ id: pending.id, status: 'succeeded' });
    expect((await f.atProcessor()).map((r) => [r.id, r.amount])).toEqual([[made.id, 2500]]);
    expect(await f.money(f.paymentId)).toMatchObject({ refunded: '25.00', amountPaid: '75.00' });
  });

  it('keeps a refund the processor has not finished as being sent back, and settles it from the processor’s event', async () => {
    const f = await cardPaid('Pending Card Render');
    fake.controls.refundsStayPending(true);
    try {
      const res = await f.refund(f.paymentId, { method: 'card', amount: '20.00' });
      expect(res.status).toBe(201);
      expect(res.body).toMatchObject({ status: 'pending', receiptNumber: null });
      const [sent] = await f.atProcessor();
      fake.controls.settleRefund(sent.id, 'succeeded');
      await eventually(async () => (await f.money(f.paymentId)).refunded === '20.00', 'the pending refund settled by its event');
      const [row] = (await f.agent.get(`/api/invoices/${f.invoiceId}`)).body.payments[0].refunds as RefundView[];
      expect(row).toMatchObject({ status: 'succeeded', receiptNumber: 'RCT-0002' });
    } finally {
      fake.controls.refundsStayPending(false);
    }
  });

  it('sends a zero-decimal currency as it is: ¥1,200 back of ¥5,000 is 1200 to the processor', async () => {
    // Stripe Docs "Supported currencies" — zero-decimal currencies: JPY is charged in whole yen, amount 5000 = ¥5,000
    const f = await cardPaid('Yen Back Plaster', { total: '5000', currency: 'JPY', processorAmount: 5000 });
    const res = await f.refund(f.paymentId, { method: 'card', amount: '1200' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: 'succeeded', amount: '1200', currency: 'JPY' });
    expect((await f.atProcessor()).map((r) => [r.amount, r.currency])).toEqual([[1200, 'jpy']]);
    const half = await f.refund(f.paymentId, { method: 'card', amount: '10.50' });
    expect(half.body).toMatchObject({
      errors: [{ field: 'amount', message: 'Use whole amounts in JPY.' }],
    });
  });

  it('ten card refunds of 30.00 at once on a 100.00 payment: three reach the processor, 90.00 in all', async () => {
    const f = await cardPaid('Ten Cards Plaster');
    const answers = await Promise.all(Array.from({ length: 10 }, () => f.refund(f.paymentId, { method: 'card', amount: '30.00' })));
    const statuses = answers.map((a) => a.status);
    const sent = await f.atProcessor();
    console.log(
      [
        'concurrent card refunds of one 100.00 payment (10 × 30.00)',
        `  201: ${statuses.filter((s) => s === 201).length}, 400: ${statuses.filter((s) => s === 400).length}, other: ${statuses.filter((s) => s !== 201 && s !== 400).length}`,
        `  at the processor: ${sent.length} refunds, ${sent.reduce((sum, r) => sum + r.amount, 0)} cents`,
      ].join('\n'),
    );
    // 3 × 3000 = 9000 ≤ 10000 cents; a fourth would be 12000 (common practice, no source: never refund more than was paid)
    expect(statuses.filter((s) => s === 201)).toHaveLength(3);
    expect(statuses.filter((s) => s === 400)).toHaveLength(7);
    expect(sent.map((r) => r.amount)).toEqual([3000, 3000, 3000]);
    expect(await f.money(f.paymentId)).toMatchObject({ refunded: '90.00', amountPaid: '10.00' });
  });
});
