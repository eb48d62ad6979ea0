import { describe, expect, it } from 'vitest';
import { signInRedirect } from '../../../../../shared/http/return-address';
import { nextUrl } from '../../features/auth/next-url';
import { API_SETTINGS } from './api-settings';

describe('portal API settings', () => {
  it.each([['/proposals/9'], ['/boards/4'], ['/projects']])(
    'a session ending on %s comes back there after sign-in (next-url.ts reads /portal/…)',
    (page) => {
      const redirect = signInRedirect(page, API_SETTINGS.signInPath, API_SETTINGS.baseHref);
      expect(redirect).toEqual({ path: '/sign-in', next: `/portal${page}` });
      expect(nextUrl(redirect?.next)).toBe(page);
    },
  );

  it.each([['/api/portal/session'], ['/api/portal/auth/link'], ['/api/portal/auth/redeem']])('treats %s as a session call', (url) => {
    expect(API_SETTINGS.sessionCalls.some((prefix) => url.startsWith(prefix))).toBe(true);
  });

  it('does not treat the client data calls as session calls', () => {
    expect(API_SETTINGS.sessionCalls.some((prefix) => '/api/portal/proposals'.startsWith(prefix))).toBe(false);
  });
});
