import { TestBed } from '@angular/core/testing';
import {
  convertToParamMap,
  provideRouter,
  Router,
  type ActivatedRouteSnapshot,
  type RouterStateSnapshot,
  type UrlTree,
} from '@angular/router';
import { describe, expect, it } from 'vitest';
import { nextUrl } from '../../features/auth/next-url';
import { signedInGuard, signedOutGuard } from './guards';
import { Session } from './session';

describe('signedInGuard', () => {
  it('sends a signed-out client to sign in with the page they opened as next, which the link brings them back to', async () => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), { provide: Session, useValue: { load: () => Promise.resolve(null) } }],
    });
    const state = { url: '/invoices/inv-7' } as RouterStateSnapshot;
    const answer = (await TestBed.runInInjectionContext(() => signedInGuard({} as never, state))) as UrlTree;
    const router = TestBed.inject(Router);
    expect(router.serializeUrl(answer)).toBe('/sign-in?next=%2Fportal%2Finvoices%2Finv-7');
    expect(nextUrl(answer.queryParams['next'] as string)).toBe('/invoices/inv-7');
  });

  it('lets a signed-in client through', async () => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), { provide: Session, useValue: { load: () => Promise.resolve({ id: 'c1' }) } }],
    });
    const answer = await TestBed.runInInjectionContext(() => signedInGuard({} as never, { url: '/projects' } as RouterStateSnapshot));
    expect(answer).toBe(true);
  });
});

describe('signedOutGuard', () => {
  const route = (next?: string) => ({ queryParamMap: convertToParamMap(next ? { next } : {}) }) as ActivatedRouteSnapshot;
  const answerFor = async (client: unknown, next?: string) => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), { provide: Session, useValue: { load: () => Promise.resolve(client) } }],
    });
    const answer = await TestBed.runInInjectionContext(() => signedOutGuard(route(next), {} as RouterStateSnapshot));
    return answer === true ? true : TestBed.inject(Router).serializeUrl(answer as UrlTree);
  };

  it('sends a signed-in client on to the page the sign-in was asked for (next)', async () => {
    expect(await answerFor({ id: 'c1' }, '/portal/invoices/inv-7')).toBe('/invoices/inv-7');
  });

  it('sends a signed-in client home when next is missing', async () => {
    expect(await answerFor({ id: 'c1' })).toBe('/projects');
  });

  it('sends a signed-in client home when next leaves the portal', async () => {
    expect(await answerFor({ id: 'c1' }, '//elsewhere.example/portal/x')).toBe('/projects');
  });

  it('lets a signed-out client in', async () => {
    expect(await answerFor(null, '/portal/invoices/inv-7')).toBe(true);
  });
});
