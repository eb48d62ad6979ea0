import type { CashReceivables, InvoiceDetail, Problem, RefundView } from '@layerbook/contracts';
import { voidWithCreditNote } from '../billing/pdf/invoice-fixtures';
import { joinAs } from '../proposals/proposal-fixtures';
import Decimal from 'decimal.js';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { issuedInvoice } from './refund-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-20T15:00:00Z'));
});
afterAll(() => t.stop());

const fieldOf = (body: unknown) => (body as Problem).errors?.[0]?.field;
const messageOf = (body: unknown) => (body as Problem).errors?.[0]?.message;

describe('offline refunds', () => {
  it('gives back part, then the rest: the invoice goes paid → part paid → refunded, each refund with its receipt and audit entry', async () => {
    const f = await issuedInvoice(t, 'Refund Lane Plaster');
    const paymentId = await f.payOffline('100.00');
    expect(await f.money(paymentId)).toMatchObject({ status: 'paid', amountPaid: '100.00', refunded: '0.00' });

    const first = await f.refund(paymentId, { amount: '30.00', method: 'cheque', reference: '2001', refundedOn: '2026-12-18' });
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({
      paymentId,
      method: 'cheque',
      status: 'succeeded',
      amount: '30.00',
      refundedOn: '2026-12-18',
      reference: '2001',
      // the payment took RCT-0001; the refund the next in the same series
      receiptNumber: 'RCT-0002',
    } satisfies Partial<RefundView>);
    // 100.00 − 30.00 = 70.00 still paid of a 100.00 invoice: part paid
    expect(await f.money(paymentId)).toMatchObject({ status: 'part_paid', amountPaid: '70.00', refunded: '30.00' });

    const second = await f.refund(paymentId, { amount: '70.00', method: 'transfer' });
    expect(second.status).toBe(201);
    // no date given: the firm's today (the default zone's date of the test clock)
    expect(second.body).toMatchObject({ status: 'succeeded', refundedOn: '2026-12-20', receiptNumber: 'RCT-0003' });
    expect(await f.money(paymentId)).toMatchObject({ status: 'refunded', amountPaid: '0.00', refunded: '100.00' });

    const trail = await f.audit('invoice.refund_recorded');
    expect(trail.map((d) => [d['amount'], d['fromApplied'], d['fromCredit'], d['statusBefore'], d['statusAfter'], d['receipt']])).toEqual([
      ['30.00', '30.00', '0.00', 'paid', 'part_paid', 'RCT-0002'],
      ['70.00', '70.00', '0.00', 'part_paid', 'refunded', 'RCT-0003'],
    ]);

    const detail = (await f.agent.get(`/api/invoices/${f.invoiceId}`)).body as InvoiceDetail;
    expect(detail.status).toBe('refunded');
    expect(detail.payments[0]).toMatchObject({ amountRefunded: '100.00', refundable: '0.00' });
    expect(detail.payments[0].refunds.map((r) => r.receiptNumber)).toEqual(['RCT-0002', 'RCT-0003']);

    const more = await f.refund(paymentId, { amount: '0.01' });
    expect(more.status).toBe(400);
    expect(fieldOf(more.body)).toBe('amount');
    expect(messageOf(more.body)).toBe('Nothing is left to refund of this 100.00 payment (100.00 already refunded).');

    // a refunded invoice takes a payment again (recordPayment counts it open)
    await f.payDirect({ amount: '40.00' });
    expect((await f.agent.get(`/api/invoices/${f.invoiceId}`)).body).toMatchObject({ status: 'part_paid' });
  });

  it('gives an overpayment back from the credit kept first, then from what went on the invoice', async () => {
    const f = await issuedInvoice(t, 'Credit Back Glaze');
    // 150.00 paid on a 100.00 invoice: 100.00 applied, 50.00 kept as credit
    const paid = await f.payDirect({ amount: '150.00' });
    expect(paid).toMatchObject({ applied: '100.00', credit: '50.00', invoiceStatus: 'paid' });

    const res = await f.refund(paid.paymentId, { amount: '60.00', method: 'cash', refundedOn: '2026-12-18' });
    expect(res.status).toBe(201);
    // 50.00 out of the credit (it comes to 0.00), 10.00 out of the applied part: 90.00 still paid, part paid
    expect(await f.money(paid.paymentId)).toMatchObject({ status: 'part_paid', amountPaid: '90.00', refunded: '60.00', credit: '0.00' });
    // The cash view owes 10.00 again, today and as of any day since the refund: the credit's 50.00 was never the invoice's.
    for (const query of ['', '?asOf=2026-12-19']) {
      expect(((await f.agent.get(`/api/cash/receivables${query}`)).body as CashReceivables).total).toBe('10.00');
    }
    const [entry] = await f.audit('invoice.refund_recorded');
    expect(entry).toMatchObject({ fromCredit: '50.00', fromApplied: '10.00' });
    const detail = (await f.agent.get(`/api/invoices/${f.invoiceId}`)).body as InvoiceDetail;
    expect(detail.clientCredits.map((c) => [c.amount, c.note])).toEqual([
      ['50.00', 'Paid beyond the amount due on INV-0001.'],
      ['-50.00', 'Refunded to the client'],
    ]);
  });

  it('gives back money paid after the invoice was voided (all of it credit), and the invoice stays void', async () => {
    const f = await issuedInvoice(t, 'Void Credit Lime');
    await voidWithCreditNote(t, f.firmId, f.invoiceId, 1, 'Billed the wrong client');
    const paid = await f.payDirect({ amount: '40.00' });
    expect(paid).toMatchObject({ applied: '0.00', credit: '40.00' });
    const res = await f.refund(paid.paymentId, { amount: '40.00', method: 'transfer', reference: 'TRF-9' });
    expect(res.status).toBe(201);
    expect(await f.money(paid.paymentId)).toMatchObject({ status: 'void', amountPaid: '0.00', refunded: '40.00', credit: '0.00' });
  });

  it('gives back money received on the firm’s tomorrow that same day, dated as the payment when no day is given', async () => {
    const f = await issuedInvoice(t, 'Tomorrow Refund Lime');
    // Recorded by an office a time zone ahead: the firm's today is December 20.
    const paymentId = await f.payOffline('60.00', 'early', '2026-12-21');
    const res = await f.refund(paymentId, { amount: '60.00', method: 'cheque', reason: 'Paid twice' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ refundedOn: '2026-12-21' });
  });

  it('refuses what it cannot do, naming the field, and writes nothing', async () => {
    const f = await issuedInvoice(t, 'Refusing Render Co');
    const paymentId = await f.payOffline('100.00');
    const cases: Array<[object, string, string | RegExp]> = [
      [{ amount: '0.00' }, 'amount', 'Enter the amount to refund.'],
      [{ amount: '10.123' }, 'amount', /at most two decimals/],
      [{ amount: '100.01' }, 'amount', 'At most 100.00 can be refunded of this 100.00 payment.'],
      [{ amount: '10.00', method: 'card' }, 'method', /Only a card payment can go back to the card/],
      // The firm's today is December 20 (New York): its tomorrow is the latest day, as for the payment itself.
      [{ amount: '10.00', refundedOn: '2026-12-22' }, 'refundedOn', 'A refund cannot be dated later than December 21, 2026.'],
      [
        { amount: '10.00', refundedOn: '2026-12-09' },
        'refundedOn',
        'A refund cannot be dated before the payment was received (December 10, 2026).',
      ],
      [{ amount: '10.00', method: 'coins' }, 'method', /Choose card/],
    ];
    for (const [body, field, message] of cases) {
      const res = await f.refund(paymentId, body as { amount: string });
      expect([res.status, fieldOf(res.body)]).toEqual([400, field]);
      expect(messageOf(res.body)).toMatch(message);
    }
    expect(await f.money(paymentId)).toMatchObject({ status: 'paid', amountPaid: '100.00', refunded: '0.00' });
    expect(await f.audit('invoice.refund_requested')).toEqual([]);

    const crew = await joinAs(t, f, 'crew');
    const asCrew = await crew.agent.post(`/api/payments/${paymentId}/refunds`).set('x-csrf-token', crew.csrf()).send({});
    expect(asCrew.status).toBe(403);
    // Asking again about a card refund is money too: 403 before whether a processor is set up (409 here).
    const askAgain = await crew.agent
      .post('/api/payments/refunds/00000000-0000-4000-8000-000000000000/send')
      .set('x-csrf-token', crew.csrf())
      .send({});
    expect(askAgain.status).toBe(403);

    const other = await signUpFirm(t.app, 'Other Firm Finishes');
    const elsewhere = await other.agent
      .post(`/api/payments/${paymentId}/refunds`)
      .set('x-csrf-token', other.csrf())
      .send({ method: 'cash', amount: '1.00', reason: '' });
    expect(elsewhere.status).toBe(404);
  });
});

