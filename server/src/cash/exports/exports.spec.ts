import {
  CASH_AGING_BUCKET_LABELS,
  CASH_AGING_BUCKETS,
  type CashReceivableInvoices,
  type CashReceivables,
  type FirmSettings,
  type InvoiceSummary,
  type KeysetPage,
} from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { parse } from 'csv-parse/sync';
import Decimal from 'decimal.js';
import request, { type Response } from 'supertest';
import { joinAs } from '../../proposals/proposal-fixtures';
import { startTestServer, type TestServer } from '../../testing/harness';
import { exportFirm } from './export-fixtures';

let t: TestServer;
let a: Awaited<ReturnType<typeof exportFirm>>;
let b: Awaited<ReturnType<typeof exportFirm>>;
let orlaId: string;
const RANGE = 'from=2026-11-01&to=2026-12-31';
const HOSTILE_NAME = '=HYPERLINK("http://evil.test","Open")';

beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-20T15:00:00Z'));
  a = await exportFirm(t, 'Kiln Lane Plaster');
  b = await exportFirm(t, 'Other Glaze Works');

  // Firm A: three invoices issued in the range (one voided by a credit note), one before it.
  const hostile = await a.client(HOSTILE_NAME, '+1 555 0100');
  orlaId = await a.client('Orla Ochre');
  const inv1 = await a.invoice(1, '2026-11-03', '1000.00', { status: 'part_paid', amountPaid: '400.00' });
  const inv2 = await a.invoice(2, '2026-11-20', '250.00');
  await a.creditNote(inv2, 1, '2026-11-21', ' ＠SUM(1+1) wrong stage');
  const inv3 = await a.invoice(3, '2026-12-05', '80.50', { clientId: hostile, status: 'paid', amountPaid: '80.50' });
  const inv0 = await a.invoice(4, '2026-10-15', '999.00', { clientId: orlaId, status: 'paid', amountPaid: '949.00' });
  const p1 = await a.payment(inv1, {
    receiptNo: 1,
    receivedOn: '2026-11-10',
    amount: '500.00',
    refunded: '100.00',
    reference: '-cheque 1042',
  });
  await a.refund(p1, { receiptNo: 2, refundedOn: '2026-11-12', amount: '100.00', status: 'succeeded', reason: '=1+1 fewer rooms' });
  await a.refund(p1, { receiptNo: null, refundedOn: '2026-11-13', amount: '20.00', status: 'failed', reason: 'Card declined the refund' });
  await a.payment(inv3, { receiptNo: 3, receivedOn: '2026-12-06', amount: '80.50' });
  const p0 = await a.payment(inv0, { receiptNo: 4, receivedOn: '2026-10-20', amount: '999.00', refunded: '50.00' });
  // Given back in the range on a payment received before it: Orla's net received is negative.
  await a.refund(p0, { receiptNo: 5, refundedOn: '2026-11-25', amount: '50.00', status: 'succeeded', reason: 'Touch-up not needed' });
  // Added at 03:30 UTC on 1 November: still 31 October in the firm's zone.
  await withTenant(t.ctx.pool, a.firmId, (tx) =>
    tx.client.query(`update clients set created_at = '2026-11-01T03:30:00Z' where tenant_id = $1 and id = $2`, [tx.tenantId, orlaId]),
  );

  // Firm B: one invoice paid three times.
  await b.manyPayments(await b.invoice(1, '2026-01-02', '100000.00'), 3);
}, 120_000);
afterAll(() => t.stop());

type Rows = Record<string, string>[];

/** The file as a spreadsheet would read it: csv-parse with the header row as column names. */
function rowsOf(res: Response): Rows {
  return parse<Record<string, string>>(res.text, { columns: true, bom: true });
}

/** A column added up with decimal.js, as text at two decimals. */
const sumOf = (rows: Rows, column: string, keep: (r: Record<string, string>) => boolean = () => true) =>
  rows
    .filter(keep)
    .reduce((s, r) => s.plus(r[column]), new Decimal(0))
    .toFixed(2);

const exportOf = (agent: typeof a.agent, kind: string, query = RANGE) => agent.get(`/api/cash/exports/${kind}.csv?${query}`).buffer(true);

