/**
 * Lighthouse 12.2.3 on a phone (its mobile default: simulated slow 4G and a 4× slower CPU) for four
 * pages of the production build — portal sign-in, the public inquiry form, a portal proposal (signed in
 * as the demo client) and admin Today (signed in as the demo owner) — the median of 3 runs each,
 * against the goals: performance ≥ 95, accessibility 100, LCP ≤ 1.5 s, CLS 0. Prints figures; it is
 * not a test. Needs a build (bash ops/build.sh) and Debian's Chromium (bash ops/deps.sh --browser).
 *
 *   npx tsx ops/bench/web/lighthouse.ts [--runs N] [--only sign-in,form,proposal,today] [--save DIR] [--build CHECKOUT]
 *
 * --save keeps each run's whole report (DIR/<page>-<run>.json; open it in the Lighthouse viewer).
 * --build serves the build of another checkout (its dist/ and server/dist/), e.g. an older commit's, to compare.
 *
 * It serves the build itself (web-server.ts: its own database, production mode, a port of 4450–4499,
 * stopped by PID). The signed-in pages get the session cookie as an extra request header, so
 * Lighthouse's storage reset before each run cannot sign them out.
 */
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { appendFigures, figuresHeader, kB, ratio } from './figures';
import { observeElements, type PageElements } from './elements';
import { type Lhr, type PageFigures, pageFigures, median } from './lhr';
import { clientSession, root, staffCookie, startWebServer } from './web-server';

const CHROMIUM = process.env.CHROME_PATH ?? '/usr/bin/chromium';
const CHROME_FLAGS = ['--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage'];
const GOALS = { performance: 95, accessibility: 100, lcpMs: 1500, cls: 0 };
const DEMO = {
  owner: 'owner@fernhollow.example',
  password: 'limewash-demo-2026',
  client: 'hattie@brambleton.example',
  firmSlug: 'fernhollow',
};

interface PageToRun {
  key: string;
  label: string;
  path: string;
  cookie?: string;
}