describe('card payments without online payments set up', () => {
  it('refuses a refund back to the card (400 naming method) and records one by cheque', async () => {
    const f = await issuedInvoice(t, 'Key Less Plaster');
    const paid = await f.payDirect({
      method: 'card',
      amount: '100.00',
      processorSessionId: 'cs_keyless',
      processorPaymentIntentId: 'pi_keyless',
    });
    const res = await f.refund(paid.paymentId, { method: 'card', amount: '10.00' });
    expect([res.status, fieldOf(res.body), messageOf(res.body)]).toEqual([
      400,
      'method',
      'Online payments are not set up: record the refund as cheque, transfer or cash.',
    ]);
    expect((await f.refund(paid.paymentId, { method: 'cheque', amount: '10.00' })).status).toBe(201);
  });
});

describe('concurrent refunds of one payment', () => {
  it('ten refunds of 30.00 asked at once on a 100.00 payment: at most three go through, never more than was paid', async () => {
    const f = await issuedInvoice(t, 'Ten At Once Plaster');
    const paymentId = await f.payOffline('100.00');
    const answers = await Promise.all(
      Array.from({ length: 10 }, (_, i) => f.refund(paymentId, { amount: '30.00', method: 'cash', reference: `R${i}` })),
    );
    const statuses = answers.map((a) => a.status);
    const money = await f.money(paymentId);
    console.log(
      [
        'concurrent refunds of one 100.00 payment (10 × 30.00)',
        `  201 refunded: ${statuses.filter((s) => s === 201).length}`,
        `  400 refused:  ${statuses.filter((s) => s === 400).length}`,
        `  other:        ${statuses.filter((s) => s !== 201 && s !== 400).length}`,
        `  payment refunded ${money.refunded}, invoice paid ${money.amountPaid} (${money.status})`,
      ].join('\n'),
    );
    // 3 × 30.00 = 90.00 ≤ 100.00; a fourth would make 120.00 (common practice, no source: never refund more than was paid)
    expect(statuses.filter((s) => s === 201)).toHaveLength(3);
    expect(statuses.filter((s) => s === 400)).toHaveLength(7);
    for (const refused of answers.filter((a) => a.status === 400)) expect(fieldOf(refused.body)).toBe('amount');
    expect(money).toMatchObject({ refunded: '90.00', amountPaid: '10.00', status: 'part_paid' });
    const receipts = answers.filter((a) => a.status === 201).map((a) => (a.body as RefundView).receiptNumber);
    expect(new Set(receipts).size).toBe(3);
  });
});

