import { createSession, type Rig, startRig } from './spec-helpers';

/** The card form as a browser posts it. */
const post = (url: string, fields: Record<string, string>) =>
  fetch(url, { method: 'POST', body: new URLSearchParams(fields), redirect: 'manual' });

const nextYear = String((new Date().getUTCFullYear() + 1) % 100).padStart(2, '0');

// The hosted page is reached at the session's url (created through the SDK).
describe('the hosted payment page', () => {
  let rig: Rig;
  beforeAll(async () => {
    rig = await startRig();
  });
  afterAll(() => rig.stop());

  it('shows what is paid, the card fields with labels, and the way back', async () => {
    const session = await createSession(rig.stripe);
    const res = await fetch(session.url!);
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain('<html lang="en">');
    expect(html).toContain('<title>Pay $1,250.00</title>');
    expect(html).toContain('INV-0007 Deposit — Hall in lime plaster');
    expect(html).toMatch(/<label for="number">Card number<\/label>\s*<input id="number" name="number"/);
    expect(html).toContain('<label for="expiry">');
    expect(html).toContain('<label for="cvc">');
    expect(html).toContain(`<a class="back" href="${session.cancel_url}">Cancel and go back</a>`);
  });

  it('shows a decline in Stripe’s words and leaves the session open', async () => {
    const session = await createSession(rig.stripe);
    const declined = await post(session.url!, { number: '4000 0000 0000 0002', expiry: `12 / ${nextYear}`, cvc: '123' });
    expect(declined.status).toBe(402);
    expect(await declined.text()).toContain('<div class="alert" role="alert">Your card was declined.</div>');
    const poor = await post(session.url!, { number: '4000000000009995', expiry: `12/${nextYear}`, cvc: '123' });
    expect(await poor.text()).toContain('Your card has insufficient funds.');
    expect((await rig.stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('names the field to correct', async () => {
    const session = await createSession(rig.stripe);
    const badNumber = await (await post(session.url!, { number: '4242424242424241', expiry: `12/${nextYear}`, cvc: '123' })).text();
    expect(badNumber).toContain('Your card number is invalid.');
    expect(badNumber).toMatch(/id="number"[^>]*aria-invalid="true"[^>]*aria-describedby="number-hint number-error"/);
    const past = await (await post(session.url!, { number: '4242424242424242', expiry: '01/20', cvc: '123' })).text();
    expect(past).toContain('Your card&#39;s expiration year is in the past.');
    const noCvc = await (await post(session.url!, { number: '4242424242424242', expiry: `12/${nextYear}`, cvc: '' })).text();
    expect(noCvc).toContain('Your card&#39;s security code is incomplete.');
  });

  it('pays with 4242 4242 4242 4242 and goes back to the success address', async () => {
    const session = await createSession(rig.stripe);
    // The expiry as people type it: "12 / 30", "12/30" or "1230".
    const paid = await post(session.url!, { number: '4242 4242 4242 4242', expiry: `12${nextYear}`, cvc: '123' });
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`http://localhost:4300/portal/invoices/invoice-7/payment/checkout-3?session=${session.id}`);
    const after = await rig.stripe.checkout.sessions.retrieve(session.id);
    expect(after).toMatchObject({ status: 'complete', payment_status: 'paid' });
    expect(await (await fetch(session.url!)).text()).toContain('This payment is complete');
  });

  it('says when the page has expired or does not exist', async () => {
    const session = await createSession(rig.stripe);
    await rig.stripe.checkout.sessions.expire(session.id);
    expect(await (await fetch(`${rig.fake.baseUrl}/pay/${session.id}`)).text()).toContain('This payment page has expired');
    expect((await fetch(`${rig.fake.baseUrl}/pay/cs_test_nobody`)).status).toBe(404);
  });
});
