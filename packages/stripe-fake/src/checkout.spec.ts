import Stripe from 'stripe';
import { createSession, type Rig, sdkFor, startRig } from './spec-helpers';

// Every check drives the stand-in through the real stripe SDK (23.1.0), as the server does.
describe('Checkout Sessions through the stripe SDK', () => {
  let rig: Rig;
  beforeAll(async () => {
    rig = await startRig();
  });
  afterAll(() => rig.stop());

  it('creates an open payment session with its page, amounts, metadata and expiry', async () => {
    const session = await createSession(rig.stripe, { expires_at: Math.floor(Date.now() / 1000) + 3600 });
    expect(session.id).toMatch(/^cs_test_/);
    expect(session).toMatchObject({
      object: 'checkout.session',
      mode: 'payment',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: 125_000,
      currency: 'usd',
      customer_email: 'hattie@brambleton.example',
      payment_intent: null,
      metadata: { tenant_id: 'tenant-1', invoice_id: 'invoice-7', checkout_id: 'checkout-3' },
    });
    expect(session.url).toBe(`${rig.fake.baseUrl}/pay/${session.id}`);
    expect(session.expires_at - session.created).toBeGreaterThanOrEqual(3599);
    // The SDK reads the request id and the API version the answer was made with.
    expect(session.lastResponse.requestId).toMatch(/^req_/);
    expect(session.lastResponse.apiVersion).toBe('2026-10-28.endive');
  });

  it('retrieves a session, expanding its PaymentIntent once paid, and lists its line items', async () => {
    const created = await createSession(rig.stripe);
    expect(rig.fake.controls.pay(created.id).ok).toBe(true);
    const session = await rig.stripe.checkout.sessions.retrieve(created.id, { expand: ['payment_intent', 'payment_intent.latest_charge'] });
    expect(session.status).toBe('complete');
    expect(session.payment_status).toBe('paid');
    const pi = session.payment_intent as Stripe.PaymentIntent;
    expect(pi).toMatchObject({ object: 'payment_intent', status: 'succeeded', amount: 125_000, amount_received: 125_000, currency: 'usd' });
    expect(pi.metadata).toEqual({ tenant_id: 'tenant-1', invoice_id: 'invoice-7', checkout_id: 'checkout-3' });
    expect((pi.latest_charge as Stripe.Charge).payment_method_details?.card?.last4).toBe('4242');
    const items = await rig.stripe.checkout.sessions.listLineItems(created.id);
    expect(items.data).toHaveLength(1);
    expect(items.data[0]).toMatchObject({ description: 'INV-0007 Deposit — Hall in lime plaster', amount_total: 125_000, quantity: 1 });
    const again = await rig.stripe.paymentIntents.retrieve(pi.id);
    expect(again.latest_charge).toBe((pi.latest_charge as Stripe.Charge).id);
  });

  it('expires an open session (checkout.session.expired) and refuses to expire it twice', async () => {
    const session = await createSession(rig.stripe);
    const expired = await rig.stripe.checkout.sessions.expire(session.id);
    expect(expired.status).toBe('expired');
    expect(rig.fake.controls.lastEvent('checkout.session.expired')?.data.object).toMatchObject({ id: session.id });
    await expect(rig.stripe.checkout.sessions.expire(session.id)).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
  });

  it('lists sessions newest first with cursors, and by PaymentIntent', async () => {
    const a = await createSession(rig.stripe);
    const b = await createSession(rig.stripe);
    const page = await rig.stripe.checkout.sessions.list({ limit: 2 });
    expect(page.data.map((s) => s.id)).toEqual([b.id, a.id]);
    expect(page.has_more).toBe(true);
    const next = await rig.stripe.checkout.sessions.list({ limit: 1, starting_after: b.id });
    expect(next.data[0].id).toBe(a.id);
    rig.fake.controls.pay(a.id);
    const paid = await rig.stripe.checkout.sessions.retrieve(a.id);
    const byPi = await rig.stripe.checkout.sessions.list({ payment_intent: paid.payment_intent as string });
    expect(byPi.data.map((s) => s.id)).toEqual([a.id]);
  });

  it("answers bad requests in Stripe's error shape, naming the parameter", async () => {
    const missing = await createSession(rig.stripe, { line_items: [] }).catch((e: unknown) => e);
    expect(missing).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(missing).toMatchObject({ code: 'parameter_missing', param: 'line_items', statusCode: 400 });
    const unknown = await createSession(rig.stripe, { not_a_param: 'x' } as Partial<Stripe.Checkout.SessionCreateParams>).catch(
      (e: unknown) => e,
    );
    expect(unknown).toMatchObject({ code: 'parameter_unknown', param: 'not_a_param' });
    const nope = await rig.stripe.checkout.sessions.retrieve('cs_test_nope').catch((e: unknown) => e);
    expect(nope).toMatchObject({ type: 'StripeInvalidRequestError', code: 'resource_missing', statusCode: 404 });
    // Stripe Docs "Supported currencies" — minimum charge amount: USD 0.50.
    const small = await createSession(rig.stripe, {
      line_items: [{ quantity: 1, price_data: { currency: 'usd', unit_amount: 49, product_data: { name: 'Tiny' } } }],
    }).catch((e: unknown) => e);
    expect(small).toMatchObject({ code: 'amount_too_small', param: 'line_items' });
  });

  it('refuses a wrong key with an authentication error', async () => {
    const other = sdkFor(rig.fake, 'sk_test_someone_else');
    await expect(createSession(other)).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
  });

  it('replays an idempotent create and refuses the same key with other parameters', async () => {
    const first = await createSession(rig.stripe, {}, { idempotencyKey: 'checkout-row-1' });
    const replay = await createSession(rig.stripe, {}, { idempotencyKey: 'checkout-row-1' });
    expect(replay.id).toBe(first.id);
    expect(replay.lastResponse.headers['idempotent-replayed']).toBe('true');
    const clash = await createSession(rig.stripe, { customer_email: 'someone@else.example' }, { idempotencyKey: 'checkout-row-1' }).catch(
      (e: unknown) => e,
    );
    expect(clash).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    const sessions = await rig.stripe.checkout.sessions.list({ limit: 100 });
    expect(sessions.data.filter((s) => s.id === first.id)).toHaveLength(1);
  });
});
