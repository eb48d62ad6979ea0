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
  angularApp
    .handle(req, { cspNonce })
    .then((response) => (response ? sendWithNonce(response, res, cspNonce) : next()))
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

async function sendWithNonce(response: Response, res: ExpressResponse, nonce: string): Promise<void> {
  const contentType = response.headers.get('content-type') ?? '';
  if (!contentType.startsWith('text/html')) {
    await writeResponseToNodeResponse(response, res);
    return;
  }
  const html = (await response.text()).replaceAll(NONCE_PLACEHOLDER, nonce).replace(BASE_ELEMENT, '');
  res.status(response.status);
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
