import type { Request, RequestHandler, Response } from 'express';
import { LRUCache } from 'lru-cache';
import type { AppContext } from '../context';
import { sessionCookieName } from '../http/session';
import { FORM_STAMP_SHAPE, formStamp, isFormStamp } from '../inquiries/public-form';
import { KEEP_RENDERED_PAGE_KEY, NONCE_PLACEHOLDER, type KeepRenderedPage } from '../../../projects/shared/ssr/rendered-page';

/**
 * Anonymous pages that are the same for every visitor — the sign-in pages and a firm's public
 * inquiry form — are rendered once and kept a few seconds (`ANONYMOUS_PAGE_CACHE_MS`) for the next
 * visitor with the same address and Accept-Language, instead of ~10–20 ms of Angular work each.
 * Each answer still gets its own CSP nonce and, on the form, its own freshly signed form stamp
 * (the stamps the kept page holds are swapped), so a kept page behaves exactly like a new render.
 * Only for visitors without a session cookie, only 200 answers that set no cookie, never for a
 * request that asks for a fresh answer (`Cache-Control: no-cache`, as a hard reload sends).
 * The app side hands the page over through `res.locals.keepRenderedPage`
 * (projects/shared/ssr/rendered-page.ts).
 */
const KEPT_PAGES = [/^\/sign-in$/, /^\/portal\/sign-in$/, /^\/portal\/f\/[^/]+\/inquiry$/];

interface KeptPage {
  readonly status: number;
  readonly headers: readonly (readonly [string, string])[];
  readonly html: string;
  /** The form stamps in `html`, each swapped for a fresh one per answer. */
  readonly stamps: readonly string[];
}

/** At most this much page text is kept (a page is 70–130 kB). */
const MAX_KEPT_CHARS = 8_000_000;

export function anonymousPageCache(ctx: AppContext): RequestHandler {
  const ttl = ctx.config.ANONYMOUS_PAGE_CACHE_MS;
  if (ttl === 0) return (_req, _res, next) => next();
  const secret = ctx.config.SESSION_SECRET;
  const sessionCookie = `${sessionCookieName(ctx.config)}=`;
  const kept = new LRUCache<string, KeptPage>({
    maxSize: MAX_KEPT_CHARS,
    sizeCalculation: (page) => page.html.length,
    ttl,
    // Our clock, so a test's injected time ages pages as it does everything else. Read on every
    // check: with the default 1 ms resolution lru-cache reuses its last reading for a real
    // millisecond, which hides a jump of the injected clock on a fast machine (CI caught it).
    perf: { now: () => ctx.now().getTime() },
    ttlResolution: 0,
  });
  const keepable = (req: Request) =>
    (req.method === 'GET' || req.method === 'HEAD') &&
    !(req.headers.cookie ?? '').includes(sessionCookie) &&
    KEPT_PAGES.some((page) => page.test(req.path));

  return (req, res, next) => {
    if (!keepable(req)) return next();
    const key = `${req.originalUrl}\n${req.headers['accept-language'] ?? ''}`;
    const page = wantsFresh(req) ? undefined : kept.get(key);
    if (page) return send(res, page, secret, ctx.now());
    const keep: KeepRenderedPage = (rendered) => {
      if (rendered.status !== 200 || rendered.setsCookie) return;
      const stamps = [...new Set(rendered.html.match(FORM_STAMP_SHAPE) ?? [])].filter((text) => isFormStamp(secret, text));
      kept.set(key, { status: rendered.status, headers: rendered.headers, html: rendered.html, stamps });
    };
    res.locals[KEEP_RENDERED_PAGE_KEY] = keep;
    next();
  };
}

function wantsFresh(req: Request): boolean {
  return /no-cache|max-age=0/.test(req.headers['cache-control'] ?? '') || req.headers.pragma === 'no-cache';
}

function send(res: Response, page: KeptPage, secret: string, now: Date): void {
  let html = page.html;
  for (const stamp of page.stamps) html = html.replaceAll(stamp, formStamp(secret, now));
  res.status(page.status);
  for (const [name, value] of page.headers) res.setHeader(name, value);
  res.setHeader('cache-control', 'no-store');
  res.send(html.replaceAll(NONCE_PLACEHOLDER, res.locals['cspNonce'] as string));
}
