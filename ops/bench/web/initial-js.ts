/**
 * Initial JavaScript per app: what a browser must fetch before the app can start, raw, gzip and
 * brotli, against the goals (brotli: admin ≤ 110 kB, portal ≤ 95 kB; kB = 1000 bytes), from the
 * production build in dist/. Prints figures; it is not a test.
 *
 *   npx tsx ops/bench/web/initial-js.ts            # sizes from dist/; contributors if dist/<app>/stats.json is there
 *   npx tsx ops/bench/web/initial-js.ts --build ../other-checkout   # another checkout's dist/, to compare
 *   npx tsx ops/bench/web/initial-js.ts --stats    # also builds each app with --stats-json into a temporary
 *                                                  # folder (not dist/, under the build lock) for the contributors
 *
 * Which files count: the module scripts of the built index HTML (the server renders every page from
 * it, so real pages carry the same tags) and, transitively, every chunk they import statically.
 * The index's modulepreload links are not used as the list: Angular writes at most 10 of them, so
 * they undercount; they are checked against the walk instead. Lazy route chunks (dynamic import())
 * are left out: the page being opened adds its own, see lighthouse.ts for whole pages.
 * Transferred sizes are the .br/.gz copies the build leaves beside each file (what the server sends);
 * a file too small to have one is sent raw.
 */
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import { buildWithStats, contributors, type Metafile } from './stats';
import { appendFigures, figuresHeader, kB, ratio, waitForBuilds } from './figures';

const root = path.resolve(__dirname, '../../..');
/** --build CHECKOUT: read another checkout's dist/ (an older commit's, to compare); default this one. */
const buildIndex = process.argv.indexOf('--build');
const buildDir = buildIndex >= 0 ? path.resolve(process.argv[buildIndex + 1]) : root;
const GOALS_BR: Record<string, number> = { admin: 110_000, portal: 95_000 };

interface Sizes {
  raw: number;
  gz: number;
  br: number;
}

/** The transferred size of one built file: its precompressed copy when the build made one, else itself. */
function sizesOf(file: string): Sizes {
  const raw = readFileSync(file);
  const copy = (ext: string, make: () => Buffer) => (existsSync(file + ext) ? readFileSync(file + ext).length : make().length);
  const small = raw.length < 1024; // compress-assets.mjs leaves files under 1 KiB uncompressed
  return {
    raw: raw.length,
    gz: small ? raw.length : copy('.gz', () => gzipSync(raw, { level: 9 })),
    br: small
      ? raw.length
      : copy('.br', () => brotliCompressSync(raw, { params: { [constants.BROTLI_PARAM_QUALITY]: constants.BROTLI_MAX_QUALITY } })),
  };
}

/** `./chunk-X.js` named by a static import or re-export (`import{a}from"./x.js"`, `import"./x.js"`), never by import(). */
const STATIC_IMPORT = /\b(?:import|export)\s*(?:[^()"'`;]*?\bfrom\s*)?["'](\.\/[\w.-]+\.js)["']/g;

/** Every file reachable from the entries through static imports, entries first. */
function staticClosure(browserDir: string, entries: string[]): string[] {
  const seen = new Set<string>();
  const queue = [...entries];
  while (queue.length > 0) {
    const name = queue.shift()!;
    if (seen.has(name)) continue;
    seen.add(name);
    const source = readFileSync(path.join(browserDir, name), 'utf8');
    for (const m of source.matchAll(STATIC_IMPORT)) queue.push(path.posix.join(path.posix.dirname(name), m[1]));
  }
  return [...seen];
}

interface IndexTags {
  scripts: string[];
  preloads: string[];
  styles: string[];
}

/** The module scripts, modulepreload links and stylesheets of the built index, as paths inside browser/. */
function indexTags(html: string): IndexTags {
  const base = /<base href="([^"]*)"/.exec(html)?.[1] ?? '/';
  const local = (href: string) => (href.startsWith(base) ? href.slice(base.length) : href.replace(/^\//, ''));
  const all = (re: RegExp) => [...html.matchAll(re)].map((m) => local(m[1]));
  return {
    scripts: all(/<script[^>]*\bsrc="([^"]+)"[^>]*type="module"/g),
    preloads: all(/<link rel="modulepreload" href="([^"]+)"/g),
    styles: all(/<link rel="stylesheet" href="([^"]+)"/g),
  };
}

