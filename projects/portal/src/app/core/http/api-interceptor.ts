import {
  HttpEvent,
  HttpHandlerFn,
  HttpInterceptorFn,
  HttpRequest,
  HttpResponse,
} from '@angular/common/http';
import { PLATFORM_ID, REQUEST, inject } from '@angular/core';
import { isPlatformServer } from '@angular/common';
import { Observable, filter, switchMap, take, tap } from 'rxjs';
import { CsrfToken } from './csrf-token';

const API_PREFIX = '/api/';
const SESSION_URL = '/api/portal/session';
/** Anonymous endpoints (the public inquiry form): no session, no cookie, so no CSRF token either. */
const PUBLIC_PREFIX = '/api/public/';
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * The one interceptor for calls to our own API.
 * Server (SSR): relative URLs have no origin there, and the API only knows the visitor by the
 * session cookie, so the URL is made absolute against the incoming request and its cookie forwarded.
 * Browser: same-origin cookies plus the CSRF token from the last session answer on writes;
 * the anonymous public API goes out as it is.
 */
export const apiInterceptor: HttpInterceptorFn = (req, next) => {
  if (!req.url.startsWith(API_PREFIX)) {
    return next(req);
  }
  if (isPlatformServer(inject(PLATFORM_ID))) {
    return next(forServer(req, inject(REQUEST, { optional: true })));
  }
  if (req.url.startsWith(PUBLIC_PREFIX)) {
    return next(req);
  }
  const csrf = inject(CsrfToken);
  const remember = (event: HttpEvent<unknown>) => rememberToken(event, csrf);
  const request = req.clone({ withCredentials: true });

  if (SAFE_METHODS.has(req.method)) {
    return next(request).pipe(tap(remember));
  }
  const send = () =>
    next(request.clone({ setHeaders: { 'x-csrf-token': csrf.value() } })).pipe(tap(remember));
  if (csrf.value()) {
    return send();
  }
  // A write before any session answer (e.g. the session call failed): fetch a token first.
  return fetchSession(next).pipe(tap(remember), switchMap(send));
};

function forServer(req: HttpRequest<unknown>, incoming: Request | null): HttpRequest<unknown> {
  if (!incoming) {
    return req;
  }
  const cookie = incoming.headers.get('cookie');
  return req.clone({
    url: new URL(req.url, incoming.url).href,
    setHeaders: cookie ? { cookie } : {},
  });
}

function fetchSession(next: HttpHandlerFn): Observable<HttpResponse<unknown>> {
  return next(new HttpRequest('GET', SESSION_URL, { withCredentials: true })).pipe(
    filter((event): event is HttpResponse<unknown> => event instanceof HttpResponse),
    take(1),
  );
}

function rememberToken(event: HttpEvent<unknown>, csrf: CsrfToken): void {
  if (!(event instanceof HttpResponse)) {
    return;
  }
  const body: unknown = event.body;
  if (typeof body === 'object' && body !== null && 'csrfToken' in body && typeof body.csrfToken === 'string') {
    csrf.remember(body.csrfToken);
  }
}
