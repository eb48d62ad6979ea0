import { randomBytes } from 'node:crypto';
import type { RequestHandler } from 'express';
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
