/**
 * What the load run counts, per step (one HTTP request of a kind, e.g. "invoice: issue"): requests
 * sent, answers by status, latency of every answer, and what the writes that succeeded made (form
 * e-mails, issued invoices with their numbers, proposal versions), so the database can be checked
 * against them afterwards, row by row.
 *
 * autocannon calls a request's onResponse and then, synchronously, emits 'response' with the latency:
 * onResponse notes which step answered, the 'response' listener books the latency to it.
 */
export class StepStats {
  sent = 0;
  ok = 0;
  /** answers that were not 2xx, by status */
  readonly refused = new Map<number, number>();
  /** 2xx answered within the measured window (for requests per second) */
  okInWindow = 0;
  readonly latencies: number[] = [];
  /** the first few refusals' bodies, to say what went wrong */
  readonly samples: string[] = [];

  constructor(
    readonly kind: string,
    readonly name: string,
  ) {}

  get failed(): number {
    return [...this.refused.values()].reduce((a, b) => a + b, 0);
  }
}

export class Recorder {
  readonly steps: StepStats[] = [];
  /** set when the measured window ends: sequences finish the step they are in, then only ask /api/health */
  draining = false;
  /** measured requests sent and not yet answered */
  inFlight = 0;
  /** connection errors and timeouts (autocannon's reqError), by kind */
  readonly transportErrors = new Map<string, number>();
  startedAt = 0;
  windowEndsAt = 0;
  /** set by onResponse, read by the 'response' listener right after (same tick) */
  private answered: StepStats | null = null;

  // What the successful writes made: the reconciliation reads these.
  readonly formEmails: string[] = [];
  /** issued invoice id → the number the answer printed */
  readonly issued = new Map<string, string>();
  readonly drafts: string[] = [];
  readonly proposalVersions: string[] = [];
  estimateSaves = 0;
  /** draft requests that found no schedule line left to bill (the prepared lines ran out) */
  linesRanOut = 0;

  step(kind: string, name: string): StepStats {
    const made = new StepStats(kind, name);
    this.steps.push(made);
    return made;
  }

  sent(step: StepStats): void {
    step.sent++;
    this.inFlight++;
  }

  /** onResponse of a measured request; `null` for a request that was not measured (a health call while draining). */
  answer(step: StepStats | null, status: number, body: string): boolean {
    this.answered = step;
    if (!step) return false;
    this.inFlight--;
    const ok = status >= 200 && status < 300;
    if (ok) {
      step.ok++;
      if (Date.now() <= this.windowEndsAt) step.okInWindow++;
    } else {
      step.refused.set(status, (step.refused.get(status) ?? 0) + 1);
      if (step.samples.length < 3) step.samples.push(`${status} ${body.slice(0, 300)}`);
    }
    return ok;
  }

  /** the 'response' event of an autocannon instance: the latency of the answer onResponse just saw */
  latency(ms: number): void {
    this.answered?.latencies.push(ms);
    this.answered = null;
  }

  transportError(kind: string): void {
    this.transportErrors.set(kind, (this.transportErrors.get(kind) ?? 0) + 1);
  }
}

/** Nearest-rank percentile (common practice, no source). */
export function percentile(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}

const pad = (s: string | number, n: number) => String(s).padStart(n);

/** The figures: one line per step, then the totals. */
export function printFigures(rec: Recorder, windowSeconds: number): void {
  console.log(
    `\n  ${'kind: step'.padEnd(30)} ${pad('sent', 7)} ${pad('2xx', 7)} ${pad('errors', 7)} ${pad('req/s', 7)} ${pad('p50 ms', 8)} ${pad('p95 ms', 8)} ${pad('p99 ms', 8)} ${pad('max ms', 8)}`,
  );
  let sent = 0;
  let ok = 0;
  let failed = 0;
  let inWindow = 0;
  const all: number[] = [];
  for (const s of rec.steps) {
    const sorted = [...s.latencies].sort((a, b) => a - b);
    all.push(...sorted);
    sent += s.sent;
    ok += s.ok;
    failed += s.failed;
    inWindow += s.okInWindow;
    console.log(
      `  ${`${s.kind}: ${s.name}`.padEnd(30)} ${pad(s.sent, 7)} ${pad(s.ok, 7)} ${pad(s.failed, 7)} ${pad((s.okInWindow / windowSeconds).toFixed(1), 7)} ` +
        `${pad(percentile(sorted, 50).toFixed(1), 8)} ${pad(percentile(sorted, 95).toFixed(1), 8)} ${pad(percentile(sorted, 99).toFixed(1), 8)} ${pad((sorted.at(-1) ?? Number.NaN).toFixed(1), 8)}`,
    );
    for (const sample of s.samples) console.log(`      refused: ${sample}`);
  }
  all.sort((a, b) => a - b);
  const transport = [...rec.transportErrors.values()].reduce((a, b) => a + b, 0);
  console.log(
    `  ${'all'.padEnd(30)} ${pad(sent, 7)} ${pad(ok, 7)} ${pad(failed, 7)} ${pad((inWindow / windowSeconds).toFixed(1), 7)} ` +
      `${pad(percentile(all, 50).toFixed(1), 8)} ${pad(percentile(all, 95).toFixed(1), 8)} ${pad(percentile(all, 99).toFixed(1), 8)} ${pad((all.at(-1) ?? Number.NaN).toFixed(1), 8)}`,
  );
  console.log(
    `  errors: ${failed} non-2xx answers, ${transport} connection errors or timeouts` +
      (transport ? ` (${[...rec.transportErrors].map(([k, n]) => `${k} ${n}`).join(', ')})` : '') +
      `; ${rec.inFlight} measured requests left unanswered; ${rec.linesRanOut} drafts found no line left to bill`,
  );
}
