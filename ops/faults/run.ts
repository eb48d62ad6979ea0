/**
 * Faults, with a table of outcomes: kill -9 of a worker mid-send and mid-payment, PostgreSQL
 * stopped for 10 s under load, SIGTERM with a request and a job under way. The same scenarios as the
 * jest specs in server/src/faults/, on a PostgreSQL cluster of this script's own (port 55490, a
 * throwaway folder; the shared one is never touched), servers on 55491–55492.
 *   npx tsx ops/faults/run.ts               the killed jobs' expiry brought forward (about 2 minutes)
 *   npx tsx ops/faults/run.ts --real-time   waits for pg-boss to expire the killed jobs (up to ~5 minutes more)
 */
import { type Row, runFaults } from './scenarios';

const PG_PORT = 55490;
const DB = 'layerbook_faults_run';

async function main(): Promise<void> {
  const realTime = process.argv.includes('--real-time');
  const started = Date.now();
  const rows: Row[] = await runFaults({ pgPort: PG_PORT, db: DB, httpPorts: [55491, 55492], realTime });
  const header = ['scenario', 'check', 'outcome'] as const;
  const cells = (r: Row): string[] => [r[0], r[1], r[2]];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => cells(r)[i]?.length ?? 0)));
  const line = (values: readonly string[]) => values.map((c, i) => c.padEnd(widths[i] ?? 0)).join('  ');
  console.log(line(header) + '  ok');
  console.log(widths.map((w) => '-'.repeat(w)).join('  ') + '  --');
  for (const r of rows) console.log(line(cells(r)) + '  ' + (r[3] ? 'yes' : 'NO'));
  const failed = rows.filter((r) => !r[3]).length;
  console.log(
    `\n${rows.length - failed}/${rows.length} as expected in ${Math.round((Date.now() - started) / 1000)} s${realTime ? ' (real time)' : ''}`,
  );
  process.exit(failed ? 1 : 0);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
