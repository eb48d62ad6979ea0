import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { newAgent, startTestServer, TestServer, uniqueEmail } from '../testing/harness';
import { PostgresRateLimitStore } from './rate-limit';

/** The count in the draft-8 `RateLimit` header: `"7-in-15min"; r=6; t=900` (IETF draft-ietf-httpapi-ratelimit-headers-08). */
const remaining = (header: string | undefined) => Number(/;\s*r=(\d+)/.exec(header ?? '')?.[1] ?? NaN);

describe('rate limits counted in PostgreSQL', () => {
  // Two instances on one database, as two web processes behind a load balancer. Limits no other
  // spec uses: the count's key carries the limit, so these counts are this file's own.
  let a: TestServer;
  let b: TestServer;
  beforeAll(async () => {
    const limits = { SIGN_IN_RATE_LIMIT: '7', PUBLIC_FORM_RATE_LIMIT: '3' };
    a = await startTestServer(limits);
    b = await startTestServer(limits);
  });
  afterAll(async () => {
    await a.stop();
    await b.stop();
  });

  it('holds one sign-in count for an address across two app instances', async () => {
    const first = await newAgent(a.app);
    const second = await newAgent(b.app);
    const answers = [];
    for (let i = 0; i < 8; i++) {
      const { agent, csrf } = i % 2 === 0 ? first : second;
      answers.push(
        await agent.post('/api/auth/signin').set('x-csrf-token', csrf()).send({ email: uniqueEmail(), password: 'whatever-123' }),
      );
    }
    // Each instance alone saw 4 attempts, under its limit of 7; together they saw 8.
    expect(answers.map((r) => r.status)).toEqual([401, 401, 401, 401, 401, 401, 401, 429]);
    expect(answers.map((r) => remaining(r.headers['ratelimit']))).toEqual([6, 5, 4, 3, 2, 1, 0, 0]);
    expect(answers[0].headers['ratelimit-policy']).toMatch(/^"7-in-15min"; q=7; w=900/);
    const refused = answers[7];
    expect(refused.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(refused.body).toMatchObject({ status: 429, title: 'Too many attempts' });
  });

  it('holds one public-form count for an address across two app instances', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) {
      const app = i % 2 === 0 ? a.app : b.app;
      statuses.push((await request(app).post('/api/public/firms/no-such-firm/inquiries').send({})).status);
    }
    expect(statuses).toEqual([400, 400, 400, 429]);
  });

  it('counts, uncounts and forgets a key in the shared table', async () => {
    const store = new PostgresRateLimitStore(a.ctx.pool, { name: 'spec', limit: 5, windowMs: 60_000 });
    const other = new PostgresRateLimitStore(b.ctx.pool, { name: 'spec', limit: 5, windowMs: 60_000 });
    const key = randomUUID();
    expect((await store.increment(key)).totalHits).toBe(1);
    const second = await other.increment(key);
    expect(second.totalHits).toBe(2);
    // The window's end, on the wall clock: about a minute away.
    expect(second.resetTime!.getTime() - Date.now()).toBeGreaterThan(55_000);
    await store.decrement(key);
    expect((await other.get(key))?.totalHits).toBe(1);
    await other.resetKey(key);
    expect(await store.get(key)).toBeUndefined();
  });

  it('keeps another limit for the same name on a count of its own', async () => {
    const key = randomUUID();
    const five = new PostgresRateLimitStore(a.ctx.pool, { name: 'spec', limit: 5, windowMs: 60_000 });
    const six = new PostgresRateLimitStore(a.ctx.pool, { name: 'spec', limit: 6, windowMs: 60_000 });
    await five.increment(key);
    await five.increment(key);
    expect((await six.increment(key)).totalHits).toBe(1);
  });
});
