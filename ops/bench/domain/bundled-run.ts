import { spawnSync } from 'node:child_process';
import os from 'node:os';
import path from 'node:path';

/**
 * Bundles a bench entry with esbuild and runs it with plain node, because the browser runs
 * bundled, optimised code: tsx's per-module transpiled output can time differently. The child
 * sees `envFlag` set, so it measures and prints without bundling itself again.
 */
export function runBundled(entry: string, envFlag: string): void {
  const root = path.resolve(__dirname, '../../..');
  const outfile = path.join(os.tmpdir(), `layerbook-${path.basename(entry, '.ts')}.cjs`);
  const build = spawnSync(
    'npx',
    ['esbuild', path.relative(root, entry), '--bundle', '--platform=node', '--format=cjs', `--outfile=${outfile}`, '--log-level=warning'],
    { cwd: root, stdio: 'inherit' },
  );
  if (build.status !== 0) {
    console.error(`esbuild failed (exit ${build.status}); bundled figures not measured.`);
    process.exitCode = 1;
    return;
  }
  const run = spawnSync(process.execPath, [outfile], { stdio: 'inherit', env: { ...process.env, [envFlag]: '1' } });
  if (run.status !== 0) process.exitCode = run.status ?? 1;
}
