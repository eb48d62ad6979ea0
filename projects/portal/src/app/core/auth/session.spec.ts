import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { PortalSession } from '@layerbook/contracts/types';
import { describe, expect, it, vi } from 'vitest';
import { Language } from '../../../../../shared/i18n/language';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { Session } from './session';

const session = (language: 'en' | 'es'): PortalSession => ({
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
    request.flush(session('es'));
    await chosen;
    await vi.waitFor(() => expect(language.current()).toBe('es'));
    expect(language.locale()).toBe('es-MX');
    expect(TestBed.inject(Session).client()?.language).toBe('es');
    http.verify();
  });
});
