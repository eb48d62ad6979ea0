/**
 * Median timings for the computations the apps run most: a full estimate of a 50-room job
 * (4 layers per surface), recomputed on every keystroke in the browser; the container pack for
 * 400 gal over 5 sizes at one unit price (the case that used to blow up the search); and a
 * two-year cash forecast over 500 open invoices. Prints figures, with each goal as a ratio
 * (median ÷ goal: at or under 1× meets it); it is not a timed test.
 *
 *   npx tsx ops/bench/domain/estimate-bench.ts
 *
 * Prints two sets: the sources run through tsx, then the same bench bundled with esbuild and
 * run with plain node (what the browser runs is bundled code). Both are medians of one process
 * each on whatever else the machine is doing, so compare runs made back to back.
 */
import {
  type CashForecastInput,
  type Container,
  addDays,
  cashForecast,
  chooseContainers,
  computeEstimate,
  toBase,
} from '../../../packages/domain/src/index';
import { benchJob } from '../../../packages/domain/src/estimate/large-estimate.fixture';
import { runBundled } from './bundled-run';

const ROOMS = 50;
/** set in the bundled child so it measures without bundling itself again */
const BUNDLED_FLAG = 'LAYERBOOK_BENCH_BUNDLED';
const isBundled = process.env[BUNDLED_FLAG] === '1';
const ESTIMATE_TARGET_MS = 1;
const PACK_TARGET_MS = 1;

/** qt, 2 qt, 1 gal, 2 gal and 5 gal all at $40/gal */
const FIVE_SIZES_ONE_RATE: Container[] = [
  { label: '1 qt', size: 1, unit: 'quart', price: '10.00' },
  { label: '2 qt', size: 2, unit: 'quart', price: '20.00' },
  { label: '1 gal', size: 1, unit: 'gallon', price: '40.00' },
  { label: '2 gal', size: 2, unit: 'gallon', price: '80.00' },
  { label: '5 gal', size: 5, unit: 'gallon', price: '200.00' },
];

const vsGoal = (ms: number, goalMs: number): string =>
  `${(ms / goalMs).toFixed(2)}× the ${goalMs} ms goal (${ms <= goalMs ? 'met' : 'missed'})`;

function fiveHundredInvoices(): CashForecastInput {
  const asOf = '2025-06-30';
  return {
    asOf,
    weeks: 105,
    currency: 'USD',
    openInvoices: Array.from({ length: 500 }, (_, i) => ({
      id: `inv${i}`,
      date: addDays(asOf, ((i * 37) % 730) - 60),
      amount: `${1000 + ((i * 7919) % 9000)}.${String(i % 100).padStart(2, '0')}`,
      probability: 0.9,
    })),
    milestones: Array.from({ length: 100 }, (_, i) => ({
      id: `m${i}`,
      date: addDays(asOf, (i * 11) % 700),
      amount: '2500.00',
      probability: 0.8,
    })),
    pipelineDeposits: Array.from({ length: 40 }, (_, i) => ({
      id: `p${i}`,
      date: addDays(asOf, i * 9),
      amount: '1000.00',
      probability: 0.4,
    })),
  };
}

function median(run: () => unknown, iterations: number): number {
  for (let i = 0; i < Math.min(50, iterations); i++) run();
  const times: number[] = [];
  for (let i = 0; i < iterations; i++) {
    const t0 = performance.now();
    run();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

console.log(isBundled ? '— bundled (esbuild --bundle, node) —' : '— tsx (TypeScript sources) —');
const forecastInput = fiveHundredInvoices();
// Walls + ceiling per room is the usual job; round walls and a dome in every room is the heavy case.
for (const surfacesPerRoom of [2, 4] as const) {
  const job = benchJob(surfacesPerRoom, ROOMS);
  const sample = computeEstimate(job);
  const ms = median(() => computeEstimate(job), 400);
  console.log(
    `computeEstimate, ${ROOMS} rooms × ${surfacesPerRoom} surfaces × 4 layers (${sample.schedule.tasks.length} scheduled tasks, ` +
      `${sample.schedule.workingDays} working days, price ${sample.price.price.toFixed(2)}):`,
  );
  console.log(`  median ${ms.toFixed(3)} ms, ${vsGoal(ms, ESTIMATE_TARGET_MS)}`);
}
// 400 gal lands on a whole number of 5 gal pails; 401.3 gal leaves a remainder that no size fits exactly.
for (const gallons of [400, 401.3]) {
  const need = toBase(gallons, 'gallon');
  const pack = chooseContainers(need, 'volume', FIVE_SIZES_ONE_RATE);
  const ms = median(() => chooseContainers(need, 'volume', FIVE_SIZES_ONE_RATE), 400);
  const lines = pack.lines.map((l) => `${l.count} × ${l.label}`).join(' + ');
  console.log(`chooseContainers, ${gallons} gal over 5 sizes at one unit price (${lines} = ${pack.totalCost.toFixed(2)}):`);
  console.log(`  median ${ms.toFixed(3)} ms, ${vsGoal(ms, PACK_TARGET_MS)}`);
}
const forecastMs = median(() => cashForecast(forecastInput), 400);
console.log('cashForecast, 500 open invoices + 100 milestones + 40 pipeline deposits over 105 weeks (2 years):');
console.log(`  median ${forecastMs.toFixed(3)} ms`);
if (!isBundled) runBundled(__filename, BUNDLED_FLAG);
