/**
 * Load driver, run in a worker thread so the measuring client never shares the server's event loop.
 * `get`: GETs one URL with a session cookie; `post`: POSTs the same body to each path in turn (one
 * path per call, e.g. one draft invoice per issue); `pg`: the same list query in a tenant transaction.
 */
import http from 'node:http';
import { parentPort, workerData } from 'node:worker_threads';
import { Pool } from 'pg';
import { type CpuShare, cpuBetween, cpuSnapshot } from './cpu-share';

interface Job {
  mode: 'get' | 'post' | 'pg';
  total: number;
  concurrency: number;
  port?: number;
  path?: string;
  paths?: string[];
  body?: string;
  cookie?: string;
  /** More request headers (get and post). */
  headers?: Record<string, string>;
  csrf?: string;
  databaseUrl?: string;
  tenantId?: string;
  sql?: { text: string; values: unknown[] };
  /** Untimed calls before the clock (get and pg only). */
  warmCalls?: number;
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

async function run(
  job: Job,
): Promise<{ rps: number; p50: number; p95: number; seconds: number; latencies: number[]; cpu: CpuShare | null }> {
  let call: (i: number) => Promise<void>;
  let close: () => Promise<void>;
  // Before the clock starts: every connection open (TCP, or PostgreSQL's sign-in and a backend that has
  // run the query once), so a short run measures the requests, not setting up a side's connections.
  let warm = () => Promise.resolve();
  if (job.mode === 'get' || job.mode === 'post') {
    const agent = new http.Agent({ keepAlive: true, maxSockets: job.concurrency });
    close = () => {
      agent.destroy();
      return Promise.resolve();
    };
    call = (i) =>
      new Promise((resolve, reject) => {
        const post = job.mode === 'post';
        const headers: http.OutgoingHttpHeaders = { ...job.headers, cookie: job.cookie };
        if (post) Object.assign(headers, { 'content-type': 'application/json', 'x-csrf-token': job.csrf });
        const req = http.request(
          { host: '127.0.0.1', port: job.port, path: post ? job.paths![i] : job.path, method: post ? 'POST' : 'GET', agent, headers },
          (res) => {
            let body = '';
            res.on('data', (d: Buffer) => (body += d.toString()));
            res.on('end', () => (res.statusCode === 200 ? resolve() : reject(new Error(`HTTP ${res.statusCode} ${body.slice(0, 300)}`))));
          },
        );
        req.on('error', reject);
        req.end(post ? job.body : undefined);
      });
  } else {
    const pool = new Pool({ connectionString: job.databaseUrl, max: job.concurrency });
    close = () => pool.end();
    warm = async () => {
      const clients = await Promise.all(Array.from({ length: job.concurrency }, () => pool.connect()));
      clients.forEach((client) => client.release());
      await Promise.all(Array.from({ length: job.concurrency }, () => call(0)));
    };
    call = async () => {
      const client = await pool.connect();
      try {
        await client.query('begin');
        await client.query(`select set_config('app.tenant_id', $1, true)`, [job.tenantId]);
        await client.query(job.sql!.text, job.sql!.values);
        await client.query('commit');
      } finally {
        client.release();
      }
    };
  }
  if (job.mode === 'get') warm = () => Promise.all(Array.from({ length: job.concurrency }, () => call(0))).then(() => undefined);
  await warm();
  const latencies: number[] = [];
  const runCalls = async (total: number, timed: boolean) => {
    let next = 0;
    await Promise.all(
      Array.from({ length: job.concurrency }, async () => {
        for (let i = next++; i < total; i = next++) {
          const t0 = process.hrtime.bigint();
          await call(i);
          if (timed) latencies.push(Number(process.hrtime.bigint() - t0) / 1e6);
        }
      }),
    );
  };
  // Each run is a new worker (a new V8 isolate): its own code starts cold. `warmCalls` untimed calls
  // first let it reach speed, so a short run does not charge the driver's JIT to the side it measures.
  if (job.mode !== 'post' && (job.warmCalls ?? 0) > 0) await runCalls(job.warmCalls!, false);
  const before = cpuSnapshot();
  const start = process.hrtime.bigint();
  await runCalls(job.total, true);
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const cpu = cpuBetween(before, cpuSnapshot());
  await close();
  latencies.sort((a, b) => a - b);
  return { rps: job.total / seconds, p50: percentile(latencies, 50), p95: percentile(latencies, 95), seconds, latencies, cpu };
}

run(workerData as Job).then(
  (result) => parentPort!.postMessage(result),
  (error) => parentPort!.postMessage({ error: String(error) }),
);
