/**
 * Cash page API figures: the four /api/cash reads for a firm with 100,000 invoices (the billing
 * bench's loader) and 20,000 payments, at 10 connections — p95 against the 100 ms limit, and the
 * ratio to the same queries run raw: each read's queries, made by the API's own plan for the demo
 * owner (server/src/cash), replayed one by one in one read-only tenant transaction (raw-queries.ts).
 * The API adds the session check (sent with BEGIN), packages/domain's arithmetic and the JSON, and
 * sends its queries together with COMMIT. Figures, not a test.
 *   npx tsx ops/bench/cash/cash-bench.ts        (PostgreSQL must be up: bash ops/pg-start.sh)
 *   CASH_BENCH_ONLY=receivables,jobs …          only the reads whose path has one of those words
 */
import os from 'node:os';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import { withTenant, type SqlQuery } from '@layerbook/db';
import { staffRowQuery, toStaffPrincipal } from '../../../server/src/auth/staff-principal';
import type { StaffPrincipal } from '../../../server/src/http/principal';
import { cashForecastView } from '../../../server/src/cash/forecast';
import { cashJobs } from '../../../server/src/cash/jobs';
import { cashReceivableInvoices, cashReceivables } from '../../../server/src/cash/receivables';
import { cashReceived } from '../../../server/src/cash/received';
import { DEMO, seedDemo } from '../../../server/src/seed/demo';
import { benchDatabase, benchServices, listenBenchApp, measure as measureAt, signInForBench, type Measured } from '../bench-server';
import { INVOICES, loadBillingBench } from '../billing/load';
import { loadCashBench, PAYMENTS } from './load-payments';
import type { RawJob } from './raw-queries';

const DB = 'layerbook_bench_cash';
const CONNECTIONS = 10;
const LIMIT_MS = 100;
const REQUESTS = Number(process.env['CASH_BENCH_REQUESTS'] ?? 1_000);
const measure = (job: Record<string, unknown>) => measureAt(CONNECTIONS, job);

/** Runs one raw job (raw-queries.ts) in a worker thread, as measure() runs the shared driver. */
const measureRaw = (job: Omit<RawJob, 'concurrency'>) =>
  new Promise<Measured>((resolve, reject) => {
    const source = `require('tsx/cjs'); require(${JSON.stringify(path.join(__dirname, 'raw-queries.ts'))});`;
    const worker = new Worker(source, { eval: true, workerData: { ...job, concurrency: CONNECTIONS } });
    worker.once('message', (m: Measured | { error: string }) => ('error' in m ? reject(new Error(m.error)) : resolve(m)));
    worker.once('error', reject);
  });

