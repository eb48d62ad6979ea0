import Stripe from 'stripe';
import { createSession, type Rig, SECRET_KEY, startRig } from './spec-helpers';

// Refunds, customers and events through the real stripe SDK, as the server calls them.
describe('refunds, customers and events through the stripe SDK', () => {
  let rig: Rig;
  beforeAll(async () => {
    rig = await startRig();
  });
  afterAll(() => rig.stop());

  async function paidIntent(): Promise<string> {
    const session = await createSession(rig.stripe);
    const paid = rig.fake.controls.pay(session.id);
    if (!paid.ok) throw new Error(paid.message);
    return paid.paymentIntent.id;
  }

  it('refunds part of a payment, then the rest, then refuses a third refund', async () => {
    const pi = await paidIntent();
    const metadata = { tenant_id: 'tenant-1', refund_id: 'refund-1' };
    const part = await rig.stripe.refunds.create({ payment_intent: pi, amount: 25_000, metadata }, { idempotencyKey: 'refund-1' });
    expect(part).toMatchObject({ object: 'refund', status: 'succeeded', amount: 25_000, currency: 'usd', payment_intent: pi, metadata });
    // The same idempotency key gives the same refund back, not a second one.
    const replay = await rig.stripe.refunds.create({ payment_intent: pi, amount: 25_000, metadata }, { idempotencyKey: 'refund-1' });
    expect(replay.id).toBe(part.id);

    const tooMuch = await rig.stripe.refunds.create({ payment_intent: pi, amount: 100_001 }).catch((e: unknown) => e);
    expect(tooMuch).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(tooMuch).toMatchObject({ param: 'amount', code: 'amount_too_large' });

    const rest = await rig.stripe.refunds.create({ payment_intent: pi });
    expect(rest.amount).toBe(100_000);
    const again = await rig.stripe.refunds.create({ payment_intent: pi, amount: 1 }).catch((e: unknown) => e);
    expect(again).toMatchObject({ code: 'charge_already_refunded' });

    const charge = (await rig.stripe.refunds.retrieve(rest.id, { expand: ['charge'] })).charge as Stripe.Charge;
    expect(charge).toMatchObject({ amount: 125_000, amount_refunded: 125_000, refunded: true });
    const types = rig.fake.controls
      .events()
      .filter((e) => JSON.stringify(e.data.object).includes(pi))
      .map((e) => e.type);
    expect(types.filter((t) => t === 'refund.created')).toHaveLength(2);
    expect(types.filter((t) => t === 'charge.refunded')).toHaveLength(2);
  });

  it('lists refunds by charge or payment_intent, newest first, and does not embed them in the charge', async () => {
    const pi = await paidIntent();
    const other = await paidIntent();
    const first = await rig.stripe.refunds.create({ payment_intent: pi, amount: 10_000 });
    const second = await rig.stripe.refunds.create({ payment_intent: pi, amount: 20_000, metadata: { refund_id: 'ours-2' } });
    await rig.stripe.refunds.create({ payment_intent: other, amount: 5_000 });
    const byIntent: Stripe.ApiList<Stripe.Refund> = await rig.stripe.refunds.list({ payment_intent: pi });
    expect(byIntent.data.map((r) => r.id)).toEqual([second.id, first.id]);
    const chargeId = first.charge as string;
    const page1 = await rig.stripe.refunds.list({ charge: chargeId, limit: 1 });
    expect(page1).toMatchObject({ has_more: true, data: [{ id: second.id }] });
    const page2 = await rig.stripe.refunds.list({ charge: chargeId, limit: 1, starting_after: second.id });
    expect(page2).toMatchObject({ has_more: false, data: [{ id: first.id, metadata: {} }] });
    await expect(rig.stripe.refunds.list({ payment_intent: 'pi_nobody' })).rejects.toMatchObject({ code: 'resource_missing' });

    // Stripe API 2022-11-15 and later: a Charge carries its PaymentIntent's metadata but no `refunds` list unless expanded.
    const refunded = rig.fake.controls.lastEvent('charge.refunded')?.data.object as Stripe.Charge;
    expect(refunded.id).not.toBe(chargeId); // the last one is the other payment's
    const event = rig.fake.controls
      .events()
      .filter((e) => e.type === 'charge.refunded' && e.data.object.id === chargeId)
      .pop()!;
    const charge = event.data.object as Stripe.Charge;
    expect(charge.refunds).toBeUndefined();
    expect(charge).toMatchObject({ amount_refunded: 30_000, metadata: { tenant_id: 'tenant-1', invoice_id: 'invoice-7' } });
    const expanded = (await rig.stripe.refunds.retrieve(first.id, { expand: ['charge.refunds'] })).charge as Stripe.Charge;
    expect(expanded.refunds?.data.map((r) => r.id)).toEqual([second.id, first.id]);
  });

  it('keeps a refund pending until it is settled, counting it against what can be refunded', async () => {
    const pi = await paidIntent();
    rig.fake.controls.refundsStayPending(true);
    try {
      const pending = await rig.stripe.refunds.create({ payment_intent: pi, amount: 100_000 });
      expect(pending.status).toBe('pending');
      await expect(rig.stripe.refunds.create({ payment_intent: pi, amount: 30_000 })).rejects.toMatchObject({ code: 'amount_too_large' });
      rig.fake.controls.settleRefund(pending.id, 'failed');
      expect((await rig.stripe.refunds.retrieve(pending.id)).status).toBe('failed');
      expect(rig.fake.controls.lastEvent('refund.failed')?.data.object).toMatchObject({ id: pending.id });
      const second = await rig.stripe.refunds.create({ payment_intent: pi, amount: 30_000 });
      rig.fake.controls.settleRefund(second.id, 'succeeded');
      expect((await rig.stripe.refunds.retrieve(second.id)).status).toBe('succeeded');
      expect(rig.fake.controls.lastEvent('refund.updated')?.data).toMatchObject({
        object: { id: second.id },
        previous_attributes: { status: 'pending' },
      });
    } finally {
      rig.fake.controls.refundsStayPending(false);
    }
  });

  it('refuses to refund a session nobody paid, and an unknown PaymentIntent', async () => {
    const session = await createSession(rig.stripe);
    rig.fake.controls.pay(session.id, '4000000000000002');
    const declined = await rig.stripe.checkout.sessions.retrieve(session.id, { expand: ['payment_intent'] });
    expect(declined.status).toBe('open');
    const pi = declined.payment_intent as Stripe.PaymentIntent;
    expect(pi.last_payment_error).toMatchObject({
      code: 'card_declined',
      decline_code: 'generic_decline',
      message: 'Your card was declined.',
    });
    await expect(rig.stripe.refunds.create({ payment_intent: pi.id })).rejects.toMatchObject({ code: 'charge_not_refundable' });
    await expect(rig.stripe.refunds.create({ payment_intent: 'pi_nobody' })).rejects.toMatchObject({
      code: 'resource_missing',
      param: 'payment_intent',
    });
  });

  it('answers a failure the test asks for once, in Stripe’s shape', async () => {
    const pi = await paidIntent();
    rig.fake.controls.failNext({
      method: 'POST',
      path: '/v1/refunds',
      status: 402,
      error: { type: 'card_error', code: 'expired_card', message: 'The card this payment was made with has expired.' },
    });
    await expect(rig.stripe.refunds.create({ payment_intent: pi })).rejects.toBeInstanceOf(Stripe.errors.StripeCardError);
    // A server error the SDK would retry (maxNetworkRetries 2) fails every try when told so.
    rig.fake.controls.failNext({
      method: 'POST',
      path: '/v1/refunds',
      status: 500,
      times: 3,
      error: { type: 'api_error', message: 'Down.' },
    });
    const retrying = new Stripe(SECRET_KEY, { host: '127.0.0.1', port: rig.fake.port, protocol: 'http', maxNetworkRetries: 2 });
    await expect(retrying.refunds.create({ payment_intent: pi })).rejects.toBeInstanceOf(Stripe.errors.StripeAPIError);
    expect((await retrying.refunds.create({ payment_intent: pi })).status).toBe('succeeded');
  });

  it('creates and retrieves customers, and opens a session for one', async () => {
    const customer = await rig.stripe.customers.create({
      email: 'hattie@brambleton.example',
      name: 'Hattie Brambleton',
      metadata: { client_id: 'c-1' },
    });
    expect(customer).toMatchObject({ object: 'customer', email: 'hattie@brambleton.example', metadata: { client_id: 'c-1' } });
    expect((await rig.stripe.customers.retrieve(customer.id)) as Stripe.Customer).toMatchObject({ name: 'Hattie Brambleton' });
    const session = await createSession(rig.stripe, { customer_email: undefined, customer: customer.id });
    expect(session).toMatchObject({
      customer: customer.id,
      customer_email: null,
      customer_details: { email: 'hattie@brambleton.example' },
    });
    await expect(createSession(rig.stripe, { customer: customer.id })).rejects.toMatchObject({ param: 'customer_email' });
  });

  it('lists events newest first since a time, by type, page by page, as the reconciliation reads them', async () => {
    const since = (await rig.stripe.events.list({ limit: 1 })).data[0].created;
    const first = await paidIntent();
    const second = await paidIntent();
    const completed = await rig.stripe.events.list({ type: 'checkout.session.completed', created: { gte: since }, limit: 100 });
    const intents = completed.data.map((e) => ((e.data.object as Stripe.Checkout.Session).payment_intent as string) ?? '');
    expect(intents.indexOf(second)).toBeLessThan(intents.indexOf(first));

    // Auto-pagination walks every page with starting_after, as the SDK does.
    const seen: string[] = [];
    for await (const event of rig.stripe.events.list({
      created: { gte: since },
      types: ['payment_intent.succeeded', 'charge.succeeded'],
      limit: 1,
    })) {
      seen.push(event.type);
    }
    expect(seen.filter((t) => t === 'payment_intent.succeeded').length).toBeGreaterThanOrEqual(2);
    expect(seen.every((t) => t === 'payment_intent.succeeded' || t === 'charge.succeeded')).toBe(true);

    const newest = (await rig.stripe.events.list({ limit: 3 })).data;
    const older = await rig.stripe.events.list({ limit: 2, starting_after: newest[0].id });
    expect(older.data[0].id).toBe(newest[1].id);
    const newer = await rig.stripe.events.list({ limit: 1, ending_before: newest[1].id });
    expect(newer.data[0].id).toBe(newest[0].id);
    expect((await rig.stripe.events.retrieve(newest[0].id)).id).toBe(newest[0].id);
    await expect(rig.stripe.events.retrieve('evt_nobody')).rejects.toMatchObject({ code: 'resource_missing' });
  });
});
