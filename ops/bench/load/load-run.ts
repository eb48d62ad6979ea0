/**
 * The load run: 60 s of mixed reading and writing at 32 connections (autocannon, one instance per kind
 * of work) against the demo firm, on its own database (layerbook_bench_load, made and seeded here) and a
 * server process of its own (the first free port of 55520–55539). Prints requests per second and latency
 * per kind, the errors, and the reconciliation of the database with the answers. Exits 1 on any error
 * or mismatch.
 * Figures, not a test (not part of npm test):
 *   npx tsx ops/bench/load/load-run.ts        (PostgreSQL must be up: bash ops/pg-start.sh)
 * LOAD_SECONDS shortens or lengthens the window (60 by default).
 *
 * The public form's limits are raised for the run (PUBLIC_FORM_RATE_LIMIT, PUBLIC_FORM_MIN_FILL_MS=0):
 * every post comes from one loopback address within a second of opening the form.
 */
import { type ChildProcess, execFile, spawn } from 'node:child_process';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import autocannon from 'autocannon';
import { Pool } from 'pg';
import { DEMO, seedDemo } from '../../../server/src/seed/demo';
import { benchDatabase, benchServices, signInForBench } from '../bench-server';
import { makeBillableLines, makeLoadEstimates } from './prepare';
import { countRows, reconcile } from './reconcile';
import { loadKinds, type LoadPlan } from './scenarios';
import { printFigures, Recorder } from './stats';

const DB = 'layerbook_bench_load';
/** The run's own ports; the first free one serves (they lie in Linux's ephemeral range, so one may be taken for a while). */
const PORTS = Array.from({ length: 20 }, (_, i) => 55520 + i);
const CONNECTIONS = 32;
const SERVER_POOL = 16;
const WINDOW_SECONDS = Number(process.env['LOAD_SECONDS'] ?? 60);
/** Lines ready to bill: more than the run can draft (120 jobs × 80 lines). */
const JOBS = 120;
const LINES_PER_JOB = 80;
const ESTIMATES = 8;
/** How long the end of the run may wait for the last measured answers. */
const DRAIN_LIMIT_MS = 15_000;

const root = path.resolve(__dirname, '../../..');
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * The load average and what else is busy (top's second sample, half a second apart), leaving out this
 * run's own processes (PostgreSQL's backends cannot be told apart: they are listed, ours among them).
 */
async function machine(own: ReadonlyArray<number | undefined>): Promise<string> {
  const [one, five] = os.loadavg();
  const sample = (await promisify(execFile)('top', ['-b', '-n', '2', '-d', '0.5', '-w', '200', '-o', '%CPU'], { encoding: 'utf8' })).stdout;
  const rows = sample.slice(sample.lastIndexOf('PID USER')).split('\n').slice(1);
  const busiest = rows
    .map((l) => l.trim().split(/\s+/))
    .filter((f) => f.length >= 12 && Number(f[8]) >= 5 && !own.includes(Number(f[0])) && !f[11].endsWith('top'))
    .slice(0, 6)
    .map((f) => `${f.slice(11).join(' ')} ${f[8]}%`)
    .join(', ');
  return `load average ${one.toFixed(2)} (1 min), ${five.toFixed(2)} (5 min); others busy: ${busiest || 'none above 5% CPU'}`;
}

const isFree = (port: number) =>
  new Promise<boolean>((resolve) => {
    const probe = net.createServer();
    probe.once('error', () => resolve(false));
    probe.listen(port, '127.0.0.1', () => probe.close(() => resolve(true)));
  });

/** The server process on the first free port of the run's own; answers it and its port. */
async function startServer(env: NodeJS.ProcessEnv): Promise<{ child: ChildProcess; port: number }> {
  for (const port of PORTS) {
    if (!(await isFree(port))) continue;
    const child = spawn(process.execPath, ['--import', 'tsx', path.join(__dirname, 'load-server.ts')], {
      cwd: root,
      env: { ...process.env, ...env, PORT: String(port), NODE_ENV: 'production' },
      stdio: ['ignore', 'inherit', 'inherit'],
    });
    for (let i = 0; i < 240 && child.exitCode === null; i++) {
      const up = await fetch(`http://127.0.0.1:${port}/api/health`).then(
        (r) => r.ok,
        () => false,
      );
      if (up) return { child, port };
      await sleep(500);
    }
    if (child.exitCode === null) {
      await stopServer(child);
      throw new Error(`the server did not answer on port ${port} within 120 s`);
    }
    // It stopped at start (the port taken between the probe and its listen): the next port.
  }
  throw new Error(`no free port in ${PORTS[0]}–${PORTS.at(-1)}`);
}

async function stopServer(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null) return;
  const exited = new Promise((r) => child.once('exit', r));
  child.kill('SIGTERM');
  await Promise.race([exited, sleep(10_000)]);
  if (child.exitCode === null) child.kill('SIGKILL');
}