describe('a refund sent again with its key', () => {
  it('is recorded once, one copy after another or at the same time; the key on another payment is 409 naming it', async () => {
    const f = await issuedInvoice(t, 'Refund Key Plaster');
    const paymentId = await f.payOffline('100.00');
    const body = { amount: '30.00', method: 'cheque' as const, reference: '2010', clientKey: 'refund-form-1' };
    const answers = [await f.refund(paymentId, body)];
    answers.push(...(await Promise.all([1, 2].map(() => f.refund(paymentId, body)))));
    expect(answers.map((a) => a.status)).toEqual([201, 201, 201]);
    expect(new Set(answers.map((a) => (a.body as RefundView).id)).size).toBe(1);
    expect(await f.money(paymentId)).toMatchObject({ refunded: '30.00', amountPaid: '70.00' });

    const otherPayment = await f.payOffline('20.00', '1043');
    const elsewhere = await f.refund(otherPayment, body);
    expect([elsewhere.status, fieldOf(elsewhere.body)]).toEqual([409, 'clientKey']);
    for (const clientKey of ['', 'k'.repeat(101)]) {
      const bad = await f.refund(otherPayment, { ...body, clientKey });
      expect([clientKey, bad.status, fieldOf(bad.body)]).toEqual([clientKey, 400, 'clientKey']);
    }
    expect(await f.money(otherPayment)).toMatchObject({ refunded: '0.00' });
  });
});

describe('refunds and payments at once on one invoice', () => {
  it('five refunds and five cheques together: no deadlock, the books add up and the receipt numbers have no gap', async () => {
    const f = await issuedInvoice(t, 'Busy Counter Plaster', '300.00');
    const first = await f.payOffline('100.00');
    const answers = await Promise.all([
      ...Array.from({ length: 5 }, () => f.refund(first, { amount: '30.00', method: 'cash' })),
      ...Array.from({ length: 5 }, (_, i) =>
        f.post(`/api/invoices/${f.invoiceId}/payments`, {
          method: 'cheque',
          amount: '50.00',
          receivedOn: '2026-12-11',
          reference: `C${i}`,
        }),
      ),
    ]);
    // every answer is a success or a refusal naming amount: none waited on another forever (a deadlock is a 500)
    expect(answers.every((a) => [200, 201, 400].includes(a.status))).toBe(true);
    const detail = (await f.agent.get(`/api/invoices/${f.invoiceId}`)).body as InvoiceDetail;
    const sum = (values: string[]) => values.reduce((total, v) => total.plus(v), new Decimal(0));
    const applied = sum(detail.payments.map((p) => p.amountApplied));
    const refunded = sum(detail.payments.map((p) => p.amountRefunded));
    // amount paid = applied − refunded (no payment here kept credit: each cheque was at most the amount due)
    expect(detail.amountPaid).toBe(applied.minus(refunded).toFixed(2));
    expect(new Decimal(detail.amountPaid).lessThanOrEqualTo(300)).toBe(true);
    expect(new Decimal(detail.payments[0].amountRefunded).lessThanOrEqualTo(100)).toBe(true);
    const numbers = [
      ...detail.payments.map((p) => p.receiptNumber),
      ...detail.payments.flatMap((p) => p.refunds.map((r) => r.receiptNumber)),
    ].sort();
    expect(numbers).toEqual(numbers.map((_, i) => `RCT-${String(i + 1).padStart(4, '0')}`));
  });
});
