import { randomBytes } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import helmet from 'helmet';
import type { Config } from '../config';
import { isProduction } from '../config';

/** A fresh CSP nonce per response; the SSR apps stamp it on their inline scripts and styles. */
export const cspNonce: RequestHandler = (_req, res, next) => {
  res.locals['cspNonce'] = randomBytes(16).toString('base64');
  next();
};

/**
 * The admin app's offline page: the app without server rendering, which the service worker keeps
 * and serves when a page cannot be fetched (projects/admin/ngsw-config.json). The worker checks it
 * against the build's hash, so it is served exactly as built: no nonce can be written into it, and
 * its own policy allows our script files only and inline styles (Angular adds component styles as
 * <style> elements; on the other pages they carry the nonce).
 */
export const OFFLINE_PAGE = '/index.csr.html';

export function securityHeaders(config: Config): RequestHandler {
  const nonceOf = (res: unknown) => `'nonce-${(res as { locals: Record<string, string> }).locals['cspNonce']}'`;
  const offlinePage = (req: unknown) => (req as { path: string }).path === OFFLINE_PAGE;
  const scriptNonce = (req: unknown, res: unknown) => (offlinePage(req) ? "'self'" : nonceOf(res));
  const styleNonce = (req: unknown, res: unknown) => (offlinePage(req) ? "'unsafe-inline'" : nonceOf(res));
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'", scriptNonce],
        styleSrc: ["'self'", styleNonce],
        // The service worker (admin: /ngsw-worker.js) is a script of our own, from our own origin.
        workerSrc: ["'self'"],
        // Material and SSR output set a few style attributes; attributes cannot carry a nonce.
        styleSrcAttr: ["'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'"],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        baseUri: ["'none'"],
        frameAncestors: ["'none'"],
        formAction: ["'self'"],
        ...(isProduction(config) ? { upgradeInsecureRequests: [] } : { upgradeInsecureRequests: null }),
      },
    },
    strictTransportSecurity: isProduction(config) ? { maxAge: 31536000, includeSubDomains: true } : false,
    crossOriginEmbedderPolicy: false,
  });
}

/**
 * What an API answer is: JSON, never a document, so its policy allows nothing to load or frame it.
 * (File and PDF routes set their own sandboxed policy on top.)
 */
export const API_CSP = "default-src 'none'; frame-ancestors 'none'";

/**
 * The headers `securityHeaders` writes, worked out once: helmet run on a stand-in answer, with the
 * API's fixed policy instead of the page one. They do not change from one answer to the next, so an
 * API answer gets the list written in a loop instead of a nonce and helmet's dozen steps (3–7 % more
 * invoice-list reads a second in the list benchmark, measured in alternating turns).
 */
export function apiSecurityHeaderList(config: Config): ReadonlyArray<readonly [string, string]> {
  const written: Array<[string, string]> = [];
  const stand = {
    locals: { cspNonce: 'unused' },
    setHeader: (name: string, value: unknown) => void written.push([name.toLowerCase(), String(value)]),
    removeHeader: () => undefined,
  };
  let done = false;
  securityHeaders(config)({ path: '/api/', method: 'GET', headers: {} } as Request, stand as unknown as Response, () => (done = true));
  if (!done) throw new Error('helmet did not finish synchronously');
  return written.map(([name, value]) => [name, name === 'content-security-policy' ? API_CSP : value] as const);
}

/** Pages get a fresh nonce and their policy from helmet; /api/ answers the fixed list above. */
export function securityHeadersFor(config: Config): RequestHandler {
  const pages = securityHeaders(config);
  const api = apiSecurityHeaderList(config);
  return (req, res, next) => {
    if (req.url.startsWith('/api/')) {
      for (const [name, value] of api) res.setHeader(name, value);
      return next();
    }
    cspNonce(req, res, () => pages(req, res, next));
  };
}
