import { createServer } from 'node:net';
import type { AddressInfo } from 'node:net';
import { Pool } from 'pg';
import request from 'supertest';
import { createApp } from '../app';
import type { AppContext } from '../context';
import { startTestServer, TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';
import { READY_CHECK_TIMEOUT_MS } from './health-routes';

/** A loopback port nothing listens on: bound, then let go. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
  const { port } = server.address() as AddressInfo;
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

/** A queue as the routes see it, without pg-boss: readiness then reads pg-boss's tables through the web pool. */
const bareQueue = { send: () => Promise.resolve() };

describe('health probes', () => {
  let t: TestServer;
  let owner: Pool;
  beforeAll(async () => {
    t = await startTestServer();
    owner = new Pool({ connectionString: testDatabaseUrls().DATABASE_OWNER_URL, max: 1 });
  });
  afterAll(async () => {
    await owner.end();
    await t.stop();
  });

  const sessions = async () => Number((await owner.query<{ n: string }>('select count(*) as n from session')).rows[0].n);

  it('answers /healthz without a cookie, a session or the database', async () => {
    const before = await sessions();
    const res = await request(t.app).get('/healthz');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok' });
    expect(res.headers['set-cookie']).toBeUndefined();
    expect(res.headers['cache-control']).toBe('no-store');
    expect(await sessions()).toBe(before);
  });

  it('answers /readyz when the database and the job queue answer, writing no session', async () => {
    const before = await sessions();
    const res = await request(t.app).get('/readyz');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ready', checks: { database: 'ok', queue: 'ok' } });
    expect(res.headers['set-cookie']).toBeUndefined();
    expect(await sessions()).toBe(before);
  });

  it('reads the queue through the web pool when the process runs no pg-boss', async () => {
    const app = createApp({ ...t.ctx, queue: bareQueue });
    expect((await request(app).get('/readyz')).body).toEqual({ status: 'ready', checks: { database: 'ok', queue: 'ok' } });
  });

  it('answers 503 problem+json naming both when the database cannot be reached, while /healthz stays up', async () => {
    const pool = new Pool({
      host: '127.0.0.1',
      port: await closedPort(),
      user: 'nobody',
      database: 'nothing',
      connectionTimeoutMillis: 1000,
    });
    pool.on('error', () => undefined);
    const ctx: AppContext = { ...t.ctx, pool, queue: bareQueue };
    try {
      const app = createApp(ctx);
      const res = await request(app).get('/readyz');
      expect(res.status).toBe(503);
      expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
      expect(res.body).toMatchObject({
        status: 503,
        title: 'Not ready',
        detail: 'This server cannot reach the database and the job queue just now; send requests elsewhere.',
        checks: { database: 'unreachable', queue: 'unreachable' },
      });
      expect((await request(app).get('/healthz')).status).toBe(200);
    } finally {
      await pool.end();
    }
  });

  it('answers 503 naming the job queue when its pool is closed', async () => {
    const stopped = { send: () => Promise.resolve(), boss: { getDb: () => ({ executeSql: () => Promise.resolve(undefined) }) } };
    const app = createApp({ ...t.ctx, queue: stopped });
    const res = await request(app).get('/readyz');
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ detail: expect.stringContaining('the job queue'), checks: { database: 'ok', queue: 'unreachable' } });
  });

  it('gives up on a database that does not answer within the check time', async () => {
    const hanging = { query: () => new Promise(() => undefined) } as unknown as Pool;
    const app = createApp({ ...t.ctx, pool: hanging, queue: bareQueue });
    const started = Date.now();
    const res = await request(app).get('/readyz');
    expect(res.status).toBe(503);
    expect(res.body.checks).toEqual({ database: 'unreachable', queue: 'unreachable' });
    expect(Date.now() - started).toBeLessThan(READY_CHECK_TIMEOUT_MS + 1500);
  });

  it('keeps /api/health', async () => {
    expect((await request(t.app).get('/api/health')).body).toEqual({ status: 'ok' });
  });
});
