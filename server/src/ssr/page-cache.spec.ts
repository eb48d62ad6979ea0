import type { RequestHandler } from 'express';
import request from 'supertest';
import { KEEP_RENDERED_PAGE_KEY, NONCE_PLACEHOLDER, type KeepRenderedPage } from '../../../projects/shared/ssr/rendered-page';
import { createApp } from '../app';
import { isFormStamp } from '../inquiries/public-form';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { type ApiDispatch, withApiDispatch } from './api-dispatch';

// light-my-request needs `cookie` 2 only for its `cookies` option, which the dispatcher never uses
// (see api-dispatch.spec.ts).
jest.mock('../../../node_modules/light-my-request/node_modules/cookie/dist/index.js', () => ({
  stringifySetCookie: () => {
    throw new Error('not used by the dispatcher');
  },
}));

/**
 * Anonymous pages kept for the next visitor, without the built apps: a stand-in renderer does what
 * projects/shared/ssr/ssr-app.ts does — renders with the nonce's placeholder, hands the page to
 * `res.locals.keepRenderedPage`, sends it with the answer's nonce — and counts its renders. The form
 * carries the stamp of the public firm answer (fetched in-process), as the real form does.
 */
let t: TestServer;
let slug: string;
beforeAll(async () => {
  t = await startTestServer();
  const { agent } = await signUpFirm(t.app, 'Kept Page Plaster');
  slug = ((await agent.get('/api/firm')).body as { slug: string }).slug;
});
afterAll(() => t.stop());
afterEach(() => t.setNow(null));

const renders: string[] = [];
beforeEach(() => (renders.length = 0));

const stubRenderer: RequestHandler = (req, res, next) => {
  renders.push(req.originalUrl);
  const dispatch = res.locals['apiDispatch'] as ApiDispatch;
  const formSlug = /^\/portal\/f\/([^/]+)\/inquiry$/.exec(req.originalUrl.split('?')[0])?.[1];
  const firm = formSlug ? dispatch({ method: 'GET', url: `/api/public/firms/${formSlug}`, headers: {} }) : Promise.resolve(null);
  firm
    .then((answer) => {
      const status = answer && answer.statusCode !== 200 ? 404 : 200;
      const stamp = answer?.statusCode === 200 ? (JSON.parse(answer.payload) as { formStamp: string }).formStamp : '';
      const language = req.headers['accept-language']?.startsWith('es') ? 'es' : 'en';
      const html =
        `<!doctype html><html lang="${language}"><script nonce="${NONCE_PLACEHOLDER}">var stamp = ${JSON.stringify(stamp)};</script>` +
        `<form><input type="hidden" name="startedAt" value="${stamp}"></form><p>render ${renders.length}</p></html>`;
      const setsCookie = req.query['cookie'] === 'yes';
      (res.locals[KEEP_RENDERED_PAGE_KEY] as KeepRenderedPage | undefined)?.({
        status,
        headers: [['content-type', 'text/html; charset=utf-8']],
        setsCookie,
        html,
      });
      if (setsCookie) res.cookie('seen', 'yes');
      res
        .status(status)
        .set('cache-control', 'no-store')
        .type('html')
        .send(html.replaceAll(NONCE_PLACEHOLDER, res.locals['cspNonce'] as string));
    })
    .catch(next);
};

const appWith = (overrides: Partial<TestServer['ctx']['config']> = {}) =>
  createApp(
    { ...t.ctx, config: { ...t.ctx.config, ...overrides } },
    { admin: withApiDispatch(stubRenderer), portal: withApiDispatch(stubRenderer) },
  );

/** The answer's nonce from its CSP header, and whether the page carries exactly that one. */
function nonceOf(res: request.Response): string {
  const nonce = /'nonce-([^']+)'/.exec(String(res.headers['content-security-policy']))?.[1] ?? '';
  expect(nonce).not.toBe('');
  expect(res.text).toContain(`nonce="${nonce}"`);
  expect(res.text).not.toContain(NONCE_PLACEHOLDER);
  return nonce;
}

const stampsIn = (html: string) => [...new Set(html.match(/\d{13}\.[A-Za-z0-9_-]{16}\.[A-Za-z0-9_-]{43}/g) ?? [])];

