import express, { type NextFunction, type Request, type Response } from 'express';
import qs from 'qs';
import { authenticationFailed, idempotencyError, invalidRequest, StripeFakeError } from './errors';
import { newId } from './ids';
import type { Params } from './params';
import { API_VERSION, type EventCause } from './state';

/** What a handler gets: the decoded parameters (form body or query), the path's ids, and what caused it. */
export interface ApiCall {
  params: Params;
  path: Record<string, string>;
  cause: EventCause;
}

export type ApiHandler = (call: ApiCall) => { status?: number; body: unknown };

interface Remembered {
  method: string;
  path: string;
  params: string;
  status: number;
  body: string;
  requestId: string;
}

/** Stripe keeps idempotent results for 24 hours; the fake keeps them while it runs. */
export class IdempotencyStore {
  readonly results = new Map<string, Remembered>();
}

/** The same bracket syntax the SDK writes (`line_items[0][price_data][currency]=usd`). */
export const decodeForm = (text: string): Params => qs.parse(text, { depth: 10, arrayLimit: 100, parameterLimit: 2000 });

/** Requests need `Authorization: Bearer sk_test_…` (or Basic with the key as user); `secretKey` pins one key. */
export function authenticate(secretKey: string | undefined) {
  return (req: Request, _res: Response, next: NextFunction) => {
    const header = req.get('authorization') ?? '';
    let key = '';
    if (header.startsWith('Bearer ')) key = header.slice(7).trim();
    else if (header.startsWith('Basic ')) key = Buffer.from(header.slice(6), 'base64').toString('utf8').split(':')[0] ?? '';
    if (!key) {
      return next(
        authenticationFailed(
          "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY').",
        ),
      );
    }
    const masked = `${key.slice(0, 8)}${'*'.repeat(Math.max(0, key.length - 12))}${key.slice(-4)}`;
    if (!/^(sk|rk)_test_\w+$/.test(key) || (secretKey !== undefined && key !== secretKey)) {
      return next(authenticationFailed(`Invalid API Key provided: ${masked}`));
    }
    next();
  };
}

/** Request ids, the API version header, and form bodies decoded with qs. */
export function plumbing() {
  const router = express.Router();
  router.use((req, res, next) => {
    res.locals['requestId'] = newId('req', 14);
    res.set('request-id', res.locals['requestId'] as string);
    const version = req.get('stripe-version');
    if (version !== undefined && !/^\d{4}-\d{2}-\d{2}(\.[a-z]+)?$/.test(version)) {
      return next(invalidRequest(`Invalid Stripe API version: ${version}`));
    }
    res.set('stripe-version', version ?? API_VERSION);
    next();
  });
  router.use(express.text({ type: () => true, limit: '1mb' }));
  return router;
}

/** The parameters of a call: the form body for POST, the query string otherwise. */
function paramsOf(req: Request): Params {
  if (req.method === 'POST') return typeof req.body === 'string' && req.body !== '' ? decodeForm(req.body) : {};
  return req.query;
}

const send = (res: Response, status: number, body: string) => res.status(status).type('application/json').send(body);

/**
 * Wraps a handler: runs it with the decoded parameters, answers JSON, and for a POST with an
 * Idempotency-Key replays the first answer (Idempotent-Replayed: true) when key, endpoint and
 * parameters match, or refuses with an idempotency_error when they differ. Errors a request could
 * not execute (400/401/404) are not remembered, so a corrected retry with the same key runs.
 */
export function api(store: IdempotencyStore, handler: ApiHandler) {
  return (req: Request, res: Response, next: NextFunction) => {
    const key = req.method === 'POST' ? req.get('idempotency-key') : undefined;
    const requestId = res.locals['requestId'] as string;
    try {
      const params = paramsOf(req);
      const canonical = JSON.stringify(params);
      if (key !== undefined) {
        if (key.length > 255) throw invalidRequest('Idempotency-Key must be at most 255 characters long.', 'idempotency_key');
        res.set('idempotency-key', key);
        const earlier = store.results.get(key);
        if (earlier) {
          if (earlier.path !== req.path || earlier.method !== req.method) {
            throw idempotencyError(
              `Keys for idempotent requests can only be used for the same endpoint they were first used for ('${earlier.method} ${earlier.path}' vs '${req.method} ${req.path}'). Try using a key other than '${key}' if you meant to execute a different request.`,
            );
          }
          if (earlier.params !== canonical) {
            throw idempotencyError(
              `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
            );
          }
          res.set('idempotent-replayed', 'true');
          res.set('original-request', earlier.requestId);
          return send(res, earlier.status, earlier.body);
        }
      }
      const cause: EventCause = { id: requestId, idempotency_key: key ?? null };
      let status: number;
      let body: string;
      try {
        const result = handler({ params, path: req.params as Record<string, string>, cause });
        status = result.status ?? 200;
        body = JSON.stringify(result.body, null, 2);
      } catch (error) {
        if (!(error instanceof StripeFakeError) || [400, 401, 404].includes(error.status)) throw error;
        status = error.status;
        body = JSON.stringify({ error: { ...error.body, request_log_url: requestLogUrl(requestId) } }, null, 2);
      }
      if (key !== undefined) store.results.set(key, { method: req.method, path: req.path, params: canonical, status, body, requestId });
      return send(res, status, body);
    } catch (error) {
      return next(error);
    }
  };
}

const requestLogUrl = (requestId: string) => `https://dashboard.stripe.com/test/logs/${requestId}`;

/** Unknown URLs under /v1, in Stripe's words. */
export function notFound(req: Request, _res: Response, next: NextFunction): void {
  next(
    new StripeFakeError(404, {
      type: 'invalid_request_error',
      message: `Unrecognized request URL (${req.method}: ${req.originalUrl.split('?')[0]}). The local Stripe stand-in implements only what Layerbook uses; see packages/stripe-fake/README.md.`,
    }),
  );
}

/** Stripe's error shape for everything the routes throw (an app-level handler: routers are skipped on errors). */
export function errorHandler(error: unknown, _req: Request, res: Response, next: NextFunction): void {
  void next;
  const requestId = (res.locals['requestId'] as string | undefined) ?? newId('req', 14);
  res.set('request-id', requestId);
  if (error instanceof StripeFakeError) {
    send(res, error.status, JSON.stringify({ error: { ...error.body, request_log_url: requestLogUrl(requestId) } }, null, 2));
    return;
  }
  const message = error instanceof Error ? error.message : String(error);
  send(res, 500, JSON.stringify({ error: { type: 'api_error', message: `The stand-in failed: ${message}` } }, null, 2));
}
