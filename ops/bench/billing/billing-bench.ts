/**
 * Billing API figures, in one run: the invoice list of a firm with 100,000 invoices (and 20 other
 * firms) against a raw node-postgres loop running the same query (buildInvoiceListQuery) in the same
 * tenant transaction — throughput ratio and p95 at 10 connections, first page and a deep page — and
 * issuing invoices, p95 with 10 issuers at once. Figures, not a test.
 *   npx tsx ops/bench/billing/billing-bench.ts        (PostgreSQL must be up: bash ops/pg-start.sh)
 *   BILLING_BENCH_ONLY=list (or issue) runs one half, e.g. under node --cpu-prof.
 */
import http from 'node:http';
import os from 'node:os';
import { buildInvoiceListQuery } from '../../../server/src/billing/invoice-read';
import { DEMO, seedDemo } from '../../../server/src/seed/demo';
import {
  benchDatabase,
  benchServices,
  listenBenchApp,
  measure as measureAt,
  measureInTurns,
  settleHeap,
  signInForBench,
} from '../bench-server';
import { perRequest } from '../cpu-share';
import { INVOICES, JOBS, loadBillingBench, makeIssueDrafts } from './load';

const DB = 'layerbook_bench_billing';
const CONNECTIONS = 10;
const REQUESTS = 2_000;
/** The API and the raw loop take turns, REQUESTS / ROUNDS requests at a time (measureInTurns). */
const ROUNDS = 4;
const ISSUES = 1_000;
const measure = (job: Record<string, unknown>) => measureAt(CONNECTIONS, job);
const ONLY = process.env.BILLING_BENCH_ONLY;

