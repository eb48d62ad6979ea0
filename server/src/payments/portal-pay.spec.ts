import type { InvoiceDetail, PortalInvoiceDetail, PortalStatement } from '@layerbook/contracts';
import { clientInvoice, type PaymentsServer, startPaymentsServer } from './checkout-fixtures';
import { payOnlineFor } from './portal-pay';
import { recordPayment } from './record-payment';
import { SYSTEM_ACTOR } from '../http/actor';
import { withTenant } from '@layerbook/db';

describe('payOnlineFor', () => {
  const open = { status: 'issued' as const, currency: 'USD', amountDue: '250.00' };

  it('offers a card payment for an open or part-paid invoice with something due, at least the smallest charge', () => {
    expect(payOnlineFor(true, open)).toEqual({ canPayOnline: true, payOnlineReason: null });
    expect(payOnlineFor(true, { ...open, status: 'part_paid' }).canPayOnline).toBe(true);
    // Stripe Docs "Supported currencies" — minimum charge amounts: USD 0.50, JPY ¥50, GBP 0.30.
    expect(payOnlineFor(true, { ...open, amountDue: '0.50' }).canPayOnline).toBe(true);
    expect(payOnlineFor(true, { ...open, currency: 'JPY', amountDue: '50' }).canPayOnline).toBe(true);
    expect(payOnlineFor(true, { ...open, currency: 'GBP', amountDue: '0.30' }).canPayOnline).toBe(true);
  });

  it('says why not, as a code with its values, when the invoice is open but below the smallest charge or in a currency without one', () => {
    expect(payOnlineFor(true, { ...open, amountDue: '0.49' })).toEqual({
      canPayOnline: false,
      payOnlineReason: { code: 'belowMinimum', currency: 'USD', minimum: '0.50' },
    });
    expect(payOnlineFor(true, { ...open, currency: 'JPY', amountDue: '49' }).payOnlineReason).toEqual({
      code: 'belowMinimum',
      currency: 'JPY',
      minimum: '50',
    });
    // No minimum published for the currency (processorMinimumCharge null): not offered.
    expect(payOnlineFor(true, { ...open, currency: 'XOF', amountDue: '50000' }).payOnlineReason).toEqual({
      code: 'currencyNotOffered',
      currency: 'XOF',
    });
  });

  it('does not offer a refunded invoice (the firm gave the money back), and says why', () => {
    expect(payOnlineFor(true, { ...open, status: 'refunded' })).toEqual({ canPayOnline: false, payOnlineReason: { code: 'refunded' } });
    expect(payOnlineFor(false, { ...open, status: 'refunded' })).toEqual({ canPayOnline: false, payOnlineReason: null });
  });

  it('is silent when online payments are off, nothing is due, or the invoice is not open', () => {
    const none = { canPayOnline: false, payOnlineReason: null };
    expect(payOnlineFor(false, open)).toEqual(none);
    expect(payOnlineFor(true, { ...open, amountDue: '0.00' })).toEqual(none);
    for (const status of ['draft', 'paid', 'void'] as const) expect(payOnlineFor(true, { ...open, status })).toEqual(none);
  });
});

