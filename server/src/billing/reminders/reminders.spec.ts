import { type BillingSettings, DEFAULT_BILLING_SETTINGS } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { addDays } from '@layerbook/domain';
import { startTestServer, type TestServer } from '../../testing/harness';
import * as invoiceMail from '../invoice-mail';
import { acceptedJob, billingQueueSettled } from '../progress-fixtures';
import { runBillingDaily } from '../triggers/daily';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(async () => {
  jest.restoreAllMocks();
  await t.stop();
});

type Job = Awaited<ReturnType<typeof acceptedJob>>;

/** SQL in the job's firm: $1 is the firm, then `params`. */
const query = <R extends object = Record<string, unknown>>(job: Job, sql: string, params: unknown[] = []) =>
  withTenant(t.ctx.pool, job.firmId, async (tx) => (await tx.client.query<R>(sql, [tx.tenantId, ...params])).rows);

let nextNumber = 100;
/** An issued invoice as billing leaves it (numbered, due on a day), written straight to the table. */
async function issuedInvoice(job: Job, status: 'issued' | 'part_paid' | 'void', dueOn: string): Promise<string> {
  const n = ++nextNumber;
  const [row] = await query<{ id: string }>(
    job,
    `insert into invoices (tenant_id, job_id, client_id, kind, status, number, number_text, currency, subtotal, total, amount_paid, origin, issued_on, due_on)
     select $1, $2, client_id, 'milestone', $3, $4::int, 'INV-' || $4::text, currency, 500, 500, case when $3 = 'part_paid' then 100 else 0 end, 'office', '2026-12-01', $5
       from jobs where tenant_id = $1 and id = $2 returning id`,
    [job.job.id, status, n, dueOn],
  );
  return row.id;
}

