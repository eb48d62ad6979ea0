import Stripe from 'stripe';
import { createSession, type Rig, startRig, WEBHOOK_SECRET } from './spec-helpers';

// What the fake delivers is checked with the SDK's own stripe.webhooks.constructEvent, as the server does.
describe('webhook deliveries', () => {
  let rig: Rig;
  beforeEach(async () => {
    rig = await startRig();
  });
  afterEach(() => rig.stop());

  const verified = (i: number) =>
    rig.stripe.webhooks.constructEvent(rig.receiver.received[i].payload, rig.receiver.received[i].signature, WEBHOOK_SECRET);

  it('signs and sends every event of a card payment', async () => {
    const session = await createSession(rig.stripe);
    const paid = rig.fake.controls.pay(session.id);
    expect(paid.ok).toBe(true);
    await rig.fake.controls.idle();
    const events = rig.receiver.received.map((_, i) => verified(i));
    expect(events.map((e) => e.type).sort()).toEqual([
      'charge.succeeded',
      'checkout.session.completed',
      'payment_intent.created',
      'payment_intent.succeeded',
    ]);
    const completed = events.find((e) => e.type === 'checkout.session.completed') as Stripe.CheckoutSessionCompletedEvent;
    expect(completed.data.object).toMatchObject({
      id: session.id,
      status: 'complete',
      payment_status: 'paid',
      amount_total: 125_000,
      currency: 'usd',
    });
    expect(completed.data.object.metadata).toEqual({ tenant_id: 'tenant-1', invoice_id: 'invoice-7', checkout_id: 'checkout-3' });
    expect(completed.api_version).toBe('2026-10-28.endive');
    // Delivered everywhere: nothing pending.
    expect((await rig.stripe.events.retrieve(completed.id)).pending_webhooks).toBe(0);
  });

  it('retries a delivery the endpoint refuses until it answers 2xx', async () => {
    let refusals = 0;
    rig.receiver.answer = (payload) => (payload.includes('"checkout.session.completed"') && refusals++ < 2 ? 500 : 200);
    const session = await createSession(rig.stripe);
    rig.fake.controls.pay(session.id);
    await rig.fake.controls.idle();
    const completed = rig.fake.controls.lastEvent('checkout.session.completed')!;
    const attempts = rig.fake.controls.attempts(completed.id);
    expect(attempts.map((a) => [a.kind, a.attempt, a.status])).toEqual([
      ['first', 1, 500],
      ['retry', 2, 500],
      ['retry', 3, 200],
    ]);
  });

  it('gives up after the last retry, and records an endpoint that cannot be reached', async () => {
    rig.fake.controls.setWebhookUrls(['http://127.0.0.1:9/nobody-listens']);
    const session = await createSession(rig.stripe);
    rig.fake.controls.pay(session.id);
    await rig.fake.controls.idle();
    const completed = rig.fake.controls.lastEvent('checkout.session.completed')!;
    const attempts = rig.fake.controls.attempts(completed.id);
    expect(attempts).toHaveLength(4); // the first try and the three retries of this rig (20, 40, 80 ms)
    expect(attempts.every((a) => a.status === null && a.error)).toBe(true);
    expect((await rig.stripe.events.retrieve(completed.id)).pending_webhooks).toBe(1);
  });

  it('delivers an event again, late (stale timestamp) and badly signed on request', async () => {
    const session = await createSession(rig.stripe);
    rig.fake.controls.pay(session.id);
    await rig.fake.controls.idle();
    const completed = rig.fake.controls.lastEvent('checkout.session.completed')!;
    const before = rig.receiver.received.length;

    const again = await rig.fake.controls.deliverAgain(completed.id, { times: 5, concurrently: true });
    expect(again.map((a) => a.status)).toEqual([200, 200, 200, 200, 200]);
    for (let i = before; i < before + 5; i++) expect(verified(i).id).toBe(completed.id);

    await rig.fake.controls.deliverStale(completed.id);
    // The SDK's default tolerance is 300 seconds; the late delivery is signed 600 seconds ago.
    expect(() => verified(before + 5)).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() => verified(before + 5)).toThrow(/tolerance/);

    await rig.fake.controls.deliverBadlySigned(completed.id);
    expect(() => verified(before + 6)).toThrow(/No signatures found matching the expected signature/);
  });

  it('waits in idle() for deliveries a control started', async () => {
    const session = await createSession(rig.stripe);
    rig.fake.controls.pay(session.id);
    await rig.fake.controls.idle();
    const completed = rig.fake.controls.lastEvent('checkout.session.completed')!;
    void rig.fake.controls.deliverAgain(completed.id, { times: 3, concurrently: true });
    await rig.fake.controls.idle();
    expect(rig.fake.controls.attempts(completed.id).map((a) => a.kind)).toEqual(['first', 'again', 'again', 'again']);
  });

  it('holds deliveries and releases them newest first (out of order)', async () => {
    rig.fake.controls.hold();
    const session = await createSession(rig.stripe);
    rig.fake.controls.pay(session.id);
    await rig.stripe.checkout.sessions.retrieve(session.id);
    expect(rig.receiver.received).toHaveLength(0);
    const released = await rig.fake.controls.release('reverse');
    expect(released.map((a) => a.type)).toEqual([
      'checkout.session.completed',
      'payment_intent.succeeded',
      'charge.succeeded',
      'payment_intent.created',
    ]);
    expect(rig.receiver.received.map((_, i) => verified(i).type)).toEqual(released.map((a) => a.type));
  });

  it('answers the test controls over HTTP too', async () => {
    const session = await createSession(rig.stripe);
    const declined = await fetch(`${rig.fake.baseUrl}/_test/checkout/${session.id}/pay`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ card: '4000000000009995' }),
    });
    expect(declined.status).toBe(402);
    expect(await declined.json()).toMatchObject({
      error: { code: 'card_declined', decline_code: 'insufficient_funds', message: 'Your card has insufficient funds.' },
    });
    const paid = await fetch(`${rig.fake.baseUrl}/_test/checkout/${session.id}/pay`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ card: '4242424242424242' }),
    });
    expect(paid.status).toBe(200);
    expect(((await paid.json()) as { session: Stripe.Checkout.Session }).session.status).toBe('complete');
    await rig.fake.controls.idle();
    const completed = rig.fake.controls.lastEvent('checkout.session.completed')!;
    const redeliver = await fetch(`${rig.fake.baseUrl}/_test/events/${completed.id}/deliver`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ times: 2 }),
    });
    expect(((await redeliver.json()) as { attempts: unknown[] }).attempts).toHaveLength(2);
    const attempts = (await (await fetch(`${rig.fake.baseUrl}/_test/webhooks/attempts?event=${completed.id}`)).json()) as {
      data: unknown[];
    };
    expect(attempts.data).toHaveLength(3);
  });
});
