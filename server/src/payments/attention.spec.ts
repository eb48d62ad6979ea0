import type { BillingToday, CashReceived, InvoiceDetail, Problem } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import type Stripe from 'stripe';
import { joinAs } from '../proposals/proposal-fixtures';
import { signUpFirm } from '../testing/harness';
import { clientInvoice, type PaymentsServer, startPaymentsServer } from './checkout-fixtures';
import { fulfilCheckoutSession } from './fulfil';

/*
 * What the card processor leaves for a person: a payment in another amount or currency than the
 * checkout asked is recorded and noted on its invoice; Today's money panel lists the notes until
 * someone marks them dealt with; money taken in another currency is not added to the firm's cash.
 */

let p: PaymentsServer;
let f: Awaited<ReturnType<typeof clientInvoice>>;
beforeAll(async () => {
  p = await startPaymentsServer();
  f = await clientInvoice(p.t, 'Attention Plaster', { total: '1000.00' });
  for (const [id, amount, total, currency] of [
    ['cs_test_att_short', '1000.00', 20000, 'usd'],
    ['cs_test_att_euro', '800.00', 80000, 'eur'],
  ] as const) {
    await withTenant(p.t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(
        `insert into checkout_sessions (tenant_id, invoice_id, client_id, processor_session_id, amount, currency, url)
         select tenant_id, id, client_id, $3, $4, 'USD', 'http://127.0.0.1/pay' from invoices where tenant_id = $1 and id = $2`,
        [tx.tenantId, f.invoiceId, id, amount],
      ),
    );
    const session = { id, object: 'checkout.session', status: 'complete', payment_status: 'paid', amount_total: total, currency };
    // Delivered twice, as the processor may: one payment, one note.
    for (let i = 0; i < 2; i++) {
      await withTenant(p.t.ctx.pool, f.firmId, (tx) =>
        fulfilCheckoutSession(
          tx,
          { queue: p.t.queue, config: p.t.ctx.config },
          session as Stripe.Checkout.Session,
          p.t.ctx.now(),
          p.t.ctx.now(),
        ),
      );
    }
  }
});
afterAll(() => p.stop());

const today = async () => (await f.agent.get('/api/billing/today')).body as BillingToday;
const clear = (agent = f.agent, csrf = f.csrf(), id: string) =>
  agent.post(`/api/billing/attention/${id}/clear`).set('x-csrf-token', csrf).send({});

describe('card payments to check', () => {
  it("are on Today's money panel, oldest first, with what was paid and what was asked in each one's currency", async () => {
    const notes = (await today()).needsAttention;
    expect(
      notes.map(({ reason, invoiceNumber, clientName, amount, currency, asked, askedCurrency }) => ({
        reason,
        invoiceNumber,
        clientName,
        amount,
        currency,
        asked,
        askedCurrency,
      })),
    ).toEqual([
      {
        reason: 'paidOtherAmount',
        invoiceNumber: 'INV-0001',
        clientName: expect.any(String),
        amount: '200.00',
        currency: 'USD',
        asked: '1000.00',
        askedCurrency: 'USD',
      },
      {
        reason: 'paidOtherAmount',
        invoiceNumber: 'INV-0001',
        clientName: expect.any(String),
        amount: '800.00',
        currency: 'EUR',
        asked: '800.00',
        askedCurrency: 'USD',
      },
    ]);
    expect(notes.every((n) => n.invoiceId === f.invoiceId)).toBe(true);
  });

  it("leave euros out of a dollar firm's cash: only the 200.00 taken in the invoice's currency is received", async () => {
    const received = (await f.agent.get('/api/cash/received')).body as CashReceived;
    expect(received.totals.received).toBe('200.00');
  });

  it('are refused to crew (403), bad ids (400 naming the id) and other firms (404)', async () => {
    const [note] = (await today()).needsAttention;
    const crew = await joinAs(p.t, f, 'crew');
    expect((await clear(crew.agent, crew.csrf(), note.id)).status).toBe(403);
    expect((await crew.agent.get('/api/billing/today')).status).toBe(403);
    const bad = await clear(f.agent, f.csrf(), 'not-a-uuid');
    expect(bad.status).toBe(400);
    expect((bad.body as Problem).errors?.map((e) => e.field)).toEqual(['id']);
    const other = await signUpFirm(p.t.app, 'Other Attention Studio');
    expect((await clear(other.agent, other.csrf(), note.id)).status).toBe(404);
    // An audit entry that is no note is not one to clear.
    const [entry] = await withTenant(
      p.t.ctx.pool,
      f.firmId,
      async (tx) =>
        (
          await tx.client.query<{ id: string }>(`select id from audit_log where tenant_id = $1 and action = 'proposal.accepted'`, [
            tx.tenantId,
          ])
        ).rows,
    );
    expect((await clear(f.agent, f.csrf(), entry.id)).status).toBe(404);
    expect((await today()).needsAttention).toHaveLength(2);
  });

  it('go once marked dealt with, stay in the invoice’s trail, and two people clearing at once write one entry', async () => {
    const [first, second] = (await today()).needsAttention;
    const answers = await Promise.all([clear(f.agent, f.csrf(), first.id), clear(f.agent, f.csrf(), first.id)]);
    expect(answers.map((a) => a.status)).toEqual([204, 204]);
    expect((await today()).needsAttention.map((n) => n.id)).toEqual([second.id]);
    const cleared = await withTenant(
      p.t.ctx.pool,
      f.firmId,
      async (tx) =>
        (await tx.client.query(`select 1 from audit_log where tenant_id = $1 and action = 'invoice.attention_cleared'`, [tx.tenantId]))
          .rowCount,
    );
    expect(cleared).toBe(1);
    const detail = (await f.agent.get(`/api/invoices/${f.invoiceId}`)).body as InvoiceDetail;
    const trail = detail.auditTrail.map((e) => e.text);
    expect(trail).toEqual(
      expect.arrayContaining([
        'A card payment needs checking: paid $200.00 where the checkout asked $1,000.00',
        'A card payment needs checking: paid €800.00 where the checkout asked $800.00',
        'Marked as dealt with',
      ]),
    );
  });
});
