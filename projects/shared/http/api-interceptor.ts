import { HttpErrorResponse, HttpEvent, HttpHandlerFn, HttpInterceptorFn, HttpRequest, HttpResponse } from '@angular/common/http';
import { isPlatformServer } from '@angular/common';
import { PLATFORM_ID, REQUEST, inject } from '@angular/core';
import { Router } from '@angular/router';
import { PROBLEM_TYPES } from '@layerbook/contracts/types';
import { Observable, catchError, filter, switchMap, take, tap, throwError } from 'rxjs';
import { API_PREFIX, ApiSettings, PUBLIC_API_PREFIX, isSessionCall } from './api-settings';
import { CsrfToken } from './csrf-token';
import { signInRedirect } from './return-address';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * The one interceptor for calls to our own API, set up per app by its settings.
 * Server (SSR): relative URLs have no origin there, and the API only knows the visitor by the
 * session cookie, so its cookie is forwarded (the server platform makes the URL absolute).
 * Browser: same-origin cookies plus the CSRF token from the last session answer on writes; the
 * anonymous public API goes out as it is; a 401 means the session ended, so the person is sent to
 * sign in and brought back afterwards. A write refused for a stale CSRF token (a sign-in in another
 * tab replaced the session's token) fetches the session's token and is sent once more.
 */
export function apiInterceptorFor(settings: ApiSettings): HttpInterceptorFn {
  return (req, next) => {
    if (!req.url.startsWith(API_PREFIX)) {
      return next(req);
    }
    if (isPlatformServer(inject(PLATFORM_ID))) {
      return next(forServer(req, inject(REQUEST, { optional: true })));
    }
    if (req.url.startsWith(PUBLIC_API_PREFIX)) {
      return next(req);
    }
    const csrf = inject(CsrfToken);
    const endSession = isSessionCall(req.url, settings) ? null : sessionEnder(settings);
    const watch = tap<HttpEvent<unknown>>({
      next: (event) => rememberToken(event, csrf),
      error: (error: unknown) => {
        if (endSession && error instanceof HttpErrorResponse && error.status === 401) {
          endSession();
        }
      },
    });
    // Same-origin calls carry the session cookie by themselves (fetch's default); asking for
    // credentials as well would keep Angular from reusing the answers the page was rendered with.
    if (SAFE_METHODS.has(req.method)) {
      return next(req).pipe(watch);
    }
    const send = () => next(req.clone({ setHeaders: { 'x-csrf-token': csrf.value() } }));
    const refreshToken = () => fetchSession(next, settings.sessionUrl).pipe(tap((event) => rememberToken(event, csrf)));
    const sendAgainIfStale = catchError<HttpEvent<unknown>, Observable<HttpEvent<unknown>>>((error: unknown) =>
      isStaleToken(error) ? refreshToken().pipe(switchMap(send)) : throwError(() => error),
    );
    if (csrf.value()) {
      return send().pipe(sendAgainIfStale, watch);
    }
    // A write before any session answer (e.g. the session call failed): fetch a token first.
    return refreshToken().pipe(switchMap(send), sendAgainIfStale, watch);
  };
}

/** The API's refusal of a write for its CSRF token, as opposed to any other 403 (a role, a record). */
function isStaleToken(error: unknown): boolean {
  if (!(error instanceof HttpErrorResponse) || error.status !== 403) return false;
  const body: unknown = error.error;
  return typeof body === 'object' && body !== null && 'type' in body && body.type === PROBLEM_TYPES.csrf;
}

/** Forgets the user and opens the sign-in page with the current page as the way back. */
function sessionEnder(settings: ApiSettings): () => void {
  const router = inject(Router);
  const session = inject(settings.session);
  return () => {
    session.accept(null);
    const navigating = router.currentNavigation();
    const target = navigating?.finalUrl ?? navigating?.extractedUrl;
    const redirect = signInRedirect(target ? router.serializeUrl(target) : router.url, settings.signInPath, settings.baseHref);
    if (redirect) {
      void router.navigate([redirect.path], { queryParams: { next: redirect.next } });
    }
  };
}

function forServer(req: HttpRequest<unknown>, incoming: Request | null): HttpRequest<unknown> {
  // The URL stays relative: Angular's server platform resolves it against the incoming request,
  // after the transfer cache has keyed it the way the browser will ask for it.
  const cookie = incoming?.headers.get('cookie');
  return cookie ? req.clone({ setHeaders: { cookie } }) : req;
}

/**
 * Angular's HTTP transfer cache skips answers marked `no-store` or carrying `set-cookie`, and our
 * API marks every answer so (for browsers and proxies). During server rendering the answer goes no
 * further than the page being rendered, which is itself `no-store` and goes only to the same
 * visitor (see ssr/ssr-app.ts), so the browser may reuse it instead of fetching it again and
 * blanking the rendered content while it waits. Applied by the server's HTTP backend
 * (app/server-config.ts); session answers are never cached (app-config.ts).
 */
export function transferable(event: HttpEvent<unknown>): HttpEvent<unknown> {
  if (!(event instanceof HttpResponse)) {
    return event;
  }
  return event.clone({ headers: event.headers.delete('cache-control').delete('set-cookie') });
}

function fetchSession(next: HttpHandlerFn, sessionUrl: string): Observable<HttpResponse<unknown>> {
  return next(new HttpRequest('GET', sessionUrl)).pipe(
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
