/**
 * The esbuild metafile Angular writes with `ng build --stats-json` (stats.json): which modules end
 * up in the initial files, to show what to cut from the first load.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, rmdirSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export interface Metafile {
  outputs: Record<
    string,
    {
      bytes: number;
      entryPoint?: string;
      imports?: Array<{ path: string; kind: string }>;
      inputs?: Record<string, { bytesInOutput: number }>;
    }
  >;
}

export interface Contributor {
  name: string;
  bytes: number;
}

/** `node_modules/@angular/material/fesm2022/x.mjs` → `@angular/material`; our own files → their folder. */
function packageOf(input: string): string {
  const nm = input.lastIndexOf('node_modules/');
  if (nm >= 0) {
    const parts = input.slice(nm + 'node_modules/'.length).split('/');
    return parts[0].startsWith('@') ? `${parts[0]}/${parts[1]}` : parts[0];
  }
  return path.posix.dirname(input).split('/').slice(0, 5).join('/');
}

/**
 * The initial outputs of the metafile's own build (the browser main entry and its static imports,
 * walked through the metafile's import-statement edges), and how many of their bytes each input
 * module and each package is: the largest first.
 */
export function contributors(meta: Metafile): { files: string[]; modules: Contributor[]; packages: Contributor[] } {
  const byBase = new Map(Object.keys(meta.outputs).map((o) => [path.basename(o), o]));
  const main = Object.keys(meta.outputs).find((o) => /^main-[\w]+\.js$/.test(path.basename(o)));
  if (!main) throw new Error('stats.json names no main-*.js output');
  const seen = new Set<string>();
  const queue = [main];
  while (queue.length > 0) {
    const out = queue.shift()!;
    if (seen.has(out)) continue;
    seen.add(out);
    for (const i of meta.outputs[out].imports ?? []) {
      const next = byBase.get(path.basename(i.path));
      if (i.kind === 'import-statement' && next) queue.push(next);
    }
  }
  const modules = new Map<string, number>();
  for (const out of seen) {
    for (const [input, { bytesInOutput }] of Object.entries(meta.outputs[out].inputs ?? {})) {
      modules.set(input, (modules.get(input) ?? 0) + bytesInOutput);
    }
  }
  const packages = new Map<string, number>();
  for (const [input, bytes] of modules) packages.set(packageOf(input), (packages.get(packageOf(input)) ?? 0) + bytes);
  const sorted = (m: Map<string, number>) => [...m].map(([name, bytes]) => ({ name, bytes })).sort((a, b) => b.bytes - a.bytes);
  return { files: [...seen].map((o) => path.basename(o)), modules: sorted(modules), packages: sorted(packages) };
}

/**
 * Builds `app` with --stats-json into a temporary folder (never the shared dist/) and answers its
 * stats.json. With LB_BUILD_LOCK set (a folder path), waits for and holds that lock while building,
 * as everyone building in the same checkout does (the build cache in .angular/ is shared).
 */
export function buildWithStats(root: string, app: string): string {
  const out = path.join(os.tmpdir(), `layerbook-stats-${app}`);
  const lock = process.env.LB_BUILD_LOCK;
  if (lock) {
    for (;;) {
      try {
        mkdirSync(lock);
        break;
      } catch {
        process.stderr.write(`waiting for the build lock ${lock}…\n`);
        execFileSync('sleep', ['15']);
      }
    }
  }
  try {
    process.stderr.write(`building ${app} with --stats-json into ${out}…\n`);
    // Chunks merged after esbuild, as ops/build.sh builds them.
    execFileSync('npx', ['ng', 'build', app, '--stats-json', `--output-path=${out}`], {
      cwd: root,
      env: { ...process.env, NG_BUILD_OPTIMIZE_CHUNKS: '1' },
      stdio: ['ignore', 'ignore', 'inherit'],
    });
  } finally {
    if (lock) rmdirSync(lock);
  }
  return path.join(out, 'stats.json');
}
