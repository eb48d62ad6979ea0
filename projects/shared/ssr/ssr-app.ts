import { AngularNodeAppEngine, createNodeRequestHandler, isMainModule, writeResponseToNodeResponse } from '@angular/ssr/node';
import express, { type Express, type Response as ExpressResponse } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { randomBytes } from 'node:crypto';
import { API_DISPATCH_KEY } from './api-dispatch';
import { KEEP_RENDERED_PAGE_KEY, NONCE_PLACEHOLDER, type KeepRenderedPage } from './rendered-page';
import { scriptAfterFirstPaint } from './script-after-paint';

const NONCE_SHAPE = /^[A-Za-z0-9+/=_-]{8,128}$/;
/**
 * The host's CSP has `base-uri 'none'`, so browsers refuse a <base> element (and log a violation).
 * Asset URLs are absolute (`deployUrl`) and the router gets APP_BASE_HREF from DI instead.
 */
const BASE_ELEMENT = /<base href="[^"]*"\s*\/?>/i;
/**
 * Without <base>, font URLs in critical CSS inlined into <head> (`url("./media/…")`) would resolve
 * against the page's own path, and break on any deeper page (/portal/f/:slug/inquiry).
 */
const INLINED_MEDIA_URL = /url\((['"]?)\.\/media\//g;
/**
 * Files whose name stays the same from one release to the next: the service worker's script, its
 * manifest and helpers (admin), and the offline page it keeps (`index.csr.html`). Revalidated on
 * every use (ETag), so a release reaches the phones at once rather than in a year.
 */
// main-*.js: the build merges the first-load chunks into it but keeps the pre-merge hashed name, so the same name can carry new code.
const REVALIDATED =
  /[\\/](?:main-[A-Z0-9]+\.js|ngsw\.json|ngsw-worker\.js|safety-worker\.js|worker-basic\.min\.js|index\.csr\.html)(?:\.br|\.gz)?$/;

export interface SsrAppOptions {
  /** The built browser files (`dist/<app>/browser`), served as they are. */
  readonly browserDistFolder: string;
  /** Where the browser files are served from (`deployUrl` + `media/`), e.g. `/portal/media/`. */
  readonly mediaRoot: string;
  /** More request context for the app, taken from what the host put in `res.locals`. */
  readonly requestContext?: (res: ExpressResponse) => Record<string, unknown>;
  /** The status to answer with, when the host's context changes it (a refused form post). */
  readonly statusFor?: (rendered: number, res: ExpressResponse) => number;
}

/** One app's server-side rendering: static files, then Angular pages carrying the host's CSP nonce. */
export function createSsrApp(options: SsrAppOptions): Express {
  const app = express();
  app.disable('x-powered-by');
  // Pages are no-store and differ on every request (the nonce): hashing each for an ETag is wasted work.
  app.set('etag', false);
  const angularApp = new AngularNodeAppEngine();
  // The build leaves a brotli and a gzip copy beside each compressible file (ops/build/compress-assets.mjs):
  // the browser gets the smallest it accepts, with no compressing per request.
  const precompressed = (folder: string, serveStatic: expressStaticGzip.ExpressStaticGzipOptions['serveStatic']) =>
    expressStaticGzip(folder, { enableBrotli: true, orderPreference: ['br', 'gzip'], index: false, serveStatic });
  // Words change with each release under the same name: revalidated (ETag) rather than kept a year.
  app.use('/i18n', precompressed(`${options.browserDistFolder}/i18n`, { maxAge: 0, index: false, redirect: false }));
  app.use(
    precompressed(options.browserDistFolder, {
      maxAge: '1y',
      immutable: true,
      index: false,
      redirect: false,
      // Hashed file names are kept a year; these keep their names from one release to the next.
      setHeaders: (res, path) => {
        if (REVALIDATED.test(path)) res.setHeader('cache-control', 'no-cache');
      },
    }),
  );
  app.use((req, res, next) => {
    const cspNonce = nonceFor(res);
    angularApp
      // The host's in-process API dispatcher (see api-dispatch.ts), when it gave one.
      .handle(req, { ...options.requestContext?.(res), cspNonce, [API_DISPATCH_KEY]: res.locals[API_DISPATCH_KEY] as unknown })
      .then((response) => {
        if (!response) {
          return next();
        }
        const status = options.statusFor?.(response.status, res) ?? response.status;
        return sendWithNonce(response, res, {
          nonce: cspNonce,
          status,
          mediaRoot: options.mediaRoot,
          keep: res.locals[KEEP_RENDERED_PAGE_KEY] as KeepRenderedPage | undefined,
        });
      })
      .catch(next);
  });
  return app;
}

/**
 * The handler the Layerbook host server mounts (and the Angular CLI dev server uses); the app
 * listens by itself only when its bundle is run directly.
 */
export function ssrRequestHandler(app: Express, moduleUrl: string): ReturnType<typeof createNodeRequestHandler> {
  if (isMainModule(moduleUrl) || process.env['pm_id']) {
    const port = process.env['PORT'] || 4000;
    app.listen(port, (error) => {
      if (error) {
        throw error;
      }
      console.log(`Node Express server listening on http://localhost:${port}`);
    });
  }
  return createNodeRequestHandler(app);
}

/**
 * The host puts a fresh nonce in `res.locals.cspNonce` and sends it in its CSP header. When this
 * bundle runs on its own there is no CSP header, so any well-formed value will do.
 */
function nonceFor(res: ExpressResponse): string {
  const given: unknown = res.locals['cspNonce'];
  if (typeof given === 'string' && NONCE_SHAPE.test(given)) {
    return given;
  }
  return randomBytes(16).toString('base64');
}

interface HtmlAnswer {
  readonly nonce: string;
  readonly status: number;
  readonly mediaRoot: string;
  /** The host's hook for keeping the page (an anonymous visitor's, see rendered-page.ts). */
  readonly keep?: KeepRenderedPage;
}

async function sendWithNonce(response: Response, res: ExpressResponse, answer: HtmlAnswer): Promise<void> {
  const contentType = response.headers.get('content-type') ?? '';
  if (!contentType.startsWith('text/html')) {
    await writeResponseToNodeResponse(response, res);
    return;
  }
  // Made with the nonce's placeholder, swapped last: a kept page serves any later answer.
  const page = scriptAfterFirstPaint(withRootedMedia((await response.text()).replace(BASE_ELEMENT, ''), answer.mediaRoot));
  const headers: [string, string][] = [];
  response.headers.forEach((value, key) => {
    // The body length changes with the nonce; cookies need their own list form.
    if (key !== 'content-length' && key !== 'set-cookie') {
      headers.push([key, value]);
    }
  });
  const cookies = response.headers.getSetCookie();
  answer.keep?.({ status: answer.status, headers, setsCookie: cookies.length > 0, html: page });
  res.status(answer.status);
  for (const [key, value] of headers) {
    res.setHeader(key, value);
  }
  // A rendered page holds the visitor's own data (and the API answers it was drawn from).
  res.setHeader('cache-control', 'no-store');
  if (cookies.length > 0) {
    res.setHeader('set-cookie', cookies);
  }
  res.send(page.replaceAll(NONCE_PLACEHOLDER, answer.nonce));
}

/** Only the head is touched: the body may hold visitors' own words. */
function withRootedMedia(html: string, mediaRoot: string): string {
  const headEnd = html.indexOf('</head>');
  if (headEnd < 0) {
    return html;
  }
  return html.slice(0, headEnd).replace(INLINED_MEDIA_URL, `url($1${mediaRoot}`) + html.slice(headEnd);
}
