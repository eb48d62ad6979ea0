import { describe, expect, it } from 'vitest';
import { signInRedirect } from '../../../../../shared/http/return-address';
import { safeNextUrl } from '../auth/guards';
import { API_SETTINGS } from './api-settings';

describe('admin API settings', () => {
  it.each([['/jobs/7?tab=photos'], ['/estimates/3'], ['/today']])('a session ending on %s comes back there after sign-in', (page) => {
    const redirect = signInRedirect(page, API_SETTINGS.signInPath, API_SETTINGS.baseHref);
    expect(redirect?.path).toBe('/sign-in');
    expect(safeNextUrl(redirect?.next)).toBe(page);
  });

  it.each([['/api/auth/session'], ['/api/auth/signin'], ['/api/auth/password-reset']])('treats %s as a session call', (url) => {
    expect(API_SETTINGS.sessionCalls.some((prefix) => url.startsWith(prefix))).toBe(true);
  });
});
