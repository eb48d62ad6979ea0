import { DEFAULT_BILLING_SETTINGS, type InvoiceDetail, type JobBillingView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { sumMoney } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { startTestServer, TestServer } from '../testing/harness';
import { billingJob } from './billing-fixtures';
import { billingQueueSettled } from './progress-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

/**
 * A job of the worked example's shape: 10 % retainage on work and stored materials (deposit credited
 * pro rata, the default), and a 48,000 contract with no tax inside (the accepted option's own total is
 * set aside).
 */
async function exampleJob(name: string) {
  const f = await billingJob(t, name);
  const settings = { ...DEFAULT_BILLING_SETTINGS, retainage: { workPercent: 10, storedPercent: 10, stopAtPercentComplete: null } };
  expect((await f.send('put', '/api/firm/billing', settings)).status).toBe(200);
  await withTenant(t.ctx.pool, f.firmId, (tx) =>
    tx.client.query(
      `update jobs set contract_sum = 48000, original_contract_sum = 48000, contract_tax = 0 where tenant_id = $1 and id = $2`,
      [tx.tenantId, f.jobId],
    ),
  );
  return f;
}

/**
 * The example job billed by progress with a 4,800 deposit on acceptance and one value line for all
 * 48,000 of the work, billing started: its deposit drafted (not issued) and the value line's id.
 */
async function withDepositDrafted(name: string) {
  const f = await exampleJob(name);
  await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
    method: 'progress',
    lines: [{ label: 'Deposit', role: 'deposit', trigger: { kind: 'acceptance' }, amount: '4800.00' }],
  });
  const values = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
    lines: [{ label: 'All the plaster work', scheduledValue: '48000.00' }],
  });
  const started = await f.send('post', `/api/jobs/${f.jobId}/billing/start`);
  const depositId = await f.lineDraft((started.body as JobBillingView).lines[0].id);
  return { f, depositId, lineId: (values.body as JobBillingView).valueLines[0].id };
}