/** The largest packages and modules of the initial files, from a stats.json (esbuild metafile). */
function contributorLines(statsFile: string, mainFile: string, totalRaw: number, share: number): string[] {
  if (!existsSync(statsFile)) return [`  contributors: no ${statsFile} (run with --stats to make one)`];
  const meta = JSON.parse(readFileSync(statsFile, 'utf8')) as Metafile;
  const { files, modules, packages } = contributors(meta);
  // Compared by content: with the chunks merged after esbuild, a name no longer tells two builds apart.
  const theirs = path.join(path.dirname(statsFile), 'browser', path.basename(mainFile));
  const same =
    existsSync(theirs) && readFileSync(theirs).equals(readFileSync(mainFile))
      ? 'the same build as dist/'
      : `another build than dist/ (the sources or the build settings changed since)`;
  // The metafile counts bytes as esbuild wrote them; the chunk merge minifies again, so they are scaled to the files' size.
  const scale = totalRaw / modules.reduce((sum, m) => sum + m.bytes, 0);
  const row = (c: { name: string; bytes: number }) =>
    `    ${kB(c.bytes * scale).padStart(9)}  ≈${kB(c.bytes * scale * share).padStart(8)} br  ${c.name}`;
  const out = [`  contributors from ${statsFile}, ${same}; ${files.length} initial files`];
  out.push(
    `  top packages (raw, the metafile's bytes × ${scale.toFixed(2)} to add up to the files; ≈brotli at their ${(share * 100).toFixed(0)}% ratio):`,
  );
  for (const p of packages.slice(0, 12)) out.push(row(p));
  out.push('  top modules:');
  for (const m of modules.slice(0, 20)) out.push(row(m));
  return out;
}

function reportApp(app: string, statsFile: string | undefined): string[] {
  const browserDir = path.join(buildDir, 'dist', app, 'browser');
  const tags = indexTags(readFileSync(path.join(browserDir, 'index.csr.html'), 'utf8'));
  const files = staticClosure(browserDir, tags.scripts);
  const rows = files.map((f) => ({ file: f, ...sizesOf(path.join(browserDir, f)) }));
  const total = rows.reduce((t, r) => ({ raw: t.raw + r.raw, gz: t.gz + r.gz, br: t.br + r.br }), { raw: 0, gz: 0, br: 0 });
  const goal = GOALS_BR[app];
  const css = tags.styles.map((f) => sizesOf(path.join(browserDir, f)));
  const missedPreloads = files.filter((f) => !tags.scripts.includes(f) && !tags.preloads.includes(f)).length;

  const out: string[] = [];
  out.push(`${app}: ${files.length} files, ${kB(total.raw)} raw, ${kB(total.gz)} gzip, ${kB(total.br)} brotli`);
  out.push(`  brotli ${kB(total.br)} vs goal ≤ ${kB(goal)}: ${ratio(total.br, goal)} ${total.br <= goal ? '(meets it)' : '(over)'}`);
  out.push(
    `  entry ${tags.scripts.join(', ')}; ${tags.preloads.length} modulepreload links in the index, ` +
      `${missedPreloads} statically imported chunks not preloaded (fetched one round trip later)`,
  );
  if (css.length > 0) {
    out.push(
      `  render-blocking CSS (not counted): ${kB(css.reduce((s, c) => s + c.raw, 0))} raw, ${kB(css.reduce((s, c) => s + c.br, 0))} brotli`,
    );
  }
  out.push('  largest initial files (brotli / raw):');
  for (const r of [...rows].sort((a, b) => b.br - a.br).slice(0, 6))
    out.push(`    ${kB(r.br).padStart(9)} / ${kB(r.raw).padStart(9)}  ${r.file}`);

  if (statsFile) out.push(...contributorLines(statsFile, path.join(browserDir, tags.scripts[0]), total.raw, total.br / total.raw));
  return out;
}

async function main(): Promise<void> {
  if (buildDir === root) await waitForBuilds();
  const withStats = process.argv.includes('--stats');
  const lines: string[] = [];
  for (const app of ['admin', 'portal']) {
    const built = path.join(buildDir, 'dist', app, 'browser', 'index.csr.html');
    if (!existsSync(built)) throw new Error(`${built} is missing: build first (bash ops/build.sh)`);
    const statsFile = withStats ? buildWithStats(buildDir, app) : path.join(buildDir, 'dist', app, 'stats.json');
    lines.push(...reportApp(app, statsFile));
  }
  const header = figuresHeader(root, 'initial JS (ops/bench/web/initial-js.ts)', buildDir);
  process.stdout.write(`${header}\n${lines.join('\n')}\n`);
  appendFigures(header, lines);
}

main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
});
