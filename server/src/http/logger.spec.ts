import { Writable } from 'node:stream';
import express from 'express';
import request from 'supertest';
import { createLogger, requestLogging, safeUrl, type LoggerSettings } from './logger';

const SESSION_COOKIE = 'lb.sid=s%3AsessionSecretValue123.signature456';
const CSRF_TOKEN = 'csrf-5f9c1e7a2b8d4c6e';
const PASSWORD = 'limewash-password-never-logged';
const LINK_TOKEN = 'Zm9vYmFyYmF6cXV4MTIzNDU2Nzg5MGFiY2RlZmdoaWprbG0';
const INVITE_TOKEN = 'aW52aXRhdGlvbnRva2VudmFsdWUxMjM0NTY3ODkwYWJjZGVm';
const RESET_TOKEN = 'cmVzZXR0b2tlbnZhbHVlMTIzNDU2Nzg5MGFiY2RlZmdoaWpr';
const SECRETS = [SESSION_COOKIE, 'sessionSecretValue123', CSRF_TOKEN, PASSWORD, LINK_TOKEN, INVITE_TOKEN, RESET_TOKEN, 'set-cookie-secret'];

/** An in-memory log destination. */
function memory(): { stream: Writable; text: () => string } {
  const chunks: string[] = [];
  const stream = new Writable({
    write(chunk: Buffer, _encoding, done) {
      chunks.push(chunk.toString());
      done();
    },
  });
  return { stream, text: () => chunks.join('') };
}

/** A small app shaped like ours: request logging first, routes that see every kind of secret. */
function appLoggingTo(settings: LoggerSettings, stream: Writable): express.Express {
  const app = express();
  app.use(requestLogging(createLogger(settings, stream)));
  app.use(express.json());
  app.post('/api/auth/signin', (req, res) => {
    // A careless hand-written log line: redaction still removes the password and token.
    req.log.warn({ body: req.body, headers: req.headers }, 'sign-in refused');
    res.setHeader('set-cookie', 'lb.sid=set-cookie-secret; HttpOnly');
    res.status(401).json({ title: 'Wrong e-mail or password' });
  });
  app.get('/api/auth/invitations/:token', (_req, res) => {
    res.json({ ok: true });
  });
  app.get('/api/portal/auth/link', (_req, res) => {
    res.json({ ok: true });
  });
  app.post('/api/auth/password-reset/complete', (req, res) => {
    req.log.info({ request: { body: req.body } }, 'reset');
    res.status(204).end();
  });
  return app;
}

async function sendEverySecret(app: express.Express): Promise<void> {
  await request(app)
    .post('/api/auth/signin')
    .set('cookie', SESSION_COOKIE)
    .set('x-csrf-token', CSRF_TOKEN)
    .set('referer', `http://localhost:4300/reset-password?token=${RESET_TOKEN}`)
    .send({ email: 'owner@fernhollow.example', password: PASSWORD });
  await request(app).get(`/api/portal/auth/link?token=${LINK_TOKEN}&next=%2Fportal%2Fproposals%2F7`).set('cookie', SESSION_COOKIE);
  await request(app).get(`/api/auth/invitations/${INVITE_TOKEN}`);
  await request(app)
    .post('/api/auth/password-reset/complete')
    .set('x-csrf-token', CSRF_TOKEN)
    .send({ token: RESET_TOKEN, password: PASSWORD });
}

