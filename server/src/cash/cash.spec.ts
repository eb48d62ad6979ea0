import type { BillingToday, CashForecast, CashJobs, CashReceivableInvoices, CashReceivables, CashReceived } from '@layerbook/contracts';
import { CASH_AGING_BUCKETS, DEFAULT_BILLING_SETTINGS } from '@layerbook/contracts';
import Decimal from 'decimal.js';
import { joinAs } from '../proposals/proposal-fixtures';
import { toDepositCapRule } from '../billing/settings';
import { startTestServer, type TestServer } from '../testing/harness';
import { cashFirm } from './cash-fixtures';
import { cashForecast, expectedDeposit } from './domain';

let t: TestServer;
let a: Awaited<ReturnType<typeof cashFirm>>;
let b: Awaited<ReturnType<typeof cashFirm>>;
let office: Awaited<ReturnType<typeof joinAs>>;
let crew: Awaited<ReturnType<typeof joinAs>>;
const ids: Record<string, string> = {};

beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-20T15:00:00Z')); // 20 December in the firm's zone (New York)
  a = await cashFirm(t, 'Kiln Lane Plaster');
  b = await cashFirm(t, 'Other Glaze Works');
  office = await joinAs(t, a, 'office');
  crew = await joinAs(t, a, 'crew');

  ids.i1 = await a.invoice(1, '2026-11-06', '2026-11-20', '300.00'); // 30 days past due on 20 December
  ids.i2 = await a.invoice(2, '2026-11-05', '2026-11-19', '410.00'); // 31 days
  ids.i3 = await a.invoice(3, '2026-12-01', '2027-01-05', '1000.00', { status: 'part_paid', amountPaid: '400.00' });
  await a.payment(ids.i3, 1, '2026-12-10', '400.00');
  // a progress application, paid, then 50.00 given back: owed again, with 250.00 of retainage held
  ids.i4 = await a.invoice(4, '2026-10-01', '2026-10-15', '2250.00', {
    kind: 'progress',
    status: 'part_paid',
    amountPaid: '2200.00',
    retainageHeld: '250.00',
  });
  const p4 = await a.payment(ids.i4, 2, '2026-10-05', '2250.00');
  await a.refund(p4, '2026-12-12', '50.00', 'succeeded');
  await a.refund(p4, '2026-12-13', '20.00', 'failed');
  ids.i5 = await a.invoice(5, '2026-07-18', '2026-08-01', '75.00');
  ids.i6 = await a.invoice(6, '2026-11-01', '2026-11-15', '500.00');
  await a.creditNote(ids.i6, 1, '2026-12-05');
  await a.sql(`insert into inquiry_stage_settings (tenant_id, stage, likelihood_percent) values ($1, 'samples', 70)`);
  ids.q1 = await a.inquiry('samples', '20000.00', '2027-01-10');
  ids.q2 = await a.inquiry('new', null, null);

  const bi = await b.invoice(1, '2026-12-01', '2026-12-15', '900.00', { status: 'paid', amountPaid: '900.00' });
  await b.payment(bi, 1, '2026-12-19', '600.00');
  await b.payment(bi, 2, '2026-12-17', '300.00');
}, 180_000);
afterAll(() => t.stop());

const get = <T>(agent: typeof a.agent, url: string) => agent.get(url).then((r) => ({ status: r.status, body: r.body as T }));

