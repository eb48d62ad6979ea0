import type { DeliveryAttempt } from '@layerbook/stripe-fake';
import Stripe from 'stripe';
import { insertInvoice } from '../billing/pdf/invoice-fixtures';
import { QUEUES } from '../queue/queues';
import { storeEvent } from './events';
import { requeueUnapplied } from './reconcile';
import {
  WEBHOOK_SECRET,
  clientInvoice,
  eventually,
  invoiceBooks,
  type PaymentsServer,
  startPaymentsServer,
  storedEvents,
} from './checkout-fixtures';

let p: PaymentsServer;
beforeAll(async () => {
  p = await startPaymentsServer();
});
afterAll(() => p.stop());

const allApplied = async (firmId: string, count: number) => {
  const events = await storedEvents(p.t, firmId);
  return events.length >= count && events.every((e) => e.applied_at) ? events : null;
};

/** The figures the exactly-once check prints: what was sent, answered, stored, applied, and paid. */
function figures(attempts: readonly DeliveryAttempt[], stored: number, applied: number, payments: number, receipts: number) {
  return {
    deliveries: attempts.length,
    '2xx': attempts.filter((a) => a.status !== null && a.status < 300).length,
    '4xx': attempts.filter((a) => a.status !== null && a.status >= 400 && a.status < 500).length,
    stored,
    applied,
    payments,
    receipts,
  };
}