describe('request logs', () => {
  it.each<[string, LoggerSettings]>([
    ['production (JSON)', { NODE_ENV: 'production', LOG_LEVEL: 'info' }],
    ['test (JSON)', { NODE_ENV: 'test', LOG_LEVEL: 'info' }],
    ['development (pino-pretty)', { NODE_ENV: 'development', LOG_LEVEL: 'info' }],
  ])('carry no cookie, CSRF token, password or one-time token in %s', async (_mode, settings) => {
    const log = memory();
    await sendEverySecret(appLoggingTo(settings, log.stream));
    const text = log.text();
    expect(text).toContain('/api/auth/signin');
    expect(text).toContain('/api/portal/auth/link?token=[redacted]&next=%2Fportal%2Fproposals%2F7');
    expect(text).toContain('/api/auth/invitations/[redacted]');
    expect(text).toContain('owner@fernhollow.example');
    for (const secret of SECRETS) {
      expect(text).not.toContain(secret);
    }
  });

  it('are JSON lines in production and one readable line each in development', async () => {
    const json = memory();
    await sendEverySecret(appLoggingTo({ NODE_ENV: 'production', LOG_LEVEL: 'info' }, json.stream));
    const lines = json.text().trim().split('\n');
    expect(lines.length).toBeGreaterThanOrEqual(4);
    for (const line of lines) expect(() => JSON.parse(line) as unknown).not.toThrow();

    const pretty = memory();
    await sendEverySecret(appLoggingTo({ NODE_ENV: 'development', LOG_LEVEL: 'info' }, pretty.stream));
    const prettyLines = pretty.text().trim().split('\n');
    expect(prettyLines).toHaveLength(lines.length);
    expect(prettyLines[0]).toMatch(/^\[\d\d:\d\d:\d\d\.\d{3}\] (INFO|WARN)/);
    expect(pretty.text()).not.toContain('"level":');
  });

  it('give every request an id, bind it to lines logged by hand, and log a failed answer as an error', async () => {
    const log = memory();
    const app = express();
    app.use(requestLogging(createLogger({ NODE_ENV: 'production', LOG_LEVEL: 'info' }, log.stream)));
    app.get('/api/broken', (req, res) => {
      req.log.warn('about to fail');
      res.status(503).json({ title: 'Down' });
    });
    app.get('/portal/page', (_req, res) => {
      res.send('<p>page</p>');
    });
    const given = await request(app).get('/api/broken').set('x-request-id', 'trace-7');
    expect(given.headers['x-request-id']).toBe('trace-7');
    const fresh = await request(app).get('/portal/page');
    expect(fresh.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    const lines = log
      .text()
      .trim()
      .split('\n')
      .map(
        (line) =>
          JSON.parse(line) as {
            level: number;
            msg: string;
            reqId?: string;
            req?: { id: string; url: string };
            res?: { statusCode: number };
          },
      );
    // Pages are not logged: two lines, both from the API request.
    expect(lines).toHaveLength(2);
    expect(lines[0]).toMatchObject({ level: 40, msg: 'about to fail', reqId: 'trace-7' });
    expect(lines[1]).toMatchObject({
      level: 50,
      msg: 'request errored',
      reqId: 'trace-7',
      req: { id: 'trace-7', url: '/api/broken' },
      res: { statusCode: 503 },
    });
  });

  it.each<[string, LoggerSettings['NODE_ENV']]>([
    ['a JSON line', 'production'],
    ['a readable line', 'development'],
  ])('log a request the caller gave up on as aborted (%s)', async (_what, env) => {
    const log = memory();
    const app = express();
    app.use(requestLogging(createLogger({ NODE_ENV: env, LOG_LEVEL: 'info' }, log.stream)));
    let answered: () => void = () => undefined;
    const late = new Promise<void>((resolve) => (answered = resolve));
    app.get('/api/slow', (_req, res) => {
      setTimeout(() => {
        res.json({ late: true });
        answered();
      }, 300);
    });
    await expect(request(app).get('/api/slow').timeout(50)).rejects.toThrow();
    await late;
    const lines = log.text().trim().split('\n');
    expect(lines).toHaveLength(1);
    if (env === 'development') {
      expect(lines[0]).toMatch(/WARN.*GET \/api\/slow aborted after \d+ms/);
      return;
    }
    expect(JSON.parse(lines[0])).toMatchObject({ level: 40, msg: 'request aborted', req: { url: '/api/slow' } });
  });
});

describe('safeUrl', () => {
  it.each([
    ['/api/jobs?cursor=abc', '/api/jobs?cursor=abc'],
    ['/portal/sign-in/link?token=abc&next=%2Fportal%2Fx', '/portal/sign-in/link?token=[redacted]&next=%2Fportal%2Fx'],
    ['/reset-password?Token=abc', '/reset-password?Token=[redacted]'],
    ['/x?csrfToken=abc&password=p&a=1', '/x?csrfToken=[redacted]&password=[redacted]&a=1'],
    ['/x?%74oken=abc', '/x?%74oken=[redacted]'],
    ['/api/auth/invitations/abc?x=1', '/api/auth/invitations/[redacted]?x=1'],
    ['/api/auth/invitations/accept', '/api/auth/invitations/accept'],
    ['/api/inquiries', '/api/inquiries'],
  ])('logs %s as %s', (url, logged) => {
    expect(safeUrl(url)).toBe(logged);
  });
});
