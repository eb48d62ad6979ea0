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

export function securityHeaders(config: Config): RequestHandler {
  const nonce = (_req: unknown, res: unknown) => `'nonce-${(res as { locals: Record<string, string> }).locals['cspNonce']}'`;
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'", nonce],
        styleSrc: ["'self'", nonce],
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
