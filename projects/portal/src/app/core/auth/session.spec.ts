import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { PortalSession } from '@layerbook/contracts/types';
import { describe, expect, it, vi } from 'vitest';
import { Language } from '../../../../../shared/i18n/language';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { Session } from './session';

const sessionAnswer = (language: 'en' | 'es'): PortalSession => ({
  client: {
    id: 'c1',
    name: 'Ada',
    email: 'ada@example.com',
    firmId: 'f1',
    firmName: 'Quillfeather',
    language,
    ownLanguage: language,
    firmLanguage: 'en',
    country: 'MX',
  },
  csrfToken: 't',
});

describe('the portal session', () => {
  it('sends the chosen language and switches the words to the answer', async () => {
    TestBed.configureTestingModule({ providers: [provideTestI18n({}), provideHttpClient(), provideHttpClientTesting()] });
    const http = TestBed.inject(HttpTestingController);
    const language = TestBed.inject(Language);
    const chosen = TestBed.inject(Session).chooseLanguage('es');
    const request = http.expectOne('/api/portal/me/language');
    expect(request.request.method).toBe('PATCH');
    expect(request.request.body).toEqual({ language: 'es' });
    request.flush(sessionAnswer('es'));
    await chosen;
    await vi.waitFor(() => expect(language.current()).toBe('es'));
    expect(language.locale()).toBe('es-MX');
    expect(TestBed.inject(Session).client()?.language).toBe('es');
    http.verify();
  });
});

describe('checking the session', () => {
  const setUp = () => {
    TestBed.configureTestingModule({ providers: [provideTestI18n({}), provideHttpClient(), provideHttpClientTesting()] });
    return { http: TestBed.inject(HttpTestingController), session: TestBed.inject(Session) };
  };
  const fail = (http: HttpTestingController) =>
    http.expectOne('/api/portal/session').flush(null, { status: 503, statusText: 'Service Unavailable' });

  it('tries a failed check once more, and a signed-in client stays signed in', async () => {
    const { http, session } = setUp();
    const checked = session.load();
    fail(http);
    await vi.waitFor(() => http.expectOne('/api/portal/session').flush(sessionAnswer('en')));
    expect((await checked)?.id).toBe('c1');
    http.verify();
  });

  it('does not remember two failed checks as signed out: the next page asks again', async () => {
    const { http, session } = setUp();
    const first = session.load();
    fail(http);
    await vi.waitFor(() => fail(http));
    expect(await first).toBeNull();
    const next = session.load();
    http.expectOne('/api/portal/session').flush(sessionAnswer('en'));
    expect((await next)?.id).toBe('c1');
    http.verify();
  });

  it('after the API ends the session, asks again, and keeps why (access turned off) from the answer', async () => {
    const { http, session } = setUp();
    const first = session.load();
    http.expectOne('/api/portal/session').flush(sessionAnswer('en'));
    await first;
    session.accept(null);
    expect(session.client()).toBeNull();
    const again = session.load();
    http.expectOne('/api/portal/session').flush({ client: null, csrfToken: 't', accessOff: { firmName: 'Quillfeather' } });
    expect(await again).toBeNull();
    expect(session.accessOff()).toEqual({ firmName: 'Quillfeather' });
    http.verify();
  });
});
