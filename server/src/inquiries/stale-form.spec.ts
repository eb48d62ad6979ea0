import express, { type RequestHandler } from 'express';
import request from 'supertest';
import { publicInquiryBody } from '../testing/public-form';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { publicFormPost } from './public-routes';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

const HOUR = 60 * 60 * 1000;

async function firmWithSlug(name: string) {
  const owner = await signUpFirm(t.app, name);
  const firm = await owner.agent.get('/api/firm');
  return { ...owner, slug: firm.body.slug as string };
}

/** Runs `send` with the clock at `start + ms` (the stamps' age), never by sleeping. */
async function at<T>(start: number, ms: number, send: () => Promise<T>): Promise<T> {
  t.setNow(new Date(start + ms));
  try {
    return await send();
  } finally {
    t.setNow(null);
  }
}

const post = (slug: string, body: Record<string, unknown>) => request(t.app).post(`/api/public/firms/${slug}/inquiries`).send(body);
const stampAt = async (slug: string) => (await request(t.app).get(`/api/public/firms/${slug}`)).body.formStamp as string;

describe('a public form renewed after its stamp expired', () => {
  it('files the inquiry of a prospect who sends again at once, as the page tells them to', async () => {
    const a = await firmWithSlug('Stale Renew Plaster');
    const start = Date.now();
    const body = await publicInquiryBody(t.app, a.slug);
    // The tab was left open for three hours: the stamp is refused as expired (400 startedAt).
    const stale = await at(start, 3 * HOUR, () => post(a.slug, body));
    expect([stale.status, stale.body.errors[0].field]).toEqual([400, 'startedAt']);
    // The page fetches a fresh stamp, keeps the refused one as renewedFrom, and the prospect clicks Send a second later.
    const fresh = await at(start, 3 * HOUR, () => stampAt(a.slug));
    const again = await at(start, 3 * HOUR + 1000, () => post(a.slug, { ...body, startedAt: fresh, renewedFrom: body.startedAt }));
    expect(again.status).toBe(201);
    expect((await a.agent.get('/api/inquiries')).body.items).toHaveLength(1);
  });

  it('gives a bot no way around the fill time: a young, forged, spent or day-old stamp vouches for nothing', async () => {
    const a = await firmWithSlug('Renew Bot Plaster');
    const start = Date.now();
    const old = await stampAt(a.slug);
    const body = await publicInquiryBody(t.app, a.slug);
    const sendAt = async (ms: number, renewedFrom: string) => {
      const fresh = await at(start, ms, () => stampAt(a.slug));
      return at(start, ms + 1000, () => post(a.slug, { ...body, startedAt: fresh, renewedFrom }));
    };
    const filed = async () => ((await a.agent.get('/api/inquiries')).body.items as unknown[]).length;
    // Not expired yet (fetched together with the fresh one), or not signed by us: sent too fast, dropped.
    expect((await sendAt(1000, await stampAt(a.slug))).status).toBe(201);
    expect((await sendAt(3 * HOUR, `${old.slice(0, -4)}AAAA`)).status).toBe(201);
    expect(await filed()).toBe(0);
    // A real expired stamp vouches once: the first send is filed, its replay with another fresh stamp is not.
    expect((await sendAt(3 * HOUR, old)).status).toBe(201);
    expect(await filed()).toBe(1);
    expect((await sendAt(3 * HOUR, old)).status).toBe(201);
    // Older than the day a spent stamp is remembered: it may have been spent and forgotten.
    expect((await sendAt(30 * HOUR, await stampAt(a.slug))).status).toBe(201);
    expect(await filed()).toBe(1);
  });

  it('files the plain (no-script) post of a renewed form, which carries renewedFrom as a hidden field', async () => {
    const a = await firmWithSlug('Renew Plain Plaster');
    const start = Date.now();
    const body = await publicInquiryBody(t.app, a.slug);
    const rendered: Array<{ values: Record<string, string>; errors: Array<{ field: string }> }> = [];
    const renderPortal: RequestHandler = (_req, res) => {
      rendered.push(res.locals['inquiryForm'] as (typeof rendered)[number]);
      res.send('form again');
    };
    const passThrough: RequestHandler = (_req, _res, next) => next();
    const host = express().use('/portal', publicFormPost(t.ctx, passThrough, renderPortal));
    const asPosted = (fields: Record<string, unknown>) =>
      Object.fromEntries(Object.entries({ ...fields, consent: 'on' }).map(([name, value]) => [name, String(value)])) as Record<
        string,
        string
      >;
    const stale = await at(start, 3 * HOUR, () => request(host).post(`/portal/f/${a.slug}/inquiry`).type('form').send(asPosted(body)));
    expect(stale.status).toBe(400);
    // The page renders the refusal with the prospect's words, the refused stamp among them (inquiry-page.ts moves it to renewedFrom).
    expect(rendered[0]?.values['startedAt']).toBe(body.startedAt);
    expect(rendered[0]?.errors.map((e) => e.field)).toEqual(['startedAt']);
    const fresh = await at(start, 3 * HOUR, () => stampAt(a.slug));
    const again = await at(start, 3 * HOUR + 1000, () =>
      request(host)
        .post(`/portal/f/${a.slug}/inquiry`)
        .type('form')
        .send(asPosted({ ...body, startedAt: fresh, renewedFrom: body.startedAt })),
    );
    expect([again.status, again.headers['location']]).toEqual([303, `/portal/f/${a.slug}/inquiry/thanks`]);
    expect((await a.agent.get('/api/inquiries')).body.items).toHaveLength(1);
  });
});
