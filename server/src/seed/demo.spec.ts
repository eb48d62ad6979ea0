import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { Pool } from 'pg';
import { testDatabaseUrls } from '../testing/test-env';
import { dateDemoHistory, DEMO, seedDemo } from './demo';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('demo seed', () => {
  it('creates the invented firm once, with people, a client and an inquiry at every stage', async () => {
    // The run's database is shared by every spec file: firms/export seeds the demo firm too, maybe first.
    expect(['created', 'present']).toContain(await seedDemo(t.ctx.pool, new Date('2026-12-01T15:00:00Z')));
    expect(await seedDemo(t.ctx.pool)).toBe('present');
    const firmId = (await t.queue.boss.getDb().executeSql(`select id from firms where slug = $1`, [DEMO.firm.slug])).rows[0].id;
    const stages = await withTenant(t.ctx.pool, firmId, (tx) => tx.client.query(`select distinct stage from inquiries order by stage`));
    expect(stages.rows.map((r) => r.stage).sort()).toEqual(['contacted', 'lost', 'new', 'proposal_sent', 'samples', 'visit_booked', 'won']);
  });

  it("keeps the US federal holidays of the coming year as the demo firm's days off (5 U.S.C. 6103(a), as observed)", async () => {
    const firmId = (await t.queue.boss.getDb().executeSql(`select id from firms where slug = $1`, [DEMO.firm.slug])).rows[0].id;
    const row = await withTenant(t.ctx.pool, firmId, (tx) => tx.client.query(`select settings from firm_estimating_settings`));
    const holidays: string[] = row.rows[0].settings.calendar.holidays;
    // seeded on 1 December 2026: Christmas Day 2026 through Thanksgiving 2027
    expect(holidays).toHaveLength(11);
    expect(holidays[0]).toBe('2026-12-25');
    expect(holidays).toContain('2027-07-05');
    expect(holidays.at(-1)).toBe('2027-11-25');
  });
});

describe('demo sample boards', () => {
  it("gives the demo client's house a board in each state: a round she asked to change, its approved next round, one shown, one draft", async () => {
    const firmId = (await t.queue.boss.getDb().executeSql(`select id from firms where slug = $1`, [DEMO.firm.slug])).rows[0].id;
    const boards = await withTenant(t.ctx.pool, firmId, (tx) =>
      tx.client.query<{ label: string; round: number; status: string; has_finish: boolean; follows: boolean }>(
        `select label, round, status, finish_snapshot is not null as has_finish, previous_board_id is not null as follows
           from sample_boards order by label, round`,
      ),
    );
    expect(boards.rows).toEqual([
      { label: 'Library, antiqued glaze', round: 1, status: 'draft', has_finish: true, follows: false },
      { label: 'Stair hall, burnished lime', round: 1, status: 'changes_requested', has_finish: true, follows: false },
      { label: 'Stair hall, burnished lime', round: 2, status: 'approved', has_finish: true, follows: true },
      { label: 'Turret room, two-coat limewash', round: 1, status: 'shown', has_finish: true, follows: false },
    ]);
  });
});