describe('receivables by age', () => {
  // Aging by days past due in 30-day buckets, retainage reported apart: common practice, no source.
  it('puts 30 days past due in 1–30 and 31 in 31–60, keeps retainage apart, per client and invoice', async () => {
    const { status, body } = await get<CashReceivables>(a.agent, '/api/cash/receivables');
    expect(status).toBe(200);
    expect(body.asOf).toBe('2026-12-20');
    expect(body.buckets).toEqual({ current: '600.00', '1-30': '300.00', '31-60': '410.00', '61-90': '50.00', '90+': '75.00' });
    expect([body.total, body.retainage]).toEqual(['1435.00', '250.00']);
    expect(body.invoiceCount).toBe(5);
    const list = await get<CashReceivableInvoices>(a.agent, '/api/cash/receivables/invoices');
    expect(list.status).toBe(200);
    const row = (id: string) => list.body.invoices.find((i) => i.invoiceId === id);
    expect([row(ids.i1)?.daysPastDue, row(ids.i1)?.bucket]).toEqual([30, '1-30']);
    expect([row(ids.i2)?.daysPastDue, row(ids.i2)?.bucket]).toEqual([31, '31-60']);
    expect(row(ids.i4)).toMatchObject({ number: 'INV-0004', amountDue: '50.00', retainage: '250.00', bucket: '61-90' });
    expect(row(ids.i6)).toBeUndefined(); // voided by its credit note
    expect(list.body.invoices).toHaveLength(5);
    expect(body.clients).toHaveLength(1);
    expect(body.clients[0]).toMatchObject({ total: '1435.00', retainage: '250.00', invoiceCount: 5, clientId: row(ids.i1)?.clientId });
  });

  it('drills into one age and one client: the invoices whose sum the age shows, aged the same', async () => {
    const summary = (await get<CashReceivables>(a.agent, '/api/cash/receivables')).body;
    const clientId = summary.clients[0].clientId;
    for (const age of CASH_AGING_BUCKETS) {
      const { status, body } = await get<CashReceivableInvoices>(
        a.agent,
        `/api/cash/receivables/invoices?age=${encodeURIComponent(age)}&client=${clientId}`,
      );
      expect(status).toBe(200);
      expect([body.age, body.clientId]).toEqual([age, clientId]);
      expect(body.invoices.every((i) => i.bucket === age)).toBe(true);
      const sum = body.invoices.reduce((s, i) => s.plus(i.amountDue), new Decimal(0)).toFixed(2);
      expect([age, sum]).toEqual([age, summary.buckets[age]]);
    }
    // 31–60 on 20 December: due 20 October to 19 November — the invoice 31 days late, the first of them
    const older = (await get<CashReceivableInvoices>(a.agent, '/api/cash/receivables/invoices?age=31-60')).body;
    expect(older.invoices.map((i) => i.invoiceId)).toContain(ids.i2);
    const past = (await get<CashReceivableInvoices>(a.agent, '/api/cash/receivables/invoices?asOf=2026-12-01&age=1-30')).body;
    expect(past.invoices.reduce((s, i) => s.plus(i.amountDue), new Decimal(0)).toFixed(2)).toBe('1210.00');
  });

  it('names a bad age or client in the drill-down', async () => {
    for (const [query, field] of [
      ['age=45', 'age'],
      ['client=nobody', 'client'],
      ['colour=red', 'colour'],
    ]) {
      const res = await a.agent.get(`/api/cash/receivables/invoices?${query}`);
      expect(res.status).toBe(400);
      expect(JSON.stringify(res.body)).toContain(field);
    }
  });

  it('a day later the 30-day invoice moves to 31–60', async () => {
    const { body } = await get<CashReceivables>(a.agent, '/api/cash/receivables?asOf=2026-12-21');
    expect(body.buckets).toMatchObject({ '1-30': '0.00', '31-60': '710.00' });
  });

  it('as of a past date counts only what was issued, paid, refunded and credited by then', async () => {
    const { body } = await get<CashReceivables>(a.agent, '/api/cash/receivables?asOf=2026-12-01');
    // 1 December: the invoices due 19 and 20 November are 12 and 11 days late; the one credited on 5 December still owed
    expect(body.buckets).toEqual({ current: '1000.00', '1-30': '1210.00', '31-60': '0.00', '61-90': '0.00', '90+': '75.00' });
    expect(body.retainage).toBe('250.00');
  });

  it('names a bad date', async () => {
    const res = await a.agent.get('/api/cash/receivables?asOf=20-12-2026');
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain('asOf');
    const which = await a.agent.get('/api/cash/receivables?clients=some');
    expect(which.status).toBe(400);
    expect(JSON.stringify(which.body)).toContain('clients');
  });

  it('lists the 25 clients owing most (largest first, ties by id), all of them on request, and counts them all', async () => {
    const c = await cashFirm(t, 'Many Clients Plaster');
    // 27 clients owing 100, 110 … 350 (the last two the same, to show the tie) on one due date each, none held back
    for (let k = 0; k < 27; k++) {
      const [client] = await c.sql<{ id: string }>(
        `insert into clients (tenant_id, kind, name) values ($1, 'homeowner', $2) returning id`,
        [`Client ${String(k).padStart(2, '0')}`],
      );
      const amount = (100 + 10 * Math.min(k, 25)).toFixed(2);
      const id = await c.invoice(k + 1, '2026-11-01', k % 2 === 0 ? '2026-12-31' : '2026-11-05', amount);
      await c.sql(`update invoices set client_id = $3 where tenant_id = $1 and id = $2`, [id, client.id]);
    }
    for (const asOf of ['', '?asOf=2026-12-20', '?asOf=2026-11-20']) {
      const top = await get<CashReceivables>(c.agent, `/api/cash/receivables${asOf}`);
      const all = await get<CashReceivables>(c.agent, `/api/cash/receivables${asOf}${asOf ? '&' : '?'}clients=all`);
      expect([top.status, all.status]).toEqual([200, 200]);
      expect([top.body.clientCount, all.body.clientCount, all.body.clients.length, top.body.clients.length]).toEqual([27, 27, 27, 25]);
      expect(top.body.clients).toEqual(all.body.clients.slice(0, 25));
      // the firm's figures cover every client either way: Σ 100 … 350 with 350 twice
      expect([top.body.total, all.body.total, top.body.invoiceCount]).toEqual(['6200.00', '6200.00', 27]);
      const totals = all.body.clients.map((x) => x.total);
      expect(totals.slice(0, 3)).toEqual(['350.00', '350.00', '340.00']);
      expect(all.body.clients[0].clientId < all.body.clients[1].clientId).toBe(true);
      expect(totals.at(-1)).toBe('100.00');
      const sum = (list: readonly { total: string }[]) => list.reduce((n, x) => n.plus(x.total), new Decimal(0)).toFixed(2);
      expect(sum(all.body.clients)).toBe(all.body.total);
    }
  });
});

