/**
 * How a server render reaches the API without a network hop: the host server (server/src/ssr/)
 * puts a dispatcher in `res.locals.apiDispatch`, ssr-app.ts hands it to Angular in the request
 * context, and the server's HttpBackend (app/server-config.ts) sends the app's API calls through it.
 * The request goes through the host's own Express app in the same process (light-my-request), so
 * sessions, row-level security, no-store and problem answers stay exactly as over HTTP.
 */
export interface ApiDispatchRequest {
  readonly method: string;
  /** Path and query, e.g. `/api/estimates/…?x=1`. */
  readonly url: string;
  readonly headers: Record<string, string>;
  readonly payload?: string;
}

export interface ApiDispatchAnswer {
  readonly statusCode: number;
  readonly statusMessage: string;
  readonly headers: Record<string, string | string[] | number | undefined>;
  readonly payload: string;
}

export type ApiDispatch = (request: ApiDispatchRequest) => Promise<ApiDispatchAnswer>;

/** The key in `res.locals` and in Angular's request context. */
export const API_DISPATCH_KEY = 'apiDispatch';

/** The dispatcher in a request context, if the host gave one. */
export function apiDispatchOf(context: unknown): ApiDispatch | null {
  if (typeof context !== 'object' || context === null) return null;
  const dispatch: unknown = (context as Record<string, unknown>)[API_DISPATCH_KEY];
  return typeof dispatch === 'function' ? (dispatch as ApiDispatch) : null;
}
