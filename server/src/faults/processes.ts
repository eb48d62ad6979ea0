import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { startS3Fake } from '../files/s3-fake';

/** The repository's root (server/src/faults → ../../..). */
export const ROOT = path.resolve(__dirname, '../../..');
const MAIN = path.join(ROOT, 'server/src/main.ts');

export type LogLine = Record<string, unknown> & { msg?: string };

/** A real Layerbook process (server/src/main.ts through tsx), started and stopped by its PID. */
export interface ServerProcess {
  readonly child: ChildProcess;
  readonly pid: number;
  /** its JSON log lines so far (LOG_LEVEL info) */
  readonly lines: LogLine[];
  /** stderr so far (start-up failures) */
  stderr(): string;
  /** resolves with the first log line whose `msg` is `msg` (already written or arriving) */
  logged(msg: string, timeoutMs?: number): Promise<LogLine>;
  /** how it ended: its exit code, or the signal that killed it */
  readonly exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
  /** still running */
  alive(): boolean;
  signal(signal: NodeJS.Signals): void;
}

/** What every spawned process is given on top of its database and mail settings. */
export const BASE_ENV = {
  NODE_ENV: 'test',
  SESSION_SECRET: 'test-session-secret-that-is-long-enough-123',
  PUBLIC_URL: 'http://localhost:4300',
  // Where main.ts looks for the built apps (dist/) and migrations (not run: RUN_MIGRATIONS false): a
  // folder without them, so the API runs alone whether or not the apps were built, as in CI's jest stage.
  ROOT_DIR: os.tmpdir(),
  LOG_LEVEL: 'info',
  RUN_MIGRATIONS: 'false',
  SIGN_IN_RATE_LIMIT: '1000',
  PUBLIC_FORM_RATE_LIMIT: '1000',
  PUBLIC_FORM_MIN_FILL_MS: '0',
} as const;

/**
 * `node --import tsx server/src/main.ts [worker]`: the same entry point as production, compiled on the
 * fly (a test run has no server/dist). `env` is added to this process's environment.
 */
export function startServerProcess(mode: 'web' | 'worker', env: Record<string, string>): ServerProcess {
  const child = spawn(process.execPath, ['--import', 'tsx', MAIN, ...(mode === 'worker' ? ['worker'] : [])], {
    cwd: ROOT,
    env: { ...process.env, ...BASE_ENV, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  if (child.pid === undefined) throw new Error('the server process did not start');
  const lines: LogLine[] = [];
  let partial = '';
  let errors = '';
  const waiters: Array<{ msg: string; resolve: (line: LogLine) => void }> = [];
  child.stdout?.on('data', (chunk: Buffer) => {
    partial += chunk.toString();
    const complete = partial.split('\n');
    partial = complete.pop() ?? '';
    for (const text of complete) {
      let line: LogLine;
      try {
        line = JSON.parse(text) as LogLine;
      } catch {
        line = { msg: text };
      }
      lines.push(line);
      for (const w of [...waiters]) {
        if (line.msg === w.msg) {
          waiters.splice(waiters.indexOf(w), 1);
          w.resolve(line);
        }
      }
    }
  });
  child.stderr?.on('data', (chunk: Buffer) => (errors += chunk.toString()));
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) =>
    child.once('exit', (code, signal) => resolve({ code, signal })),
  );
  return {
    child,
    pid: child.pid,
    lines,
    stderr: () => errors,
    logged: (msg, timeoutMs = 60_000) =>
      new Promise((resolve, reject) => {
        const found = lines.find((l) => l.msg === msg);
        if (found) return resolve(found);
        const timer = setTimeout(() => reject(new Error(`the process never logged "${msg}"; stderr: ${errors.slice(-2000)}`)), timeoutMs);
        void exited.then(({ code, signal }) => {
          clearTimeout(timer);
          reject(new Error(`the process ended (${code ?? signal}) before logging "${msg}"; stderr: ${errors.slice(-2000)}`));
        });
        waiters.push({ msg, resolve: (l) => (clearTimeout(timer), resolve(l)) });
      }),
    exited,
    alive: () => child.exitCode === null && child.signalCode === null,
    signal: (signal) => void child.kill(signal),
  };
}

/** Stops a process still running (SIGKILL) and waits for it: for afterAll, whatever happened. */
export async function ensureStopped(p: ServerProcess | undefined): Promise<void> {
  if (!p || !p.alive()) return;
  p.signal('SIGKILL');
  await p.exited;
}

/** An S3 stand-in in this process (the server checks its bucket at start), in a throwaway folder. */
export async function startObjectStore(): Promise<{ endpoint: string; stop(): Promise<void> }> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'layerbook-faults-s3-'));
  const s3 = await startS3Fake({ directory: dir, port: 0 });
  return {
    endpoint: s3.endpoint,
    async stop() {
      await s3.stop();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Polls `check` until it answers something truthy; fails naming `what` after `timeoutMs`. */
export async function until<T>(what: string, check: () => Promise<T | undefined | null | false>, timeoutMs = 30_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value) return value;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await sleep(100);
  }
}