describe('CSV exports for the accountant', () => {
  it('invoices issued in the range, with the same totals as the database and the invoice list', async () => {
    const res = await exportOf(a.agent, 'invoices');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    const slug = ((await a.agent.get('/api/firm')).body as FirmSettings).slug;
    expect(res.headers['content-disposition']).toBe(`attachment; filename="${slug}-invoices-2026-11-01-2026-12-31.csv"`);
    // RFC 4180 §2: CRLF line ends, a header line first; a UTF-8 byte-order mark leads (common practice, no source)
    expect(res.text.startsWith('\uFEFFInvoice number,Issued on,Due on,Status,Kind,Client,Job,Currency,Subtotal,')).toBe(true);
    expect(res.text.split('\r\n')).toHaveLength(5);
    // a progress application restates the job's whole retainage: the column says so, so nobody sums it down a job
    expect(res.text.split('\r\n')[0]).toContain(',Credited,Retainage held to date,Amount due');

    const rows = rowsOf(res);
    expect(rows.map((r) => [r['Invoice number'], r['Issued on'], r.Status, r.Total, r['Amount due'], r.Currency])).toEqual([
      ['INV-0001', '2026-11-03', 'part_paid', '1000.00', '600.00', 'USD'],
      ['INV-0002', '2026-11-20', 'void', '250.00', '0.00', 'USD'],
      ['INV-0003', '2026-12-05', 'paid', '80.50', '0.00', 'USD'],
    ]);
    const inRange = `issued_on between '2026-11-01' and '2026-12-31'`;
    expect(sumOf(rows, 'Total')).toBe(await a.dbSum('total', 'invoices', inRange));
    expect(sumOf(rows, 'Paid')).toBe(await a.dbSum('amount_paid', 'invoices', inRange));
    // The invoice list's amounts due for the same invoices (GET /api/invoices)
    const list = (await a.agent.get('/api/invoices?limit=100')).body as KeysetPage<InvoiceSummary>;
    const listed = list.items.filter((i) => i.issuedOn !== null && i.issuedOn >= '2026-11-01' && i.issuedOn <= '2026-12-31');
    expect(sumOf(rows, 'Amount due')).toBe(listed.reduce((s, i) => s.plus(i.amountDue), new Decimal(0)).toFixed(2));
    expect(sumOf(rows, 'Amount due')).toBe('600.00');
  });

  it('payments, refunds and credit notes of the range add up as the tables do', async () => {
    const payments = rowsOf(await exportOf(a.agent, 'payments'));
    expect(payments.map((r) => [r['Receipt number'], r['Received on'], r['Invoice number'], r.Amount, r.Refunded])).toEqual([
      ['RCT-0001', '2026-11-10', 'INV-0001', '500.00', '100.00'],
      ['RCT-0003', '2026-12-06', 'INV-0003', '80.50', '0.00'],
    ]);
    expect(sumOf(payments, 'Amount')).toBe(await a.dbSum('amount', 'payments', `received_on between '2026-11-01' and '2026-12-31'`));

    const refunds = rowsOf(await exportOf(a.agent, 'refunds'));
    expect(refunds.map((r) => [r['Receipt number'], r['Refunded on'], r.Status, r['Payment receipt number'], r.Amount])).toEqual([
      ['RCT-0002', '2026-11-12', 'succeeded', 'RCT-0001', '100.00'],
      ['', '2026-11-13', 'failed', 'RCT-0001', '20.00'],
      ['RCT-0005', '2026-11-25', 'succeeded', 'RCT-0004', '50.00'],
    ]);
    expect(sumOf(refunds, 'Amount', (r) => r.Status === 'succeeded')).toBe(
      await a.dbSum('amount', 'refunds', `status = 'succeeded' and refunded_on between '2026-11-01' and '2026-12-31'`),
    );

    const notes = rowsOf(await exportOf(a.agent, 'credit-notes'));
    expect(notes.map((r) => [r['Credit note number'], r['Issued on'], r['Invoice number'], r.Amount])).toEqual([
      ['CN-0001', '2026-11-21', 'INV-0002', '250.00'],
    ]);
  });

  it('clients: one row per client the range concerns, each column adding up to its own file, dates in the firm zone', async () => {
    const clients = rowsOf(await exportOf(a.agent, 'clients'));
    const byName = new Map(clients.map((r) => [r.Client, r]));
    const orla = byName.get('Orla Ochre')!;
    expect([orla.Invoiced, orla.Received, orla.Refunded, orla['Net received'], orla['Amount due today']]).toEqual([
      '0.00',
      '0.00',
      '50.00',
      '-50.00',
      '50.00',
    ]);
    const zone = await withTenant(t.ctx.pool, a.firmId, async (tx) => {
      const { rows } = await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tx.tenantId]);
      return rows[0].time_zone;
    });
    // 2026-11-01T03:30Z read in the firm's own zone (IANA time zone database, through Intl)
    expect(orla['Added on']).toBe(new Intl.DateTimeFormat('en-CA', { timeZone: zone }).format(new Date('2026-11-01T03:30:00Z')));

    const [invoices, payments, refunds, notes] = await Promise.all(
      ['invoices', 'payments', 'refunds', 'credit-notes'].map(async (kind) => rowsOf(await exportOf(a.agent, kind))),
    );
    expect(sumOf(clients, 'Invoiced')).toBe(sumOf(invoices, 'Total'));
    expect(sumOf(clients, 'Credited')).toBe(sumOf(notes, 'Amount'));
    expect(sumOf(clients, 'Received')).toBe(sumOf(payments, 'Amount'));
    expect(sumOf(clients, 'Refunded')).toBe(sumOf(refunds, 'Amount', (r) => r.Status === 'succeeded'));
    expect(sumOf(clients, 'Net received')).toBe(new Decimal(sumOf(payments, 'Amount')).minus(sumOf(clients, 'Refunded')).toFixed(2));
  });

  it('neutralises free text that a spreadsheet would run as a formula, and leaves amounts as numbers', async () => {
    // OWASP "CSV Injection": cells starting with = + - @ (after any whitespace, full-width too) get a single quote in front
    const invoices = rowsOf(await exportOf(a.agent, 'invoices'));
    expect(invoices[2].Client).toBe(`'${HOSTILE_NAME}`);
    const payments = rowsOf(await exportOf(a.agent, 'payments'));
    expect(payments[0].Reference).toBe(`'-cheque 1042`);
    const refunds = rowsOf(await exportOf(a.agent, 'refunds'));
    expect(refunds[0].Reason).toBe(`'=1+1 fewer rooms`);
    const notes = rowsOf(await exportOf(a.agent, 'credit-notes'));
    expect(notes[0].Reason).toBe(`' ＠SUM(1+1) wrong stage`);
    const clientsRes = await exportOf(a.agent, 'clients');
    const clients = rowsOf(clientsRes);
    const hostile = clients.find((r) => r.Client === `'${HOSTILE_NAME}`)!;
    expect(hostile.Phone).toBe(`'+1 555 0100`);
    // A negative amount is ours, written as a plain decimal: it stays a number
    const orla = clients.find((r) => r.Client === 'Orla Ochre')!;
    expect(orla['Net received']).toBe('-50.00');
    expect(clientsRes.text).toContain(',-50.00,');
    // No cell of any file starts with a formula character, but for our own negative amounts (plain decimals)
    for (const kind of ['invoices', 'payments', 'refunds', 'credit-notes', 'clients']) {
      const cells = parse((await exportOf(a.agent, kind)).text, { bom: true }).flat();
      expect(cells.filter((c) => /^(?:[\t\r\0]|\s*[=+\-@＝＋－＠])/.test(c) && !/^-\d+\.\d\d$/.test(c))).toEqual([]);
    }
  });

  it('owner and office export; crew is refused before anything is read; signed out is 401', async () => {
    const office = await joinAs(t, a, 'office');
    expect((await exportOf(office.agent, 'payments')).status).toBe(200);
    const crew = await joinAs(t, a, 'crew');
    const refused = await crew.agent.get(`/api/cash/exports/payments.csv?${RANGE}`);
    expect(refused.status).toBe(403);
    expect(refused.headers['content-type']).toContain('application/problem+json');
    expect(refused.headers['content-disposition']).toBeUndefined();
    // 403 before 400: crew with a bad range is still 403
    expect((await crew.agent.get('/api/cash/exports/nope.csv?from=x')).status).toBe(403);
    expect((await request(t.app).get(`/api/cash/exports/payments.csv?${RANGE}`)).status).toBe(401);
  });

  it.each([
    ['', 'from'],
    ['from=2026-11-01', 'to'],
    ['from=2026-13-01&to=2026-12-31', 'from'],
    ['from=2026-12-31&to=2026-11-01', 'to'],
    ['from=2021-01-01&to=2026-01-01', 'to'],
    ['from=2026-11-01&to=2026-12-31&limit=5', 'limit'],
  ])('?%s is 400 naming %s', async (query, field) => {
    const res = await a.agent.get(`/api/cash/exports/payments.csv?${query}`);
    expect(res.status).toBe(400);
    expect(res.headers['content-disposition']).toBeUndefined();
    expect((res.body as { errors: Array<{ field: string }> }).errors.map((e) => e.field)).toContain(field);
  });

  it('an unknown kind is 400 naming kind; five years to the day less one is allowed', async () => {
    const res = await a.agent.get(`/api/cash/exports/estimates.csv?${RANGE}`);
    expect(res.status).toBe(400);
    expect((res.body as { errors: Array<{ field: string }> }).errors[0].field).toBe('kind');
    expect((await exportOf(a.agent, 'payments', 'from=2021-01-01&to=2025-12-31')).status).toBe(200);
  });

  it("each firm's files hold its own rows only", async () => {
    const aPayments = await exportOf(a.agent, 'payments', 'from=2026-01-01&to=2026-12-31');
    expect(rowsOf(aPayments)).toHaveLength(3);
    expect(aPayments.text).not.toContain('Bulk transfer');
    for (const kind of ['invoices', 'payments', 'refunds', 'credit-notes', 'clients']) {
      const text = (await exportOf(b.agent, kind, 'from=2026-01-01&to=2026-12-31')).text;
      expect(text).not.toContain('HYPERLINK');
      expect(text).not.toContain('Orla Ochre');
      expect(text).not.toContain('INV-0003');
    }
  });

  it('receivables as of a day: the same aging as the receivables page, bucket by bucket', async () => {
    const res = await a.agent.get('/api/cash/exports/receivables.csv?asOf=2026-12-20').buffer(true);
    expect(res.status).toBe(200);
    const slug = ((await a.agent.get('/api/firm')).body as FirmSettings).slug;
    expect(res.headers['content-disposition']).toBe(`attachment; filename="${slug}-receivables-2026-12-20.csv"`);
    const rows = rowsOf(res);
    const page = (await a.agent.get('/api/cash/receivables?asOf=2026-12-20')).body as CashReceivables;
    const list = (await a.agent.get('/api/cash/receivables/invoices?asOf=2026-12-20')).body as CashReceivableInvoices;
    expect(rows.map((r) => [r['Invoice number'], r['Days past due'], r.Age, r['Amount due']])).toEqual(
      list.invoices.map((i) => [i.number, String(i.daysPastDue), CASH_AGING_BUCKET_LABELS[i.bucket], i.amountDue]),
    );
    // INV-0001: due 3 November, 600.00 open on 20 December — 47 days late (accounting glossaries; common practice)
    expect(rows.find((r) => r['Invoice number'] === 'INV-0001')).toMatchObject({ 'Days past due': '47', 'Amount due': '600.00' });
    for (const bucket of CASH_AGING_BUCKETS) {
      const label = CASH_AGING_BUCKET_LABELS[bucket];
      expect(sumOf(rows, 'Amount due', (r) => r.Age === label)).toBe(new Decimal(page.buckets[bucket]).toFixed(2));
    }
    expect(sumOf(rows, 'Amount due')).toBe(new Decimal(page.total).toFixed(2));
    expect(sumOf(rows, 'Retainage held')).toBe(new Decimal(page.retainage).toFixed(2));

    const crew = await joinAs(t, a, 'crew');
    expect((await crew.agent.get('/api/cash/exports/receivables.csv?asOf=nope')).status).toBe(403);
    const bad = await a.agent.get('/api/cash/exports/receivables.csv?asOf=2026-02-30');
    expect(bad.status).toBe(400);
    expect((bad.body as { errors: Array<{ field: string }> }).errors[0].field).toBe('asOf');
  });
});
