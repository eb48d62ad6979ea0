import type { RequestHandler } from 'express';
import { Histogram } from 'prom-client';

/** The label of a request no route answered: a page or file of the server-rendered apps. */
export const ROUTE_PAGES = 'pages';
/** The label of an API request no route matched (answered 404 by apiNotFound). */
export const ROUTE_UNMATCHED = 'unmatched';

const METHODS = new Set(['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE', 'OPTIONS']);

/**
 * Time to answer, by method, route pattern (`/api/jobs/:id`, never the URL with its ids: a label
 * per record would grow without end) and status class. One histogram per process, registered in
 * each registry that serves it (metricsRegistry); every app of the process observes into it.
 */
export const requestDuration = new Histogram({
  name: 'layerbook_http_request_duration_seconds',
  help: 'Time to answer an HTTP request, by method, Express route pattern and status class.',
  labelNames: ['method', 'route', 'status_class'] as const,
  buckets: [0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10],
  registers: [],
});

/**
 * Times every request to its end. Express sets `req.route` when a route matches, while `req.baseUrl`
 * still holds the routers' mount paths; an error passed on afterwards unwinds `baseUrl` before the
 * answer is written, so the full pattern is taken at the moment the route is set.
 */
export function observeRequests(histogram: Histogram<'method' | 'route' | 'status_class'> = requestDuration): RequestHandler {
  return (req, res, next) => {
    const stop = histogram.startTimer();
    let matched: unknown;
    let pattern: string | undefined;
    Object.defineProperty(req, 'route', {
      configurable: true,
      enumerable: true,
      get: () => matched,
      set(route: { path?: unknown } | undefined) {
        matched = route;
        if (route) pattern = `${req.baseUrl}${String(route.path)}`;
      },
    });
    res.once('finish', () => {
      stop({
        method: METHODS.has(req.method) ? req.method : 'OTHER',
        route: pattern ?? (req.originalUrl.startsWith('/api/') ? ROUTE_UNMATCHED : ROUTE_PAGES),
        status_class: `${Math.floor(res.statusCode / 100)}xx`,
      });
    });
    next();
  };
}
