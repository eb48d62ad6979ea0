/**
 * The production build served as real users get it, for the browser benchmarks: its own database
 * (demo firm seeded), `node server/dist/main.js` in production mode (compression, precompressed
 * static files, CSP) on a free port of 4450–4499, started and stopped by PID; an in-process mail
 * catcher receives the client's sign-in link and the local S3 stand-in (in-process too) holds files. Sessions are made through the API, as the apps do.
 */
import { type ChildProcess, execFileSync, spawn } from 'node:child_process';
import { cpSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { waitForBuilds } from './figures';
import { startS3Fake } from '../../../server/src/files/s3-fake';
import { type Catcher, firstLink, startCatcher } from './mail';
import { testDatabaseUrls } from '../../../server/src/testing/test-env';

export const root = path.resolve(__dirname, '../../..');
const DB = 'layerbook_bench_web';
const PORTS = { from: 4450, to: 4499 };

export interface WebServer {
  readonly base: string;
  readonly pid: number;
  readonly inbox: Catcher;
  stop(): Promise<void>;
}

/** The first port of the range nobody listens on. */
async function freePort(): Promise<number> {
  for (let port = PORTS.from; port <= PORTS.to; port++) {
    const free = await new Promise<boolean>((resolve) => {
      const probe = net.createServer().once('error', () => resolve(false));
      probe.listen(port, '127.0.0.1', () => probe.close(() => resolve(true)));
    });
    if (free) return port;
  }
  throw new Error(`no free port in ${PORTS.from}–${PORTS.to}`);
}

const BUILT = ['dist/admin/server/server.mjs', 'dist/portal/server/server.mjs', 'server/dist/main.js', 'server/dist/seed/run.js'];

/**
 * A copy of the build (dist/ and server/dist/, ~15 MB) in a temporary folder the server runs from,
 * so a build started meanwhile in the checkout cannot swap files under a run; node_modules and
 * migrations are linked.
 */
async function snapshotBuild(from: string): Promise<string> {
  if (from === root) await waitForBuilds();
  for (const file of BUILT) {
    if (!existsSync(path.join(from, file))) throw new Error(`${path.join(from, file)} is missing: build first (bash ops/build.sh)`);
  }
  const copy = mkdtempSync(path.join(os.tmpdir(), 'layerbook-web-bench-'));
  for (const dir of ['dist/admin', 'dist/portal', 'server/dist']) cpSync(path.join(from, dir), path.join(copy, dir), { recursive: true });
  cpSync(path.join(from, 'server/package.json'), path.join(copy, 'server/package.json'));
  for (const link of ['node_modules', 'migrations']) symlinkSync(path.join(from, link), path.join(copy, link));
  return copy;
}

async function waitUntilUp(base: string, child: ChildProcess): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the server exited (${child.exitCode}) while starting`);
    try {
      if ((await fetch(`${base}/readyz`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error('the server did not answer /readyz within 60 s');
}

/**
 * One run at a time on this machine: two would share the database (each makes it afresh) and slow
 * each other's figures. The lock is a folder holding the owner's PID; a dead owner's lock is taken over.
 */
const RUN_LOCK = path.join(os.tmpdir(), 'layerbook-bench-web.lock');

async function takeRunLock(): Promise<void> {
  for (;;) {
    try {
      mkdirSync(RUN_LOCK);
      writeFileSync(path.join(RUN_LOCK, 'pid'), String(process.pid));
      return;
    } catch {
      const owner = Number(existsSync(path.join(RUN_LOCK, 'pid')) ? readFileSync(path.join(RUN_LOCK, 'pid'), 'utf8') : NaN);
      let alive = Number.isNaN(owner); // a lock being made has no PID yet
      try {
        if (!alive) alive = process.kill(owner, 0);
      } catch {
        alive = false;
      }
      if (!alive) rmSync(RUN_LOCK, { recursive: true, force: true });
      else {
        process.stderr.write(`another web bench (PID ${owner}) is running; waiting…\n`);
        await new Promise((r) => setTimeout(r, 10_000));
      }
    }
  }
}

const releaseRunLock = () => rmSync(RUN_LOCK, { recursive: true, force: true });

/**
 * PostgreSQL up, a fresh seeded database, the built server listening; stop() ends it by PID.
 * `from`: the checkout whose build is served (another one's, to compare; default this one).
 */
export async function startWebServer(from = root): Promise<WebServer> {
  await takeRunLock();
  const build = await snapshotBuild(path.resolve(from)).catch((error: unknown) => {
    releaseRunLock();
    throw error;
  });
  try {
    execFileSync('bash', [path.join(root, 'ops/pg-start.sh')], { stdio: ['ignore', 'ignore', 'inherit'] });
    execFileSync('bash', [path.join(root, 'ops/pg-createdb.sh'), DB, '--fresh'], { stdio: ['ignore', 'ignore', 'inherit'] });
  } catch (error) {
    rmSync(build, { recursive: true, force: true });
    releaseRunLock();
    throw error;
  }
  const inbox = await startCatcher(await freePort());
  const s3Dir = mkdtempSync(path.join(os.tmpdir(), 'layerbook-web-bench-s3-'));
  const s3 = await startS3Fake({ directory: s3Dir, port: await freePort(), bucket: 'layerbook' });
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...testDatabaseUrls(DB),
    NODE_ENV: 'production',
    HOST: '127.0.0.1',
    PORT: String(port),
    PUBLIC_URL: base,
    ROOT_DIR: build,
    SESSION_SECRET: 'web-bench-session-secret-that-is-long-enough',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(inbox.port),
    LOG_LEVEL: 'warn',
    METRICS_PORT: '0',
    NODE_NO_WARNINGS: '1',
    S3_ENDPOINT: s3.endpoint,
    S3_BUCKET: 'layerbook',
  };
  const closeHelpers = async () => {
    await inbox.close();
    await s3.stop();
    rmSync(s3Dir, { recursive: true, force: true });
    rmSync(build, { recursive: true, force: true });
    releaseRunLock();
  };
  try {
    execFileSync('node', [path.join(build, 'server/dist/seed/run.js')], { cwd: build, env, stdio: ['ignore', 'ignore', 'inherit'] });
  } catch (error) {
    await closeHelpers();
    throw error;
  }
  const child = spawn('node', [path.join(build, 'server/dist/main.js')], { cwd: build, env, stdio: ['ignore', 'ignore', 'inherit'] });
  let stopped = false;
  const stop = async () => {
    if (stopped) return;
    stopped = true;
    if (child.exitCode === null && child.signalCode === null) {
      const exited = new Promise((r) => child.once('exit', r));
      process.kill(child.pid!, 'SIGTERM');
      const killer = setTimeout(() => child.exitCode === null && process.kill(child.pid!, 'SIGKILL'), 15_000);
      await exited;
      clearTimeout(killer);
    }
    await closeHelpers();
  };
  try {
    await waitUntilUp(base, child);
  } catch (error) {
    await stop();
    throw error;
  }
  return { base, pid: child.pid!, inbox, stop };
}

/** The cookie pairs (`name=value`) of an answer, joined with those already held. */
function cookiesFrom(res: Response, held = ''): string {
  const jar = new Map(held ? held.split('; ').map((c) => [c.split('=')[0], c] as const) : []);
  for (const set of res.headers.getSetCookie()) {
    const pair = set.split(';')[0];
    jar.set(pair.split('=')[0], pair);
  }
  return [...jar.values()].join('; ');
}

/**
 * The production server marks its cookies Secure and trusts one proxy: the API calls say they came
 * through a TLS proxy, as they do for real users, so the session cookie is issued on plain loopback.
 */
const PROXIED = { 'x-forwarded-proto': 'https' };

async function call(base: string, url: string, cookie: string, csrf?: string, body?: unknown): Promise<{ res: Response; cookie: string }> {
  const res = await fetch(`${base}${url}`, {
    method: body === undefined ? 'GET' : 'POST',
    headers: {
      ...PROXIED,
      cookie,
      ...(csrf ? { 'x-csrf-token': csrf } : {}),
      ...(body === undefined ? {} : { 'content-type': 'application/json' }),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${url}: ${res.status} ${await res.text()}`);
  return { res, cookie: cookiesFrom(res, cookie) };
}

