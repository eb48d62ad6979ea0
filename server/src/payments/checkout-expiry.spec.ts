import type { BillingToday } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { clientInvoice, eventually, invoiceBooks, type PaymentsServer, startPaymentsServer, storedEvents } from './checkout-fixtures';
import { processorFor } from './processor';

/*
 * A checkout asks for the amount due when it opened. Once the invoice no longer asks that — settled
 * another way, or a newer checkout opened for what is due now — its processor page stops taking
 * money; and a payment that still lands there is kept as the client's credit, noted for a person,
 * and the return page says so.
 */

let p: PaymentsServer;
beforeAll(async () => {
  p = await startPaymentsServer();
});
afterAll(() => p.stop());

const stripe = () => processorFor(p.t.ctx.config)!;
const atProcessor = async (sessionId: string) => (await stripe().checkout.sessions.retrieve(sessionId)).status;

const checkoutStates = (firmId: string, invoiceId: string) =>
  withTenant(p.t.ctx.pool, firmId, async (tx) => {
    const { rows } = await tx.client.query<{ id: string; status: string }>(
      `select id, status from checkout_sessions where tenant_id = $1 and invoice_id = $2`,
      [tx.tenantId, invoiceId],
    );
    return Object.fromEntries(rows.map((r) => [r.id, r.status]));
  });

const cheque = (f: Awaited<ReturnType<typeof clientInvoice>>, amount: string) =>
  f.agent
    .post(`/api/invoices/${f.invoiceId}/payments`)
    .set('x-csrf-token', f.csrf())
    .send({ method: 'cheque', amount, receivedOn: '2026-12-01', reference: '1042' });

describe('checkouts the invoice no longer asks for', () => {
  it('expires the older checkout when a newer one opens for a changed amount due; the newer stays payable', async () => {
    const f = await clientInvoice(p.t, 'Two Tabs Plaster');
    const older = await f.started();
    expect((await cheque(f, '100.00')).status).toBe(200);
    // 250.00 − 100.00 = 150.00 now due: a new checkout for it
    const newer = await f.started();
    expect(newer.checkoutId).not.toBe(older.checkoutId);
    await eventually(async () => (await atProcessor(older.sessionId)) === 'expired', 'the older session expired');
    await eventually(
      async () => (await checkoutStates(f.firmId, f.invoiceId))[older.checkoutId] === 'expired',
      'our older checkout marked expired',
    );
    expect(p.fake.controls.pay(older.sessionId).ok).toBe(false);
    expect(await atProcessor(newer.sessionId)).toBe('open');
    expect((await checkoutStates(f.firmId, f.invoiceId))[newer.checkoutId]).toBe('open');
    expect(p.fake.controls.pay(newer.sessionId).ok).toBe(true);
    await eventually(async () => (await f.status(newer.checkoutId)).state === 'paid', 'the newer checkout paid');
    expect(await invoiceBooks(p.t, f.firmId, f.invoiceId)).toMatchObject({ status: 'paid', amountPaid: '250.00', credits: [] });
  });

  it('expires an open checkout of an invoice a cheque settled, by the job the cheque queues', async () => {
    const f = await clientInvoice(p.t, 'Cheque Settled Plaster');
    const started = await f.started();
    expect((await cheque(f, '250.00')).status).toBe(200);
    await eventually(async () => (await atProcessor(started.sessionId)) === 'expired', 'the session expired');
    await eventually(async () => (await checkoutStates(f.firmId, f.invoiceId))[started.checkoutId] === 'expired', 'ours marked expired');
    expect(p.fake.controls.pay(started.sessionId).ok).toBe(false);
    // nothing left to expire: the reconciliation's run leaves it alone
    expect((await p.reconcile()).checkoutsExpired).toBe(0);
  });

  it('expires at the reconciliation’s next run a stale checkout no job expired (one that gave up)', async () => {
    const f = await clientInvoice(p.t, 'Swept Plaster');
    const started = await f.started();
    // Settled in a way that queued nothing: the invoice stops asking while its card page stays open.
    await withTenant(p.t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update invoices set status = 'void' where tenant_id = $1 and id = $2`, [f.firmId, f.invoiceId]),
    );
    const report = await p.reconcile();
    expect(report.checkoutsExpired).toBeGreaterThanOrEqual(1);
    expect(await atProcessor(started.sessionId)).toBe('expired');
    expect((await checkoutStates(f.firmId, f.invoiceId))[started.checkoutId]).toBe('expired');
    expect((await p.reconcile()).checkoutsExpired).toBe(0);
  });

  it('keeps a card payment that lands on a voided invoice as credit, notes it on Today, and the return page says so', async () => {
    const f = await clientInvoice(p.t, 'Paid As Voided Plaster');
    const started = await f.started();
    // The client pays at the processor the moment the office voids: its word reaches us after the void.
    p.fake.controls.hold();
    expect(p.fake.controls.pay(started.sessionId).ok).toBe(true);
    const voided = await f.agent.post(`/api/invoices/${f.invoiceId}/void`).set('x-csrf-token', f.csrf()).send({ reason: 'Job cancelled' });
    expect(voided.status).toBe(200);
    await p.fake.controls.release();
    await p.fake.controls.idle();
    const applied = await eventually(
      async () => (await storedEvents(p.t, f.firmId)).find((e) => e.type === 'checkout.session.completed' && e.applied_at),
      'the payment recorded',
    );
    expect(applied.outcome).toBe('Needs attention: Payment RCT-0001 recorded: 250.00 USD, 250.00 kept as credit (the invoice is void)');
    expect(await invoiceBooks(p.t, f.firmId, f.invoiceId)).toMatchObject({
      status: 'void',
      amountPaid: '0.00',
      credits: [{ amount: '250.00', currency: 'USD', note: 'Paid after INV-0001 was voided.' }],
    });
    expect(await f.status(started.checkoutId)).toMatchObject({
      state: 'paid',
      receiptNumber: 'RCT-0001',
      credit: { amount: '250.00', currency: 'USD', isWholePayment: true },
    });
    // Today's money panel lists it until someone deals with it, and the invoice's history says what happened
    const notes = ((await f.agent.get('/api/billing/today')).body as BillingToday).needsAttention;
    expect(notes.map((n) => [n.reason, n.invoiceNumber, n.amount, n.currency])).toEqual([
      ['paidWhenNotAsked', 'INV-0001', '250.00', 'USD'],
    ]);
    const trail = (await f.agent.get(`/api/invoices/${f.invoiceId}`)).body.auditTrail as { action: string; text: string }[];
    expect(trail.find((a) => a.action === 'invoice.payment_needs_attention')?.text).toBe(
      "A card payment of $250.00 came in after the invoice stopped asking for it; kept as the client's credit ($250.00)",
    );
  });

  it('says a card payment went on the invoice in full when it did: no credit', async () => {
    const f = await clientInvoice(p.t, 'Paid In Full Plaster');
    const started = await f.started();
    expect(p.fake.controls.pay(started.sessionId).ok).toBe(true);
    await eventually(async () => (await f.status(started.checkoutId)).state === 'paid', 'the payment recorded');
    expect(await f.status(started.checkoutId)).toMatchObject({ state: 'paid', credit: null });
    expect(((await f.agent.get('/api/billing/today')).body as BillingToday).needsAttention).toEqual([]);
  });
});
