import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { DEMO, seedDemo } from './demo';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('demo seed', () => {
  it('creates the invented firm once, with people, a client and an inquiry at every stage', async () => {
    expect(await seedDemo(t.ctx.pool, new Date('2026-12-01T15:00:00Z'))).toBe('created');
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
