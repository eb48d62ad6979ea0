import express, { type RequestHandler } from 'express';
import { IncomingMessage, ServerResponse } from 'node:http';
import { Pool } from 'pg';
import request from 'supertest';
import { createApp } from '../app';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';
import { type ApiDispatch, apiDispatcher, withApiDispatch } from './api-dispatch';

// light-my-request needs `cookie` 2 (an ES module jest's CommonJS runtime cannot require; Node
// itself can) only for its `cookies` option, which the dispatcher never uses.
jest.mock('../../../node_modules/light-my-request/node_modules/cookie/dist/index.js', () => ({
  stringifySetCookie: () => {
    throw new Error('not used by the dispatcher');
  },
}));

/**
 * The host side of in-process rendering, without the built apps (CI's jest stage has none): a
 * stand-in page handler makes the API calls the real pages make (the portal's and the staff
 * session, the public firm) through `res.locals.apiDispatch`, as the apps' server backend does.
 */
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

const sessionRows = async () => Number((await owner.query<{ n: string }>('select count(*) as n from session')).rows[0].n);

async function firmSlug(firmId: string): Promise<string> {
  const client = await owner.connect();
  try {
    await client.query('begin');
    await client.query(`select set_config('app.tenant_id', $1, true)`, [firmId]);
    const { rows } = await client.query<{ slug: string }>('select slug from firms where id = $1', [firmId]);
    await client.query('commit');
    return rows[0].slug;
  } finally {
    client.release();
  }
}

interface Seen {
  status: number;
  setCookie: string[];
  body: unknown;
}

/** A page handler calling `urls` in-process with the visitor's cookie (as the apps' API interceptor forwards it). */
function stubPage(urls: (req: Parameters<RequestHandler>[0]) => string[], seen: Seen[]): RequestHandler {
  return (req, res, next) => {
    const dispatch = res.locals['apiDispatch'] as ApiDispatch;
    const cookie = req.headers.cookie;
    Promise.all(urls(req).map((url) => dispatch({ method: 'GET', url, headers: cookie ? { cookie } : {} })))
      .then((answers) => {
        for (const a of answers) {
          const setCookie = a.headers['set-cookie'];
          seen.push({
            status: a.statusCode,
            setCookie: setCookie === undefined ? [] : [setCookie].flat().map(String),
            body: JSON.parse(a.payload),
          });
        }
        res.set('cache-control', 'no-store').type('html').send('<!doctype html><p>page</p>');
      })
      .catch(next);
  };
}

describe('API calls of a server render, dispatched in-process', () => {
  it('answers as over HTTP: status, no-store, JSON body; only /api/ paths are dispatched', async () => {
    const dispatch = apiDispatcher(t.app);
    const health = await dispatch({ method: 'GET', url: '/api/health', headers: {} });
    expect(health.statusCode).toBe(200);
    expect(health.headers['cache-control']).toBe('no-store');
    expect(JSON.parse(health.payload)).toEqual({ status: 'ok' });
    const missing = await dispatch({ method: 'GET', url: '/api/no-such-thing', headers: {} });
    expect(missing.statusCode).toBe(404);
    expect(String(missing.headers['content-type'])).toContain('application/problem+json');
    await expect(dispatch({ method: 'GET', url: '/today', headers: {} })).rejects.toThrow(/Only the API/);
    // Express's shared prototypes stay Node's: real requests of the process are untouched.
    expect(Object.getPrototypeOf(express.request)).toBe(IncomingMessage.prototype);
    expect(Object.getPrototypeOf(express.response)).toBe(ServerResponse.prototype);
    expect((await request(t.app).get('/api/health')).body).toEqual({ status: 'ok' });
  });

  it('an anonymous render writes no session row and sets no session cookie', async () => {
    const { firmId } = await signUpFirm(t.app);
    const slug = await firmSlug(firmId);
    const seen: Seen[] = [];
    const page = stubPage(() => ['/api/portal/session', '/api/auth/session', `/api/public/firms/${slug}`], seen);
    const app = createApp(t.ctx, { admin: withApiDispatch(page), portal: withApiDispatch(page) });
    const before = await sessionRows();

    for (const url of ['/portal/sign-in', `/portal/f/${slug}/inquiry`, '/sign-in']) {
      const res = await request(app).get(url);
      expect(res.status).toBe(200);
      expect(res.headers['set-cookie']).toBeUndefined();
    }
    expect(await sessionRows()).toBe(before);
    expect(seen).toHaveLength(9);
    for (const answer of seen) {
      expect(answer.status).toBe(200);
      // express-session's cookie (lb.sid) never; the anonymous CSRF cookie stays with the server too.
      expect(answer.setCookie.filter((c) => c.startsWith('lb.sid=') || c.startsWith('__Host-lb.sid='))).toEqual([]);
    }
    // Nobody is signed in: the staff session answers (one per page) say so.
    const users = seen.map((a) => a.body as { user?: unknown }).filter((body) => 'user' in body);
    expect(users.map((body) => body.user)).toEqual([null, null, null]);
  });

  it('a signed-in render reaches the API as the visitor (their cookie), and adds no session row', async () => {
    const { agent, email } = await signUpFirm(t.app);
    const cookie = (await agent.get('/api/auth/session')).request.cookies as unknown as string | undefined;
    const seen: Seen[] = [];
    const page = stubPage(() => ['/api/auth/session'], seen);
    const app = createApp(t.ctx, { admin: withApiDispatch(page), portal: withApiDispatch(page) });
    const before = await sessionRows();
    const res = await request(app)
      .get('/today')
      .set('cookie', cookie ?? '');
    expect(res.status).toBe(200);
    expect(await sessionRows()).toBe(before);
    expect(seen[0]?.body).toMatchObject({ user: { email } });
  });
});