async function main(): Promise<void> {
  const config = await benchDatabase(DB, CONNECTIONS);
  const { pool, queue } = await benchServices(config, CONNECTIONS);

  // The demo firm, made through the services (its jobs and invoices are real), then 100,000 invoices around it.
  const loadStart = Date.now();
  await seedDemo(pool);
  const firms = (await queue.boss.getDb().executeSql(`select id from firms where slug = $1`, [DEMO.firm.slug])).rows as Array<{
    id: string;
  }>;
  const firmId = firms[0].id;
  await loadBillingBench(config.DATABASE_OWNER_URL, firmId);
  const drafts = await makeIssueDrafts(config.DATABASE_OWNER_URL, firmId, ISSUES + 100);
  const loadSeconds = ((Date.now() - loadStart) / 1000).toFixed(0);

  const { server, port } = await listenBenchApp(config, { pool, queue });
  // The demo office manager, signed in through the API.
  const { cookie: session, csrf } = await signInForBench(`http://127.0.0.1:${port}`, DEMO.people[1].email, DEMO.password);

  const agent = new http.Agent({ keepAlive: true, maxSockets: CONNECTIONS });
  const get = (url: string) =>
    new Promise<string>((resolve, reject) => {
      http
        .get({ host: '127.0.0.1', port, path: url, agent, headers: { cookie: session } }, (res) => {
          let body = '';
          res.on('data', (d: Buffer) => (body += d.toString()));
          res.on('end', () => (res.statusCode === 200 ? resolve(body) : reject(new Error(`${res.statusCode} ${body}`))));
        })
        .on('error', reject);
    });
  // A deep cursor: walk ~15,000 invoices in once.
  let after: string | null = null;
  for (let i = 0; i < 150; i++)
    after = (JSON.parse(await get(`/api/invoices?limit=100${after ? `&after=${after}` : ''}`)) as { nextCursor: string }).nextCursor;

  console.log(
    `billing: ${INVOICES.toLocaleString('en-US')} invoices over ${JOBS.toLocaleString('en-US')} jobs in the demo firm, 20 other firms × 1,000 (loaded in ${loadSeconds} s); ` +
      `${REQUESTS} requests, ${CONNECTIONS} connections, API and raw in ${ROUNDS} turns each; load from a worker thread; ` +
      `machine: ${os.cpus().length} cores, load average ${os.loadavg()[0].toFixed(1)} at the start`,
  );
  const lists = [
    ['invoice list, first page', null, 'all'],
    ['deep page (~15,000 in)', after, 'all'],
    ['overdue filter', null, 'overdue'],
  ] as const;
  const jobsOf = (cursor: string | null, filter: 'all' | 'overdue') => {
    const url = `/api/invoices?limit=50${filter === 'all' ? '' : `&filter=${filter}`}${cursor ? `&after=${cursor}` : ''}`;
    const sqlQuery = buildInvoiceListQuery(firmId, { filter, limit: 50, ...(cursor ? { after: cursor } : {}) }, new Date());
    return [
      { mode: 'get', port, path: url, cookie: session },
      { mode: 'pg', databaseUrl: config.DATABASE_URL, tenantId: firmId, sql: sqlQuery },
    ] as const;
  };
  settleHeap();
  if (ONLY !== 'issue') {
    // Warm-up before the first figure: the first list would otherwise also measure the server's JIT.
    const [httpJob, pgJob] = jobsOf(null, 'all');
    await measure({ ...httpJob, total: 1_000 });
    await measure({ ...pgJob, total: 1_000 });
  }
  for (const [label, cursor, filter] of ONLY === 'issue' ? [] : lists) {
    const [httpJob, pgJob] = jobsOf(cursor, filter);
    await measure({ ...httpJob, total: 300 }); // warm-up
    await measure({ ...pgJob, total: 300 });
    const [api, raw] = await measureInTurns(CONNECTIONS, httpJob, pgJob, ROUNDS, REQUESTS / ROUNDS);
    console.log(
      `  ${label.padEnd(26)} API ${api.rps.toFixed(0)} req/s (p50 ${api.p50.toFixed(1)} ms, p95 ${api.p95.toFixed(1)} ms) | ` +
        `raw pg ${raw.rps.toFixed(0)} q/s (p95 ${raw.p95.toFixed(1)} ms) | ratio ${(api.rps / raw.rps).toFixed(2)}  (goals: ratio ≥ 0.7, p95 ≤ 25 ms)`,
    );
    console.log(
      `  ${''.padEnd(26)} CPU per request, µs: API ${perRequest(api.cpu, api.latencies.length)} | raw ${perRequest(raw.cpu, raw.latencies.length)}`,
    );
    if (label === 'invoice list, first page') {
      // One at a time, nothing queued: what a request costs on its own, beside the same query alone.
      const apiAlone = await measure({ ...httpJob, total: 500, concurrency: 1 });
      const rawAlone = await measure({ ...pgJob, total: 500, concurrency: 1 });
      console.log(
        `  ${'  the same, 1 connection'.padEnd(26)} API p50 ${apiAlone.p50.toFixed(1)} ms, p95 ${apiAlone.p95.toFixed(1)} ms | ` +
          `raw pg p50 ${rawAlone.p50.toFixed(1)} ms, p95 ${rawAlone.p95.toFixed(1)} ms | ratio ${(apiAlone.rps / rawAlone.rps).toFixed(2)}`,
      );
    }
  }

  // Issuing: each call issues another draft (one firm, one counter: every issuer waits its turn on it).
  const body = JSON.stringify({ send: false });
  const issueJob = { mode: 'post', port, cookie: session, csrf, body };
  if (ONLY !== 'list') await issueAll(issueJob, drafts);
  agent.destroy();
  server.close();
  await queue.stop();
  await pool.end();
}

async function issueAll(issueJob: Record<string, unknown>, drafts: string[]): Promise<void> {
  await measure({ ...issueJob, total: 100, paths: drafts.slice(0, 100).map((id) => `/api/invoices/${id}/issue`) }); // warm-up
  const issued = await measure({ ...issueJob, total: ISSUES, paths: drafts.slice(100).map((id) => `/api/invoices/${id}/issue`) });
  console.log(
    `  ${'issue an invoice'.padEnd(26)} ${issued.rps.toFixed(0)} issues/s (p50 ${issued.p50.toFixed(1)} ms, p95 ${issued.p95.toFixed(1)} ms), ` +
      `${CONNECTIONS} issuers at once, ${ISSUES} issues  (goal: p95 ≤ 50 ms)`,
  );
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
