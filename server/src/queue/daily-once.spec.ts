import { Pool } from 'pg';
import { sweepBilling } from '../billing/triggers/sweep';
import { sweepFollowUps } from './follow-ups';
import { QUEUES } from './queues';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';

// A firm's day is queued with the singletonKey firm:localDate. pg-boss 10 only honours a singletonKey on a
// queue with a policy that says how (pg-boss docs, "Queues": short, singleton, stately…); these queues are
// 'stately' (two never run at once), and sendFirmDay queues no copy while one waits or runs, so a repeated
// sweep (its own retry, an operator's rerun) adds nothing, and no copy waits behind a running one.

let t: TestServer;
let jobs: Pool;
beforeAll(async () => {
  t = await startTestServer();
  jobs = new Pool({ connectionString: testDatabaseUrls().DATABASE_JOBS_URL, max: 2 });
});
afterAll(async () => {
  await jobs.end();
  await t.stop();
});

const localDateOf = async (firmId: string, now: Date) => {
  const { rows } = await jobs.query<{ time_zone: string }>('select time_zone from firms where id = $1', [firmId]);
  return new Intl.DateTimeFormat('en-CA', { timeZone: rows[0].time_zone }).format(now);
};
const waitingOrRunning = async (queue: string, key: string) =>
  (
    await jobs.query<{ state: string; n: number }>(
      `select state, count(*)::int as n from pgboss.job where name = $1 and singleton_key = $2 and state in ('created', 'retry', 'active')
        group by state order by state`,
      [queue, key],
    )
  ).rows;

it.each([
  ['follow-up digest', QUEUES.followUpDigest, sweepFollowUps],
  ['billing day', QUEUES.billingDaily, sweepBilling],
] as const)('a repeated sweep queues a firm’s %s once', async (_what, queue, sweep) => {
  const o = await signUpFirm(t.app, `Sweep Twice ${queue}`);
  const now = new Date('2026-03-10T12:05:00Z');
  const counts = [];
  for (let i = 0; i < 3; i++) counts.push(await sweep(jobs, t.queue, { force: true, tenantIds: [o.firmId] }, now));
  // the first is waiting or running (or already done): no copy beside or behind it
  expect(counts[0]).toBe(1);
  const live = await waitingOrRunning(queue, `${o.firmId}:${await localDateOf(o.firmId, now)}`);
  expect(live.reduce((a, r) => a + r.n, 0)).toBeLessThanOrEqual(1);
  const { rows } = await jobs.query(`select policy from pgboss.queue where name = $1`, [queue]);
  expect(rows).toEqual([{ policy: 'stately' }]);
});
