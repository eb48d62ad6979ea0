import {
  HttpBackend,
  HttpErrorResponse,
  type HttpEvent,
  HttpEventType,
  HttpHeaders,
  type HttpRequest,
  HttpResponse,
} from '@angular/common/http';
import type { NgZone } from '@angular/core';
import { Observable } from 'rxjs';
import type { ApiDispatch, ApiDispatchAnswer } from './api-dispatch';

/**
 * The server's HTTP backend when the host gave a dispatcher: JSON and text calls go into the host's
 * Express app in-process; anything else (a blob, a form body, another origin) goes to `fallback`
 * (fetch over the network). Answers are shaped as Angular's own backends shape them, so the transfer
 * cache, interceptors and error handling see no difference.
 */
export class InProcessBackend implements HttpBackend {
  constructor(
    private readonly dispatch: ApiDispatch,
    private readonly fallback: HttpBackend,
    private readonly zone: NgZone,
  ) {}

  handle(req: HttpRequest<unknown>): Observable<HttpEvent<unknown>> {
    const body = req.serializeBody();
    const target = sameHostPath(req.urlWithParams);
    if ((req.responseType !== 'json' && req.responseType !== 'text') || (body !== null && typeof body !== 'string') || target === null) {
      return this.fallback.handle(req);
    }
    const headers: Record<string, string> = { accept: 'application/json, text/plain, */*' };
    for (const name of req.headers.keys()) headers[name.toLowerCase()] = req.headers.getAll(name)?.join(', ') ?? '';
    const contentType = req.detectContentTypeHeader();
    if (body !== null && contentType !== null && !('content-type' in headers)) headers['content-type'] = contentType;
    return new Observable<HttpEvent<unknown>>((observer) => {
      let open = true;
      observer.next({ type: HttpEventType.Sent });
      // As Angular's FetchBackend does: the request's own steps (streams, immediates) run outside the
      // zone, so they do not each trigger change detection of the whole page; the answer comes back in.
      const answered = this.zone.runOutsideAngular(() =>
        this.dispatch({ method: req.method, url: target, headers, ...(body !== null ? { payload: body } : {}) }),
      );
      answered.then(
        (answer) =>
          this.zone.run(() => {
            if (!open) return;
            const event = toEvent(req, answer);
            if (event instanceof HttpErrorResponse) {
              observer.error(event);
            } else {
              observer.next(event);
              observer.complete();
            }
          }),
        (error: unknown) =>
          this.zone.run(() => {
            if (open) observer.error(new HttpErrorResponse({ error, status: 0, statusText: 'Unknown Error', url: req.urlWithParams }));
          }),
      );
      return () => {
        open = false;
      };
    });
  }
}

/**
 * Path and query of an API URL. The server platform has already made it absolute against the page's
 * own address (`http://host/api/…`), so any URL starting with `/` or `http(s)://` is ours once the
 * path is taken; the interceptor only lets `/api/` URLs through with the visitor's cookie.
 */
function sameHostPath(url: string): string | null {
  if (url.startsWith('/')) return url.startsWith('/api/') ? url : null;
  let parsed: URL;
  try {
    parsed = new URL(url);
  } catch {
    return null;
  }
  return parsed.pathname.startsWith('/api/') ? parsed.pathname + parsed.search : null;
}

function toEvent(req: HttpRequest<unknown>, answer: ApiDispatchAnswer): HttpResponse<unknown> | HttpErrorResponse {
  let all = new HttpHeaders();
  for (const [name, value] of Object.entries(answer.headers)) {
    if (value === undefined) continue;
    all = all.set(name, Array.isArray(value) ? value : String(value));
  }
  const ok = answer.statusCode >= 200 && answer.statusCode < 300;
  const url = req.urlWithParams;
  const statusText = answer.statusMessage || (ok ? 'OK' : '');
  let body: unknown = answer.payload;
  if (req.responseType === 'json' && answer.payload !== '') {
    try {
      body = JSON.parse(answer.payload);
    } catch (error) {
      // As Angular's own backends do: a 2xx that is not JSON is an error; an error's text is kept as it is.
      if (ok)
        return new HttpErrorResponse({ error: { error, text: answer.payload }, headers: all, status: answer.statusCode, statusText, url });
    }
  } else if (req.responseType === 'json') {
    body = null;
  }
  return ok
    ? new HttpResponse({ body, headers: all, status: answer.statusCode, statusText, url })
    : new HttpErrorResponse({ error: body, headers: all, status: answer.statusCode, statusText, url });
}