describe('invoice reminders', () => {
  it('follow the firm’s cadence over a month: each step once, none after payment, none for a void invoice, one per step when two runs race', async () => {
    const sentMail: Array<{ invoiceId: string; step: string; day: string }> = [];
    let day = '';
    // What the reminders hand to the mail (whose own spec checks the e-mail): each call, on the day of the run.
    jest.spyOn(invoiceMail, 'enqueueInvoiceMail').mockImplementation((_tx, _q, _c, invoiceId, purpose) => {
      if (purpose.kind === 'reminder') sentMail.push({ invoiceId, step: purpose.step, day });
      return Promise.resolve();
    });
    const job = await acceptedJob(t, 'Reminder Studio');
    // The defaults: 3 days before, on the due date, then every 7 days, at most 3 times.
    const open = await issuedInvoice(job, 'issued', '2026-12-15');
    const partPaid = await issuedInvoice(job, 'part_paid', '2026-12-15');
    const paidLater = await issuedInvoice(job, 'issued', '2026-12-15');
    const voided = await issuedInvoice(job, 'void', '2026-12-15');
    const run = () =>
      runBillingDaily(t.ctx.pool, t.ctx.queue, t.ctx.config, { tenantId: job.firmId, localDate: day }, t.ctx.logger, t.ctx.now());

    for (day = '2026-12-01'; day <= '2026-12-31'; day = addDays(day, 1)) {
      t.setNow(new Date(`${day}T16:00:00Z`));
      if (day === '2026-12-16') {
        await query(job, `update invoices set amount_paid = total, status = 'paid' where tenant_id = $1 and id = $2`, [paidLater]);
      }
      // Two workers on the same day (a retry racing the first run): the unique step key lets one through.
      await Promise.all([run(), run()]);
    }
    const steps = (id: string) => sentMail.filter((m) => m.invoiceId === id).map((m) => `${m.step}@${m.day}`);
    const cadence = ['before:3@2026-12-12', 'due@2026-12-15', 'after:7@2026-12-22', 'after:14@2026-12-29'];
    expect(steps(open)).toEqual(cadence);
    expect(steps(partPaid)).toEqual(cadence);
    expect(steps(paidLater)).toEqual(['before:3@2026-12-12', 'due@2026-12-15']);
    expect(steps(voided)).toEqual([]);
    const logged = await query<{ step: string; sent_on: string }>(
      job,
      `select step, sent_on::text as sent_on from invoice_reminders where tenant_id = $1 and invoice_id = $2 order by sent_on`,
      [open],
    );
    expect(logged.map((r) => `${r.step}@${r.sent_on}`)).toEqual(cadence);
    const audits = await query<{ n: number }>(
      job,
      `select count(*)::int as n from audit_log where tenant_id = $1 and action = 'invoice.reminded' and data->>'jobId' = $2::text`,
      [job.job.id],
    );
    expect(audits[0].n).toBe(cadence.length * 2 + 2);

    // A changed cadence keeps what was sent: every 10 days now, but after:14 was the second of at most 3.
    // Straight to the table: the owner's session has long expired on the moved clock.
    const setReminders = (reminders: BillingSettings['reminders']) =>
      query(
        job,
        `insert into firm_billing_settings (tenant_id, settings) values ($1, $2) on conflict (tenant_id) do update set settings = excluded.settings`,
        [JSON.stringify({ ...DEFAULT_BILLING_SETTINGS, reminders })],
      );
    await setReminders({ isOn: true, daysBefore: 3, onDueDate: true, everyDaysAfter: 10, maxAfter: 3 });
    for (day = '2027-01-01'; day <= '2027-01-31'; day = addDays(day, 1)) await run();
    expect(steps(open)).toEqual([...cadence, 'after:20@2027-01-04']);

    // Reminders off: nothing, whatever is due.
    await setReminders({ isOn: false, daysBefore: 3, onDueDate: true, everyDaysAfter: 7, maxAfter: 3 });
    const later = await issuedInvoice(job, 'issued', '2027-02-10');
    for (day = '2027-02-01'; day <= '2027-02-28'; day = addDays(day, 1)) await run();
    expect(steps(later)).toEqual([]);
    t.setNow(new Date('2026-12-01T15:00:00Z'));
    jest.restoreAllMocks();
  }, 120_000);

  it('skip an invoice voided while the run goes (its list read before the void committed)', async () => {
    const reminded: string[] = [];
    jest.spyOn(invoiceMail, 'enqueueInvoiceMail').mockImplementation((_tx, _q, _c, invoiceId, purpose) => {
      if (purpose.kind === 'reminder') reminded.push(invoiceId);
      return Promise.resolve();
    });
    const job = await acceptedJob(t, 'Reminder Void Race Studio');
    const id = await issuedInvoice(job, 'issued', '2026-12-15');
    t.setNow(new Date('2026-12-15T16:00:00Z'));
    let commitVoid!: () => void;
    const voidMayCommit = new Promise<void>((resolve) => (commitVoid = resolve));
    let voidWritten!: () => void;
    const written = new Promise<void>((resolve) => (voidWritten = resolve));
    // A void holding the invoice's row, not yet committed, as voidInvoice does.
    const voiding = withTenant(t.ctx.pool, job.firmId, async (tx) => {
      await tx.client.query(`update invoices set status = 'void' where tenant_id = $1 and id = $2`, [tx.tenantId, id]);
      voidWritten();
      await voidMayCommit;
    });
    await written;
    const run = runBillingDaily(
      t.ctx.pool,
      t.ctx.queue,
      t.ctx.config,
      { tenantId: job.firmId, localDate: '2026-12-15' },
      t.ctx.logger,
      t.ctx.now(),
    );
    await new Promise((resolve) => setTimeout(resolve, 300));
    commitVoid();
    await Promise.all([voiding, run]);
    expect(reminded).toEqual([]);
    expect(await query(job, `select step from invoice_reminders where tenant_id = $1 and invoice_id = $2`, [id])).toEqual([]);
    t.setNow(new Date('2026-12-01T15:00:00Z'));
    jest.restoreAllMocks();
  });

  it('reach the client by e-mail from the firm’s billing day in the queue, once however often the day runs, and stop once the invoice is paid', async () => {
    const job = await acceptedJob(t, 'Mailed Reminder Studio');
    expect((await job.agent.post(`/api/jobs/${job.job.id}/billing/start`).set('x-csrf-token', job.csrf()).send({})).status).toBe(200);
    await billingQueueSettled(t, [job.firmId]);
    const [deposit] = await query<{ id: string }>(
      job,
      `select id from invoices where tenant_id = $1 and job_id = $2 and kind = 'deposit'`,
      [job.job.id],
    );
    const issued = await job.agent
      .post(`/api/invoices/${deposit.id}/issue`)
      .set('x-csrf-token', job.csrf())
      .send({ issuedOn: '2026-12-01', send: false });
    expect(issued.status).toBe(200);
    expect(issued.body).toMatchObject({ status: 'issued', dueOn: '2026-12-15' });
    const billingDay = async (localDate: string) => {
      await Promise.all([1, 2].map(() => t.queue.boss.send('billing-daily', { tenantId: job.firmId, localDate })));
      await billingQueueSettled(t, [job.firmId]);
    };
    // The web role reads only the outbox's purpose keys (its own firm's rows).
    const reminderKeys = () =>
      withTenant(t.ctx.pool, job.firmId, async (tx) =>
        (
          await tx.client.query<{ purpose_key: string }>(`select purpose_key from mail_outbox where purpose_key like $1`, [
            `invoice:${deposit.id}:reminder:%`,
          ])
        ).rows.map((r) => r.purpose_key),
      );

    await billingDay('2026-12-12');
    const mail = await t.inbox.waitFor(
      (m) => JSON.stringify(m.to).includes(job.clientEmail) && (m.text ?? '').includes(`/portal/invoices/${deposit.id}`),
    );
    expect(mail.text).toContain('Edwina Marl');
    expect(await reminderKeys()).toEqual([`invoice:${deposit.id}:reminder:before:3`]);

    // The API's clock stays on the 1st (the office's session would lapse across the days run), so the cheque is dated then.
    const paid = await job.agent
      .post(`/api/invoices/${deposit.id}/payments`)
      .set('x-csrf-token', job.csrf())
      .send({ method: 'cheque', amount: issued.body.amountDue, receivedOn: '2026-12-01', reference: 'Cheque 1041' });
    expect(paid.status).toBe(200);
    expect(paid.body.status).toBe('paid');
    await billingDay('2026-12-15');
    await billingDay('2026-12-22');
    expect(await reminderKeys()).toHaveLength(1);
    const history = (await job.agent.get(`/api/jobs/${job.job.id}/history`)).body as { items: Array<{ text: string; who: string }> };
    const reminded = history.items.filter((e) => e.text.startsWith('Reminder for'));
    expect(reminded.map((e) => [e.text, e.who])).toEqual([
      [`Reminder for Deposit ${issued.body.number} sent, 3 days before the due date`, 'Automatic (billing)'],
    ]);
  }, 120_000);
});
