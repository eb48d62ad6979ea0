import type { Express, Response } from 'express';

const CHARSET = /;\s*charset=/i;

/**
 * `res.json` for this app's answers, leaner than Express's: the JSON text goes to the socket as it is
 * (Node writes a string with the headers in one go) instead of being copied into a Buffer first, and
 * without Express's content-type parsing and freshness check, which an answer without an ETag or a
 * Last-Modified never needs. The rest is kept: a content type set before (problem+json) stays, with
 * `charset=utf-8` added; 204 and 304 go without a body; HEAD gets the headers only.
 */
export function leanJson(this: Response, body: unknown): Response {
  const text = JSON.stringify(body) ?? '';
  const type = this.getHeader('content-type');
  if (typeof type !== 'string') this.setHeader('content-type', 'application/json; charset=utf-8');
  else if (!CHARSET.test(type)) this.setHeader('content-type', `${type}; charset=utf-8`);
  if (this.statusCode === 204 || this.statusCode === 304) {
    this.removeHeader('content-type');
    this.removeHeader('content-length');
    this.end();
    return this;
  }
  this.setHeader('content-length', Buffer.byteLength(text));
  this.end(this.req.method === 'HEAD' ? undefined : text);
  return this;
}

/** Installs leanJson on the app's own response prototype (Express makes one per app), once. */
export function useLeanJson(app: Express): void {
  app.response.json = leanJson as Express['response']['json'];
}