/** Runs every kind at once for the window, then lets each sequence finish the step it is in. */
async function runLoad(rec: Recorder, plan: LoadPlan, port: number): Promise<number> {
  const kinds = loadKinds(rec, plan);
  if (kinds.reduce((n, k) => n + k.connections, 0) !== CONNECTIONS) throw new Error(`the kinds do not share ${CONNECTIONS} connections`);
  rec.startedAt = Date.now();
  rec.windowEndsAt = rec.startedAt + WINDOW_SECONDS * 1000;
  const runs = kinds.map((k) => {
    let settle: (error: Error | null) => void = () => undefined;
    const finished = new Promise<void>((resolve, reject) => (settle = (error) => (error ? reject(error) : resolve())));
    const instance = autocannon(
      { url: `http://127.0.0.1:${port}`, connections: k.connections, duration: WINDOW_SECONDS + 120, timeout: 30, requests: k.requests },
      (error: Error | null) => settle(error),
    );
    // The tracker's 'response' is (client, status, bytes, latency ms), right after the request's onResponse.
    instance.on('response', (...args: unknown[]) => rec.latency(args[3] as number));
    instance.on('reqError', () => rec.transportError(k.name));
    return { instance, finished };
  });
  await sleep(WINDOW_SECONDS * 1000);
  rec.draining = true;
  const drainStart = Date.now();
  while (rec.inFlight > 0 && Date.now() - drainStart < DRAIN_LIMIT_MS) await sleep(20);
  const drained = Date.now() - drainStart;
  for (const r of runs) r.instance.stop();
  await Promise.all(runs.map((r) => r.finished));
  return drained;
}

async function main(): Promise<void> {
  const config = await benchDatabase(DB, SERVER_POOL);
  const owner = new Pool({ connectionString: config.DATABASE_OWNER_URL, max: 2 });
  let server: ChildProcess | null = null;
  try {
    // The demo firm through the services (pg-boss's schema first: the seed queues mail), then the run's extra rows.
    const prepStart = Date.now();
    const seeding = await benchServices(config, 4);
    await seedDemo(seeding.pool);
    const firmId = (
      (await seeding.queue.boss.getDb().executeSql(`select id from firms where slug = $1`, [DEMO.firm.slug])).rows as Array<{ id: string }>
    )[0].id;
    await seeding.queue.stop();
    await seeding.pool.end();
    const lines = await makeBillableLines(owner, firmId, JOBS, LINES_PER_JOB);

    const started = await startServer({
      DATABASE_URL: config.DATABASE_URL,
      DATABASE_OWNER_URL: config.DATABASE_OWNER_URL,
      DATABASE_JOBS_URL: config.DATABASE_JOBS_URL,
      SESSION_SECRET: config.SESSION_SECRET,
      HOST: '127.0.0.1',
      PUBLIC_URL: config.PUBLIC_URL,
      ROOT_DIR: root,
      LOG_LEVEL: 'silent',
      DB_POOL_MAX: String(SERVER_POOL),
      RUN_WORKERS: 'false',
      // Raised for the run: the whole load comes from one address, and forms are sent the moment they open.
      PUBLIC_FORM_RATE_LIMIT: '100000000',
      PUBLIC_FORM_MIN_FILL_MS: '0',
    });
    server = started.child;
    const base = `http://127.0.0.1:${started.port}`;
    const ownerSession = await signInForBench(base, DEMO.people[0].email, DEMO.password);
    const office = await signInForBench(base, DEMO.people[1].email, DEMO.password);
    const estimateIds = await makeLoadEstimates(base, ownerSession, ESTIMATES);
    const expires = new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10);
    const plan: LoadPlan = { owner: ownerSession, office, firmSlug: DEMO.firm.slug, estimateIds, lines, expiresOn: expires };
    const before = await countRows(owner, firmId, estimateIds);
    const prepSeconds = ((Date.now() - prepStart) / 1000).toFixed(0);

    console.log(
      `load: ${WINDOW_SECONDS} s, ${CONNECTIONS} connections (autocannon 8, one instance per kind), ` +
        `server process on :${started.port} with ${SERVER_POOL} database connections, no workers; demo firm + ${JOBS} jobs × ${LINES_PER_JOB} lines to bill, ` +
        `${ESTIMATES} open estimates (prepared in ${prepSeconds} s); public form limits raised for the run (PUBLIC_FORM_RATE_LIMIT, PUBLIC_FORM_MIN_FILL_MS=0)`,
    );
    const own = [process.pid, server.pid];
    console.log(`  machine: ${os.cpus().length} cores; before the run: ${await machine(own)}`);
    const rec = new Recorder();
    const midway = sleep(WINDOW_SECONDS * 500).then(() => machine(own));
    const drained = await runLoad(rec, plan, started.port);
    console.log(`  halfway through the run: ${await midway}`);
    console.log(`  after the run: ${await machine(own)}`);
    console.log(`  window ${WINDOW_SECONDS} s, then ${drained} ms for the last answers (sequences finish the step they are in)`);
    printFigures(rec, WINDOW_SECONDS);
    const reconciled = await reconcile(owner, firmId, estimateIds, before, rec);
    const errors = rec.steps.reduce((n, s) => n + s.failed, 0) + [...rec.transportErrors.values()].reduce((a, b) => a + b, 0);
    const clean = errors === 0 && rec.inFlight === 0 && rec.linesRanOut === 0 && reconciled;
    console.log(`\n  ${clean ? 'PASS' : 'FAIL'}: ${errors} errors, ${reconciled ? 'every row reconciles' : 'rows do not reconcile'}`);
    if (!clean) process.exitCode = 1;
  } finally {
    if (server) await stopServer(server);
    await owner.end();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
