/**
 * What the API benchmarks share: a fresh migrated database, the server in-process on a free port
 * (no files, no workers), signing in through the API, and the load driver (driver.ts) in a worker
 * thread so the measuring client never shares the server's event loop.
 */
import { execFileSync } from 'node:child_process';
import type { Server } from 'node:http';
import path from 'node:path';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { Worker } from 'node:worker_threads';
import { migrateDatabase } from '@layerbook/db';
import { Pool } from 'pg';
import pino from 'pino';
import { createApp } from '../../server/src/app';
import { type Config, loadConfig } from '../../server/src/config';
import type { ObjectStore } from '../../server/src/files/object-store';
import { type StartedQueue, startQueue } from '../../server/src/queue/job-queue';
import { testDatabaseUrls } from '../../server/src/testing/test-env';
import { addShares, type CpuShare } from './cpu-share';

const root = path.resolve(__dirname, '../..');

/** What driver.ts posts back: ops/s, latencies (ms, sorted) and the time it took, or why it failed. */
export interface Measured {
  rps: number;
  p50: number;
  p95: number;
  seconds: number;
  latencies: number[];
  /** CPU milliseconds by party over the timed calls (cpu-share.ts), null without Linux's /proc. */
  cpu: CpuShare | null;
}
type DriverMessage = Measured | { error: string };

/** Runs one driver job (get, post or pg; see driver.ts) at `concurrency` in a worker thread. */
export const measure = (concurrency: number, job: Record<string, unknown>) =>
  new Promise<Measured>((resolve, reject) => {
    // The driver is TypeScript: register tsx's CommonJS hook inside the worker, then load it.
    const source = `require('tsx/cjs'); require(${JSON.stringify(path.join(__dirname, 'driver.ts'))});`;
    const worker = new Worker(source, { eval: true, workerData: { concurrency, ...job } });
    worker.once('message', (m: DriverMessage) => ('error' in m ? reject(new Error(m.error)) : resolve(m)));
    worker.once('error', reject);
  });

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];

/**
 * Two jobs measured in turns — `rounds` rounds of a, then b — and each one's rounds added up: its
 * requests over its time, and its percentiles over all its latencies. A VM's speed drifts over
 * seconds; taking the two sides in turns lets the drift fall on both instead of on whichever ran second.
 * Each turn is a new worker whose code starts cold: it makes WARM_CALLS untimed calls first, as a
 * cold driver costs more per call on the side whose answers it parses most (50 rows from PostgreSQL).
 */
const WARM_CALLS = 300;

export async function measureInTurns(
  concurrency: number,
  a: Record<string, unknown>,
  b: Record<string, unknown>,
  rounds: number,
  perRound: number,
): Promise<[Measured, Measured]> {
  const runs: [Measured[], Measured[]] = [[], []];
  for (let round = 0; round < rounds; round++) {
    runs[0].push(await measure(concurrency, { ...a, total: perRound, warmCalls: WARM_CALLS }));
    runs[1].push(await measure(concurrency, { ...b, total: perRound, warmCalls: WARM_CALLS }));
  }
  const added = (ms: Measured[]): Measured => {
    const latencies = ms.flatMap((m) => m.latencies).sort((x, y) => x - y);
    const seconds = ms.reduce((sum, m) => sum + m.seconds, 0);
    const cpu = addShares(ms.map((m) => m.cpu));
    return { rps: latencies.length / seconds, p50: percentile(latencies, 50), p95: percentile(latencies, 95), seconds, latencies, cpu };
  };
  return [added(runs[0]), added(runs[1])];
}

/**
 * A full collection before the first figure: loading the data (the demo seeded through the services,
 * rows parsed by the loaders) leaves the process's heap full of garbage, and without this its
 * collection lands on whichever measurement runs first, as work on V8's helper threads beside it.
 */
export function settleHeap(): void {
  setFlagsFromString('--expose-gc');
  (runInNewContext('gc') as () => void)();
}

/** Drops and makes database `name`, migrates it and answers the server's configuration for it. */
export async function benchDatabase(name: string, connections: number): Promise<Config> {
  execFileSync('bash', [path.join(root, 'ops/pg-createdb.sh'), name, '--fresh'], { stdio: 'inherit' });
  const urls = testDatabaseUrls(name);
  await migrateDatabase(urls.DATABASE_OWNER_URL, path.join(root, 'migrations'));
  return loadConfig({
    ...urls,
    NODE_ENV: 'production',
    SESSION_SECRET: 'bench-session-secret-that-is-long-enough',
    ROOT_DIR: root,
    LOG_LEVEL: 'silent',
    PUBLIC_URL: 'http://localhost',
    DB_POOL_MAX: String(connections),
  });
}

export interface BenchServices {
  readonly pool: Pool;
  readonly queue: StartedQueue;
}

/** The web pool and the queue (for the seed's jobs and the firm lookups), without workers. */
export async function benchServices(config: Config, connections: number): Promise<BenchServices> {
  const pool = new Pool({ connectionString: config.DATABASE_URL, max: connections });
  const queue = await startQueue(config, pino({ level: 'silent' }));
  return { pool, queue };
}

/** Benchmarks store no files: a store that refuses uploads keeps the context complete. */
const noFiles: ObjectStore = {
  put: () => Promise.reject(new Error('A benchmark stores no files.')),
  get: () => Promise.resolve(null),
  delete: () => Promise.resolve(),
  close: () => undefined,
};

/** The app listening on a free loopback port (plain-HTTP cookies: NODE_ENV development for the app). */
export async function listenBenchApp(config: Config, services: BenchServices): Promise<{ server: Server; port: number; base: string }> {
  const logger = pino({ level: 'silent' });
  const app = createApp({ config: { ...config, NODE_ENV: 'development' }, ...services, logger, storage: noFiles, now: () => new Date() });
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const port = (server.address() as { port: number }).port;
  return { server, port, base: `http://127.0.0.1:${port}` };
}

/** Signs a staff member in through the API: the session cookie and its CSRF token. */
export async function signInForBench(base: string, email: string, password: string): Promise<{ cookie: string; csrf: string }> {
  const first = await fetch(`${base}/api/auth/session`);
  const cookie0 = first.headers.get('set-cookie')!.split(';')[0];
  const csrf0 = ((await first.json()) as { csrfToken: string }).csrfToken;
  const signedIn = await fetch(`${base}/api/auth/signin`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: cookie0, 'x-csrf-token': csrf0 },
    body: JSON.stringify({ email, password }),
  });
  if (signedIn.status !== 200) throw new Error(`sign-in failed: ${signedIn.status} ${await signedIn.text()}`);
  const cookie = signedIn.headers.get('set-cookie')!.split(';')[0];
  const csrf = ((await (await fetch(`${base}/api/auth/session`, { headers: { cookie } })).json()) as { csrfToken: string }).csrfToken;
  return { cookie, csrf };
}