describe('webhook: exactly once', () => {
  it('one payment however its completed event arrives: five times, out of order, late, badly signed', async () => {
    const f = await clientInvoice(p.t, 'Exactly Once Plaster');
    const checkout = await f.started();
    p.fake.controls.hold();
    expect(p.fake.controls.pay(checkout.sessionId).ok).toBe(true);
    const completed = p.fake.controls.lastEvent('checkout.session.completed')!;
    const ours = p.fake.controls.events().filter((e) => e.created >= completed.created - 5);

    // Late: signed more than Stripe's 300 s tolerance ago — refused, nothing stored.
    const stale = await p.fake.controls.deliverStale(completed.id, { ageSeconds: 600 });
    expect(stale.status).toBe(400);
    // Badly signed — refused, nothing stored.
    const bad = await p.fake.controls.deliverBadlySigned(completed.id);
    expect(bad.status).toBe(400);
    expect(await storedEvents(p.t, f.firmId)).toEqual([]);

    // Out of order: the held deliveries go newest first (the completed event before those created ahead of it).
    const released = await p.fake.controls.release('reverse');
    expect(released.map((a) => a.eventId)).toEqual(ours.map((e) => e.id).reverse());
    // Five more deliveries of the completed event, all at once.
    const again = await p.fake.controls.deliverAgain(completed.id, { times: 5, concurrently: true });
    expect(again.map((a) => a.status)).toEqual([200, 200, 200, 200, 200]);
    await p.fake.controls.idle();
    const events = await eventually(() => allApplied(f.firmId, 1), 'the stored events applied');
    // The reconciliation finds nothing missing.
    expect((await p.reconcile()).stored).toBe(0);

    const books = await invoiceBooks(p.t, f.firmId, f.invoiceId);
    expect(books.status).toBe('paid');
    expect(books.payments.map((x) => [x.amount, x.amount_applied, x.receipt_no])).toEqual([['250.00', '250.00', 1]]);
    expect(events.filter((e) => e.id === completed.id)).toEqual([
      expect.objectContaining({ received_via: 'webhook', outcome: 'Payment RCT-0001 recorded: 250.00 USD' }),
    ]);
    // Each stored event is one of the processor's (by id), stored once.
    expect(new Set(events.map((e) => e.id)).size).toBe(events.length);

    const attempts = p.fake.controls.attempts().filter((a) => ours.some((e) => e.id === a.eventId));
    const row = figures(
      attempts,
      events.length,
      events.filter((e) => e.applied_at).length,
      books.payments.length,
      books.payments.filter((x) => x.receipt_no !== null).length,
    );
    console.log(`Webhook exactly once (one checkout paid):\n${JSON.stringify(row)}`);
    console.table([row]);
    expect(row).toMatchObject({ '4xx': 2, payments: 1, receipts: 1 });
    expect(row['2xx']).toBe(attempts.length - 2);
  });

  it('a payment whose every delivery came late is found by the reconciliation and applied once', async () => {
    const f = await clientInvoice(p.t, 'Late Delivery Plaster');
    const checkout = await f.started();
    p.fake.controls.hold();
    p.fake.controls.pay(checkout.sessionId);
    const completed = p.fake.controls.lastEvent('checkout.session.completed')!;
    expect((await p.fake.controls.deliverStale(completed.id)).status).toBe(400);
    expect(await storedEvents(p.t, f.firmId)).toEqual([]);

    const report = await p.reconcile();
    expect(report.stored).toBeGreaterThanOrEqual(1);
    const events = await eventually(() => allApplied(f.firmId, 1), 'the reconciled events applied');
    expect(events.find((e) => e.id === completed.id)).toMatchObject({
      received_via: 'reconcile',
      outcome: 'Payment RCT-0001 recorded: 250.00 USD',
    });
    // The held deliveries arrive after all: answered 200, nothing more recorded.
    const late = await p.fake.controls.release();
    expect(late.every((a) => a.status === 200)).toBe(true);
    await p.fake.controls.idle();
    await eventually(() => allApplied(f.firmId, events.length), 'all applied');
    const books = await invoiceBooks(p.t, f.firmId, f.invoiceId);
    expect([books.status, books.payments.length]).toEqual(['paid', 1]);
  });

  it('the reconciliation job on the queue finds a payment whose deliveries are held back', async () => {
    const f = await clientInvoice(p.t, 'Queued Reconcile Plaster');
    const checkout = await f.started();
    p.fake.controls.hold();
    p.fake.controls.pay(checkout.sessionId);
    const completed = p.fake.controls.lastEvent('checkout.session.completed')!;
    await p.t.queue.boss.send(QUEUES.paymentsReconcile, {});
    const events = await eventually(async () => {
      const stored = await storedEvents(p.t, f.firmId);
      return stored.find((e) => e.id === completed.id && e.applied_at) ? stored : null;
    }, 'the reconciled payment applied');
    expect(events.find((e) => e.id === completed.id)?.received_via).toBe('reconcile');
    await p.fake.controls.release();
    await p.fake.controls.idle();
    expect((await invoiceBooks(p.t, f.firmId, f.invoiceId)).payments).toHaveLength(1);
  });

  it('the return page, the webhook and the reconciliation fulfilling at once record one payment', async () => {
    const f = await clientInvoice(p.t, 'Three Ways Plaster');
    const second = await insertInvoice(p.t, f.firmId, f.jobId, { kind: 'milestone', status: 'issued', number: 2, total: '800.00' });
    for (const invoiceId of [f.invoiceId, second]) {
      const checkout = await f.started(invoiceId);
      p.fake.controls.hold();
      p.fake.controls.pay(checkout.sessionId);
      const completed = p.fake.controls.lastEvent('checkout.session.completed')!;
      await Promise.all([
        f.status(checkout.checkoutId, invoiceId),
        f.status(checkout.checkoutId, invoiceId),
        p.fake.controls.release(),
        p.fake.controls.deliverAgain(completed.id, { times: 3, concurrently: true }),
        p.reconcile(),
      ]);
      await p.fake.controls.idle();
      await eventually(async () => (await storedEvents(p.t, f.firmId)).find((e) => e.id === completed.id && e.applied_at), 'applied');
      expect(await f.status(checkout.checkoutId, invoiceId)).toMatchObject({ state: 'paid' });
      const books = await invoiceBooks(p.t, f.firmId, invoiceId);
      expect([books.status, books.payments.length]).toEqual(['paid', 1]);
    }
  });

  it('queues an event that cannot apply yet again at most once per slot, however often the reconciliation runs', async () => {
    const f = await clientInvoice(p.t, 'Requeue Once Plaster');
    // A refund of a payment never recorded here: its application fails and is retried, the event stays unapplied.
    const event = {
      id: `evt_stuck_${Date.now()}`,
      object: 'event',
      type: 'refund.created',
      created: Math.floor(Date.now() / 1000),
      data: {
        object: {
          id: `re_stuck_${Date.now()}`,
          object: 'refund',
          status: 'succeeded',
          amount: 100,
          currency: 'usd',
          payment_intent: 'pi_never',
          metadata: { tenant_id: f.firmId },
        },
      },
    } as unknown as Stripe.Event;
    expect(await storeEvent(p.t.ctx.pool, p.t.queue, f.firmId, event, 'webhook')).toBe('stored');
    const later = new Date(Date.now() + 120_000);
    for (let run = 0; run < 3; run++) expect(await requeueUnapplied(p.jobsPool, p.t.queue, later)).toBeGreaterThanOrEqual(1);
    const { rows } = await p.jobsPool.query<{ n: string }>(
      `select count(*)::text as n from pgboss.job where name = $1 and singleton_key = $2`,
      [QUEUES.paymentsApply, `apply:${event.id}`],
    );
    expect(rows[0].n).toBe('1');
    expect((await storedEvents(p.t, f.firmId)).find((e) => e.id === event.id)?.applied_at).toBeNull();
  });

  it('answers 400 to a missing signature and 200 (not stored) to an event of no firm of ours', async () => {
    const missing = await fetch(p.webhookUrl, { method: 'POST', body: '{}', headers: { 'content-type': 'application/json' } });
    expect(missing.status).toBe(400);
    expect(((await missing.json()) as { errors: unknown }).errors).toEqual([
      { field: 'stripe-signature', message: 'The signature header is missing.' },
    ]);
    // Events signed right but naming no firm of ours: answered 200 so the processor stops sending, not stored.
    const post = async (event: object) => {
      const payload = JSON.stringify(event);
      const header = Stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET });
      const res = await fetch(p.webhookUrl, {
        method: 'POST',
        body: payload,
        headers: { 'content-type': 'application/json', 'stripe-signature': header },
      });
      return [res.status, await res.json()];
    };
    const event = (id: string, metadata: object) => ({
      id,
      object: 'event',
      type: 'checkout.session.completed',
      created: Math.floor(Date.now() / 1000),
      data: { object: { id: `cs_${id}`, object: 'checkout.session', metadata } },
    });
    expect(await post(event('evt_no_firm', {}))).toEqual([200, { received: true, stored: false }]);
    expect(await post(event('evt_unknown_firm', { tenant_id: '00000000-0000-4000-8000-000000000000' }))).toEqual([
      200,
      { received: true, stored: false },
    ]);
  });
});
