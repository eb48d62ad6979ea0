import type { PortalInvoiceDetail } from '@layerbook/contracts';
import request from 'supertest';
import { insertInvoice } from '../billing/pdf/invoice-fixtures';
import { otherClientOf, signInByLink } from '../proposals/portal-fixtures';
import { linkIn } from '../testing/inbox';
import { newAgent, startTestServer, type TestServer } from '../testing/harness';
import { clientInvoice, eventually, invoiceBooks, type PaymentsServer, startPaymentsServer, storedEvents } from './checkout-fixtures';
import { processorFor } from './processor';

let p: PaymentsServer;
let off: TestServer;
beforeAll(async () => {
  p = await startPaymentsServer();
  // Both servers' workers send mail: into one inbox, the one the fixtures read.
  off = await startTestServer({ SMTP_PORT: String(p.t.inbox.port) });
});
afterAll(async () => {
  await p.stop();
  await off.stop();
});

describe('starting a card payment from the portal', () => {
  it('opens the processor’s checkout for the amount due, offers the same one again, and records the payment on return', async () => {
    const f = await clientInvoice(p.t, 'Checkout Start Plaster', { status: 'part_paid', total: '1000.00', amountPaid: '400.00' });
    const invoice = (await f.client.agent.get(`/api/portal/invoices/${f.invoiceId}`)).body as PortalInvoiceDetail;
    expect(invoice).toMatchObject({ amountDue: '600.00', canPayOnline: true, payOnlineReason: null });

    const first = await f.started();
    expect(first.url).toBe(`${p.fake.baseUrl}/pay/${first.sessionId}`);
    // The same open checkout is offered again rather than a second one.
    expect((await f.started()).checkoutId).toBe(first.checkoutId);

    const stripe = processorFor(p.t.ctx.config)!;
    const session = await stripe.checkout.sessions.retrieve(first.sessionId);
    // Stripe Docs "Supported currencies": USD is sent in cents, so 600.00 is 60000.
    expect(session).toMatchObject({
      mode: 'payment',
      amount_total: 60000,
      currency: 'usd',
      customer_email: expect.stringContaining('@'),
      success_url: `http://localhost:4300/portal/invoices/${f.invoiceId}/payment/${first.checkoutId}`,
      cancel_url: `http://localhost:4300/portal/invoices/${f.invoiceId}?payment=cancelled`,
      metadata: { tenant_id: f.firmId, invoice_id: f.invoiceId, checkout_id: first.checkoutId },
    });
    // An hour from when we asked (the processor's `created` may fall a second later).
    expect(session.expires_at - session.created).toBeGreaterThanOrEqual(3599);
    expect(session.expires_at - session.created).toBeLessThanOrEqual(3600);
    const items = await stripe.checkout.sessions.listLineItems(first.sessionId);
    expect(items.data.map((i) => [i.description, i.amount_total])).toEqual([['INV-0001 Deposit — Dining room plaster', 60000]]);

    expect(await f.status(first.checkoutId)).toMatchObject({ state: 'open', amount: '600.00', currency: 'USD', paymentId: null });
    // Nothing is paid while the page is open; the client pays with Stripe's success test card.
    p.fake.controls.hold();
    expect(p.fake.controls.pay(first.sessionId, '4242424242424242').ok).toBe(true);
    // The return page polls every 1.5 s: the processor is asked about a checkout at most once per 10 s
    // (common practice, no source: one account-wide rate limit), in between our rows answer.
    const asked = jest.spyOn(stripe.checkout.sessions, 'retrieve');
    expect(await f.status(first.checkoutId)).toMatchObject({ state: 'open' });
    expect(asked).not.toHaveBeenCalled();
    // Back from the processor (the webhook held), 11 s on: the return page's status records the payment itself.
    p.t.setNow(new Date(Date.now() + 11_000));
    try {
      const back = await f.status(first.checkoutId);
      expect(back).toMatchObject({ state: 'paid', receiptNumber: 'RCT-0001' });
      expect(asked).toHaveBeenCalledTimes(1);
    } finally {
      p.t.setNow(null);
      asked.mockRestore();
    }
    const books = await invoiceBooks(p.t, f.firmId, f.invoiceId);
    expect(books).toMatchObject({ status: 'paid', amountPaid: '1000.00' });
    expect(books.payments.map((x) => [x.amount, x.amount_applied, x.currency])).toEqual([['600.00', '600.00', 'USD']]);
    await p.fake.controls.release();
    await p.fake.controls.idle();
    const completed = await eventually(
      async () => (await storedEvents(p.t, f.firmId)).find((e) => e.type === 'checkout.session.completed' && e.applied_at),
      'the webhook applied',
    );
    expect(completed.outcome).toBe('Payment RCT-0001 already recorded');
    expect((await invoiceBooks(p.t, f.firmId, f.invoiceId)).payments).toHaveLength(1);
    const after = (await f.client.agent.get(`/api/portal/invoices/${f.invoiceId}`)).body as PortalInvoiceDetail;
    expect(after).toMatchObject({ status: 'paid', canPayOnline: false, payOnlineReason: null });
    expect(after.receipts.map((r) => [r.kind, r.number, r.method, r.amount])).toEqual([['payment', 'RCT-0001', 'card', '600.00']]);
    // The receipt e-mail, queued with the payment, reaches the client once.
    const mail = await p.t.inbox.waitFor((m) => m.subject === 'Receipt RCT-0001 — Checkout Start Plaster');
    expect(mail.text).toContain(`/portal/invoices/${f.invoiceId}`);
    expect(p.t.inbox.messages.filter((m) => m.subject === mail.subject)).toHaveLength(1);
  });

  it('two starts at once (a double click, a second tab) open one processor session', async () => {
    const f = await clientInvoice(p.t, 'Checkout Twice Plaster');
    // A second tab with its own sign-in (requests of one session may queue behind each other).
    const tab = await newAgent(p.t.app, 'portal');
    const seen = new Set(p.t.inbox.messages);
    await tab.agent.post('/api/portal/auth/link').set('x-csrf-token', tab.csrf()).send({ email: f.clientEmail });
    const mail = await p.t.inbox.waitFor(
      (m) => !seen.has(m) && JSON.stringify(m.to).includes(f.clientEmail) && /token=/.test(m.text ?? ''),
    );
    await signInByLink(tab, linkIn(mail));
    const fromTab = () => tab.agent.post(`/api/portal/invoices/${f.invoiceId}/checkout`).set('x-csrf-token', tab.csrf()).send({});
    // The processor is slow to open the first (one failed try, which the SDK retries after a pause): the others arrive meanwhile.
    p.fake.controls.failNext({
      method: 'POST',
      path: '/v1/checkout/sessions',
      status: 500,
      shouldRetry: true,
      error: { type: 'api_error', message: 'Slow.' },
    });
    const first = f.start();
    await new Promise((resolve) => setTimeout(resolve, 150));
    const answers = await Promise.all([first, fromTab(), f.start(), fromTab()]);
    expect(answers.map((a) => a.status)).toEqual([201, 201, 201, 201]);
    const ids = new Set(answers.map((a) => (a.body as { checkoutId: string }).checkoutId));
    expect(ids.size).toBe(1);
    const stripe = processorFor(p.t.ctx.config)!;
    const sessions = (await stripe.checkout.sessions.list({ limit: 100 })).data.filter((s) => s.metadata?.['invoice_id'] === f.invoiceId);
    expect(sessions).toHaveLength(1);
  });

  it('refuses a void or paid invoice, an amount below the smallest card payment, and another client’s invoice', async () => {
    const f = await clientInvoice(p.t, 'Checkout Refusal Plaster', { status: 'void', amountCredited: '250.00' });
    const voided = await f.start();
    expect(voided.status).toBe(409);
    expect(voided.body.detail).toBe('Invoice INV-0001 is void: there is nothing to pay.');

    const paid = await insertInvoice(p.t, f.firmId, f.jobId, {
      kind: 'milestone',
      status: 'paid',
      number: 2,
      total: '500.00',
      amountPaid: '500.00',
    });
    expect((await f.start(paid)).status).toBe(409);
    expect((await f.start(paid)).body.detail).toBe('Invoice INV-0002 is already paid.');

    // Refunded: the firm gave the money back, so the portal does not chase it.
    const refunded = await insertInvoice(p.t, f.firmId, f.jobId, { kind: 'milestone', status: 'refunded', number: 5, total: '300.00' });
    const refusedRefunded = await f.start(refunded);
    expect([refusedRefunded.status, refusedRefunded.body.detail]).toEqual([
      409,
      'The firm gave back what was paid on this invoice, so it is not paid by card here. Please ask the firm.',
    ]);
    expect((await f.client.agent.get(`/api/portal/invoices/${refunded}`)).body).toMatchObject({
      canPayOnline: false,
      payOnlineReason: { code: 'refunded' },
    });

    // Stripe Docs "Supported currencies" — minimum charge amounts: USD 0.50.
    const small = await insertInvoice(p.t, f.firmId, f.jobId, { kind: 'milestone', status: 'issued', number: 3, total: '0.40' });
    const below = await f.start(small);
    expect(below.status).toBe(409);
    expect(below.body.errors).toEqual([{ field: 'amount', message: 'Below the smallest card payment, 0.50 USD; please pay another way.' }]);
    const smallView = (await f.client.agent.get(`/api/portal/invoices/${small}`)).body as PortalInvoiceDetail;
    expect(smallView).toMatchObject({
      canPayOnline: false,
      payOnlineReason: { code: 'belowMinimum', currency: 'USD', minimum: '0.50' },
    });
    const atMinimum = await insertInvoice(p.t, f.firmId, f.jobId, { kind: 'milestone', status: 'issued', number: 4, total: '0.50' });
    expect((await f.start(atMinimum)).status).toBe(201);

    const neighbour = await otherClientOf(p.t, f);
    const other = await neighbour.agent.post(`/api/portal/invoices/${atMinimum}/checkout`).set('x-csrf-token', neighbour.csrf()).send({});
    expect(other.status).toBe(404);
    expect(
      (await neighbour.agent.get(`/api/portal/invoices/${atMinimum}/checkout/${'0'.repeat(8)}-0000-4000-8000-${'0'.repeat(12)}`)).status,
    ).toBe(404);
    expect((await f.client.agent.post(`/api/portal/invoices/${atMinimum}/checkout`).send({})).status).toBe(403);
    expect((await f.client.agent.post(`/api/portal/invoices/nope/checkout`).set('x-csrf-token', f.client.csrf()).send({})).status).toBe(
      400,
    );
    expect((await f.agent.post(`/api/portal/invoices/${atMinimum}/checkout`).set('x-csrf-token', f.csrf()).send({})).status).toBe(401);
  });

  it('offers no card payment when online payments are off', async () => {
    const f = await clientInvoice(p.t, 'Checkout Off Plaster');
    // The same signed-in client on a server without a processor key (sessions live in PostgreSQL).
    const session = await f.client.agent.get('/api/portal/session');
    const cookie = session.request.cookies;
    const csrf = (session.body as { csrfToken: string }).csrfToken;
    const view = (await request(off.app).get(`/api/portal/invoices/${f.invoiceId}`).set('cookie', cookie)).body as PortalInvoiceDetail;
    expect(view).toMatchObject({ amountDue: '250.00', canPayOnline: false, payOnlineReason: null });
    const res = await request(off.app)
      .post(`/api/portal/invoices/${f.invoiceId}/checkout`)
      .set('cookie', cookie)
      .set('x-csrf-token', csrf)
      .send({});
    expect(res.status).toBe(409);
    expect(res.body.detail).toBe('This firm takes no card payments online; the invoice says how to pay.');
    const webhook = await request(off.app).post('/api/payments/webhook').set('stripe-signature', 't=1,v1=x').send('{}');
    expect(webhook.status).toBe(503);
  });
});