describe('progress billing through the API', () => {
  // DOMAIN.md §2.10 worked example (AIA G702/G703 arithmetic summaries): original contract 48,000,
  // change order #1 +3,200, retainage 10 % on work and on stored materials; application #1 certifies
  // 14,800 of work (13,320 after retainage); application #2 is due 17,010 with 3,370 held.
  it('reproduces the worked example: application #1, then #2 after a change order, line retainage adding up to the summary', async () => {
    const f = await exampleJob('Progress Example Plaster');
    const method = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, { method: 'progress', lines: [] });
    expect(method.status).toBe(200);
    const notSum = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
      lines: [{ label: 'All work', scheduledValue: '47999.99' }],
    });
    expect(notSum.status).toBe(400);
    expect(notSum.body.errors).toEqual([{ field: 'lines', message: expect.stringContaining('0.01 short of the contract sum') }]);
    const values = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
      lines: [
        { label: 'Mobilization, protection, prep', scheduledValue: '6000.00' },
        { label: 'Venetian plaster, walls', scheduledValue: '22000.00' },
        { label: 'Dome: lime plaster + glaze', scheduledValue: '14000.00' },
        { label: 'Stenciled frieze', scheduledValue: '6000.00' },
      ],
    });
    expect(values.status).toBe(200);
    const [prep, walls, dome, frieze] = (values.body as JobBillingView).valueLines.map((v) => v.id);
    expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);

    // Application #1: prep done (as an amount), walls 40 % (as a percent).
    const first = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-31' });
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ kind: 'progress', status: 'draft', number: null, total: '0.00' });
    const app1 = await f.send('patch', `/api/invoices/${first.body.id}`, {
      progressLines: [
        { valueLineId: prep, workToDate: { amount: '6000.00' }, storedMaterials: '0' },
        { valueLineId: walls, workToDate: { percent: 40 }, storedMaterials: '0' },
      ],
    });
    expect(app1.status).toBe(200);
    expect((app1.body as InvoiceDetail).progress!.summary).toMatchObject({
      completedToDate: '14800.00',
      retainage: '1480.00',
      earnedLessRetainage: '13320.00',
      previouslyBilled: '0.00',
      dueThisPeriod: '13320.00',
    });
    expect((await f.issue(first.body.id)).number).toBe('INV-0001');

    // Change order #1, approved: +3,200, its own line in the schedule of values.
    await withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const co = await tx.client.query<{ id: string }>(
        `insert into change_orders (tenant_id, job_id, number, title, pricing, price, amount, status, decided_at)
         values ($1, $2, 1, 'Faux beams', 'lumpSum', 3200, 3200, 'approved', now()) returning id`,
        [tx.tenantId, f.jobId],
      );
      await tx.client.query(`update jobs set contract_sum = 51200 where tenant_id = $1 and id = $2`, [tx.tenantId, f.jobId]);
      await tx.client.query(
        `insert into job_value_lines (tenant_id, job_id, position, label, scheduled_value, change_order_id) values ($1, $2, 5, 'CO #1 faux beams', 3200, $3)`,
        [tx.tenantId, f.jobId, co.rows[0].id],
      );
    });
    const beams = (await f.billing()).valueLines[4].id;

    // Application #2: walls 80 %, dome 50 %, frieze materials stored 1,500, beams 50 %.
    const second = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2027-01-31' });
    expect(second.status).toBe(201);
    // Work billed never goes down; stored materials never pass what is left of the line: 400 naming each, nothing written.
    const wrong = await f.send('patch', `/api/invoices/${second.body.id}`, {
      progressLines: [
        { valueLineId: walls, workToDate: { percent: 30 }, storedMaterials: '0' },
        { valueLineId: frieze, workToDate: { amount: '0' }, storedMaterials: '6000.01' },
      ],
    });
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors.map((e: { field: string }) => e.field)).toEqual([
      'progressLines.0.workToDate',
      'progressLines.1.storedMaterials',
    ]);
    expect((await f.billing()).valueLines.map((v) => [v.percentComplete, v.storedMaterials])).toEqual([
      ['100', '0.00'],
      ['40', '0.00'],
      ['0', '0.00'],
      ['0', '0.00'],
      ['0', '0.00'],
    ]);
    const app2 = await f.send('patch', `/api/invoices/${second.body.id}`, {
      progressLines: [
        { valueLineId: walls, workToDate: { percent: 80 }, storedMaterials: '0' },
        { valueLineId: dome, workToDate: { amount: '7000.00' }, storedMaterials: '0' },
        { valueLineId: frieze, workToDate: { percent: 0 }, storedMaterials: '1500.00' },
        { valueLineId: beams, workToDate: { percent: 50 }, storedMaterials: '0' },
      ],
    });
    expect(app2.status).toBe(200);
    const table = (app2.body as InvoiceDetail).progress!;
    expect(
      table.lines.map((l) => [
        l.scheduledValue,
        l.previousWork,
        l.thisPeriodWork,
        l.storedMaterials,
        l.completedToDate,
        l.percentComplete,
        l.balanceToFinish,
        l.retainage,
      ]),
    ).toEqual([
      ['6000.00', '6000.00', '0.00', '0.00', '6000.00', '100', '0.00', '600.00'],
      ['22000.00', '8800.00', '8800.00', '0.00', '17600.00', '80', '4400.00', '1760.00'],
      ['14000.00', '0.00', '7000.00', '0.00', '7000.00', '50', '7000.00', '700.00'],
      ['6000.00', '0.00', '0.00', '1500.00', '1500.00', '25', '4500.00', '150.00'],
      ['3200.00', '0.00', '1600.00', '0.00', '1600.00', '50', '1600.00', '160.00'],
    ]);
    expect(table.summary).toEqual({
      originalContractSum: '48000.00',
      changeOrders: '3200.00',
      contractSumToDate: '51200.00',
      completedToDate: '33700.00',
      retainage: '3370.00',
      // kept back this period: 3,370 to date less application #1's 1,480 (= 18,900 of work and stored × 10 %)
      retainageThisPeriod: '1890.00',
      earnedLessRetainage: '30330.00',
      previouslyBilled: '13320.00',
      dueThisPeriod: '17010.00',
      balanceToFinishWithRetainage: '20870.00',
    });
    expect(sumMoney(table.lines.map((l) => new Decimal(l.retainage))).toFixed(2)).toBe(table.summary.retainage);
    const issued = await f.issue(second.body.id);
    expect(issued).toMatchObject({
      number: 'INV-0002',
      total: '17010.00',
      subtotal: '17010.00',
      retainageHeld: '3370.00',
      depositCredit: '0.00',
    });

    const after = await f.billing();
    expect(after.valueLines.map((v) => v.billedWork)).toEqual(['6000.00', '17600.00', '7000.00', '0.00', '1600.00']);
    expect(after.totals).toMatchObject({ invoiced: '30330.00', retainageHeld: '3370.00', unbilled: '20870.00' });
    // The marks are kept in the job's history.
    const marks = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`select kind from job_progress where tenant_id = $1 and job_id = $2`, [tx.tenantId, f.jobId]),
    );
    // prep and walls on #1; walls, dome and beams on #2 (the frieze's 0 % did not change)
    expect(marks.rows.filter((r) => r.kind === 'valuePercent')).toHaveLength(5);
    expect(marks.rows.filter((r) => r.kind === 'storedMaterials')).toHaveLength(1);

    // Retainage release bills what is held.
    const release = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'retainage' });
    expect(release.status).toBe(201);
    expect(release.body).toMatchObject({
      kind: 'retainage',
      total: '3370.00',
      lines: [{ label: 'Retainage released', amount: '3370.00' }],
    });
    // A schedule-method job has no progress applications.
    const other = await billingJob(t, 'Progress Refused Plaster');
    expect((await other.send('post', `/api/jobs/${other.jobId}/billing/start`)).status).toBe(200);
    expect((await other.send('post', `/api/jobs/${other.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-31' })).status).toBe(409);
  });

  it("takes the deposit off progress invoices by the firm's rule (pro rata: the deposit's share of what the invoice earns)", async () => {
    const f = await exampleJob('Progress Deposit Plaster');
    const onlyMilestone = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      method: 'progress',
      lines: [{ label: 'Stage payment', role: 'milestone', trigger: { kind: 'acceptance' }, amount: '4800.00' }],
    });
    expect(onlyMilestone.status).toBe(400);
    expect(onlyMilestone.body.errors.map((e: { field: string }) => e.field)).toEqual(['lines.0.role']);
    const schedule = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      method: 'progress',
      lines: [{ label: 'Deposit', role: 'deposit', trigger: { kind: 'acceptance' }, amount: '4800.00' }],
    });
    expect(schedule.status).toBe(200);
    const values = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
      lines: [{ label: 'All the plaster work', scheduledValue: '48000.00' }],
    });
    expect(values.status).toBe(200);
    const started = await f.send('post', `/api/jobs/${f.jobId}/billing/start`);
    expect(started.status).toBe(200);
    const depositId = await f.lineDraft((started.body as JobBillingView).lines[0].id);
    expect((await f.issue(depositId)).total).toBe('4800.00');

    const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-31' });
    const lineId = (values.body as JobBillingView).valueLines[0].id;
    const half = await f.send('patch', `/api/invoices/${draft.body.id}`, {
      progressLines: [{ valueLineId: lineId, workToDate: { percent: 50 }, storedMaterials: '0' }],
    });
    // 24,000 done less 10 % retainage = 21,600 earned; the deposit's share: 4,800 × 21,600 ÷ 48,000 = 2,160.
    expect(half.body).toMatchObject({ subtotal: '21600.00', depositCredit: '2160.00', total: '19440.00', retainageHeld: '2400.00' });
    const issued = await f.issue(draft.body.id);
    expect(issued).toMatchObject({ number: 'INV-0002', depositCredit: '2160.00', total: '19440.00', amountDue: '19440.00' });
    expect((await f.billing()).totals).toMatchObject({ invoiced: '24240.00', unbilled: '23760.00', retainageHeld: '2400.00' });
  });

  it('refigures the open progress draft (through the queue) when a deposit is issued or voided after it was drafted', async () => {
    const { f, depositId, lineId } = await withDepositDrafted('Late Deposit Plaster');
    const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-31' });
    // An amount its percent (four decimals) would not give back: the refigured draft must keep it as typed.
    const typed = await f.send('patch', `/api/invoices/${draft.body.id}`, {
      progressLines: [{ valueLineId: lineId, workToDate: { amount: '12345.67' }, storedMaterials: '0' }],
    });
    const subtotal = (typed.body as InvoiceDetail).subtotal;
    // No deposit issued yet: nothing to credit.
    expect(typed.body).toMatchObject({ depositCredit: '0.00', total: subtotal });
    const read = async () => {
      await billingQueueSettled(t, [f.firmId]);
      return (await f.agent.get(`/api/invoices/${draft.body.id}`)).body as InvoiceDetail;
    };

    await f.issue(depositId);
    // Pro rata, as above: the deposit's share of what the invoice earns, 4,800 ÷ 48,000 of it.
    const credit = new Decimal(subtotal).times(4800).div(48000).toDecimalPlaces(2, Decimal.ROUND_HALF_UP);
    const refigured = await read();
    expect(refigured).toMatchObject({
      status: 'draft',
      subtotal,
      depositCredit: credit.toFixed(2),
      total: new Decimal(subtotal).minus(credit).toFixed(2),
    });
    expect(refigured.progress!.lines[0]).toMatchObject({ thisPeriodWork: '12345.67' });
    const history = (await f.agent.get(`/api/jobs/${f.jobId}/history`)).body as { items: Array<{ text: string; who: string }> };
    expect(history.items.filter((e) => e.text.startsWith('Progress invoice draft refigured'))).toHaveLength(1);

    expect((await f.send('post', `/api/invoices/${depositId}/void`, { reason: 'Wrong client' })).status).toBe(200);
    const back = await read();
    expect(back).toMatchObject({ status: 'draft', subtotal, depositCredit: '0.00', total: subtotal });
    expect(back.progress!.lines[0]).toMatchObject({ thisPeriodWork: '12345.67' });
  });

  it('issues an application as it figures at issue, when its value lines changed under the draft', async () => {
    const f = await exampleJob('Moved Lines Plaster');
    await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, { method: 'progress', lines: [] });
    const values = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
      lines: [
        { label: 'Walls', scheduledValue: '24000.00' },
        { label: 'Ceilings', scheduledValue: '24000.00' },
      ],
    });
    expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);
    const [walls, ceilings] = (values.body as JobBillingView).valueLines;
    const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-11-30' });
    const done = await f.send('patch', `/api/invoices/${draft.body.id}`, {
      progressLines: [{ valueLineId: walls.id, workToDate: { percent: 100 }, storedMaterials: '0' }],
    });
    // 24,000 of work less 10 % retainage.
    expect(done.body).toMatchObject({ subtotal: '21600.00' });
    // The office moves value between the lines before issuing: the walls are worth 12,000 now.
    const moved = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
      lines: [
        { id: walls.id, label: 'Walls', scheduledValue: '12000.00' },
        { id: ceilings.id, label: 'Ceilings', scheduledValue: '36000.00' },
      ],
    });
    expect(moved.status).toBe(200);
    const issued = await f.issue(draft.body.id);
    // All of the walls' 12,000 less 10 %: never the 24,000 the draft was figured on.
    expect(issued).toMatchObject({ subtotal: '10800.00', total: '10800.00' });
    expect(issued.progress!.lines.map((l) => [l.label, l.scheduledValue, l.thisPeriodWork])).toEqual([
      ['Walls', '12000.00', '12000.00'],
      ['Ceilings', '36000.00', '0.00'],
    ]);
    expect(issued.auditTrail.map((a) => a.text)).toContain('Refigured from $21,600.00 to $10,800.00: figured again as it was issued');
    // The next period drafts, on a schedule of values that still ties out.
    const next = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-31' });
    expect(next.status).toBe(201);
    expect((await f.billing()).totals).toMatchObject({ invoiced: '10800.00', retainageHeld: '1200.00' });
  });

  it('does not void what later invoices build on: a deposit they credit, an application before a later one', async () => {
    const { f, depositId, lineId } = await withDepositDrafted('Void Order Plaster');
    await f.issue(depositId);
    const application = async (percent: number, periodEnd: string) => {
      const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd });
      await f.send('patch', `/api/invoices/${draft.body.id}`, {
        progressLines: [{ valueLineId: lineId, workToDate: { percent }, storedMaterials: '0' }],
      });
      return f.issue(draft.body.id);
    };
    const voidOf = (id: string) => f.send('post', `/api/invoices/${id}/void`, { reason: 'Billed in error' });
    const first = await application(25, '2026-11-15');
    expect(first).toMatchObject({ number: 'INV-0002', depositCredit: '1080.00' });
    const second = await application(50, '2026-11-30');
    // Periods go forward, within a year of today (December 1, 2026).
    for (const [periodEnd, message] of [
      ['2026-11-20', 'The last application billed work up to November 30, 2026: this period ends on that day or later.'],
      ['2999-01-01', 'A period ends within a year of today: not after December 2, 2027.'],
    ]) {
      const refused = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd });
      expect(refused.status).toBe(400);
      expect(refused.body.errors).toEqual([{ field: 'periodEnd', message }]);
    }

    // Voided, the deposit would leave 1,080 + 1,080 credited against nothing, billed by no invoice.
    const deposit = await voidOf(depositId);
    expect(deposit.status).toBe(409);
    expect(deposit.body.detail).toBe(
      'Later invoices take this deposit off as a credit (INV-0003 and INV-0002): void them first, newest first, then this deposit.',
    );
    // Application #2 bills work to date less #1's: voiding #1 under it would lose #1's amount.
    const early = await voidOf(first.id);
    expect(early.status).toBe(409);
    expect(early.body.detail).toBe('INV-0003 was issued after this application and bills from it: void it before this one.');
    const invoiced = (await f.billing()).totals.invoiced;

    // Newest first, each goes.
    for (const id of [second.id, first.id, depositId]) expect((await voidOf(id)).status).toBe(200);
    expect(invoiced).toBe('24240.00');
    expect((await f.billing()).totals).toMatchObject({ invoiced: '0.00', unbilled: '48000.00' });
  });

  it('an invoice issued for nothing due (no work this period, or all of it taken by the deposit credit) is paid, never overdue', async () => {
    const f = await billingJob(t, 'Zero Application Plaster');
    expect((await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, { method: 'progress', lines: [] })).status).toBe(200);
    expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);
    const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-01' });
    expect(draft.body).toMatchObject({ status: 'draft', total: '0.00' });
    const issued = await f.issue(draft.body.id, { issuedOn: '2026-10-01', send: false });
    // Left 'issued', it could never be paid (a payment is more than nothing) and stayed overdue with reminders.
    expect(issued).toMatchObject({ number: 'INV-0001', status: 'paid', total: '0.00', amountDue: '0.00', isOverdue: false });
  });

  it('never issues a retainage release for more than is still held (its application voided after the release was drafted)', async () => {
    const f = await billingJob(t, 'Stale Release Plaster');
    const settings = { ...DEFAULT_BILLING_SETTINGS, retainage: { workPercent: 10, storedPercent: 10, stopAtPercentComplete: null } };
    expect((await f.send('put', '/api/firm/billing', settings)).status).toBe(200);
    expect((await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, { method: 'progress', lines: [] })).status).toBe(200);
    const started = await f.send('post', `/api/jobs/${f.jobId}/billing/start`);
    expect(started.status).toBe(200);
    const lineId = (started.body as JobBillingView).valueLines[0].id;
    const app = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-12-01' });
    const half = await f.send('patch', `/api/invoices/${app.body.id}`, {
      progressLines: [{ valueLineId: lineId, workToDate: { percent: 50 }, storedMaterials: '0' }],
    });
    expect(new Decimal((half.body as InvoiceDetail).retainageHeld).isPositive()).toBe(true);
    await f.issue(app.body.id);
    const release = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'retainage' });
    expect(release.status).toBe(201);
    expect((await f.send('post', `/api/invoices/${app.body.id}/void`, { reason: 'Wrong percent' })).status).toBe(200);
    const refused = await f.send('post', `/api/invoices/${release.body.id}/issue`, { send: false });
    expect(refused.status).toBe(409);
    expect((await f.billing()).totals.retainageHeld).toBe('0.00');
  });
});
