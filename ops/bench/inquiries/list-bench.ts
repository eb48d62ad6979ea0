/**
 * Inquiries list API against a raw node-postgres loop running the same query in the same tenant
 * transaction, with 20,000 inquiries in one firm and 20 other firms. Prints throughput of each, their
 * ratio, and p95 latency at 10 connections, for the first page and a deep page. Figures, not a test.
 *   npx tsx ops/bench/inquiries/list-bench.ts        (PostgreSQL must be up: bash ops/pg-start.sh)
 */
import http from 'node:http';
import { Pool } from 'pg';
import { hashPassword } from '../../../server/src/auth/passwords';
import { buildListQuery } from '../../../server/src/inquiries/list';
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

const DB = 'layerbook_bench';
const BIG = 20_000;
const OTHERS = 20;
const PER_OTHER = 1_000;
const CONNECTIONS = 10;
const REQUESTS = 2_000;
/** The API and the raw loop take turns, REQUESTS / ROUNDS requests at a time (measureInTurns). */
const ROUNDS = 4;

async function seed(ownerUrl: string): Promise<string> {
  const owner = new Pool({ connectionString: ownerUrl, max: 2 });
  const firmIds: string[] = [];
  for (let f = 0; f <= OTHERS; f++) {
    const client = await owner.connect();
    try {
      await client.query('begin');
      const id = (await client.query<{ id: string }>(`select gen_random_uuid() as id`)).rows[0].id;
      await client.query(`select set_config('app.tenant_id', $1, true)`, [id]);
      await client.query(`insert into firms (id, name, slug) values ($1, $2, $3)`, [id, `Bench Firm ${f}`, `bench-${f}-${id.slice(0, 8)}`]);
      const n = f === 0 ? BIG : PER_OTHER;
      // Spread over a year so the keyset walks real timestamps.
      await client.query(
        `insert into inquiries (tenant_id, contact_name, email, site_address, source, stage, estimated_value, created_at)
         select $1, 'Prospect ' || g, 'p' || g || '@example.test', g || ' Kiln Row', 'phone',
                (array['new','contacted','visit_booked','samples','proposal_sent','won','lost'])[1 + g % 7],
                (1000 + g % 40000)::numeric, now() - (g || ' minutes')::interval
           from generate_series(1, $2) g`,
        [id, n],
      );
      await client.query('commit');
      firmIds.push(id);
    } finally {
      client.release();
    }
  }
  await owner.query('analyze');
  await owner.end();
  return firmIds[0];
}

async function main(): Promise<void> {
  const config = await benchDatabase(DB, CONNECTIONS);
  const firmId = await seed(config.DATABASE_OWNER_URL);
  const { pool, queue } = await benchServices(config, CONNECTIONS);
  const { server, port, base: origin } = await listenBenchApp(config, { pool, queue });
  const agent = new http.Agent({ keepAlive: true, maxSockets: CONNECTIONS });

  // A staff member of the big firm, made straight in the database (sign-up now confirms by e-mail,
  // which a bench has no inbox for), then signed in through the API.
  const jobsPool = new Pool({ connectionString: config.DATABASE_OWNER_URL, max: 1 });
  const c = await jobsPool.connect();
  const passwordHash = await hashPassword('bench-password-2026');
  await c.query('begin');
  const { rows } = await c.query<{ id: string }>(
    `insert into users (email, name, password_hash) values ('bench@example.test', 'Bench Owner', $1) returning id`,
    [passwordHash],
  );
  await c.query(`select set_config('app.tenant_id', $1, true)`, [firmId]);
  await c.query(`insert into memberships (tenant_id, user_id, role) values ($1, $2, 'owner')`, [firmId, rows[0].id]);
  await c.query('commit');
  c.release();
  await jobsPool.end();
  const session = (await signInForBench(origin, 'bench@example.test', 'bench-password-2026')).cookie;

  const get = (url: string) =>
    new Promise<string>((resolve, reject) => {
      http
        .get({ host: '127.0.0.1', port, path: url, agent, headers: { cookie: session } }, (res) => {
          let body = '';
          res.on('data', (d) => (body += d));
          res.on('end', () => (res.statusCode === 200 ? resolve(body) : reject(new Error(`${res.statusCode} ${body}`))));
        })
        .on('error', reject);
    });

  // A deep cursor: walk ~15,000 rows in once.
  let after: string | null = null;
  for (let i = 0; i < 150; i++)
    after = (JSON.parse(await get(`/api/inquiries?limit=100${after ? `&after=${after}` : ''}`)) as { nextCursor: string }).nextCursor;

  const measure = (job: Record<string, unknown>) => measureAt(CONNECTIONS, job);

  console.log(
    `inquiries list: ${BIG} in one firm, ${OTHERS} other firms × ${PER_OTHER}; ${REQUESTS} requests, ${CONNECTIONS} connections, API and raw in ${ROUNDS} turns each; load from a worker thread`,
  );
  const jobsOf = (cursor: string | null) => {
    const url = `/api/inquiries?limit=50${cursor ? `&after=${cursor}` : ''}`;
    const sqlQuery = buildListQuery(firmId, { sort: 'newest', limit: 50, ...(cursor ? { after: cursor } : {}) });
    return [
      { mode: 'get', port, path: url, cookie: session },
      { mode: 'pg', databaseUrl: config.DATABASE_URL, tenantId: firmId, sql: sqlQuery },
    ] as const;
  };
  // Before the first figure, as in the billing bench: what seeding left in the heap collected, and the server's JIT warmed.
  settleHeap();
  const [firstHttp, firstPg] = jobsOf(null);
  await measure({ ...firstHttp, total: 1_000 });
  await measure({ ...firstPg, total: 1_000 });
  for (const [label, cursor] of [
    ['first page', null],
    ['deep page (~15,000 in)', after],
  ] as const) {
    const [httpJob, pgJob] = jobsOf(cursor);
    await measure({ ...httpJob, total: 300 }); // warm-up
    await measure({ ...pgJob, total: 300 });
    const [api, base] = await measureInTurns(CONNECTIONS, httpJob, pgJob, ROUNDS, REQUESTS / ROUNDS);
    console.log(
      `  ${label.padEnd(24)} API ${api.rps.toFixed(0)} req/s (p50 ${api.p50.toFixed(1)} ms, p95 ${api.p95.toFixed(1)} ms) | ` +
        `raw pg ${base.rps.toFixed(0)} q/s (p95 ${base.p95.toFixed(1)} ms) | ratio ${(api.rps / base.rps).toFixed(2)}  (goals: ratio ≥ 0.7, p95 ≤ 25 ms)`,
    );
    console.log(
      `  ${''.padEnd(26)} CPU per request, µs: API ${perRequest(api.cpu, api.latencies.length)} | raw ${perRequest(base.cpu, base.latencies.length)}`,
    );
  }
  agent.destroy();
  server.close();
  await queue.stop();
  await pool.end();
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
