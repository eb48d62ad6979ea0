import { TestBed } from '@angular/core/testing';
import { provideRouter, Router, type RouterStateSnapshot, type UrlTree } from '@angular/router';
import { describe, expect, it } from 'vitest';
import { nextUrl } from '../../features/auth/next-url';
import { signedInGuard } from './guards';
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
