import { HttpClient, HttpErrorResponse, HttpHeaders, HttpResponse, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef, Component, Injectable } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { PROBLEM_TYPES } from '@layerbook/contracts/types';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { apiInterceptorFor, transferable } from './api-interceptor';
import type { ApiSettings } from './api-settings';

@Component({ template: '' })
class Page {}

/** Stands in for an app's Session: records being told to forget the user. */
@Injectable({ providedIn: 'root' })
class FakeSession {
  forgotten = 0;
  accept(session: null): null {
    this.forgotten++;
    return session;
  }
}

const ADMIN_LIKE: ApiSettings = {
  sessionUrl: '/api/auth/session',
  sessionCalls: ['/api/auth/'],
  signInPath: '/sign-in',
  baseHref: '/',
  session: FakeSession,
};
const PORTAL_LIKE: ApiSettings = {
  sessionUrl: '/api/portal/session',
  sessionCalls: ['/api/portal/session', '/api/portal/auth/'],
  signInPath: '/sign-in',
  baseHref: '/portal/',
  session: FakeSession,
};
const EXPIRED = { type: 'about:blank', title: 'Please sign in.', status: 401 };

function setUp(settings: ApiSettings) {
  TestBed.configureTestingModule({
    providers: [
      provideRouter([
        { path: 'sign-in', component: Page },
        { path: '**', component: Page },
      ]),
      provideHttpClient(withInterceptors([apiInterceptorFor(settings)])),
      provideHttpClientTesting(),
    ],
  });
  return {
    http: TestBed.inject(HttpClient),
    api: TestBed.inject(HttpTestingController),
    router: TestBed.inject(Router),
    session: TestBed.inject(FakeSession),
  };
}

/** Waits for a request the test expects to fail, then for whatever the interceptor started. */
async function failing(request: Promise<unknown>): Promise<void> {
  await expect(request).rejects.toBeInstanceOf(HttpErrorResponse);
  await TestBed.inject(ApplicationRef).whenStable();
}

