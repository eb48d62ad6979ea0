import {
  AngularNodeAppEngine,
  createNodeRequestHandler,
  isMainModule,
  writeResponseToNodeResponse,
} from '@angular/ssr/node';
import express, { type Response as ExpressResponse } from 'express';
import { randomBytes } from 'node:crypto';
import { join } from 'node:path';

/** index.html carries this marker in `ngCspNonce`; every copy is swapped for the request's nonce. */
const NONCE_PLACEHOLDER = '__LB_CSP_NONCE__';
const NONCE_SHAPE = /^[A-Za-z0-9+/=_-]{8,128}$/;
/**
 * The host's CSP has `base-uri 'none'`, so browsers refuse a <base> element (and log a violation).
 * Asset URLs are absolute (`deployUrl`) and the router gets APP_BASE_HREF from DI instead.
 */
const BASE_ELEMENT = /<base href="[^"]*"\s*\/?>/i;
/**
 * Without <base>, the font URLs in the critical CSS inlined into <head> (`url("./media/…")`) would
 * resolve against the page's own path, and break on any deeper page (/portal/f/:slug/inquiry).
 */
const INLINED_MEDIA_URL = /url\((['"]?)\.\/media\//g;
const MEDIA_ROOT = '/portal/media/';

const browserDistFolder = join(import.meta.dirname, '../browser');

const app = express();
const angularApp = new AngularNodeAppEngine();

app.use(
  express.static(browserDistFolder, {
    maxAge: '1y',
    index: false,
    redirect: false,
  }),
);

app.use((req, res, next) => {
  const cspNonce = nonceFor(res);
  // Set by the host when a no-script inquiry post is refused: the page shows it again with the
  // prospect's words and messages (features/inquiry/posted-refusal.ts reads it).
  const inquiryForm: unknown = res.locals['inquiryForm'];
  angularApp
    .handle(req, { cspNonce, inquiryForm })
    .then((response) => {
      if (!response) {
        return next();
      }
      // A refused post answers 400 even if rendering itself went well (a 404 or 5xx stays as it is).
      const status = inquiryForm !== undefined && response.status < 300 ? 400 : response.status;
      return sendWithNonce(response, res, cspNonce, status);
    })
    .catch(next);
});

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

async function sendWithNonce(response: Response, res: ExpressResponse, nonce: string, status: number): Promise<void> {
  const contentType = response.headers.get('content-type') ?? '';
  if (!contentType.startsWith('text/html')) {
    await writeResponseToNodeResponse(response, res);
    return;
  }
  const html = withRootedMedia((await response.text()).replaceAll(NONCE_PLACEHOLDER, nonce).replace(BASE_ELEMENT, ''));
  res.status(status);
  response.headers.forEach((value, key) => {
    // The body length changes with the nonce; cookies need their own list form.
    if (key !== 'content-length' && key !== 'set-cookie') {
      res.setHeader(key, value);
    }
  });
  const cookies = response.headers.getSetCookie();
  if (cookies.length > 0) {
    res.setHeader('set-cookie', cookies);
  }
  res.send(html);
}

/** Only the head is touched: the body may hold visitors' own words. */
function withRootedMedia(html: string): string {
  const headEnd = html.indexOf('</head>');
  if (headEnd < 0) {
    return html;
  }
  return html.slice(0, headEnd).replace(INLINED_MEDIA_URL, `url($1${MEDIA_ROOT}`) + html.slice(headEnd);
}

if (isMainModule(import.meta.url) || process.env['pm_id']) {
  const port = process.env['PORT'] || 4000;
  app.listen(port, (error) => {
    if (error) {
      throw error;
    }
    console.log(`Node Express server listening on http://localhost:${port}`);
  });
}

/** Mounted by the Layerbook host server (and used by the Angular CLI dev server). */
export const reqHandler = createNodeRequestHandler(app);