describe('cash received by month', () => {
  it('counts payments less refunds that went through, by their own dates', async () => {
    const { body } = await get<CashReceived>(a.agent, '/api/cash/received');
    expect(body.months.map((m) => m.month)).toEqual([...Array(12).keys()].map((i) => `2026-${String(i + 1).padStart(2, '0')}`));
    expect(body.months[9]).toEqual({
      month: '2026-10',
      received: '2250.00',
      paymentCount: 1,
      refunded: '0.00',
      refundCount: 0,
      net: '2250.00',
    });
    expect(body.months[11]).toEqual({
      month: '2026-12',
      received: '400.00',
      paymentCount: 1,
      refunded: '50.00',
      refundCount: 1,
      net: '350.00',
    });
    expect(body.totals).toEqual({ received: '2650.00', refunded: '50.00', net: '2600.00' });
  });
});

describe('13-week forecast', () => {
  it('equals packages/domain’s cashForecast on the seeded data, each part apart', async () => {
    const { body } = await get<CashForecast>(a.agent, '/api/cash/forecast');
    expect(body.weeks).toHaveLength(13);
    expect(body.weeks[0].weekStart).toBe('2026-12-14');
    // overdue invoices fall in this week; the one due 5 January in the week of 4 January
    expect(body.weeks[0].invoices).toBe('835.00');
    expect(body.weeks[3]).toMatchObject({ weekStart: '2027-01-04', invoices: '600.00' });
    const lines = await a.sql<{ id: string; expected_on: string | null; amount: string }>(
      `select id, expected_on::text as expected_on, amount::text as amount from payment_schedule_lines where tenant_id = $1`,
    );
    const deposits = await a.sql<{ deposits: string; contracts: string }>(
      `select (select sum(amount) from payment_schedule_lines where tenant_id = $1 and role = 'deposit')::text as deposits,
              (select sum(original_contract_sum) from jobs where tenant_id = $1)::text as contracts`,
    );
    const share = new Decimal(deposits[0].deposits).dividedBy(deposits[0].contracts).toDecimalPlaces(4);
    const deposit = expectedDeposit('20000.00', share, toDepositCapRule(DEFAULT_BILLING_SETTINGS.depositCap), 'USD');
    const expected = cashForecast({
      asOf: '2026-12-20',
      weeks: 13,
      currency: 'USD',
      openInvoices: [
        { id: 'i1', date: '2026-11-20', amount: '300.00' },
        { id: 'i2', date: '2026-11-19', amount: '410.00' },
        { id: 'i3', date: '2027-01-05', amount: '600.00' },
        { id: 'i4', date: '2026-10-15', amount: '50.00' },
        { id: 'i5', date: '2026-08-01', amount: '75.00' },
      ],
      milestones: lines.map((l) => ({ id: l.id, date: l.expected_on ?? '2027-03-28', amount: l.amount })),
      pipelineDeposits: [{ id: 'q1', date: '2027-01-10', amount: deposit.toFixed(2), probability: 0.7 }],
    });
    expect(body.weeks.map((w) => [w.weekStart, w.invoices, w.scheduled, w.pipeline, w.total])).toEqual(
      expected.weeks.map((w) => [w.weekStart, w.invoices.toFixed(2), w.milestones.toFixed(2), w.pipeline.toFixed(2), w.total.toFixed(2)]),
    );
    expect(body.beyondHorizon).toEqual({
      invoices: expected.beyond.invoices.toFixed(2),
      scheduled: expected.beyond.milestones.toFixed(2),
      pipeline: expected.beyond.pipeline.toFixed(2),
      total: expected.beyondHorizon.toFixed(2),
    });
    expect(body.odds.find((o) => o.stage === 'samples')).toMatchObject({ percent: 70, source: 'firm', openCount: 1 });
    expect(body.odds.find((o) => o.stage === 'new')).toMatchObject({ percent: 10, source: 'default', openCount: 1 });
  });
});

