/**
 * The raw side of the cash bench, in a worker thread: the queries one Cash read ran (recorded from
 * the API's own functions, in order), replayed in one read-only tenant transaction per call at the
 * given concurrency. Posts back ops/s and latencies (ms) like ops/bench/driver.ts, whose pg mode
 * runs a single query.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { Pool } from 'pg';

export interface RawJob {
  databaseUrl: string;
  tenantId: string;
  queries: Array<{ name?: string; text: string; values: unknown[] }>;
  concurrency: number;
  total: number;
}

// as ops/bench/driver.ts reads a percentile
const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];

async function run(job: RawJob): Promise<{ rps: number; p50: number; p95: number }> {
  const pool = new Pool({ connectionString: job.databaseUrl, max: job.concurrency });
  const call = async () => {
    const client = await pool.connect();
    try {
      await client.query('begin');
      await client.query(`select set_config('app.tenant_id', $1, true)`, [job.tenantId]);
      await client.query('set transaction read only');
      // Named ones prepared per connection, as the API runs them (packages/db prepared-reads.ts).
      for (const q of job.queries)
        await client.query(q.name ? { name: q.name, text: q.text, values: q.values } : { text: q.text, values: q.values });
      await client.query('commit');
    } finally {
      client.release();
    }
  };
  const latencies: number[] = [];
  let next = 0;
  const start = process.hrtime.bigint();
  await Promise.all(
    Array.from({ length: job.concurrency }, async () => {
      for (let i = next++; i < job.total; i = next++) {
        const t0 = process.hrtime.bigint();
        await call();
        latencies.push(Number(process.hrtime.bigint() - t0) / 1e6);
      }
    }),
  );
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  await pool.end();
  latencies.sort((a, b) => a - b);
  return { rps: job.total / seconds, p50: percentile(latencies, 50), p95: percentile(latencies, 95) };
}

run(workerData as RawJob).then(
  (result) => parentPort!.postMessage(result),
  (error) => parentPort!.postMessage({ error: String(error) }),
);
