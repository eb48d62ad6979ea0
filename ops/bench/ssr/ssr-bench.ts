/**
 * Server rendering against the API calls that feed each page and against a static file of the same
 * size, on the built apps with the demo firm. Prints, per page: the page's p50/p95 as a visitor gets
 * it (anonymous pages: the page kept for the next visitor, server/src/ssr/page-cache.ts), a fresh
 * render's (`Cache-Control: no-cache`), the p50 of each API call the render makes (found by rendering
 * once and reading the request log), their sum, page ÷ API (and fresh render ÷ API for anonymous
 * pages), and page ÷ static file, with each figure against its limit. Figures, not a test.
 *   bash ops/build.sh            (a production build; take /tmp/lb/build.lock first when others build)
 *   npx tsx ops/bench/ssr/ssr-bench.ts      (PostgreSQL must be up: bash ops/pg-start.sh)
 * Environment: SSR_BENCH_PORT (default 4400), SSR_BENCH_RENDERS (default 200 per page), SSR_BENCH_ONLY
 * (pages whose label contains it, e.g. `estimate`: for a profile with `node --cpu-prof --import tsx`).
 */
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import type { Server } from 'node:http';
import { loadavg, tmpdir } from 'node:os';
import { performance } from 'node:perf_hooks';
import path from 'node:path';
import express from 'express';
import { Pool } from 'pg';
import pino from 'pino';
import { createApp } from '../../../server/src/app';
import type { ObjectStore } from '../../../server/src/files/object-store';
import { DEMO, seedDemo } from '../../../server/src/seed/demo';
import { loadSsrHandlers } from '../../../server/src/ssr/load';
import { benchDatabase, benchServices, measure, signInForBench, type Measured } from '../bench-server';

const root = path.resolve(__dirname, '../../..');
const DB = 'layerbook_bench_ssr';
const PORT = Number(process.env['SSR_BENCH_PORT'] ?? 4400);
const RENDERS = Number(process.env['SSR_BENCH_RENDERS'] ?? 200);
const CONNECTIONS = 4;
const ONLY = process.env['SSR_BENCH_ONLY'] ?? '';
const FRESH = { 'cache-control': 'no-cache' };

interface Page {
  readonly label: string;
  readonly url: string;
  /** Signed in as the demo owner, or anonymous. */
  readonly owner: boolean;
  /** Render p50 limit (ms). */
  readonly limitMs: number;
  /** Render ÷ API limit, where the goal sets one. */
  readonly ratioLimit: number | null;
}

/** The page's API calls, as the request log shows them while it renders once. */
const apiCallsSeen: string[] = [];
const logSink = {
  write(line: string) {
    const entry = JSON.parse(line) as { level?: number; req?: { url?: string } };
    // Errors are always shown (the logger stays at "error" outside the one logged render).
    if ((entry.level ?? 0) >= 50) process.stderr.write(line);
    else if (entry.req?.url) apiCallsSeen.push(entry.req.url);
  },
};

const noFiles: ObjectStore = {
  put: () => Promise.reject(new Error('A benchmark stores no files.')),
  get: () => Promise.resolve(null),
  delete: () => Promise.resolve(),
  close: () => undefined,
};

const ratio = (value: number, limit: number) => `${(value / limit).toFixed(2)}× limit`;
const ms = (value: number) => `${value.toFixed(1)} ms`;