function option(name: string): string | undefined {
  const i = process.argv.indexOf(name);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

const fmtS = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
/** A shift too small for three decimals still misses a goal of 0: it is printed so it does not read as 0. */
const fmtCls = (cls: number) => (cls === 0 || cls >= 0.001 ? cls.toFixed(3) : cls.toExponential(1));

/** The median figures of one page's runs, each against its goal (ratio = measured ÷ goal). */
function describe(page: PageToRun, runs: PageFigures[], seen: PageElements | undefined): string[] {
  const m = (f: (r: PageFigures) => number) => median(runs.map(f));
  const perf = m((r) => r.performance);
  const a11y = m((r) => r.accessibility);
  const lcp = m((r) => r.lcpMs);
  const cls = m((r) => r.cls);
  // The run whose performance score is the median one names the LCP element and the shifts.
  const typical = [...runs].sort((a, b) => a.performance - b.performance)[Math.floor(runs.length / 2)];
  const meets = (ok: boolean) => (ok ? 'meets' : 'misses');
  const out = [
    `${page.label}  ${page.path}  (median of ${runs.length}; performance per run ${runs.map((r) => r.performance).join(', ')})`,
    `  performance ${perf} vs ≥ ${GOALS.performance}: ${ratio(perf, GOALS.performance)} ${meets(perf >= GOALS.performance)}` +
      `   accessibility ${a11y} vs ${GOALS.accessibility}: ${ratio(a11y, GOALS.accessibility)} ${meets(a11y >= GOALS.accessibility)}`,
    `  LCP ${fmtS(lcp)} vs ≤ ${fmtS(GOALS.lcpMs)}: ${ratio(lcp, GOALS.lcpMs)} ${meets(lcp <= GOALS.lcpMs)}` +
      `   CLS ${fmtCls(cls)} vs ${GOALS.cls}: ${cls === 0 ? 'meets' : `misses (${fmtCls(cls)} over)`}`,
    `  TBT ${Math.round(m((r) => r.tbtMs))} ms   FCP ${fmtS(m((r) => r.fcpMs))}   (no goals; Lighthouse's "good": TBT ≤ 200 ms, FCP ≤ 1.8 s)`,
    `  transferred ${kB(m((r) => r.transferBytes))} in ${m((r) => r.requests)} requests; ` +
      `of it script ${kB(m((r) => r.scriptBytes))}, fonts ${kB(m((r) => r.fontBytes))}; benchmark index ${Math.round(m((r) => r.benchmarkIndex))}`,
  ];
  const lcpElement = typical.lcpElement ?? seen?.lcpElement ?? 'unknown';
  const shifts = typical.clsCulprits ?? seen?.clsCulprits ?? [];
  if (seen) {
    const why = (typical.elementsError ?? '').slice(0, 140);
    out.push(
      `  LCP element and shifts below: seen by the page in a throttled load of its own (shifts there add up to ` +
        `${seen.shiftTotal.toFixed(3)}), as Lighthouse could not name them: ${why}`,
    );
  }
  out.push(`  LCP element: ${lcpElement}`, `  CLS culprits:${shifts.length === 0 ? ' none' : ''}`, ...shifts.map((c) => `    ${c}`));
  const failed = [...new Set(runs.flatMap((r) => r.failedAudits))];
  if (failed.length > 0) out.push(`  accessibility audits failed: ${failed.join(', ')}`);
  const warnings = [...new Set(runs.flatMap((r) => r.warnings))];
  for (const w of warnings) out.push(`  warning: ${w}`);
  return out;
}

async function main(): Promise<void> {
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: bash ops/deps.sh --browser (or set CHROME_PATH)`);
  const runsPerPage = Number(option('--runs') ?? 3);
  const only = option('--only')?.split(',');
  const saveDir = option('--save');
  if (saveDir) mkdirSync(saveDir, { recursive: true });
  const { default: lighthouse } = await import('lighthouse');
  const chromeLauncher = await import('chrome-launcher');

  const buildFrom = option('--build') ?? root;
  const server = await startWebServer(buildFrom);
  let chrome: Awaited<ReturnType<typeof chromeLauncher.launch>> | undefined;
  const stopAll = async () => {
    chrome?.kill();
    await server.stop();
  };
  process.once('SIGINT', () => void stopAll().then(() => process.exit(130)));
  try {
    process.stderr.write(`serving a copy of the build at ${server.base} (PID ${server.pid}); signing in…\n`);
    const owner = await staffCookie(server.base, DEMO.owner, DEMO.password);
    const client = await clientSession(server, DEMO.client);
    const pages: PageToRun[] = [
      { key: 'sign-in', label: 'portal sign-in', path: '/portal/sign-in' },
      { key: 'form', label: 'public inquiry form', path: `/portal/f/${DEMO.firmSlug}/inquiry` },
      { key: 'proposal', label: 'portal proposal', path: `/portal/proposals/${client.proposalId}`, cookie: client.cookie },
      { key: 'today', label: 'admin Today', path: '/today', cookie: owner },
    ].filter((p) => !only || only.includes(p.key));

    /**
     * One Lighthouse run in a new browser with an empty profile (Lighthouse's reset keeps cookies, and
     * a cookie one page left, an anonymous session, would sit beside the signed-in one of the next).
     * A run whose trace Chromium failed to record (NO_NAVSTART and the like) is tried again, twice at most.
     */
    const runLighthouse = async (page: PageToRun, run: number): Promise<Lhr> => {
      for (let attempt = 1; ; attempt++) {
        chrome = await chromeLauncher.launch({ chromePath: CHROMIUM, chromeFlags: ['--headless=new', ...CHROME_FLAGS] });
        const result = await lighthouse(`${server.base}${page.path}`, {
          port: chrome.port,
          output: 'json',
          logLevel: 'error',
          onlyCategories: ['performance', 'accessibility'],
          ...(page.cookie ? { extraHeaders: { Cookie: page.cookie } } : {}),
        });
        chrome.kill();
        chrome = undefined;
        if (!result) throw new Error(`Lighthouse gave no result for ${page.path}`);
        if (saveDir) writeFileSync(path.join(saveDir, `${page.key}-${run}.json`), JSON.stringify(result.lhr));
        const lhr = result.lhr as unknown as Lhr;
        if (lhr.runtimeError) {
          const why = `${page.path}: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`;
          if (attempt === 3) throw new Error(why);
          process.stderr.write(`  ${why}; trying again\n`);
          continue;
        }
        if (!lhr.finalDisplayedUrl.endsWith(page.path)) {
          throw new Error(`${page.path} ended at ${lhr.finalDisplayedUrl} (signed out, or moved?)`);
        }
        return lhr;
      }
    };

    const header = figuresHeader(root, 'Lighthouse mobile (ops/bench/web/lighthouse.ts)', path.resolve(buildFrom));
    const version = (JSON.parse(readFileSync(path.join(root, 'node_modules/lighthouse/package.json'), 'utf8')) as { version: string })
      .version;
    const lines = [`Lighthouse ${version} mobile (simulated throttling), ${CHROMIUM}; ratios are measured ÷ goal`];
    process.stdout.write(`${header}\n${lines[0]}\n`);
    // Each page's figures are printed as soon as they are in; a failure later keeps them (in the figures file too).
    try {
      for (const page of pages) {
        const runs: PageFigures[] = [];
        for (let i = 0; i < runsPerPage; i++) {
          process.stderr.write(`${page.label}: run ${i + 1} of ${runsPerPage}…\n`);
          runs.push(pageFigures(await runLighthouse(page, i + 1)));
        }
        // Lighthouse 12.2.3 cannot read the elements from newer Chromium traces: the page reports them itself then.
        const needSeen = runs.some((r) => r.lcpElement === null || r.clsCulprits === null);
        const seen = needSeen ? await observeElements(CHROMIUM, CHROME_FLAGS, `${server.base}${page.path}`, page.cookie) : undefined;
        const described = describe(page, runs, seen);
        process.stdout.write(`${described.join('\n')}\n`);
        lines.push(...described);
      }
    } catch (error) {
      lines.push(`stopped: ${error instanceof Error ? error.message : String(error)}`);
      throw error;
    } finally {
      appendFigures(header, lines);
    }
  } finally {
    await stopAll();
  }
}

main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
  process.exit(1);
});
