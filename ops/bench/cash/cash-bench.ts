/**
 * Cash page API figures: the four /api/cash reads for a firm with 100,000 invoices (the billing
 * bench's loader) and 20,000 payments, at 10 connections — p95, and the throughput ratio to the
 * same aggregate query run raw in one tenant transaction (the endpoint's main query; the API also
 * reads the firm's clock and settings and computes with packages/domain). Figures, not a test.
 *   npx tsx ops/bench/cash/cash-bench.ts        (PostgreSQL must be up: bash ops/pg-start.sh)
 */
import os from 'node:os';
import { OWED } from '../../../server/src/cash/forecast-inputs';
import { JOB_MONEY } from '../../../server/src/cash/jobs-sql';
import { AGING_BUCKETS, bucketDueDates } from '@layerbook/domain';
import { RECEIVABLES_NOW, receivableInvoices } from '../../../server/src/cash/receivables-sql';
import { RECEIVED_BY_DAY } from '../../../server/src/cash/received';
import { localDate } from '../../../server/src/firms/local-date';
import { DEMO, seedDemo } from '../../../server/src/seed/demo';
import { benchDatabase, benchServices, listenBenchApp, measure as measureAt, signInForBench } from '../bench-server';
import { INVOICES, loadBillingBench } from '../billing/load';
import { loadCashBench, PAYMENTS } from './load-payments';

const DB = 'layerbook_bench_cash';
const CONNECTIONS = 10;
const REQUESTS = Number(process.env['CASH_BENCH_REQUESTS'] ?? 1_000);
const measure = (job: Record<string, unknown>) => measureAt(CONNECTIONS, job);

async function main(): Promise<void> {
  const config = await benchDatabase(DB, CONNECTIONS);
  const { pool, queue } = await benchServices(config, CONNECTIONS);

  const loadStart = Date.now();
  await seedDemo(pool);
  const firm = (await queue.boss.getDb().executeSql(`select id, time_zone from firms where slug = $1`, [DEMO.firm.slug])).rows as Array<{
    id: string;
    time_zone: string;
  }>;
  const firmId = firm[0].id;
  await loadBillingBench(config.DATABASE_OWNER_URL, firmId);
  await loadCashBench(config.DATABASE_OWNER_URL, firmId);
  const loadSeconds = ((Date.now() - loadStart) / 1000).toFixed(0);

  const now = () => new Date();
  const { server, port, base } = await listenBenchApp(config, { pool, queue });
  // The demo owner (margins included), signed in through the API.
  const session = (await signInForBench(base, DEMO.people[0].email, DEMO.password)).cookie;

  const today = localDate(firm[0].time_zone, now());
  const yearAgo = `${Number(today.slice(0, 4)) - 1}-${today.slice(5, 7)}-01`;
  // Counted in the firm's tenant transaction (row-level security sees nothing without it).
  const tx = await pool.connect();
  await tx.query('begin');
  await tx.query(`select set_config('app.tenant_id', $1, true)`, [firmId]);
  const counts = (
    await tx.query<{ open: string; payments: string }>(
      `select (select count(*) from invoices where tenant_id = $1 and status in ('issued', 'part_paid', 'refunded'))::text as open,
              (select count(*) from payments where tenant_id = $1)::text as payments`,
      [firmId],
    )
  ).rows[0];
  await tx.query('commit');
  tx.release();
  console.log(
    `cash: ${INVOICES.toLocaleString('en-US')} invoices (${Number(counts.open).toLocaleString('en-US')} open) and ` +
      `${Number(counts.payments).toLocaleString('en-US')} payments (${PAYMENTS.toLocaleString('en-US')} asked) in the demo firm, ` +
      `20 other firms × 1,000 invoices (loaded in ${loadSeconds} s); ${REQUESTS} requests, ${CONNECTIONS} connections; ` +
      `machine: ${os.cpus().length} cores, load average ${os.loadavg()[0].toFixed(1)} at the start`,
  );
  const cases: Array<[string, string, { text: string; values: unknown[] }]> = [
    [
      'receivables by age',
      '/api/cash/receivables',
      { text: RECEIVABLES_NOW, values: [firmId, today, ...AGING_BUCKETS.slice(0, 4).map((b) => bucketDueDates(b, today).from)] },
    ],
    ['cash by month', '/api/cash/received', { text: RECEIVED_BY_DAY, values: [firmId, yearAgo] }],
    ['13-week forecast', '/api/cash/forecast', { text: OWED, values: [firmId] }],
    ['jobs and margins', '/api/cash/jobs', { text: JOB_MONEY, values: [firmId, 200] }],
  ];
  // Opening one age (a drill-down, not part of the page's first load): the 31–60 days' invoices.
  const older = bucketDueDates('31-60', today);
  const drill: (typeof cases)[number] = [
    'drill-down 31–60',
    '/api/cash/receivables/invoices?age=31-60',
    { text: receivableInvoices(false), values: [firmId, today, null, older.from, older.to] },
  ];
  for (const [label, url, sql] of [...cases, drill]) {
    const httpJob = { mode: 'get', port, path: url, cookie: session };
    const pgJob = { mode: 'pg', databaseUrl: config.DATABASE_URL, tenantId: firmId, sql };
    await measure({ ...httpJob, total: 200 }); // warm-up
    await measure({ ...pgJob, total: 200 });
    const api = await measure({ ...httpJob, total: REQUESTS });
    const raw = await measure({ ...pgJob, total: REQUESTS });
    console.log(
      `  ${label.padEnd(20)} API ${api.rps.toFixed(0)} req/s (p50 ${api.p50.toFixed(1)} ms, p95 ${api.p95.toFixed(1)} ms) | ` +
        `raw pg ${raw.rps.toFixed(0)} q/s (p95 ${raw.p95.toFixed(1)} ms) | ratio ${(api.rps / raw.rps).toFixed(2)}  (goal: p95 ≤ 100 ms)`,
    );
  }
  server.close();
  await queue.stop();
  await pool.end();
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
