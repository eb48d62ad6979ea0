import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef, Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { PROBLEM_TYPES, type PortalSession } from '@layerbook/contracts/types';
import { describe, expect, it, vi } from 'vitest';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import auth from '../../../i18n/auth/en.json';
import problems from '../../../i18n/problems/en.json';
import { SignInLink } from './sign-in-link';

@Component({ template: '' })
class Page {}

const TOKEN = 'a'.repeat(43);
const NEXT = '/portal/invoices/inv-7';
const signedIn: PortalSession = {
  client: {
    id: 'c1',
    name: 'Ada',
    email: 'ada@example.com',
    firmId: 'f1',
    firmName: 'Quillfeather',
    language: 'en',
    ownLanguage: null,
    firmLanguage: 'en',
    country: 'US',
  },
  csrfToken: 't',
};
const refused = (status: number, detail: string, type = `https://layerbook.local/problems/${status}`) => ({
  body: { type, title: 'x', status, detail },
  init: { status, statusText: 'x' },
});

async function open() {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ auth, problems, common }),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([{ path: '**', component: Page }]),
    ],
  });
  const router = TestBed.inject(Router);
  await router.navigateByUrl('/sign-in/link');
  const fixture = TestBed.createComponent(SignInLink);
  fixture.componentRef.setInput('token', TOKEN);
  fixture.componentRef.setInput('next', NEXT);
  fixture.componentRef.setInput('lang', 'es');
  TestBed.inject(ApplicationRef).tick();
  const http = TestBed.inject(HttpTestingController);
  const html = fixture.nativeElement as HTMLElement;
  /** Waits until the page shows an alert (the redeem's answer is handled after a promise). */
  const settle = () =>
    vi.waitFor(() => {
      fixture.detectChanges();
      expect(html.querySelector('[role=alert]')).not.toBeNull();
    });
  return { fixture, http, html, router, settle };
}

describe('opening an e-mailed sign-in link', () => {
  it('a link the server no longer knows, opened by a signed-in client, goes on to the page it was for', async () => {
    const { http, router } = await open();
    const { body, init } = refused(404, 'No such sign-in link.');
    http.expectOne('/api/portal/auth/redeem').flush(body, init);
    await vi.waitFor(() => http.expectOne('/api/portal/session').flush(signedIn));
    await vi.waitFor(() => expect(router.url).toBe('/invoices/inv-7'));
    http.verify();
  });

  it('a spent link for a signed-out client says so, and the new link it asks for keeps the page it was for and its language', async () => {
    const { http, html, settle } = await open();
    const { body, init } = refused(410, 'This sign-in link was already used. Ask for a new one.');
    http.expectOne('/api/portal/auth/redeem').flush(body, init);
    await settle();
    expect(html.querySelector('[role=alert]')?.textContent).toContain(auth.signInLink.expired);
    const again = html.querySelector<HTMLAnchorElement>('a[href^="/sign-in?"]');
    expect(again?.getAttribute('href')).toBe('/sign-in?next=%2Fportal%2Finvoices%2Finv-7&lang=es');
    http.verify();
  });

  it('a link for an account the firm turned off says so, and offers no new link', async () => {
    const { http, html, settle } = await open();
    const { body, init } = refused(410, 'The firm has turned off this client account.', PROBLEM_TYPES.portalAccessOff);
    http.expectOne('/api/portal/auth/redeem').flush(body, init);
    await settle();
    expect(html.querySelector('[role=alert]')?.textContent).toContain(auth.signInLink.accessOff);
    expect(html.textContent).not.toContain(auth.signInLink.expired);
    expect(html.querySelector('a[href^="/sign-in?"]')).toBeNull();
    http.verify();
  });
});