describe('demo billing', () => {
  const firmOf = async () =>
    (await t.queue.boss.getDb().executeSql(`select id from firms where slug = $1`, [DEMO.firm.slug])).rows[0].id as string;

  it('gives the demo firm two billed jobs with an invoice in every state, a void one with its credit note, and change orders', async () => {
    const firmId = await firmOf();
    const found = await withTenant(t.ctx.pool, firmId, async (tx) => {
      const jobs = await tx.client.query<{ title: string; billing_started_at: Date | null }>(
        `select title, billing_started_at from jobs order by created_at`,
      );
      // seeded on 1 December 2026 (America/New_York): overdue = open or part paid and due before that day
      const invoices = await tx.client.query<{ status: string; origin: string; number_text: string | null; overdue: boolean }>(
        `select status, origin, number_text, (status in ('issued', 'part_paid') and due_on < '2026-12-01') as overdue from invoices order by created_at`,
      );
      const credit = await tx.client.query<{ number_text: string; status: string }>(
        `select c.number_text, i.status from credit_notes c join invoices i on i.id = c.invoice_id`,
      );
      const orders = await tx.client.query<{ status: string }>(`select status from change_orders order by status`);
      const marks = await tx.client.query<{ n: number }>(`select count(*)::int as n from job_progress where kind = 'layerDone'`);
      // the turret's approved change order priced from the crown: its layers are work the crew marks
      const crown = await tx.client.query<{ n: number }>(
        `select count(*)::int as n from job_work_items where surface_name = 'Crown at the wall top'`,
      );
      const payments = await tx.client.query<{ n: number }>(`select count(*)::int as n from payments`);
      return {
        jobs: jobs.rows,
        invoices: invoices.rows,
        credit: credit.rows,
        orders: orders.rows,
        marks: marks.rows[0].n,
        crownItems: crown.rows[0].n,
        payments: payments.rows[0].n,
      };
    });
    expect(found.jobs.map((j) => j.title)).toEqual(['Stair hall lime plaster', 'Turret room limewash']);
    expect(found.jobs.every((j) => j.billing_started_at)).toBe(true);
    const states = found.invoices.map((i) => (i.overdue ? 'overdue' : i.status));
    for (const state of ['draft', 'issued', 'part_paid', 'paid', 'overdue', 'void']) expect(states).toContain(state);
    // the draft waiting for review was made by the queue's trigger check, and has no number
    expect(found.invoices.filter((i) => i.status === 'draft').every((i) => i.origin === 'queue' && i.number_text === null)).toBe(true);
    // numbers without a gap nor a duplicate (a void invoice keeps its number)
    const numbers = found.invoices.filter((i) => i.number_text).map((i) => i.number_text!);
    expect([...numbers].sort()).toEqual(numbers.map((_, i) => `INV-${String(i + 1).padStart(4, '0')}`));
    expect(found.credit).toEqual([{ number_text: 'CN-0001', status: 'void' }]);
    expect(found.orders.map((o) => o.status)).toEqual(['approved', 'approved', 'sent']);
    expect(found.marks).toBeGreaterThan(0);
    expect(found.crownItems).toBeGreaterThan(0);
    expect(found.payments).toBeGreaterThanOrEqual(2);
  });

  it('shows the chasing of the overdue invoice: the reminders the daily job would have sent, each on its day', async () => {
    const firmId = await firmOf();
    const reminders = await withTenant(t.ctx.pool, firmId, async (tx) => {
      const { rows } = await tx.client.query<{ step: string; sent_on: string; due_on: string }>(
        `select r.step, r.sent_on::text as sent_on, i.due_on::text as due_on from invoice_reminders r
           join invoices i on i.tenant_id = r.tenant_id and i.id = r.invoice_id
          where i.status in ('issued', 'part_paid') and i.due_on < '2026-12-01' order by r.sent_on`,
      );
      return rows;
    });
    expect(reminders.length).toBeGreaterThan(0);
    // each sent on a day of the story, none after the seed's today
    expect(reminders.every((r) => r.sent_on <= '2026-12-01')).toBe(true);
  });

  it("dates the audit rows of a seeding transaction at the moment of the story it stands for (the owner's pool)", async () => {
    const firmId = await firmOf();
    const txStart = await withTenant(t.ctx.pool, firmId, async (tx) => {
      await tx.client.query(
        `insert into audit_log (tenant_id, actor_kind, action, entity) values ($1, 'system', 'demo.history_check', 'firm')`,
        [tx.tenantId],
      );
      return (await tx.client.query<{ t: string }>(`select now()::text as t`)).rows[0].t;
    });
    const owner = new Pool({ connectionString: testDatabaseUrls().DATABASE_OWNER_URL, max: 1 });
    try {
      await dateDemoHistory(owner, firmId, [{ txStart, at: new Date('2026-09-18T15:00:00Z') }]);
    } finally {
      await owner.end();
    }
    const dated = await withTenant(t.ctx.pool, firmId, async (tx) => {
      const { rows } = await tx.client.query<{ at: Date }>(`select created_at as at from audit_log where action = 'demo.history_check'`);
      return rows.map((r) => r.at.toISOString());
    });
    expect(dated).toEqual(['2026-09-18T15:00:00.000Z']);
  });
});