async function main(): Promise<void> {
  const config = await benchDatabase(DB, CONNECTIONS);
  const { pool, queue } = await benchServices(config, CONNECTIONS);

  const loadStart = Date.now();
  await seedDemo(pool);
  const firm = (await queue.boss.getDb().executeSql(`select id from firms where slug = $1`, [DEMO.firm.slug])).rows as Array<{
    id: string;
  }>;
  const firmId = firm[0].id;
  await loadBillingBench(config.DATABASE_OWNER_URL, firmId);
  await loadCashBench(config.DATABASE_OWNER_URL, firmId);
  const loadSeconds = ((Date.now() - loadStart) / 1000).toFixed(0);

  const now = () => new Date();
  const { server, port, base } = await listenBenchApp(config, { pool, queue });
  // The demo owner (margins included), signed in through the API.
  const session = (await signInForBench(base, DEMO.people[0].email, DEMO.password)).cookie;

  const counts = await withTenant(
    pool,
    firmId,
    async (tx) =>
      (
        await tx.client.query<{ open: string; payments: string }>(
          `select (select count(*) from invoices where tenant_id = $1 and status in ('issued', 'part_paid', 'refunded'))::text as open,
                  (select count(*) from payments where tenant_id = $1)::text as payments`,
          [tx.tenantId],
        )
      ).rows[0],
  );
  console.log(
    `cash: ${INVOICES.toLocaleString('en-US')} invoices (${Number(counts.open).toLocaleString('en-US')} open) and ` +
      `${Number(counts.payments).toLocaleString('en-US')} payments (${PAYMENTS.toLocaleString('en-US')} asked) in the demo firm, ` +
      `20 other firms × 1,000 invoices (loaded in ${loadSeconds} s); ${REQUESTS} requests, ${CONNECTIONS} connections; ` +
      `machine: ${os.cpus().length} cores, load average ${os.loadavg()[0].toFixed(1)} at the start`,
  );
  // The demo owner as the API sees them once re-checked: each read's queries are made from it.
  const ownerId = (
    (await queue.boss.getDb().executeSql(`select id from users where email = $1`, [DEMO.people[0].email])).rows as Array<{ id: string }>
  )[0].id;
  const owner = await withTenant(pool, firmId, async (tx) =>
    toStaffPrincipal(
      firmId,
      ownerId,
      (await tx.client.query(staffRowQuery(firmId, ownerId).text, [firmId, ownerId])).rows[0] as Parameters<typeof toStaffPrincipal>[2],
    ),
  );
  if (!owner) throw new Error('The demo owner is not an active member.');
  const cases: Array<[string, string, (staff: StaffPrincipal) => { queries: readonly SqlQuery[] }]> = [
    ['receivables by age', '/api/cash/receivables', (staff) => cashReceivables(staff, now(), {})],
    ['cash by month', '/api/cash/received', (staff) => cashReceived(staff, now())],
    ['13-week forecast', '/api/cash/forecast', (staff) => cashForecastView(staff, now())],
    ['jobs and margins', '/api/cash/jobs', (staff) => cashJobs(staff)],
    // Opening one age (a drill-down, not part of the page's first load): the 31–60 days' invoices, from the base tables.
    ['drill-down 31–60', '/api/cash/receivables/invoices?age=31-60', (staff) => cashReceivableInvoices(staff, now(), { age: '31-60' })],
  ];
  // CASH_BENCH_ONLY=receivables,jobs … measures only the reads whose path has one of those words.
  const only = process.env['CASH_BENCH_ONLY']?.split(',');
  for (const [label, url, plan] of cases.filter(([, url]) => !only || only.some((word) => url.includes(word)))) {
    const queries = plan(owner).queries.map((q) => ({ ...q, values: [...q.values] }));
    const httpJob = { mode: 'get', port, path: url, cookie: session };
    const rawJob = { databaseUrl: config.DATABASE_URL, tenantId: firmId, queries };
    await measure({ ...httpJob, total: 200 }); // warm-up
    await measureRaw({ ...rawJob, total: 200 });
    const api = await measure({ ...httpJob, total: REQUESTS });
    const raw = await measureRaw({ ...rawJob, total: REQUESTS });
    console.log(
      `  ${label.padEnd(18)} API p95 ${api.p95.toFixed(1).padStart(6)} ms = ${(api.p95 / LIMIT_MS).toFixed(2)}× the ${LIMIT_MS} ms limit ` +
        `(p50 ${api.p50.toFixed(1)} ms, ${api.rps.toFixed(0)} req/s) | raw ${queries.length} queries in one tenant transaction: ` +
        `p95 ${raw.p95.toFixed(1)} ms, ${raw.rps.toFixed(0)}/s | API ÷ raw: p95 ${(api.p95 / raw.p95).toFixed(2)}×, throughput ${(api.rps / raw.rps).toFixed(2)}`,
    );
  }
  console.log(
    `  load average ${os
      .loadavg()
      .map((l) => l.toFixed(1))
      .join(' / ')} (1 / 5 / 15 min) at the end`,
  );
  server.close();
  await queue.stop();
  await pool.end();
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