describe('the portal invoice and statement after payments and refunds', () => {
  let p: PaymentsServer;
  beforeAll(async () => {
    p = await startPaymentsServer();
  });
  afterAll(() => p.stop());

  it('lists the receipts and shows a refund on the statement as a negative credit that raises the balance', async () => {
    p.t.setNow(new Date('2026-12-05T15:00:00Z'));
    const f = await clientInvoice(p.t, 'Receipts Statement Plaster', { issuedOn: '2026-12-01' });
    const paid = await f.agent
      .post(`/api/invoices/${f.invoiceId}/payments`)
      .set('x-csrf-token', f.csrf())
      .send({ method: 'cheque', amount: '250.00', receivedOn: '2026-12-02', reference: '1042' });
    expect(paid.status).toBeLessThan(300);
    const payment = ((await f.agent.get(`/api/invoices/${f.invoiceId}`)).body as InvoiceDetail).payments[0];
    const refund = await f.agent
      .post(`/api/payments/${payment.id}/refunds`)
      .set('x-csrf-token', f.csrf())
      .send({ method: 'cheque', amount: '50.00', reason: 'Less plaster used', refundedOn: '2026-12-03', reference: '77' });
    expect([refund.status, refund.body]).toEqual([201, expect.objectContaining({ status: 'succeeded' })]);

    const view = (await f.client.agent.get(`/api/portal/invoices/${f.invoiceId}`)).body as PortalInvoiceDetail;
    expect(view.receipts.map((r) => [r.kind, r.number, r.on, r.method, r.amount])).toEqual([
      ['payment', 'RCT-0001', '2026-12-02', 'cheque', '250.00'],
      ['refund', 'RCT-0002', '2026-12-03', 'cheque', '50.00'],
    ]);
    // 50.00 owed again after the refund: an open (part-paid) invoice above the USD minimum can be paid by card.
    expect(view).toMatchObject({ status: 'part_paid', amountDue: '50.00', canPayOnline: true, payOnlineReason: null });

    const statement = (await f.client.agent.get(`/api/portal/jobs/${f.jobId}/statement`)).body as PortalStatement;
    expect(statement.lines.map((l) => [l.on, l.kind, l.text, l.charge, l.credit, l.balance])).toEqual([
      ['2026-12-01', 'invoice', 'INV-0001 Deposit', '250.00', '0.00', '250.00'],
      ['2026-12-02', 'payment', 'Payment by cheque 1042', '0.00', '250.00', '0.00'],
      ['2026-12-03', 'refund', 'Refund by cheque 77', '0.00', '-50.00', '50.00'],
    ]);
    expect(statement).toMatchObject({ invoiced: '250.00', paid: '200.00', balanceDue: '50.00' });
  });

  it('tells a Spanish-reading client why there is no pay button as a code with its values, never in English words', async () => {
    // The portal says the reason in the reader's words (payments.pay.why.*); before, a fixed English
    // note landed inside the Spanish sentence around it.
    p.t.setNow(new Date('2026-12-05T15:00:00Z'));
    const f = await clientInvoice(p.t, 'Yeso Fino Estudio', { total: '0.40', lines: [{ label: 'Deposit', amount: '0.40' }] });
    await withTenant(p.t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(
        `update clients set language = 'es' where tenant_id = $1 and id = (select client_id from invoices where tenant_id = $1 and id = $2)`,
        [tx.tenantId, f.invoiceId],
      ),
    );
    const view = (await f.client.agent.get(`/api/portal/invoices/${f.invoiceId}`)).body as PortalInvoiceDetail;
    expect(view).toMatchObject({ canPayOnline: false, payOnlineReason: { code: 'belowMinimum', currency: 'USD', minimum: '0.50' } });
    expect(view).not.toHaveProperty('payOnlineNote');
    // Starting a checkout anyway: the 409 names `amount`, which the portal maps to its own words.
    const refused = await f.start();
    expect([refused.status, refused.body.errors?.map((e: { field: string }) => e.field)]).toEqual([409, ['amount']]);

    // A currency the processor publishes no card charge for: the reason names it, the 409 names `currency`
    // (not `amount`, which the portal would read as "below the smallest payment").
    await withTenant(p.t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update invoices set currency = 'XOF', total = 50000 where tenant_id = $1 and id = $2`, [tx.tenantId, f.invoiceId]),
    );
    const xof = (await f.client.agent.get(`/api/portal/invoices/${f.invoiceId}`)).body as PortalInvoiceDetail;
    expect(xof).toMatchObject({ canPayOnline: false, payOnlineReason: { code: 'currencyNotOffered', currency: 'XOF' } });
    const refusedXof = await f.start();
    expect([refusedXof.status, refusedXof.body.errors?.map((e: { field: string }) => e.field)]).toEqual([409, ['currency']]);
  });

  it('counts only what went on the invoice: a card payment taken in another currency is the client’s credit, not this job’s', async () => {
    p.t.setNow(new Date('2026-12-05T15:00:00Z'));
    const f = await clientInvoice(p.t, 'Other Currency Statement Plaster', { issuedOn: '2026-12-01' });
    await withTenant(p.t.ctx.pool, f.firmId, (tx) =>
      recordPayment(tx, SYSTEM_ACTOR, {
        invoiceId: f.invoiceId,
        method: 'card',
        amount: '250.00',
        currency: 'EUR',
        receivedOn: '2026-12-02',
        reference: 'pi_other_currency',
      }),
    );
    const view = (await f.client.agent.get(`/api/portal/invoices/${f.invoiceId}`)).body as PortalInvoiceDetail;
    const statement = (await f.client.agent.get(`/api/portal/jobs/${f.jobId}/statement`)).body as PortalStatement;
    expect(statement.lines.map((l) => l.kind)).toEqual(['invoice']);
    expect(statement).toMatchObject({ paid: '0.00', balanceDue: view.amountDue });
    expect(view.amountDue).toBe('250.00');
  });
});
