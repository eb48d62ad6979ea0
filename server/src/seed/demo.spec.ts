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
    expect(await seedDemo(t.ctx.pool)).toBe('created');
    expect(await seedDemo(t.ctx.pool)).toBe('present');
    const firmId = (await t.queue.boss.getDb().executeSql(`select id from firms where slug = $1`, [DEMO.firm.slug])).rows[0].id;
    const stages = await withTenant(t.ctx.pool, firmId, (tx) => tx.client.query(`select distinct stage from inquiries order by stage`));
    expect(stages.rows.map((r) => r.stage).sort()).toEqual(['contacted', 'lost', 'new', 'proposal_sent', 'samples', 'visit_booked', 'won']);
  });
});
