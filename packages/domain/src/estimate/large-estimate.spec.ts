import { computeEstimate } from './compute-estimate';
import { LARGE_JOBS } from './large-estimate.fixture';
import { toResultJson } from './result-json';

// The domain is browser code compiled without Node's types; only this spec reads a file, so it
// declares the little it uses here (module scope: nothing leaks into the rest of the package).
declare const __dirname: string;
declare const process: { env: Record<string, string | undefined> };
declare function require(id: 'node:fs'): {
  readFileSync: (path: string, encoding: 'utf8') => string;
  writeFileSync: (path: string, data: string) => void;
};
const { readFileSync, writeFileSync } = require('node:fs');

/**
 * Regression guard for speed work on the estimate: large generated jobs must give exactly the
 * result they gave before (every number, string and order), as stored in the snapshot beside
 * this spec (one line of JSON in a .txt, so Prettier and Jest's own snapshots leave it alone).
 * The snapshot is the engine's own earlier output, not an outside source. Rewrite it only for a
 * deliberate change of results:
 *   LB_WRITE_ESTIMATE_SNAPSHOT=1 npx jest -c packages/domain/jest.config.cjs large-estimate
 */
const file = `${__dirname}/large-estimate.result.txt`;
if (process.env['LB_WRITE_ESTIMATE_SNAPSHOT'] === '1') {
  const out: Record<string, unknown> = {};
  for (const [name, job] of LARGE_JOBS) out[name] = toResultJson(computeEstimate(job()));
  writeFileSync(file, `${JSON.stringify(out)}\n`);
}
const snapshot = JSON.parse(readFileSync(file, 'utf8')) as Record<string, unknown>;

describe('computeEstimate on large generated jobs', () => {
  it.each(LARGE_JOBS.map(([name, job]) => [name, job] as const))('%s gives the stored result exactly', (name, job) => {
    expect(toResultJson(computeEstimate(job()))).toEqual(snapshot[name]);
  });

  it('the snapshot holds every job and nothing else', () => {
    expect(Object.keys(snapshot)).toEqual(LARGE_JOBS.map(([name]) => name));
  });
});
