import type { BillingScheduleUpdate, InvoiceDetail, JobBillingView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { sumMoney } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { joinAs } from '../proposals/proposal-fixtures';
import { startTestServer, TestServer } from '../testing/harness';
import { billingJob } from './billing-fixtures';
import * as invoiceMail from './invoice-mail';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Firm = Awaited<ReturnType<typeof billingJob>>;
let f: Firm;
let other: Firm;
let started: JobBillingView;

const asUpdate = (b: JobBillingView): BillingScheduleUpdate => ({
  method: b.method,
  lines: b.lines.map((l) => ({ id: l.id, label: l.label, role: l.role, trigger: l.trigger, amount: l.amount })),
});

const counter = (firm: Firm, series: string) =>
  withTenant(t.ctx.pool, firm.firmId, async (tx) => {
    const { rows } = await tx.client.query<{ next_no: number }>(
      `select next_no from document_counters where tenant_id = $1 and series = $2`,
      [tx.tenantId, series],
    );
    return rows[0]?.next_no ?? 1;
  });

describe('billing core: the job schedule, drafts, issue, void, payments', () => {
  beforeAll(async () => {
    f = await billingJob(t, 'Core Billing Plaster');
    other = await billingJob(t, 'Other Billing Plaster');
  });

  it("shows the job's billing before it starts, with the firm's terms and each line's trigger in words", async () => {
    // A job made before work items and a schedule of values existed gets them on its first read.
    await withTenant(t.ctx.pool, f.firmId, async (tx) => {
      await tx.client.query(`delete from job_work_items where tenant_id = $1 and job_id = $2`, [tx.tenantId, f.jobId]);
      await tx.client.query(`delete from job_value_lines where tenant_id = $1 and job_id = $2`, [tx.tenantId, f.jobId]);
    });
    const b = await f.billing();
    expect(b.workItems.length).toBeGreaterThan(0);
    expect(sumMoney(b.valueLines.map((v) => new Decimal(v.scheduledValue))).toFixed(2)).toBe(b.contractSum);
    expect(b.billingStartedAt).toBeNull();
    expect(b.method).toBe('schedule');
    expect(b.terms).toMatchObject({ depositCapName: 'No deposit limit', depositCap: null, terms: { kind: 'net', days: 14 } });
    expect(b.lines.map((l) => [l.role, l.status, l.invoiceId])).toEqual([
      ['deposit', 'draft', null],
      ['milestone', 'draft', null],
      ['final', 'draft', null],
    ]);
    expect(b.lines[0].triggerProgress).toBe('Met when billing starts');
    const stage = b.lines[1];
    expect(stage.trigger.kind).toBe('layerComplete');
    expect(stage.layerName).toBeTruthy();
    expect(stage.triggerProgress).toMatch(/^0 of \d+ surfaces? done$/);
    expect(b.lines[2].triggerProgress).toBe('Waiting for the final walkthrough');
    expect(b.totals).toEqual({ invoiced: '0.00', paid: '0.00', unbilled: b.contractSum, retainageHeld: '0.00' });
    expect(b.readyToBill).toBe(0);
  });

  it('edits the schedule within the rules: 400 naming the field and nothing written', async () => {
    const before = await f.billing();
    const update = asUpdate(before);
    const short = {
      ...update,
      lines: update.lines.map((l, i) => (i === 2 ? { ...l, amount: new Decimal(l.amount).minus(1).toFixed(2) } : l)),
    };
    const res = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, short);
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ field: 'lines', message: expect.stringContaining('1.00 short of the contract sum') }]);
    const badAmount = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      ...update,
      lines: update.lines.map((l, i) => (i === 2 ? { ...l, amount: '12.345' } : l)),
    });
    expect(badAmount.status).toBe(400);
    expect(badAmount.body.errors.map((e: { field: string }) => e.field)).toEqual(['lines.2.amount']);
    const badLayer = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      ...update,
      lines: update.lines.map((l, i) => (i === 1 ? { ...l, trigger: { kind: 'layerComplete', layerId: 'nope' } } : l)),
    });
    expect(badLayer.status).toBe(400);
    expect(badLayer.body.errors.map((e: { field: string }) => e.field)).toEqual(['lines.1.trigger.layerId']);
    const farDate = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      ...update,
      lines: update.lines.map((l, i) => (i === 1 ? { ...l, trigger: { kind: 'date', date: '2999-12-31' } } : l)),
    });
    expect(farDate.status).toBe(400);
    expect(farDate.body.errors).toEqual([
      { field: 'lines.1.trigger.date', message: expect.stringMatching(/^Choose a billing date from \w+ \d+, 2025 to \w+ \d+, 2031\.$/) },
    ]);
    const finalFirst = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      ...update,
      lines: [update.lines[2], update.lines[0], update.lines[1]],
    });
    expect(finalFirst.status).toBe(400);
    expect(finalFirst.body.errors.map((e: { field: string }) => e.field)).toEqual(['lines.0.role']);
    expect(await f.billing()).toEqual(before);

    // One dollar moves from the stage payment to the final; a new dated stage payment comes from the final too.
    const moved = update.lines.map((l, i) =>
      i === 1
        ? { ...l, amount: new Decimal(l.amount).minus(1).toFixed(2) }
        : i === 2
          ? { ...l, amount: new Decimal(l.amount).minus(99).toFixed(2) }
          : l,
    );
    const ok = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      method: 'schedule',
      lines: [
        ...moved.slice(0, 2),
        { label: 'Stage payment on the 20th', role: 'milestone', trigger: { kind: 'date', date: '2026-12-20' }, amount: '100.00' },
        moved[2],
      ],
    });
    expect(ok.status).toBe(200);
    const after = ok.body as JobBillingView;
    expect(after.lines.map((l) => l.position)).toEqual([1, 2, 3, 4]);
    expect(after.lines[2]).toMatchObject({ expectedOn: '2026-12-20', status: 'draft', triggerProgress: 'Due December 20, 2026' });
    expect(after.lines[1].expectedOn).toBe(before.lines[1].expectedOn);
    expect(after.lines[1].amount).toBe(new Decimal(before.lines[1].amount).minus(1).toFixed(2));
  });

  it('starts billing once: terms copied, lines scheduled, the deposit drafted; twice is 409', async () => {
    const res = await f.send('post', `/api/jobs/${f.jobId}/billing/start`);
    expect(res.status).toBe(200);
    started = res.body as JobBillingView;
    expect(started.billingStartedAt).not.toBeNull();
    expect(started.lines.every((l) => l.status === 'scheduled' || l.status === 'ready')).toBe(true);
    expect(started.lines[0].triggerProgress).toBe('Met when billing started');
    // Drafted in the same answer (the page shows it at once), not only after the queue's check.
    expect(started.lines[0]).toMatchObject({ status: 'ready', invoiceId: expect.any(String) });
    expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(409);
    const audit = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`select 1 from audit_log where tenant_id = $1 and action = 'billing.started' and entity_id = $2`, [
        tx.tenantId,
        f.jobId,
      ]),
    );
    expect(audit.rowCount).toBe(1);
  });

  it('drafts have no number; issue numbers 1, 2, 3 in issue order with no gap when an issue fails; twice is 409', async () => {
    const [deposit, stage, dated] = started.lines;
    const depositId = await f.lineDraft(deposit.id);
    const draft = (await f.agent.get(`/api/invoices/${depositId}`)).body as InvoiceDetail;
    expect(draft).toMatchObject({ status: 'draft', number: null, kind: 'deposit', total: deposit.amount, issuedOn: null, dueOn: null });
    // The label the schedule wrote, kept by key too, so a client reads it in their language.
    expect(draft.lines).toEqual([{ label: deposit.label, amount: deposit.amount, words: { key: 'invoiceWords.line.deposit.acceptance' } }]);
    expect(draft.document.depositCapName).toBe('No deposit limit');
    expect((await f.billing()).lines[0]).toMatchObject({ status: 'ready', invoiceId: depositId });
    expect(new Decimal(draft.taxIncluded).greaterThan(0)).toBe(true);

    const first = await f.issue(depositId, { send: false, issuedOn: '2026-12-01' });
    expect(first).toMatchObject({
      status: 'issued',
      number: 'INV-0001',
      issuedOn: '2026-12-01',
      dueOn: '2026-12-15',
      amountDue: deposit.amount,
    });
    expect(first.document.firm.name).toBe('Core Billing Plaster');
    expect(first.document.termsText).toBe('Net 14 (due 14 days after the invoice date)');
    expect(first.auditTrail.map((a) => a.action)).toEqual(['invoice.drafted', 'invoice.issued']);
    expect(first.auditTrail[1].text).toBe('Issued as INV-0001');
    expect((await f.send('post', `/api/invoices/${depositId}/issue`, { send: false })).status).toBe(409);
    expect((await f.billing()).lines[0].status).toBe('invoiced');

    const stageId = await f.lineDraft(stage.id);
    // The e-mail step fails after the number was taken: the whole issue rolls back, number and all.
    expect(await counter(f, 'invoice')).toBe(2);
    const spy = jest.spyOn(invoiceMail, 'enqueueInvoiceMail').mockRejectedValueOnce(new Error('outbox down'));
    const failed = await f.send('post', `/api/invoices/${stageId}/issue`, { send: true });
    spy.mockRestore();
    expect(failed.status).toBe(500);
    expect(await counter(f, 'invoice')).toBe(2);
    expect(((await f.agent.get(`/api/invoices/${stageId}`)).body as InvoiceDetail).status).toBe('draft');
    const badIssue = await f.send('post', `/api/invoices/${stageId}/issue`, { send: 'yes', issuedOn: '2026-13-01' });
    expect(badIssue.status).toBe(400);
    expect(badIssue.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['issuedOn', 'send']);
    // Dated past tomorrow, or over a year before billing started on the job (the test's today, December 1): 400 naming the date.
    for (const issuedOn of ['2026-12-03', '2025-11-30']) {
      const misdated = await f.send('post', `/api/invoices/${stageId}/issue`, { send: false, issuedOn });
      expect([issuedOn, misdated.status, misdated.body.errors?.[0]?.field]).toEqual([issuedOn, 400, 'issuedOn']);
    }
    // A draft that bills 0.00 is refused: numbered, it would read paid at once and could never be voided.
    const setTotals = (subtotal: string, total: string) =>
      withTenant(t.ctx.pool, f.firmId, (tx) =>
        tx.client.query(`update invoices set subtotal = $3, total = $4 where tenant_id = $1 and id = $2`, [
          tx.tenantId,
          stageId,
          subtotal,
          total,
        ]),
      );
    const kept = ((await f.agent.get(`/api/invoices/${stageId}`)).body as InvoiceDetail).total;
    await setTotals('0', '0');
    expect((await f.send('post', `/api/invoices/${stageId}/issue`, { send: false })).status).toBe(409);
    await setTotals(kept, kept);
    expect(await counter(f, 'invoice')).toBe(2);

    const datedId = await f.lineDraft(dated.id);
    expect((await f.issue(datedId)).number).toBe('INV-0002');
    expect((await f.issue(stageId)).number).toBe('INV-0003');
    // Issue order is checked just above; here, no gap. The test clock stands still, so issued_at ties and cannot order them.
    const numbers = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query<{ number: number }>(`select number from invoices where tenant_id = $1 and number is not null order by number`, [
        tx.tenantId,
      ]),
    );
    expect(numbers.rows.map((r) => r.number)).toEqual([1, 2, 3]);
  });

  it('drafts change and delete (line back to waiting); issued ones never change', async () => {
    const final = started.lines[3];
    const id = await f.lineDraft(final.id);
    const patched = await f.send('patch', `/api/invoices/${id}`, { notes: 'Thank you for the walkthrough.' });
    expect(patched.status).toBe(200);
    expect(patched.body.notes).toBe('Thank you for the walkthrough.');
    expect((await f.send('patch', `/api/invoices/${id}`, {})).status).toBe(400);
    const wrong = await f.send('patch', `/api/invoices/${id}`, { periodEnd: '2026-12-31' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors[0].field).toBe('periodEnd');
    expect((await f.send('delete', `/api/invoices/${id}`)).status).toBe(204);
    expect((await f.agent.get(`/api/invoices/${id}`)).status).toBe(404);
    expect((await f.billing()).lines[3]).toMatchObject({ status: 'scheduled', invoiceId: null });

    const issuedId = (await f.billing()).lines[0].invoiceId!;
    expect((await f.send('patch', `/api/invoices/${issuedId}`, { notes: 'x' })).status).toBe(409);
    expect((await f.send('delete', `/api/invoices/${issuedId}`)).status).toBe(409);
    // Billed lines keep their amount: 409 naming the line.
    const b = await f.billing();
    const changed = asUpdate(b);
    const res = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      ...changed,
      lines: changed.lines.map((l, i) =>
        i === 0
          ? { ...l, amount: new Decimal(l.amount).minus(1).toFixed(2) }
          : i === 3
            ? { ...l, amount: new Decimal(l.amount).plus(1).toFixed(2) }
            : l,
      ),
    });
    expect(res.status).toBe(409);
    expect(res.body.errors).toEqual([{ field: 'lines.0.amount', message: 'This line is billed and cannot change.' }]);
    // … and its label: its invoice carries it (a draft's would be issued under the old one)
    const renamed = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      ...changed,
      lines: changed.lines.map((l, i) => (i === 0 ? { ...l, label: 'Deposit at signing' } : l)),
    });
    expect(renamed.status).toBe(409);
    expect(renamed.body.errors).toEqual([{ field: 'lines.0.label', message: 'This line is billed and cannot change.' }]);
  });

  it('drafts a line once however often it is asked at the same time; bad draft requests are 400 naming the field', async () => {
    const final = started.lines[3];
    const asks = await Promise.all(
      Array.from({ length: 4 }, () => f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'line', scheduleLineId: final.id })),
    );
    expect(asks.map((r) => r.status).sort()).toEqual([201, 409, 409, 409]);
    const live = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`select id from invoices where tenant_id = $1 and schedule_line_id = $2`, [tx.tenantId, final.id]),
    );
    expect(live.rowCount).toBe(1);
    expect((await f.send('delete', `/api/invoices/${live.rows[0].id}`)).status).toBe(204);

    const badKind = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'credit' });
    expect(badKind.status).toBe(400);
    expect(badKind.body.errors.map((e: { field: string }) => e.field)).toEqual(['kind']);
    const badLine = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'line', scheduleLineId: 'not-a-line' });
    expect(badLine.body.errors.map((e: { field: string }) => e.field)).toEqual(['scheduleLineId']);
    const otherLine = (await other.billing()).lines[0].id;
    const foreign = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'line', scheduleLineId: otherLine });
    expect(foreign.status).toBe(400);
    expect(foreign.body.errors.map((e: { field: string }) => e.field)).toEqual(['scheduleLineId']);
    expect((await f.billing()).lines[3]).toMatchObject({ status: 'scheduled', invoiceId: null });
  });

  it('records offline payments up to the amount due, then voids only what is unpaid, with credit note CN-0001', async () => {
    const b = await f.billing();
    const [depositId, stageId] = [b.lines[0].invoiceId!, b.lines[1].invoiceId!];
    const deposit = (await f.agent.get(`/api/invoices/${depositId}`)).body as InvoiceDetail;
    const over = await f.send('post', `/api/invoices/${depositId}/payments`, {
      method: 'cheque',
      amount: new Decimal(deposit.amountDue).plus('0.01').toFixed(2),
      receivedOn: '2026-12-02',
      reference: '1042',
    });
    expect(over.status).toBe(400);
    expect(over.body.errors.map((e: { field: string }) => e.field)).toEqual(['amount']);
    const badMethod = await f.send('post', `/api/invoices/${depositId}/payments`, {
      method: 'card',
      amount: '1.00',
      receivedOn: '2026-12-02',
      reference: '',
    });
    expect(badMethod.status).toBe(400);
    expect(badMethod.body.errors.map((e: { field: string }) => e.field)).toEqual(['method']);
    // Received today or before (tomorrow allowed, as the invoice date), and not a year before the invoice's date.
    for (const receivedOn of ['2026-12-03', '2025-11-30']) {
      const badDay = await f.send('post', `/api/invoices/${depositId}/payments`, {
        method: 'cash',
        amount: '1.00',
        receivedOn,
        reference: '',
      });
      expect(badDay.status).toBe(400);
      expect(badDay.body.errors.map((e: { field: string }) => e.field)).toEqual(['receivedOn']);
    }

    const part = await f.send('post', `/api/invoices/${depositId}/payments`, {
      method: 'cheque',
      amount: '100.00',
      receivedOn: '2026-12-02',
      reference: '1042',
    });
    expect(part.status).toBe(200);
    expect(part.body).toMatchObject({
      status: 'part_paid',
      amountPaid: '100.00',
      amountDue: new Decimal(deposit.total).minus(100).toFixed(2),
    });
    const rest = await f.send('post', `/api/invoices/${depositId}/payments`, {
      method: 'transfer',
      amount: part.body.amountDue,
      receivedOn: '2026-12-02',
      reference: 'Bank ref 77',
    });
    expect(rest.body).toMatchObject({ status: 'paid', amountDue: '0.00' });
    expect((rest.body as InvoiceDetail).payments.map((p) => p.method)).toEqual(['cheque', 'transfer']);
    const recorded = (rest.body as InvoiceDetail).auditTrail.filter((a) => a.action === 'invoice.payment_recorded');
    expect(recorded.map((a) => a.text.replace(/, receipt .*$/, ''))).toEqual([
      'Payment of $100.00 received (cheque)',
      `Payment of ${new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(part.body.amountDue as Intl.StringNumericLiteral)} received (bank transfer)`,
    ]);

    const refused = await f.send('post', `/api/invoices/${depositId}/void`, { reason: 'Billed twice' });
    expect(refused.status).toBe(409);
    expect(refused.body.detail).toContain('Refund the payments first');
    expect((await f.send('post', `/api/invoices/${stageId}/void`, { reason: '' })).status).toBe(400);
    const voided = await f.send('post', `/api/invoices/${stageId}/void`, { reason: 'Billed before the layer was done' });
    expect(voided.status).toBe(200);
    const v = voided.body as InvoiceDetail;
    expect(v).toMatchObject({ status: 'void', amountDue: '0.00', voidReason: 'Billed before the layer was done', number: 'INV-0003' });
    expect(v.creditNote).toMatchObject({ number: 'CN-0001', amount: v.total, issuedOn: '2026-12-01' });
    expect(v.auditTrail.map((a) => a.action)).toEqual(['invoice.drafted', 'invoice.issued', 'invoice.voided', 'credit_note.issued']);
    expect((await f.send('post', `/api/invoices/${stageId}/void`, { reason: 'again' })).status).toBe(409);
    const after = await f.billing();
    expect(after.lines[1]).toMatchObject({ status: 'scheduled', invoiceId: null });
    expect(after.totals.paid).toBe(deposit.total);
  });

  it('lists invoices newest first by keyset with filters and search; Today shows drafts and overdue ones', async () => {
    const all = await f.agent.get('/api/invoices?limit=2');
    expect(all.status).toBe(200);
    expect(all.body.items).toHaveLength(2);
    expect(all.body.nextCursor).toEqual(expect.any(String));
    const next = await f.agent.get(`/api/invoices?limit=2&after=${all.body.nextCursor}`);
    const ids = [...all.body.items, ...next.body.items].map((i: { id: string }) => i.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(ids.length).toBe(3);
    expect(next.body.nextCursor).toBeNull();
    const byFilter = async (filter: string) =>
      ((await f.agent.get(`/api/invoices?filter=${filter}`)).body.items as Array<{ number: string | null }>).map((i) => i.number);
    expect(await byFilter('paid')).toEqual(['INV-0001']);
    expect(await byFilter('void')).toEqual(['INV-0003']);
    expect(await byFilter('open')).toEqual(['INV-0002']);
    expect(await byFilter('drafts')).toEqual([]);
    expect(await byFilter('overdue')).toEqual([]);
    expect(((await f.agent.get('/api/invoices?q=inv-0002')).body.items as unknown[]).length).toBe(1);
    expect(((await f.agent.get('/api/invoices?q=Edwina')).body.items as unknown[]).length).toBe(3);
    expect(((await f.agent.get('/api/invoices?q=nobody')).body.items as unknown[]).length).toBe(0);
    const bad = await f.agent.get('/api/invoices?filter=late&after=abc');
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field)).toEqual(['filter']);
    expect((await f.agent.get('/api/invoices?after=abc')).body.errors[0].field).toBe('after');

    // An invoice dated a month back is past its due date (net 14) today.
    const lateId = await f.lineDraft(started.lines[3].id);
    expect((await f.issue(lateId, { send: false, issuedOn: '2026-11-01' })).dueOn).toBe('2026-11-15');
    expect(await byFilter('overdue')).toEqual(['INV-0004']);
    expect(await byFilter('open')).toEqual(['INV-0004', 'INV-0002']);
    const today = await f.agent.get('/api/billing/today');
    expect(today.status).toBe(200);
    expect(today.body.overdue.map((i: { number: string }) => i.number)).toEqual(['INV-0004']);
    expect(today.body.overdue[0].isOverdue).toBe(true);
    expect(today.body.readyToBill).toEqual([]);
    const draftId = await f.lineDraft(started.lines[1].id);
    expect((await f.agent.get('/api/billing/today')).body.readyToBill.map((i: { id: string }) => i.id)).toEqual([draftId]);
    expect((await f.billing()).readyToBill).toBe(1);
  });

  it('crew get 403 on every billing route; another firm gets 404 for these ids', async () => {
    const invoiceId = (await f.billing()).lines[0].invoiceId!;
    const lineId = started.lines[3].id;
    const routes: Array<[method: 'get' | 'post' | 'put' | 'patch' | 'delete', url: string, body?: object]> = [
      ['get', `/api/jobs/${f.jobId}/billing`],
      ['put', `/api/jobs/${f.jobId}/billing/schedule`, asUpdate(started)],
      ['post', `/api/jobs/${f.jobId}/billing/start`],
      ['put', `/api/jobs/${f.jobId}/billing/value-lines`, { lines: [{ label: 'All', scheduledValue: started.contractSum }] }],
      ['post', `/api/jobs/${f.jobId}/invoices`, { kind: 'line', scheduleLineId: lineId }],
      ['get', `/api/invoices/${invoiceId}`],
      ['patch', `/api/invoices/${invoiceId}`, { notes: 'x' }],
      ['delete', `/api/invoices/${invoiceId}`],
      ['post', `/api/invoices/${invoiceId}/issue`, { send: false }],
      ['post', `/api/invoices/${invoiceId}/void`, { reason: 'x' }],
      ['post', `/api/invoices/${invoiceId}/payments`, { method: 'cash', amount: '1.00', receivedOn: '2026-12-01', reference: '' }],
    ];
    const crew = await joinAs(t, f, 'crew');
    for (const [method, url, body] of [...routes, ['get', '/api/invoices'], ['get', '/api/billing/today']] as typeof routes) {
      const res = await crew.agent[method](url)
        .set('x-csrf-token', crew.csrf())
        .send(body ?? {});
      expect([method, url, res.status]).toEqual([method, url, 403]);
    }
    for (const [method, url, body] of routes) {
      const res = await other.agent[method](url)
        .set('x-csrf-token', other.csrf())
        .send(body ?? {});
      expect([method, url, res.status]).toEqual([method, url, 404]);
    }
    expect(((await other.agent.get('/api/invoices')).body.items as unknown[]).length).toBe(0);
    const office = await joinAs(t, f, 'office');
    expect((await office.agent.get(`/api/invoices/${invoiceId}`)).status).toBe(200);
  });

  it('refuses amounts finer than the currency allows (yen has no cents): 400 naming the field', async () => {
    await withTenant(t.ctx.pool, other.firmId, (tx) =>
      tx.client.query(
        `update jobs set currency = 'JPY', contract_sum = 480000, original_contract_sum = 480000, contract_tax = 0 where tenant_id = $1 and id = $2`,
        [tx.tenantId, other.jobId],
      ),
    );
    const res = await other.send('put', `/api/jobs/${other.jobId}/billing/value-lines`, {
      lines: [
        { label: 'Walls', scheduledValue: '240000.50' },
        { label: 'Ceiling', scheduledValue: '239999.50' },
      ],
    });
    expect(res.status).toBe(400);
    expect(res.body.errors.map((e: { field: string }) => e.field)).toEqual(['lines.0.scheduledValue', 'lines.1.scheduledValue']);
    const deposit = await other.send('put', `/api/jobs/${other.jobId}/billing/schedule`, {
      method: 'progress',
      lines: [{ label: 'Deposit', role: 'deposit', trigger: { kind: 'acceptance' }, amount: '1000.50' }],
    });
    expect(deposit.status).toBe(400);
    expect(deposit.body.errors.map((e: { field: string }) => e.field)).toEqual(['lines.0.amount']);
    const view = await other.billing();
    expect(view).toMatchObject({ currency: 'JPY', contractSum: '480000', method: 'schedule' });
  });
});