describe('apiInterceptorFor', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  describe('when the session ends (401)', () => {
    it.each([
      // settings, page the person is on, sign-in URL they land on
      [ADMIN_LIKE, '/jobs/7?tab=photos', '/sign-in?next=%2Fjobs%2F7%3Ftab%3Dphotos'],
      [PORTAL_LIKE, '/proposals/9', '/sign-in?next=%2Fportal%2Fproposals%2F9'],
    ])('sends them to sign in and back (%#)', async (settings, page, landing) => {
      const { http, api, router, session } = setUp(settings);
      await router.navigateByUrl(page);
      const sent = failing(firstValueFrom(http.get('/api/jobs/7')));
      api.expectOne('/api/jobs/7').flush(EXPIRED, { status: 401, statusText: 'Unauthorized' });
      await sent;
      expect(router.url).toBe(landing);
      expect(session.forgotten).toBe(1);
    });

    it.each([
      [ADMIN_LIKE, '/api/auth/session'],
      [ADMIN_LIKE, '/api/auth/signin'],
      [PORTAL_LIKE, '/api/portal/session'],
      [PORTAL_LIKE, '/api/portal/auth/redeem'],
    ])('leaves a 401 from a session call to the page (%#: %s)', async (settings, url) => {
      const { http, api, router, session } = setUp(settings);
      await router.navigateByUrl('/today');
      const sent = failing(firstValueFrom(http.post(url, {})));
      if (url.endsWith('/session')) {
        api.expectOne(url).flush(EXPIRED, { status: 401, statusText: 'Unauthorized' });
      } else {
        // A write with no token yet asks the session for one first.
        api.expectOne(settings.sessionUrl).flush({ csrfToken: 't1' });
        api.expectOne(url).flush(EXPIRED, { status: 401, statusText: 'Unauthorized' });
      }
      await sent;
      expect(router.url).toBe('/today');
      expect(session.forgotten).toBe(0);
    });

    it('does not send someone on the sign-in page to the sign-in page', async () => {
      const { http, api, router } = setUp(ADMIN_LIKE);
      await router.navigateByUrl('/sign-in?next=%2Fjobs');
      const sent = failing(firstValueFrom(http.get('/api/firm')));
      api.expectOne('/api/firm').flush(EXPIRED, { status: 401, statusText: 'Unauthorized' });
      await sent;
      expect(router.url).toBe('/sign-in?next=%2Fjobs');
    });

    it('leaves other failures to the page', async () => {
      const { http, api, router, session } = setUp(ADMIN_LIKE);
      await router.navigateByUrl('/jobs');
      const sent = failing(firstValueFrom(http.get('/api/jobs')));
      api.expectOne('/api/jobs').flush({ ...EXPIRED, status: 403 }, { status: 403, statusText: 'Forbidden' });
      await sent;
      expect(router.url).toBe('/jobs');
      expect(session.forgotten).toBe(0);
    });
  });

  describe('cookies and CSRF', () => {
    let http: HttpClient;
    let api: HttpTestingController;
    beforeEach(() => ({ http, api } = setUp(ADMIN_LIKE)));

    it('sends the token from the last session answer on writes (same-origin: the browser adds the cookie)', async () => {
      const probe = firstValueFrom(http.get('/api/auth/session'));
      const read = api.expectOne('/api/auth/session');
      expect(read.request.withCredentials).toBe(false);
      expect(read.request.headers.has('x-csrf-token')).toBe(false);
      read.flush({ user: null, csrfToken: 'token-1' });
      await probe;

      const write = firstValueFrom(http.post('/api/jobs', { name: 'Hall' }));
      const sent = api.expectOne('/api/jobs');
      expect(sent.request.headers.get('x-csrf-token')).toBe('token-1');
      expect(sent.request.withCredentials).toBe(false);
      sent.flush({ id: 'j1' });
      await write;
    });

    it('asks for a token first when a write comes before any session answer', async () => {
      const write = firstValueFrom(http.post('/api/jobs', {}));
      api.expectOne({ method: 'GET', url: '/api/auth/session' }).flush({ user: null, csrfToken: 'token-2' });
      const sent = api.expectOne({ method: 'POST', url: '/api/jobs' });
      expect(sent.request.headers.get('x-csrf-token')).toBe('token-2');
      sent.flush({});
      await write;
    });

    describe('a write refused for a stale token (signed in again in another tab)', () => {
      const STALE = { type: PROBLEM_TYPES.csrf, title: 'Security check failed', status: 403, detail: 'Reload the page and try again.' };
      const refuse = (request: ReturnType<HttpTestingController['expectOne']>, body: object = STALE) =>
        request.flush(body, { status: 403, statusText: 'Forbidden' });

      beforeEach(async () => {
        const probe = firstValueFrom(http.get('/api/auth/session'));
        api.expectOne('/api/auth/session').flush({ user: null, csrfToken: 'old' });
        await probe;
      });

      it('fetches the session’s token and sends the write once more with it', async () => {
        const write = firstValueFrom(http.post('/api/jobs', { name: 'Hall' }));
        refuse(api.expectOne({ method: 'POST', url: '/api/jobs' }));
        api.expectOne({ method: 'GET', url: '/api/auth/session' }).flush({ user: null, csrfToken: 'new' });
        const again = api.expectOne({ method: 'POST', url: '/api/jobs' });
        expect([again.request.headers.get('x-csrf-token'), again.request.body]).toEqual(['new', { name: 'Hall' }]);
        again.flush({ id: 'j1' });
        expect(await write).toEqual({ id: 'j1' });
      });

      it('tries only once: a second refusal reaches the page', async () => {
        const write = failing(firstValueFrom(http.post('/api/jobs', {})));
        refuse(api.expectOne({ method: 'POST', url: '/api/jobs' }));
        api.expectOne({ method: 'GET', url: '/api/auth/session' }).flush({ user: null, csrfToken: 'new' });
        refuse(api.expectOne({ method: 'POST', url: '/api/jobs' }));
        await write;
      });

      it('leaves any other 403 (a role, a record) to the page, unsent again', async () => {
        const write = failing(firstValueFrom(http.post('/api/jobs', {})));
        refuse(api.expectOne({ method: 'POST', url: '/api/jobs' }), { ...STALE, type: 'https://layerbook.local/problems/403' });
        await write;
        api.expectNone('/api/auth/session');
      });
    });

    it.each([['/api/public/firms/fernhollow'], ['/assets/logo.svg'], ['https://example.test/api/x']])(
      'sends %s as it is (no cookie, no token)',
      async (url) => {
        const read = firstValueFrom(http.get(url));
        const sent = api.expectOne(url);
        expect(sent.request.withCredentials).toBe(false);
        expect(sent.request.headers.has('x-csrf-token')).toBe(false);
        sent.flush({});
        await read;
      },
    );
  });
});

describe('answers fetched while rendering on the server', () => {
  it('lose no-store and set-cookie so the browser reuses them from the page', () => {
    const answer = new HttpResponse({
      status: 200,
      body: { items: [] },
      headers: new HttpHeaders({ 'cache-control': 'no-store', 'set-cookie': 'lb.sid=abc', 'content-type': 'application/json' }),
    });
    const kept = transferable(answer) as HttpResponse<unknown>;
    expect(kept.headers.has('cache-control')).toBe(false);
    expect(kept.headers.has('set-cookie')).toBe(false);
    expect(kept.headers.get('content-type')).toBe('application/json');
    expect(kept.body).toEqual({ items: [] });
  });
});