describe('jobs and margins', () => {
  it('the owner sees win rate, average size, each job’s money and its estimated margin', async () => {
    const { body } = await get<CashJobs>(a.agent, '/api/cash/jobs');
    expect(body.winRate).toEqual({ accepted: 1, decided: 1, percent: '100.0' });
    expect(body.marginsShown).toBe(true);
    const job = body.jobs[0];
    expect(job).toMatchObject({ jobId: a.jobId, changeOrders: '0.00', invoiced: '4035.00', paid: '2600.00' });
    expect(body.averageJobSize).toBe(job.contracted);
    expect(job.margin?.estimatedCost).not.toBeNull();
    expect(job.margin).toMatchObject({ actualMargin: null, actualCost: null });
    expect(job.margin?.actualMarginReason).toMatch(/not recorded/);
  });

  it('the office sees the jobs without any margin', async () => {
    const res = await office.agent.get('/api/cash/jobs');
    expect(res.status).toBe(200);
    const body = res.body as CashJobs;
    expect(body.marginsShown).toBe(false);
    expect(body.jobs.length).toBeGreaterThan(0);
    expect(body.jobs.every((j) => !('margin' in j))).toBe(true);
    expect(res.text).not.toMatch(/[Mm]argin"?\s*:/);
    expect((await office.agent.get('/api/cash/receivables')).status).toBe(200);
  });

  it('crew gets 403 everywhere in /api/cash', async () => {
    for (const url of [
      '/api/cash/receivables',
      '/api/cash/receivables/invoices',
      '/api/cash/received',
      '/api/cash/forecast',
      '/api/cash/jobs',
    ]) {
      expect((await crew.agent.get(url)).status).toBe(403);
    }
  });
});

describe('isolation and Today', () => {
  it('another firm’s invoices and payments never appear', async () => {
    const rec = (await get<CashReceivables>(b.agent, '/api/cash/receivables')).body;
    expect(rec.clients).toHaveLength(0);
    expect((await get<CashReceivableInvoices>(b.agent, '/api/cash/receivables/invoices')).body.invoices).toHaveLength(0);
    expect(rec.total).toBe('0.00');
    const received = (await get<CashReceived>(b.agent, '/api/cash/received')).body;
    expect(received.totals.received).toBe('900.00');
    const forecast = (await get<CashForecast>(b.agent, '/api/cash/forecast')).body;
    expect(forecast.weeks[0].invoices).toBe('0.00');
    expect(forecast.odds.every((o) => o.openCount === 0)).toBe(true);
    const jobs = (await get<CashJobs>(b.agent, '/api/cash/jobs')).body;
    expect(jobs.jobs.map((j) => j.jobId)).toEqual([b.jobId]);
  });

  it('Today lists the payments received yesterday and today in the firm’s zone', async () => {
    const today = (await get<BillingToday>(b.agent, '/api/billing/today')).body;
    expect(today.paymentsReceived).toEqual([
      expect.objectContaining({
        receiptNumber: expect.stringMatching(/1$/),
        amount: '600.00',
        method: 'cheque',
        receivedOn: '2026-12-19',
        invoiceNumber: 'INV-0001',
      }),
    ]);
    const ofA = (await get<BillingToday>(a.agent, '/api/billing/today')).body;
    expect(ofA.paymentsReceived).toEqual([]);
  });
});
