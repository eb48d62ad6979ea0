import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import { csrfSync } from 'csrf-sync';
import type { Request, RequestHandler, Response } from 'express';
import { PROBLEM_TYPES } from '@layerbook/contracts';
import type { Config } from '../config';
import { isProduction } from '../config';
import { HttpError } from './problem';

/**
 * CSRF protection on every state-changing request, in two forms:
 * - signed in: a synchronizer token kept in the session (`csrf-sync`);
 * - anonymous (no session row is written for them): a signed double-submit token, the same value in
 *   an HttpOnly cookie and in the session answer; the app sends it back in `x-csrf-token`, which a
 *   cross-site page can neither read nor set. The signature keeps a planted cookie from passing.
 * Either way the apps read the token from `GET /api/auth/session` or `/api/portal/session`.
 */
const sync = csrfSync({
  getTokenFromRequest: (req) => headerToken(req),
  errorConfig: { statusCode: 403, message: 'Security check failed', code: 'EBADCSRFTOKEN' },
});

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
// Its own problem type: the apps fetch the session's current token and send once more (a sign-in
// in another tab renews the token), which a 403 for a role or a record must not trigger.
const refused = () => new HttpError(403, 'Security check failed', 'Reload the page and try again.', undefined, PROBLEM_TYPES.csrf);

function headerToken(req: Request): string | undefined {
  const header = req.headers['x-csrf-token'];
  return typeof header === 'string' ? header : undefined;
}

export const csrfCookieName = (config: Config) => (isProduction(config) ? '__Host-lb.csrf' : 'lb.csrf');

function sign(secret: string, nonce: string): string {
  return createHmac('sha256', secret).update(`csrf:${nonce}`).digest('base64url');
}

function validAnonymousToken(secret: string, token: string | undefined): token is string {
  const [nonce, mac, extra] = (token ?? '').split('.');
  if (!nonce || !mac || extra !== undefined) return false;
  const expected = Buffer.from(sign(secret, nonce));
  const given = Buffer.from(mac);
  return expected.length === given.length && timingSafeEqual(expected, given);
}

function readCookie(req: Request, name: string): string | undefined {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const at = part.indexOf('=');
    if (at > 0 && part.slice(0, at).trim() === name) return part.slice(at + 1).trim();
  }
  return undefined;
}

function sameToken(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

/** The token for the session answer: the session's own once signed in, else the anonymous cookie's. */
export function csrfToken(config: Config, req: Request, res: Response, fresh = false): string {
  if (req.user) return sync.generateToken(req, fresh);
  const name = csrfCookieName(config);
  const current = readCookie(req, name);
  if (!fresh && validAnonymousToken(config.SESSION_SECRET, current)) return current;
  const nonce = randomBytes(32).toString('base64url');
  const token = `${nonce}.${sign(config.SESSION_SECRET, nonce)}`;
  res.cookie(name, token, { httpOnly: true, sameSite: 'lax', secure: isProduction(config), path: '/' });
  return token;
}

/** Refuses every non-GET without the right token (403 problem). */
export function csrfProtection(config: Config): RequestHandler {
  return (req, res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    if (req.session?.csrfToken) {
      return sync.csrfSynchronisedProtection(req, res, (error?: unknown) =>
        next((error as { code?: string } | undefined)?.code === 'EBADCSRFTOKEN' ? refused() : error),
      );
    }
    const header = headerToken(req);
    const cookie = readCookie(req, csrfCookieName(config));
    if (header && cookie && sameToken(header, cookie) && validAnonymousToken(config.SESSION_SECRET, header)) return next();
    next(refused());
  };
}