/** A staff member signed in with a password: the Cookie header the browser would send. */
export async function staffCookie(base: string, email: string, password: string): Promise<string> {
  const first = await call(base, '/api/auth/session', '');
  const { csrfToken } = (await first.res.json()) as { csrfToken: string };
  const signedIn = await call(base, '/api/auth/signin', first.cookie, csrfToken, { email, password });
  const answer = (await signedIn.res.json()) as { user: unknown };
  if (!answer.user) throw new Error(`signing in ${email} asked for more than a password: ${JSON.stringify(answer)}`);
  return signedIn.cookie;
}

/** A client signed in through the e-mailed one-time link: the Cookie header and the client's first proposal. */
export async function clientSession(server: WebServer, email: string): Promise<{ cookie: string; proposalId: string }> {
  const first = await call(server.base, '/api/portal/session', '');
  const { csrfToken } = (await first.res.json()) as { csrfToken: string };
  await call(server.base, '/api/portal/auth/link', first.cookie, csrfToken, { email });
  const mail = await server.inbox.waitFor(email, 30_000);
  const token = new URL(firstLink(mail)).searchParams.get('token');
  if (!token) throw new Error(`the sign-in e-mail to ${email} carries no token`);
  const redeemed = await call(server.base, '/api/portal/auth/redeem', first.cookie, csrfToken, { token });
  const list = await call(server.base, '/api/portal/proposals', redeemed.cookie);
  const { items } = (await list.res.json()) as { items: Array<{ latest: { id: string } }> };
  if (items.length === 0) throw new Error(`${email} has no proposal in the demo firm`);
  return { cookie: redeemed.cookie, proposalId: items[0].latest.id };
}
