import { type HttpBackend, HttpErrorResponse, type HttpEvent, HttpRequest, HttpResponse } from '@angular/common/http';
import { NgZone } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { firstValueFrom, last, of } from 'rxjs';
import { describe, expect, it } from 'vitest';
import type { ApiDispatchAnswer, ApiDispatchRequest } from './api-dispatch';
import { InProcessBackend } from './in-process-backend';

const json = (statusCode: number, body: unknown, contentType = 'application/json'): ApiDispatchAnswer => ({
  statusCode,
  statusMessage: '',
  headers: { 'content-type': contentType, 'cache-control': 'no-store' },
  payload: JSON.stringify(body),
});

function backendWith(answer: ApiDispatchAnswer) {
  const sent: ApiDispatchRequest[] = [];
  const fellBack: string[] = [];
  const fallback: HttpBackend = {
    handle: (req) => {
      fellBack.push(req.urlWithParams);
      return of(new HttpResponse({ status: 200, body: 'over the network' }));
    },
  };
  const backend = new InProcessBackend(
    (request) => {
      sent.push(request);
      return Promise.resolve(answer);
    },
    fallback,
    TestBed.inject(NgZone),
  );
  const run = (req: HttpRequest<unknown>) => firstValueFrom(backend.handle(req).pipe(last<HttpEvent<unknown>>()));
  return { run, sent, fellBack };
}

describe('InProcessBackend (server rendering)', () => {
  it("sends an absolute API URL's path and query with the request's headers, and answers JSON as Angular's backends do", async () => {
    const { run, sent } = backendWith(json(200, { user: null }));
    const req = new HttpRequest('GET', 'http://localhost:4000/api/auth/session?x=1', null, {}).clone({
      setHeaders: { cookie: 'lb.sid=abc' },
    });
    const event = await run(req);
    expect(sent[0]).toMatchObject({ method: 'GET', url: '/api/auth/session?x=1', headers: { cookie: 'lb.sid=abc' } });
    expect(event).toBeInstanceOf(HttpResponse);
    expect((event as HttpResponse<unknown>).body).toEqual({ user: null });
    expect((event as HttpResponse<unknown>).headers.get('cache-control')).toBe('no-store');
  });

  it('a problem answer is an HttpErrorResponse carrying the problem', async () => {
    const problem = { type: 'about:blank', title: 'Not found', status: 404 };
    const { run } = backendWith(json(404, problem, 'application/problem+json'));
    await expect(run(new HttpRequest('GET', '/api/estimates/nope'))).rejects.toMatchObject({ status: 404, error: problem });
    await expect(run(new HttpRequest('GET', '/api/estimates/nope'))).rejects.toBeInstanceOf(HttpErrorResponse);
  });

  it('anything that is not a JSON or text call to our API goes over the network', async () => {
    const { run, sent, fellBack } = backendWith(json(200, {}));
    await run(new HttpRequest('GET', 'https://elsewhere.example/data.json'));
    await run(new HttpRequest('GET', '/i18n/en.json'));
    await run(new HttpRequest('GET', '/api/files/1', null, { responseType: 'blob' }));
    expect(sent).toEqual([]);
    expect(fellBack).toEqual(['https://elsewhere.example/data.json', '/i18n/en.json', '/api/files/1']);
  });
});
