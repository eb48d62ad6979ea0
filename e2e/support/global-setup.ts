import { execFileSync, spawn } from 'node:child_process';
import { mkdirSync, openSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { E2E } from './env';

const root = path.resolve(__dirname, '../..');

/** Up when it answers at all: the S3 fake answers an unsigned request with an error status. */
async function waitForAnswer(url: string, timeoutMs: number): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      await fetch(url);
      return;
    } catch {
      await new Promise((r) => setTimeout(r, 100));
    }
  }
  throw new Error(`${url} did not come up`);
}

async function waitFor(url: string, timeoutMs: number): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${url} did not come up`);
}

function startByPid(name: string, command: string, args: string[], env: NodeJS.ProcessEnv): void {
  const dir = path.join(root, E2E.stateDir);
  mkdirSync(dir, { recursive: true });
  const log = openSync(path.join(dir, `${name}.log`), 'w');
  const child = spawn(command, args, { cwd: root, env, stdio: ['ignore', log, log], detached: true });
  child.unref();
  writeFileSync(path.join(dir, `${name}.pid`), String(child.pid));
}

/** The environment of the e2e server, also used to run operator commands against it. */
export function e2eEnv(): NodeJS.ProcessEnv {
  const port = process.env['LB_PG_PORT'] ?? '54329';
  const pw = (n: string, d: string) => process.env[n] ?? d;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: 'test',
    PORT: String(E2E.port),
    PUBLIC_URL: E2E.baseUrl,
    ROOT_DIR: root,
    SESSION_SECRET: 'e2e-session-secret-that-is-long-enough-0123',
    SMTP_PORT: String(E2E.smtpPort),
    S3_ENDPOINT: `http://127.0.0.1:${E2E.s3Port}`,
    // Card payments through the local Stripe stand-in, started below on its own port.
    STRIPE_SECRET_KEY: E2E.stripeSecretKey,
    STRIPE_WEBHOOK_SECRET: E2E.stripeWebhookSecret,
    STRIPE_API_BASE: `http://127.0.0.1:${E2E.stripePort}`,
    LOG_LEVEL: 'warn',
    DATABASE_URL: `postgres://layerbook_app:${pw('LB_APP_PASSWORD', 'layerbook-app-local')}@127.0.0.1:${port}/${E2E.db}`,
    DATABASE_OWNER_URL: `postgres://layerbook_owner:${pw('LB_OWNER_PASSWORD', 'layerbook-owner-local')}@127.0.0.1:${port}/${E2E.db}`,
    DATABASE_JOBS_URL: `postgres://layerbook_jobs:${pw('LB_JOBS_PASSWORD', 'layerbook-jobs-local')}@127.0.0.1:${port}/${E2E.db}`,
    // The fill-time bot check is covered by API tests; a browser test fills forms faster than a person.
    PUBLIC_FORM_MIN_FILL_MS: '0',
    // Every journey signs in from 127.0.0.1: the per-address sign-in limit (30 in 15 minutes, checked by
    // API tests) would refuse the later journeys of one run, not a person.
    SIGN_IN_RATE_LIMIT: '100000',
  };
  return env;
}

/** Fresh database, demo seed, a mail catcher, the S3 fake, the Stripe stand-in and the built server — each started by PID. */
export default async function globalSetup(): Promise<void> {
  execFileSync('bash', ['ops/pg-start.sh'], { cwd: root, stdio: 'inherit' });
  execFileSync('bash', ['ops/pg-createdb.sh', E2E.db, '--fresh'], { cwd: root, stdio: 'inherit' });
  const env = e2eEnv();
  rmSync(path.join(root, E2E.stateDir, 'mail'), { recursive: true, force: true });
  startByPid(
    'maildev',
    path.join(root, 'node_modules/.bin/maildev'),
    [
      '--smtp',
      String(E2E.smtpPort),
      '--web',
      String(E2E.mailWebPort),
      '--ip',
      '127.0.0.1',
      '--mail-directory',
      path.join(root, E2E.stateDir, 'mail'),
    ],
    env,
  );
  // Uploaded files from earlier runs are dropped with the database that pointed at them.
  const s3Dir = path.join(root, E2E.stateDir, 's3');
  rmSync(s3Dir, { recursive: true, force: true });
  startByPid('s3', 'node', ['server/dist/files/s3-fake-cli.js', s3Dir, String(E2E.s3Port)], env);
  // The stand-in keeps its sessions in memory: each run starts with none. Its CLI is bundled here so a
  // run of one spec file does not need `npm run build` first.
  const cli = 'packages/stripe-fake/dist/cli.js';
  execFileSync(
    'npx',
    [
      'esbuild',
      'packages/stripe-fake/src/cli.ts',
      '--bundle',
      '--platform=node',
      '--target=node20',
      '--format=cjs',
      '--packages=external',
      `--outfile=${cli}`,
    ],
    { cwd: root, stdio: 'inherit' },
  );
  startByPid('stripe', 'node', [cli, '--port', String(E2E.stripePort)], {
    ...env,
    STRIPE_FAKE_WEBHOOK_URL: `http://127.0.0.1:${E2E.port}/api/payments/webhook`,
  });
  execFileSync('node', ['server/dist/seed/run.js'], { cwd: root, env, stdio: 'inherit' });
  // The server creates its bucket at start-up, so the fake must answer first.
  await waitForAnswer(`http://127.0.0.1:${E2E.s3Port}/`, 15_000);
  startByPid('server', 'node', ['server/dist/main.js'], env);
  await waitFor(`http://127.0.0.1:${E2E.mailWebPort}/api/healthz`, 30_000).catch(() =>
    waitFor(`http://127.0.0.1:${E2E.mailWebPort}/`, 5_000),
  );
  await waitFor(`${E2E.baseUrl}/api/health`, 60_000);
  await waitFor(`http://127.0.0.1:${E2E.stripePort}/_test/health`, 15_000);
}
