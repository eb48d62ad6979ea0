import type { Application, RequestHandler } from 'express';
import { IncomingMessage, ServerResponse } from 'node:http';
import { inject } from 'light-my-request';

/**
 * The in-process API for server rendering (the app side: projects/shared/ssr/api-dispatch.ts).
 * A page's API calls are dispatched into the same Express app with light-my-request: no socket, no
 * loopback HTTP, but the same route, session, CSRF, row-level security and problem answers as a
 * browser's call. The visitor's cookie comes with the request (the app's API interceptor adds it);
 * whatever the API answers in set-cookie stays on the server (the page never forwards it).
 */
export interface DispatchRequest {
  readonly method: string;
  readonly url: string;
  readonly headers: Record<string, string>;
  readonly payload?: string;
}

export interface DispatchAnswer {
  readonly statusCode: number;
  readonly statusMessage: string;
  readonly headers: Record<string, string | string[] | number | undefined>;
  readonly payload: string;
}

export type ApiDispatch = (request: DispatchRequest) => Promise<DispatchAnswer>;

/** Only the API is reachable this way: never a page (no render inside a render). */
const API_PATH = /^\/api\//;

/** A dispatcher into `app`. */
export function apiDispatcher(app: Application): ApiDispatch {
  const into = expressInto(app);
  return async (request) => {
    if (!API_PATH.test(request.url)) throw new Error(`Only the API is dispatched in-process, not ${request.url}`);
    const answer = await inject(into, {
      method: request.method as 'GET',
      url: request.url,
      headers: request.headers,
      ...(request.payload !== undefined ? { payload: request.payload } : {}),
    });
    return { statusCode: answer.statusCode, statusMessage: answer.statusMessage, headers: answer.headers, payload: answer.payload };
  };
}

type Handle = (this: object, req: unknown, res: unknown) => void;

/**
 * `app` as a plain (req, res) function for light-my-request. Handed an Express app itself,
 * light-my-request re-parents Express's shared request and response prototypes onto its own, for
 * every request of the process: real HTTP requests would then lose IncomingMessage's methods. And
 * Express re-parents each request onto `app.request` / `app.response`, which would drop
 * light-my-request's own stream methods (the answer's body would be lost). So the app handles the
 * request with prototypes made once for this purpose: Express's methods (its request and response
 * objects, the app's own layer and a parent app's) on top of light-my-request's classes. Nothing shared is changed.
 */
function expressInto(app: Application): (req: object, res: object) => void {
  let shim: object | null = null;
  const express = app as unknown as { handle: Handle; request: object; response: object };
  const handle = express.handle;
  return (req, res) => {
    shim ??= Object.create(app, {
      request: { value: layered(express.request, IncomingMessage.prototype, Object.getPrototypeOf(req) as object) },
      response: { value: layered(express.response, ServerResponse.prototype, Object.getPrototypeOf(res) as object) },
    }) as object;
    handle.call(shim, req, res);
  };
}

/**
 * Express's layers over `base`: `app.request` (the app), a parent app's when mounted, and Express's
 * own request or response methods, down to Node's class (`nodeBase`), nearest layer winning.
 */
function layered(appLayer: object, nodeBase: object, base: object): object {
  const layers: object[] = [];
  for (let at: object | null = appLayer; at && at !== nodeBase; at = Object.getPrototypeOf(at) as object | null) layers.unshift(at);
  const layer = Object.create(base) as object;
  for (const from of layers) Object.defineProperties(layer, Object.getOwnPropertyDescriptors(from));
  return layer;
}

const dispatchers = new WeakMap<Application, ApiDispatch>();

/**
 * Wraps an app's render handler: each page request gets the dispatcher of the app that serves it
 * (`req.app`, the host's Express app, since the handler is mounted on it as a plain function) in
 * `res.locals.apiDispatch`, where the app's ssr-app.ts picks it up.
 */
export function withApiDispatch(render: RequestHandler): RequestHandler {
  return (req, res, next) => {
    const app = req.app;
    let dispatch = dispatchers.get(app);
    if (!dispatch) {
      dispatch = apiDispatcher(app);
      dispatchers.set(app, dispatch);
    }
    res.locals['apiDispatch'] = dispatch;
    return render(req, res, next);
  };
}