describe('anonymous pages kept for the next visitor', () => {
  it('renders a sign-in page once; each answer gets its own nonce, no-store, and sets no cookie', async () => {
    const app = appWith();
    const first = await request(app).get('/portal/sign-in');
    const second = await request(app).get('/portal/sign-in');
    const staff = await request(app).get('/sign-in');
    expect([first.status, second.status, staff.status]).toEqual([200, 200, 200]);
    expect(renders).toEqual(['/portal/sign-in', '/sign-in']);
    expect(nonceOf(first)).not.toBe(nonceOf(second));
    expect(second.text.replace(/nonce="[^"]+"/g, '')).toBe(first.text.replace(/nonce="[^"]+"/g, ''));
    for (const res of [first, second]) {
      expect(res.headers['cache-control']).toBe('no-store');
      expect(res.headers['content-type']).toBe('text/html; charset=utf-8');
      expect(res.headers['set-cookie']).toBeUndefined();
    }
    const head = await request(app).head('/portal/sign-in');
    expect(head.status).toBe(200);
    expect(renders).toHaveLength(2);
  });

  it('gives each visitor of the public form a fresh, valid form stamp of the time it is shown', async () => {
    const app = appWith();
    t.setNow(new Date('2026-12-01T10:00:00Z'));
    const first = await request(app).get(`/portal/f/${slug}/inquiry`);
    t.setNow(new Date('2026-12-01T10:00:03Z'));
    const second = await request(app).get(`/portal/f/${slug}/inquiry`);
    expect(renders).toHaveLength(1);
    const [a] = stampsIn(first.text);
    const [b] = stampsIn(second.text);
    expect(stampsIn(second.text)).toHaveLength(1);
    expect(a).not.toBe(b);
    expect(b.split('.')[0]).toBe(String(Date.parse('2026-12-01T10:00:03Z')));
    expect(isFormStamp(t.ctx.config.SESSION_SECRET, b)).toBe(true);
    // Every copy on the page (the script's and the no-script form's) is the same new stamp.
    expect(second.text.split(b)).toHaveLength(3);
    // The kept stamp's one inquiry is not handed to anybody else.
    expect(second.text).not.toContain(a);
  });

  it('renders again after the time set, for a hard reload, and per address and language', async () => {
    const app = appWith({ ANONYMOUS_PAGE_CACHE_MS: 5000 });
    t.setNow(new Date('2026-12-01T10:00:00Z'));
    await request(app).get('/portal/sign-in');
    t.setNow(new Date('2026-12-01T10:00:04Z'));
    await request(app).get('/portal/sign-in');
    expect(renders).toHaveLength(1);
    t.setNow(new Date('2026-12-01T10:00:06Z'));
    await request(app).get('/portal/sign-in');
    expect(renders).toHaveLength(2);
    await request(app).get('/portal/sign-in').set('cache-control', 'no-cache');
    expect(renders).toHaveLength(3);
    await request(app).get('/portal/sign-in?next=%2Fportal%2Finvoices');
    const spanish = await request(app).get('/portal/sign-in').set('accept-language', 'es-MX,es;q=0.9');
    expect(spanish.text).toContain('lang="es"');
    expect(renders).toHaveLength(5);
    // The reloaded page is the one kept since.
    await request(app).get('/portal/sign-in');
    expect(renders).toHaveLength(5);
  });

  it('never keeps a signed-in visitor’s page, other pages, a page that is not 200 or sets a cookie', async () => {
    const app = appWith();
    for (let i = 0; i < 2; i++) {
      await request(app).get('/portal/sign-in').set('cookie', 'lb.sid=s%3Asomebody.signature');
      await request(app).get('/today');
      await request(app).get('/portal/f/no-such-firm-here/inquiry');
      await request(app).get('/sign-in?cookie=yes');
      await request(app).get('/portal/sign-in/link?token=abc');
    }
    expect(renders).toHaveLength(10);
  });

  it('keeps nothing when the time is 0', async () => {
    const app = appWith({ ANONYMOUS_PAGE_CACHE_MS: 0 });
    await request(app).get('/portal/sign-in');
    await request(app).get('/portal/sign-in');
    expect(renders).toHaveLength(2);
  });
});