async function main(): Promise<void> {
  if (!existsSync(path.join(root, 'dist/admin/server/server.mjs'))) throw new Error('No production build: run bash ops/build.sh first.');
  const config = await benchDatabase(DB, CONNECTIONS + 2);
  const services = await benchServices(config, CONNECTIONS + 2);
  const seedPool = new Pool({ connectionString: config.DATABASE_URL, max: 2 });
  await seedDemo(seedPool);
  await seedPool.end();

  const logger = pino({ level: 'error' }, logSink);
  const app = createApp(
    { config: { ...config, NODE_ENV: 'development' }, ...services, logger, storage: noFiles, now: () => new Date() },
    await loadSsrHandlers(root),
  );
  // The static file of each page's size is served by the same process, in front of the app.
  const staticDir = mkdtempSync(path.join(tmpdir(), 'lb-ssr-bench-'));
  const outer = express();
  outer.use('/__bench-static', express.static(staticDir));
  outer.use(app);
  const server: Server = outer.listen(PORT, '127.0.0.1');
  await new Promise((resolve, reject) => server.once('listening', resolve).once('error', reject));
  const origin = `http://127.0.0.1:${PORT}`;

  try {
    const { cookie } = await signInForBench(origin, DEMO.people[0].email, DEMO.password);
    const estimates = (await (await fetch(`${origin}/api/estimates?limit=50`, { headers: { cookie } })).json()) as {
      items: { id: string }[];
    };
    // The estimate with the most to show: the longest answer.
    let estimateId = '';
    let longest = -1;
    for (const { id } of estimates.items) {
      const size = (await (await fetch(`${origin}/api/estimates/${id}`, { headers: { cookie } })).text()).length;
      if (size > longest) [estimateId, longest] = [id, size];
    }
    if (!estimateId) throw new Error('The demo firm has no estimate.');
    // The job with the longest billing view (schedule lines, work done, invoices).
    const jobs = (await (await fetch(`${origin}/api/jobs?limit=50`, { headers: { cookie } })).json()) as { items: { id: string }[] };
    let jobId = '';
    longest = -1;
    for (const { id } of jobs.items) {
      const size = (await (await fetch(`${origin}/api/jobs/${id}/billing`, { headers: { cookie } })).text()).length;
      if (size > longest) [jobId, longest] = [id, size];
    }
    if (!jobId) throw new Error('The demo firm has no job.');

    const pages: Page[] = [
      { label: 'portal sign-in', url: '/portal/sign-in', owner: false, limitMs: 25, ratioLimit: 3 },
      { label: 'public inquiry form', url: `/portal/f/${DEMO.firm.slug}/inquiry`, owner: false, limitMs: 25, ratioLimit: 3 },
      { label: 'admin Today', url: '/today', owner: true, limitMs: 25, ratioLimit: 3 },
      { label: 'admin estimate page', url: `/estimates/${estimateId}`, owner: true, limitMs: 50, ratioLimit: null },
      // Not in the goals, held to the estimate page's limit: the longest form an owner opens on a
      // phone, and the job page the office bills from.
      { label: 'admin settings', url: '/settings', owner: true, limitMs: 50, ratioLimit: null },
      { label: 'admin job page', url: `/jobs/${jobId}`, owner: true, limitMs: 50, ratioLimit: null },
    ];
    const load = loadavg()
      .map((l) => l.toFixed(2))
      .join(' ');
    console.log(
      `server render, built apps, demo firm; ${RENDERS} renders per page, one at a time, from a worker thread; load average ${load}`,
    );
    for (const page of pages.filter((p) => p.label.includes(ONLY))) {
      const pageCookie = page.owner ? cookie : 'lb.bench=anonymous';
      const get = (url: string, total: number, headers: Record<string, string> = {}): Promise<Measured> =>
        measure(1, { mode: 'get', port: PORT, path: url, cookie: pageCookie, total, headers });

      // One render with the request log on: which API calls feed this page.
      apiCallsSeen.length = 0;
      logger.level = 'info';
      const html = await (await fetch(`${origin}${page.url}`, { headers: { cookie: pageCookie } })).text();
      logger.level = 'error';
      const calls = [...new Set(apiCallsSeen)];
      const staticName = `${page.label.replaceAll(' ', '-')}.html`;
      writeFileSync(path.join(staticDir, staticName), 'x'.repeat(Buffer.byteLength(html)));

      // Every render fresh (as a hard reload asks): anonymous pages are otherwise kept a few seconds
      // for the next visitor (server/src/ssr/page-cache.ts), and the answer below is mostly that.
      await get(page.url, Math.max(20, RENDERS / 5), FRESH); // warm-up
      // The server's event loop busy time per render: less swayed by other work on the machine than latency.
      const loopBefore = performance.eventLoopUtilization();
      const fresh = await get(page.url, RENDERS, FRESH);
      const busy = performance.eventLoopUtilization(loopBefore).active / RENDERS;
      // What a visitor gets: the kept page for an anonymous one, a render for a signed-in one.
      await get(page.url, 20);
      const render = await get(page.url, RENDERS);
      const apis: { url: string; p50: number }[] = [];
      for (const url of calls) {
        await get(url, 50);
        apis.push({ url, p50: (await get(url, RENDERS)).p50 });
      }
      await get(`/__bench-static/${staticName}`, 50);
      const file = await get(`/__bench-static/${staticName}`, RENDERS);
      const apiSum = apis.reduce((sum, a) => sum + a.p50, 0);

      console.log(`\n${page.label}  ${page.url}  (${(Buffer.byteLength(html) / 1024).toFixed(0)} kB)`);
      console.log(
        `  page p50 ${ms(render.p50)} (${ratio(render.p50, page.limitMs)} of ${page.limitMs} ms)  p95 ${ms(render.p95)}${page.owner ? '' : ' (the kept page: anonymous)'}`,
      );
      console.log(`  fresh render p50 ${ms(fresh.p50)}  p95 ${ms(fresh.p95)}; server busy ${ms(busy)} a render`);
      for (const a of apis) console.log(`  API ${a.url}  p50 ${ms(a.p50)}`);
      if (apis.length > 0) {
        const times = render.p50 / apiSum;
        const against = page.ratioLimit ? ` (${ratio(times, page.ratioLimit)} of ${page.ratioLimit}×)` : ' (no limit set)';
        console.log(`  page ÷ API (sum of p50s ${ms(apiSum)}) ${times.toFixed(2)}×${against}`);
        if (!page.owner) console.log(`  fresh render ÷ API ${(fresh.p50 / apiSum).toFixed(2)}× (no limit set)`);
      } else {
        console.log('  no API call while rendering');
      }
      console.log(
        `  static file of the same size p50 ${ms(file.p50)}; render ÷ static ${(render.p50 / file.p50).toFixed(1)}× (no limit set)`,
      );
    }
  } finally {
    server.close();
    rmSync(staticDir, { recursive: true, force: true });
    await services.queue.stop();
    await services.pool.end();
  }
}

main().then(
  // The apps' bundles keep timers of their own (zone.js, Angular's platform): end the process here.
  () => process.exit(0),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
