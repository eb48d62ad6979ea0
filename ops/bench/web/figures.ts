/** What both browser benchmarks print first and where they keep their figures. */
import { execFileSync } from 'node:child_process';
import { appendFileSync, existsSync, statSync } from 'node:fs';
import path from 'node:path';
import os from 'node:os';

/** kB = 1000 bytes, as the goals and the browser's tools count. */
export const kB = (bytes: number) => `${(bytes / 1000).toFixed(1)} kB`;

/** measured ÷ goal for an upper bound (≤ 1× meets it); goal ÷ measured for a lower bound. */
export const ratio = (measured: number, goal: number) => `${(measured / goal).toFixed(2)}×`;

/** A heading naming the bench, the time (UTC), the commit and the machine's load when it ran. */
export function figuresHeader(root: string, what: string, buildDir = root): string {
  let head = 'unknown';
  try {
    head = execFileSync('git', ['rev-parse', '--short', 'HEAD'], { cwd: root, encoding: 'utf8' }).trim();
    const dirty = execFileSync('git', ['status', '--porcelain', '--', 'projects', 'server/src', 'packages'], {
      cwd: root,
      encoding: 'utf8',
    });
    if (dirty.trim()) head += ' (+ uncommitted changes in the sources)';
  } catch {
    // not a git checkout: the figures still stand, without a commit
  }
  const load = os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');
  const index = path.join(buildDir, 'dist/admin/browser/index.csr.html');
  const where = buildDir === root ? 'dist/' : `the build in ${buildDir}`;
  const built = existsSync(index) ? `, ${where} built ${statSync(index).mtime.toISOString().slice(0, 16)}Z` : '';
  return `## ${what} — ${new Date().toISOString().slice(0, 16)}Z, HEAD ${head}${built}, load ${load} (${os.cpus().length} cores)`;
}

/** Appends the figures to the file LB_WEB_FIGURES names (a shared notes file), when it is set. */
export function appendFigures(header: string, lines: string[]): void {
  const file = process.env.LB_WEB_FIGURES;
  if (file) appendFileSync(file, `\n${header}\n\n\`\`\`\n${lines.join('\n')}\n\`\`\`\n`);
}

/**
 * With LB_BUILD_LOCK set (the folder a build holds while it writes dist/), waits until no build is
 * under way, so the figures are of one whole build.
 */
export async function waitForBuilds(): Promise<void> {
  const lock = process.env.LB_BUILD_LOCK;
  while (lock && existsSync(lock)) {
    process.stderr.write(`a build holds ${lock}; waiting…\n`);
    await new Promise((r) => setTimeout(r, 15_000));
  }
}
